import { Router } from "express";
import type { AppContext } from "../../context";

/** Liveness with the database's state: load balancers and the start script poll this. */
export function healthRouter(ctx: AppContext): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    try {
      await ctx.pool.query({ text: "SELECT 1", query_timeout: 2_000 } as never);
      res.json({ status: "ok", db: "up" });
    } catch {
      res.status(503).json({ status: "degraded", db: "down" });
    }
  });
  return router;
}
