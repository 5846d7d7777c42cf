import type { EntityManager } from "@mikro-orm/postgresql";
import type pg from "pg";
import type { Env } from "./env";
import type { Orm } from "./db/orm";
import type { Actor } from "./auth/actor";
import type { Mailer } from "./adapters/mailer";
import type { Storage } from "./adapters/storage";
import type { WeatherService } from "./adapters/weather";
import type { AppLinks } from "./mail/links";
import type { ScheduledTask } from "./services/scheduler";
import type { OutboxWorker } from "./services/outbox";
import type { WeatherSource } from "./services/temperature/forecasts";
import type { ReadyGate } from "./services/transfers/transition";
import type { ManifestExtrasProvider } from "./services/transfers/manifest-extras";

/** What an app is built from: configuration and the long-lived database clients. */
export type AppBase = {
  env: Env;
  orm: Orm;
  /** A small pg pool for sessions, throttling and health checks (outside the ORM's unit of work). */
  pool: pg.Pool;
};

/** The one module per hosted service, built once per app from its environment. */
export type Adapters = { mailer: Mailer; storage: Storage; weather: WeatherService };

/**
 * Everything an app uses, assembled by the composition root (server/composition.ts) and handed
 * to routes and services. Nothing in it is shared with another app built in the same process.
 */
export type AppContext = AppBase & {
  readonly adapters: Readonly<Adapters>;
  /** Where links in e-mail and on the manifest point (PUBLIC_URL). */
  readonly links: AppLinks;
  /** The weather adapter with the forecast cache in this app's database. */
  readonly forecastSource: WeatherSource;
  /** The gates in front of "ready to ship", in the order they run. */
  readonly readyGates: readonly ReadyGate[];
  /** What the manifest adds from other parts of Hatchway, in order. */
  readonly manifestExtras: readonly ManifestExtrasProvider[];
  /** The periodic work a server process of this app runs when WORKERS is on. */
  readonly scheduledTasks: readonly ScheduledTask[];
  /** Delivers queued mail; started by index.ts only where WORKERS is on. */
  readonly outbox: OutboxWorker;
  /** Wakes the outbox worker after a request queued mail; a no-op when no worker runs. */
  readonly kickOutbox: () => void;
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
