import { AsyncLocalStorage } from "node:async_hooks";
import type { RequestHandler } from "express";
import pg from "pg";

const counter = new AsyncLocalStorage<{ queries: number }>();
let patched = false;

/**
 * Benchmark aid: counts the SQL statements each request sends (the ORM's and ours alike)
 * and reports them in `X-Query-Count` when the request asks with `X-Count-Queries: 1`. Mounted
 * only when BENCH_ROUTES is set.
 */
export function queryCounter(): RequestHandler {
  if (!patched) {
    patched = true;
    const original = pg.Client.prototype.query;
    pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
      const store = counter.getStore();
      if (store) store.queries++;
      return (original as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof original;
  }
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
