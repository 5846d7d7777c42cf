import type { EntityManager } from "@mikro-orm/postgresql";
import type pg from "pg";
import type { Env } from "./env";
import type { Orm } from "./db/orm";
import type { Actor } from "./auth/actor";

/** What the app is built from: configuration and the long-lived clients. */
export type AppContext = {
  env: Env;
  orm: Orm;
  /** A small pg pool for sessions, throttling and health checks (outside the ORM's unit of work). */
  pool: pg.Pool;
  /** Wakes the outbox worker after a request queued mail; a no-op when no worker runs. */
  kickOutbox: () => void;
};

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends Actor {}
    interface Request {
      em: EntityManager;
      ctx: AppContext;
    }
  }
}
