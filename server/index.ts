import pg from "pg";
import { parseEnv } from "./env";
import { initORM } from "./db/orm";
import { createApp } from "./app";
import { createMailer } from "./adapters/mailer";
import { startOutboxWorker } from "./services/outbox";
import { startScheduler } from "./services/scheduler";

/** Listens; the process stays up when the database or the mail server goes away and comes back. */
async function main() {
  const env = parseEnv();
  const orm = await initORM(env.DATABASE_URL);
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
  pool.on("error", (err) => console.error("[pg] idle client error", err.message));
  const mailer = createMailer(env.SMTP_URL, env.MAIL_FROM);
  const outbox = env.WORKERS ? startOutboxWorker(orm, mailer) : null;
  const ctx = { env, orm, pool, kickOutbox: () => outbox?.kick() };
  const app = createApp(ctx);
  const scheduler = env.WORKERS ? startScheduler(ctx) : null;
  const server = app.listen(env.PORT, env.HOST, () => {
    console.log(`Hatchway is serving http://${env.HOST}:${env.PORT} (Node.js ${process.version})`);
  });

  const shutdown = async () => {
    // Finish what is in flight, then drop idle keep-alive sockets, then close the pools.
    const closed = new Promise((resolve) => server.close(resolve));
    server.closeIdleConnections();
    await Promise.race([closed, new Promise((r) => setTimeout(r, 5_000))]);
    server.closeAllConnections();
    scheduler?.stop();
    await outbox?.stop();
    mailer.close();
    await pool.end().catch(() => undefined);
    await orm.close().catch(() => undefined);
    process.exit(0);
  };
  process.on("SIGINT", shutdown);
  process.on("SIGTERM", shutdown);
}

process.on("unhandledRejection", (err) => console.error("[hatchway] unhandled rejection", err));

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
