/**
 * The one module that talks to the weather service: hourly temperature_2m in °F and
 * shortwave_radiation in W/m² (the mean of the hour before each value) for a set of points, through the real `openmeteo` client, from a base URL the caller gives (Open-Meteo or
 * the fake in fakes/open-meteo), run in a worker thread (see weather-client.worker.mjs for why).
 * The whole call (worker start, request, one retry, decoding) ends within the timeout, follows
 * no redirect, and the status, the framing and every value are checked; anything else is a
 * typed "unavailable" result, which the assessment turns into "forecast unavailable".
 */
import { Worker } from "node:worker_threads";
import { Unit } from "@openmeteo/sdk/unit.js";
import { Variable } from "@openmeteo/sdk/variable.js";
import { isPlausibleAmbientF, isPlausibleRadiationWm2, type PointForecast } from "@shared/temperature/ambient";
import type { LatLon } from "@shared/temperature/geo";
import { FORECAST_POINTS_MAX } from "@shared/temperature/limits";

export const WEATHER_TIMEOUT_MS = 3000;

/** Longest span one request may ask for; the fake serves 31 days, the service less ahead of today. */
export const FORECAST_REQUEST_HOURS_MAX = 31 * 24;

/** The service answers with its grid cell's centre; farther than this is someone else's point. */
const POSITION_TOLERANCE_DEG = 0.5;
const HOUR_MS = 3_600_000;
/** Two tries in all (one retry after 500, 502 or 504), inside the same timeout. */
const CLIENT_TRIES = 2;
/** Room per location beyond its float32 values: header, strings, tables. */
const LOCATION_OVERHEAD_BYTES = 1024;
/** Hourly variables asked for: temperature and solar radiation. */
const VARIABLES_ASKED = 2;

export type WeatherUnavailableReason = "timeout" | "network" | "redirect" | "upstream_error" | "invalid_response";

export type ForecastResult =
  { ok: true; forecasts: PointForecast[] } | { ok: false; reason: WeatherUnavailableReason; detail: string };

export type ForecastRequest = {
  /** Service base URL, e.g. https://api.open-meteo.com (the path /v1/forecast is added). */
  baseUrl: string;
  points: readonly LatLon[];
  /** First and last hour wanted, ISO 8601; widened to whole hours. */
  fromHour: string;
  toHour: string;
  timeoutMs?: number;
};

/** What the worker copies out of the client's readers. */
type DecodedVariable = { variable: number; unit: number; altitude: number; length: number; values: number[] };
type DecodedLocation = {
  latitude: number;
  longitude: number;
  hourly: { time: number; timeEnd: number; interval: number; variables: DecodedVariable[] } | null;
};
type WorkerMessage =
  | { ok: true; locations: DecodedLocation[] }
  | { ok: false; phase: "fetch" | "decode"; error: { name: string; message: string; cause: string } };

type Plan = { url: string; params: Record<string, string>; points: readonly LatLon[]; fromS: number; hours: number };

/** The weather service of one app: its base URL is fixed when the composition root builds it. */
export type WeatherService = {
  readonly baseUrl: string;
  hourlyForecastsF(request: Omit<ForecastRequest, "baseUrl">): Promise<ForecastResult>;
};

/** The weather adapter for a base URL (Open-Meteo, or the fake in fakes/open-meteo). */
export function createWeatherService(baseUrl: string): WeatherService {
  return { baseUrl, hourlyForecastsF: (request) => fetchHourlyForecastsF({ ...request, baseUrl }) };
}

/**
 * Hourly outside temperatures (°F) at each point, in the order asked, or why there are none.
 * Throws RangeError for a request that could never be right (no points, too many, bad hours).
 */
export async function fetchHourlyForecastsF(request: ForecastRequest): Promise<ForecastResult> {
  const plan = planRequest(request);
  const message = await runClient(plan, request.timeoutMs ?? WEATHER_TIMEOUT_MS);
  if ("reason" in message) return message;
  if (!message.ok) return unavailableFrom(message);
  return checkedForecasts(message.locations, plan);
}

function planRequest(request: ForecastRequest): Plan {
  const { points } = request;
  if (points.length === 0 || points.length > FORECAST_POINTS_MAX)
    throw new RangeError(`between 1 and ${FORECAST_POINTS_MAX} points`);
  if (!points.every((p) => Math.abs(p.lat) <= 90 && Math.abs(p.lon) <= 180))
    throw new RangeError("a point is off the globe");
  const fromMs = Math.floor(Date.parse(request.fromHour) / HOUR_MS) * HOUR_MS;
  const toMs = Math.ceil(Date.parse(request.toHour) / HOUR_MS) * HOUR_MS;
  const hours = (toMs - fromMs) / HOUR_MS + 1;
  if (!(hours >= 1 && hours <= FORECAST_REQUEST_HOURS_MAX))
    throw new RangeError(`fromHour..toHour must span 1 to ${FORECAST_REQUEST_HOURS_MAX} hours`);
  const base = new URL(request.baseUrl);
  if (base.protocol !== "https:" && base.protocol !== "http:") throw new RangeError("baseUrl must be http(s)");
  const hour = (ms: number) => new Date(ms).toISOString().slice(0, 16);
  return {
    url: new URL("v1/forecast", base.href.endsWith("/") ? base.href : `${base.href}/`).href,
    params: {
      latitude: points.map((p) => p.lat.toFixed(4)).join(","),
      longitude: points.map((p) => p.lon.toFixed(4)).join(","),
      hourly: "temperature_2m,shortwave_radiation",
      temperature_unit: "fahrenheit",
      timezone: "GMT",
      start_hour: hour(fromMs),
      end_hour: hour(toMs),
    },
    points,
    fromS: fromMs / 1000,
    hours,
  };
}

type Unavailable = Extract<ForecastResult, { ok: false }>;

/** Runs the client in a worker and waits for its answer, its death or the timeout. */
function runClient(plan: Plan, timeoutMs: number): Promise<WorkerMessage | Unavailable> {
  return new Promise((resolve) => {
    const worker = new Worker(new URL("./weather-client.worker.mjs", import.meta.url), {
      workerData: {
        url: plan.url,
        params: plan.params,
        timeoutMs,
        retries: CLIENT_TRIES,
        maxLocations: plan.points.length,
        maxValues: plan.hours,
        maxBodyBytes: plan.points.length * (VARIABLES_ASKED * plan.hours * 4 + LOCATION_OVERHEAD_BYTES),
      },
      // No loader in the worker: it is plain JavaScript, and starting tsx there would eat the budget.
      execArgv: [],
    });
    let settled = false;
    const finish = (outcome: WorkerMessage | Unavailable) => {
      if (settled) return;
      settled = true;
      clearTimeout(timer);
      void worker.terminate();
      resolve(outcome);
    };
    const timer = setTimeout(
      () => finish({ ok: false, reason: "timeout", detail: `no usable answer within ${timeoutMs} ms` }),
      timeoutMs,
    );
    worker.once("message", (message: WorkerMessage) => finish(message));
    worker.once("error", (error) =>
      finish({ ok: false, reason: "invalid_response", detail: `the client failed on the answer: ${error.message}` }),
    );
    worker.once("exit", (code) =>
      finish({ ok: false, reason: "invalid_response", detail: `the client stopped (exit ${code})` }),
    );
  });
}

function unavailableFrom(message: Extract<WorkerMessage, { ok: false }>): Unavailable {
  const { name, message: text, cause } = message.error;
  if (message.phase === "decode" || name === "InvalidBody")
    return { ok: false, reason: "invalid_response", detail: text };
  if (name === "TimeoutError" || name === "AbortError") return { ok: false, reason: "timeout", detail: text };
  if (name === "TypeError" && text === "fetch failed") {
    if (/redirect/i.test(cause)) return { ok: false, reason: "redirect", detail: `the service redirected (${cause})` };
    return { ok: false, reason: "network", detail: cause || text };
  }
  // "UpstreamStatus" from the worker's checked fetch; else the client's own: the status text
  // after retrying 500/502/504, or the JSON reason of a 400/429.
  return { ok: false, reason: "upstream_error", detail: text };
}

function invalid(detail: string): Unavailable {
  return { ok: false, reason: "invalid_response", detail };
}

function checkedForecasts(locations: readonly DecodedLocation[], plan: Plan): ForecastResult {
  if (locations.length !== plan.points.length)
    return invalid(`${locations.length} locations for ${plan.points.length} points`);
  const forecasts: PointForecast[] = [];
  for (const [i, location] of locations.entries()) {
    const point = plan.points[i]!;
    const problem = locationProblem(location, point, plan);
    if (problem) return invalid(`point ${i}: ${problem}`);
    const values = temperatureSeries(location)!.values;
    const radiation = radiationSeries(location)!.values;
    forecasts.push({
      lat: point.lat,
      lon: point.lon,
      hours: values.map((tempF, h) => ({
        at: new Date((plan.fromS + h * 3600) * 1000).toISOString(),
        tempF: Math.round(tempF * 100) / 100,
        radiationWm2: Math.round(radiation[h]! * 10) / 10,
      })),
    });
  }
  return { ok: true, forecasts };
}

function temperatureSeries(location: DecodedLocation): DecodedVariable | undefined {
  return location.hourly?.variables.find((v) => v.variable === Variable.temperature && v.altitude === 2);
}

function radiationSeries(location: DecodedLocation): DecodedVariable | undefined {
  return location.hourly?.variables.find((v) => v.variable === Variable.shortwave_radiation);
}

/** Why one location's answer cannot be used, or undefined when it can. */
function locationProblem(location: DecodedLocation, point: LatLon, plan: Plan): string | undefined {
  const hourly = location.hourly;
  if (!hourly) return "no hourly data";
  if (
    Math.abs(location.latitude - point.lat) > POSITION_TOLERANCE_DEG ||
    Math.abs(location.longitude - point.lon) > POSITION_TOLERANCE_DEG
  ) {
    return `answer is for ${location.latitude}, ${location.longitude}`;
  }
  if (hourly.interval !== 3600 || hourly.time !== plan.fromS || hourly.timeEnd !== plan.fromS + plan.hours * 3600) {
    return "hours differ from those asked";
  }
  const series = temperatureSeries(location);
  if (!series) return "no temperature_2m";
  if (series.unit !== Unit.fahrenheit) return "temperature not in °F";
  if (series.length !== plan.hours || series.values.length !== plan.hours)
    return `${series.length} values for ${plan.hours} hours`;
  const bad = series.values.findIndex((v) => !isPlausibleAmbientF(v));
  if (bad >= 0) return `implausible value ${series.values[bad]} at hour ${bad}`;
  const radiation = radiationSeries(location);
  if (!radiation) return "no shortwave_radiation";
  if (radiation.unit !== Unit.watt_per_square_metre) return "shortwave_radiation not in W/m²";
  if (radiation.length !== plan.hours || radiation.values.length !== plan.hours)
    return `${radiation.length} radiation values for ${plan.hours} hours`;
  const dark = radiation.values.findIndex((v) => !isPlausibleRadiationWm2(v));
  if (dark >= 0) return `implausible radiation ${radiation.values[dark]} at hour ${dark}`;
  return undefined;
}
