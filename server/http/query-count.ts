import { AsyncLocalStorage } from "node:async_hooks";
import type { RequestHandler } from "express";
import type pg from "pg";
import type { AppBase } from "../context";

/** Marks a database connection this app already counts on (each connection belongs to one app's pool). */
const COUNTED = Symbol("hatchway.queryCounted");
type Countable = { query: (...args: unknown[]) => unknown; [COUNTED]?: true };

/** Wraps one connection's `query` so each statement it sends adds to the current request's count. */
function countOn(connection: Countable, count: () => void): void {
  if (connection[COUNTED]) return;
  connection[COUNTED] = true;
  const original = connection.query;
  connection.query = function (this: unknown, ...args: unknown[]) {
    count();
    return original.apply(this, args);
  };
}

/**
 * Benchmark aid: counts the SQL statements each request sends (the ORM's and ours alike)
 * and reports them in `X-Query-Count` when the request asks with `X-Count-Queries: 1`. Mounted
 * only when BENCH_ROUTES is set. It instruments this app's own connections as they are handed
 * out (the pg pool's and the ORM's), never a library's prototype, so another app in the same
 * process is not counted, and an app built without BENCH_ROUTES pays nothing.
 */
export function queryCounter({ orm, pool }: Pick<AppBase, "orm" | "pool">): RequestHandler {
  const counter = new AsyncLocalStorage<{ queries: number }>();
  const count = () => {
    const store = counter.getStore();
    if (store) store.queries++;
  };
  pool.on("acquire", (client: pg.PoolClient) => countOn(client as unknown as Countable, count));
  // The ORM's connections come from its knex client; transactions acquire through it too.
  const knexClient = orm.em.getConnection().getKnex().client as { acquireConnection(): Promise<Countable> };
  const acquire = knexClient.acquireConnection;
  knexClient.acquireConnection = async function (this: unknown) {
    const connection = await acquire.call(this);
    countOn(connection, count);
    return connection;
  };

  return (req, res, next) => {
    // Only on request: under load the counting itself (AsyncLocalStorage) would be measured too.
    if (req.headers["x-count-queries"] !== "1") return next();
    const store = { queries: 0 };
    const writeHead = res.writeHead;
    res.writeHead = function (this: typeof res, ...args: unknown[]) {
      if (!res.headersSent) res.setHeader("X-Query-Count", String(store.queries));
      return (writeHead as (...a: unknown[]) => typeof res).apply(this, args);
    } as typeof res.writeHead;
    counter.run(store, next);
  };
}
