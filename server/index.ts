import pg from "pg";
import { parseEnv } from "./env";
import { initORM } from "./db/orm";
import { createApp } from "./app";
import { composeApp } from "./composition";
import { startScheduler } from "./services/scheduler";
import { privilegeProblems } from "./db/least-privilege";

/**
 * The server's login must not be able to rewrite the evidence (D18). In production a login
 * that could is refused; elsewhere it is said out loud. A database that is down at boot is
 * checked by nobody: the server starts and recovers when it comes back (SECURITY.md, Faults).
 */
async function checkDatabaseLogin(pool: pg.Pool, production: boolean): Promise<void> {
  const problems = await privilegeProblems(pool).catch((err: Error) => {
    console.error(`[hatchway] could not check the database login's privileges: ${err.message}`);
    return [];
  });
  if (problems.length === 0) return;
  const text = `the database login can do more than the app needs (${problems.slice(0, 5).join("; ")}${problems.length > 5 ? "; …" : ""}). Connect as hatchway_app (README, "Deployment").`;
  if (production) throw new Error(`Hatchway cannot start: ${text}`);
  console.warn(`[hatchway] warning: ${text}`);
}

/** Listens; the process stays up when the database or the mail server goes away and comes back. */
async function main() {
  const env = parseEnv();
  const orm = await initORM(env.DATABASE_URL);
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
  pool.on("error", (err) => console.error("[pg] idle client error", err.message));
  await checkDatabaseLogin(pool, env.NODE_ENV === "production");
  if (env.NODE_ENV === "production" && !env.SECURE_COOKIES)
    console.warn("[hatchway] warning: production without SECURE_COOKIES: cookies travel without the Secure flag.");
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
