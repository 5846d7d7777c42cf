import pg from "pg";
import { parseEnv } from "./env";
import { initORM } from "./db/orm";
import { createApp } from "./app";
import { composeApp } from "./composition";
import { startScheduler } from "./services/scheduler";

/** Listens; the process stays up when the database or the mail server goes away and comes back. */
async function main() {
  const env = parseEnv();
  const orm = await initORM(env.DATABASE_URL);
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
  pool.on("error", (err) => console.error("[pg] idle client error", err.message));
  // The composition root builds everything once; this process then serves it and runs its workers.
  const ctx = composeApp({ env, orm, pool });
  const app = createApp(ctx);
  if (env.WORKERS) ctx.outbox.start();
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
    await ctx.outbox.stop();
    ctx.adapters.mailer.close();
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
