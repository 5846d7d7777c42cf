/**
 * The composition root: the one place an app is assembled. It builds, in this order, the
 * adapters (mail, storage, weather), the link base, the ready-to-ship gates (compliance first,
 * then temperature), the manifest's extras, the scheduled tasks and the outbox worker, and
 * returns them as the app's context. Routes and services receive what they use from it; no
 * module registers anything or keeps a setting of its own, so two apps built in one process
 * share nothing (see composition.db.test.ts).
 */
import { createMailer } from "./adapters/mailer";
import { createStorage } from "./adapters/storage";
import { createWeatherService } from "./adapters/weather";
import type { CustodyKind } from "@shared/constants";
import type { Adapters, AppBase, AppContext } from "./context";
import { createLinks } from "./mail/links";
import { complianceGate } from "./services/compliance/gate";
import { expiryReminderTask } from "./services/compliance/expiry-reminders";
import { reportReminderTask } from "./services/register/report-reminders";
import { manifestDocuments } from "./services/compliance/manifest-documents";
import { createOutboxWorker } from "./services/outbox";
import type { ScheduledTask } from "./services/scheduler";
import type { WeatherSource } from "./services/temperature/forecasts";
import { createTemperatureGate } from "./services/temperature/gate";
import { manifestTemperature } from "./services/temperature/manifest-temperature";
import { FORECAST_PRUNE_TASK, TEMPERATURE_RECHECK_TASK } from "./services/temperature/recheck";
import type { ManifestExtrasProvider } from "./services/transfers/manifest-extras";
import type { ReadyGate } from "./services/transfers/transition";
import { appendCustody } from "./services/transfers/custody";

/** The ready-to-ship gates by name, in the order they run: the law first, then the weather. */
export const READY_GATE_ORDER = ["compliance", "temperature"] as const;

export type CompositionOptions = {
  /** Adapters to use instead of the ones the environment names (tests: a recording mailer, say). */
  adapters?: Partial<Adapters>;
  /** Gates to use instead of the standard ones (tests only: the product always runs both). */
  readyGates?: readonly ReadyGate[];
};

/** Builds the standard gates around this app's weather source, in READY_GATE_ORDER. */
export function createReadyGates(forecastSource: WeatherSource | null): readonly ReadyGate[] {
  const byName: Record<(typeof READY_GATE_ORDER)[number], ReadyGate> = {
    compliance: complianceGate,
    temperature: createTemperatureGate(forecastSource),
  };
  return Object.freeze(READY_GATE_ORDER.map((name) => byName[name]));
}

/** Assembles an app's context from its environment and database clients. */
export function composeApp(base: AppBase, options: CompositionOptions = {}): AppContext {
  const { env, orm, pool } = base;

  const adapters: Adapters = Object.freeze({
    mailer: options.adapters?.mailer ?? createMailer(env.SMTP_URL, env.MAIL_FROM),
    storage: options.adapters?.storage ?? createStorage(env),
    weather: options.adapters?.weather ?? createWeatherService(env.WEATHER_URL),
  });
  const links = createLinks(env.PUBLIC_URL);
  const forecastSource: WeatherSource = Object.freeze({ service: adapters.weather, db: pool });

  const readyGates = Object.freeze([...(options.readyGates ?? createReadyGates(forecastSource))]);
  // Compliance adds the permits on file, temperature the advice of the last stored check.
  const manifestExtras: readonly ManifestExtrasProvider[] = Object.freeze([manifestDocuments, manifestTemperature]);
  const scheduledTasks: readonly ScheduledTask[] = Object.freeze([
    expiryReminderTask,
    reportReminderTask,
    TEMPERATURE_RECHECK_TASK,
    FORECAST_PRUNE_TASK,
  ]);
  const outbox = createOutboxWorker(orm, adapters.mailer);

  return Object.freeze({
    env,
    orm,
    pool,
    adapters,
    links,
    forecastSource,
    readyGates,
    manifestExtras,
    scheduledTasks,
    outbox,
    kickOutbox: () => outbox.kick(),
  });
}

/** Where records come from that were loaded rather than entered: the demo scenario or the benchmark's data. */
export type LoadedDataKind = "demo" | "bench";

/** The custody entry that marks a transfer cleared to ship without its checks. */
export const CHECKS_SKIPPED_ENTRY = "checks_skipped" satisfies CustodyKind;

/**
 * The one way records are written past the ready-to-ship gates. Demo seeding and the benchmark
 * loader run outside any app, with no weather service and no rules they are meant to test; their
 * transfers become ready without the compliance and temperature checks. In place of the gates this
 * writes a custody entry, in the same transaction as the step, naming the checks that were not run
 * and why; the transfer API shows it as `loadedWithoutChecks`.
 */
export function gatesForLoadedData(loadedAs: LoadedDataKind): readonly ReadyGate[] {
  const checksNotRun = [...READY_GATE_ORDER];
  return Object.freeze([
    {
      name: "loaded-data",
      async check({ em, actor, transfer }) {
        await appendCustody(em, transfer.id, actor, CHECKS_SKIPPED_ENTRY, {
          loadedAs,
          checksNotRun,
          reason: `Loaded as ${loadedAs === "demo" ? "demo" : "benchmark"} data: cleared to ship without the compliance and temperature checks.`,
        });
      },
    },
  ]);
}

/** True when `value` already went through `composeApp`. */
export function isComposed(value: AppBase | AppContext): value is AppContext {
  return "readyGates" in value && "links" in value && "adapters" in value;
}
