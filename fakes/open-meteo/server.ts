/**
 * A local stand-in for the Open-Meteo forecast API: a real HTTP server that answers
 * GET /v1/forecast in the FlatBuffers format the `openmeteo` client asks for, with
 * deterministic, plausible hourly temperature_2m and shortwave_radiation values (fake data: see
 * climate.ts).
 * Scenarios let a test or the demo choose a heat wave, a cold snap or a failure. It records
 * every request it receives. Standalone: node --import tsx fakes/open-meteo/server.ts --port 4102
 */
import http from "node:http";
import type { AddressInfo } from "node:net";
import { pathToFileURL } from "node:url";
import { parseArgs } from "node:util";
import { Unit } from "@openmeteo/sdk/unit.js";
import { Variable } from "@openmeteo/sdk/variable.js";
import { WEATHER_SCENARIOS, type WeatherScenario } from "../../shared/constants";
import { cToF } from "../../shared/units";
import { SCENARIO_SHIFT_C, fakeShortwaveRadiationWm2, fakeTemperatureC } from "./climate";
import { encodeLocation, encodeResponse, type LocationResponse } from "./flatbuffers-response";

export { WEATHER_SCENARIOS, type WeatherScenario };

/** Kinds of bad answer the "garbage" scenario sends, each a 200 the client will try to read. */
export const GARBAGE_KINDS = [
  "random_bytes",
  "framed_noise",
  "negative_size_prefix",
  "truncated",
  "nan_values",
  "absurd_values",
  "short_series",
  "wrong_unit",
] as const;
export type GarbageKind = (typeof GARBAGE_KINDS)[number];

export type ScenarioOptions = { garbage?: GarbageKind; slowMs?: number };

export type RecordedRequest = { method: string; path: string; query: Record<string, string>; receivedAt: string };

export type OpenMeteoFake = {
  /** Base URL, e.g. http://127.0.0.1:4102 (the forecast is at /v1/forecast). */
  url: string;
  port: number;
  /** POST {"scenario", "garbage"?, "slowMs"?} here to switch scenarios over HTTP. */
  controlUrl: string;
  setScenario(scenario: WeatherScenario, options?: ScenarioOptions): void;
  readonly scenario: WeatherScenario;
  /** Requests received so far, oldest first (also at GET /__requests). */
  readonly requests: readonly RecordedRequest[];
  clearRequests(): void;
  close(): Promise<void>;
};

const FORECAST_PATHS = new Set(["/v1/forecast", "/v1/forecast-moved"]);
const MAX_LOCATIONS = 1000;
const MAX_HOURS = 31 * 24;
const DEFAULT_SLOW_MS = 10_000;
const DEFAULT_FORECAST_DAYS = 7;
/** The fake's grid: the service answers with the centre of its model cell, not the asked point. */
const GRID_DEG = 0.05;
const FAKE_ELEVATION_M = 150;
const HOUR_S = 3600;

class RequestError extends Error {}

function parseCoordinates(query: URLSearchParams): { lat: number; lon: number }[] {
  const lats = (query.get("latitude") ?? "").split(",").filter(Boolean).map(Number);
  const lons = (query.get("longitude") ?? "").split(",").filter(Boolean).map(Number);
  if (lats.length === 0 || lats.length !== lons.length)
    throw new RequestError("Parameter 'latitude' and 'longitude' must have the same number of elements");
  if (lats.length > MAX_LOCATIONS) throw new RequestError("Too many locations");
  return lats.map((lat, i) => {
    const lon = lons[i]!;
    if (!(lat >= -90 && lat <= 90) || !(lon >= -180 && lon <= 180))
      throw new RequestError(`Latitude must be in range of -90 to 90°. Given: ${lat}.`);
    return { lat, lon };
  });
}

function parseHourUtc(value: string, name: string): number {
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/.test(value)) throw new RequestError(`Invalid ${name}: ${value}`);
  const ms = Date.parse(`${value}:00Z`);
  if (!Number.isFinite(ms) || ms % (HOUR_S * 1000) !== 0) throw new RequestError(`Invalid ${name}: ${value}`);
  return ms / 1000;
}

function parseDateUtc(value: string, name: string): number {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(value) || !Number.isFinite(Date.parse(value)))
    throw new RequestError(`Invalid ${name}: ${value}`);
  return Date.parse(`${value}T00:00:00Z`) / 1000;
}

/** The hours asked for, [startS, endS) in Unix seconds; the fake accepts any dates. */
function parseHours(query: URLSearchParams): { startS: number; endS: number } {
  const zone = query.get("timezone") ?? "GMT";
  if (!["GMT", "UTC"].includes(zone)) throw new RequestError("The fake serves timezone=GMT only");
  let range: { startS: number; endS: number };
  if (query.has("start_hour") || query.has("end_hour")) {
    range = {
      startS: parseHourUtc(query.get("start_hour") ?? "", "start_hour"),
      endS: parseHourUtc(query.get("end_hour") ?? "", "end_hour") + HOUR_S,
    };
  } else if (query.has("start_date") || query.has("end_date")) {
    range = {
      startS: parseDateUtc(query.get("start_date") ?? "", "start_date"),
      endS: parseDateUtc(query.get("end_date") ?? "", "end_date") + 24 * HOUR_S,
    };
  } else {
    const days = Number(query.get("forecast_days") ?? DEFAULT_FORECAST_DAYS);
    const pastDays = Number(query.get("past_days") ?? 0);
    if (!(days >= 0 && days <= 16) || !(pastDays >= 0 && pastDays <= 92))
      throw new RequestError("Forecast days is invalid");
    const todayS = Math.floor(Date.now() / 86_400_000) * 86_400;
    range = { startS: todayS - pastDays * 86_400, endS: todayS + days * 86_400 };
  }
  if (!(range.endS > range.startS) || range.endS - range.startS > MAX_HOURS * HOUR_S)
    throw new RequestError("Parameter 'end_hour' must be after 'start_hour' and within 31 days");
  return range;
}

/** Hourly variables the fake serves, in the order the real service answers them: the order asked. */
const SERVED_VARIABLES = ["temperature_2m", "shortwave_radiation"] as const;
type ServedVariable = (typeof SERVED_VARIABLES)[number];

function hourlyVariables(query: URLSearchParams): ServedVariable[] {
  const hourly = (query.get("hourly") ?? "").split(",").filter(Boolean);
  const served = (name: string): name is ServedVariable => (SERVED_VARIABLES as readonly string[]).includes(name);
  if (hourly.length === 0 || !hourly.every(served) || new Set(hourly).size !== hourly.length)
    throw new RequestError("The fake serves hourly=temperature_2m and shortwave_radiation only");
  return hourly;
}

/** Builds the locations of a forecast answer; `spoil` lets the garbage scenario bend the values. */
function forecastLocations(query: URLSearchParams, shiftC: number, spoil?: GarbageKind): LocationResponse[] {
  const asked = hourlyVariables(query);
  const coordinates = parseCoordinates(query);
  const { startS, endS } = parseHours(query);
  const fahrenheit = query.get("temperature_unit") === "fahrenheit";
  const hours = (endS - startS) / HOUR_S - (spoil === "short_series" ? 3 : 0);
  return coordinates.map(({ lat, lon }, locationId) => {
    const gridLat = Math.round(lat / GRID_DEG) * GRID_DEG;
    const gridLon = Math.round(lon / GRID_DEG) * GRID_DEG;
    const spoilt = (value: number) => (spoil === "nan_values" ? Number.NaN : spoil === "absurd_values" ? 999 : value);
    const temperatures = Array.from({ length: hours }, (_, i) => {
      const tempC = fakeTemperatureC(gridLat, gridLon, startS + i * HOUR_S, shiftC);
      return spoilt(fahrenheit ? cToF(tempC) : tempC);
    });
    const unit = fahrenheit !== (spoil === "wrong_unit") ? Unit.fahrenheit : Unit.celsius;
    // The value at an hour is the mean of the hour before it, as the service reports it.
    const radiation = () =>
      Array.from({ length: hours }, (_, i) =>
        spoilt(fakeShortwaveRadiationWm2(gridLat, gridLon, startS + i * HOUR_S, shiftC > 0)),
      );
    const variables = asked.map((name) =>
      name === "temperature_2m"
        ? { variable: Variable.temperature, unit, altitude: 2, values: temperatures }
        : {
            variable: Variable.shortwave_radiation,
            unit: Unit.watt_per_square_metre,
            altitude: 0,
            values: radiation(),
          },
    );
    return {
      latitude: gridLat,
      longitude: gridLon,
      elevation: FAKE_ELEVATION_M,
      locationId,
      utcOffsetSeconds: 0,
      timezone: "GMT",
      timezoneAbbreviation: "GMT",
      hourly: {
        timeS: startS,
        timeEndS: startS + hours * HOUR_S,
        intervalS: HOUR_S,
        variables,
      },
    };
  });
}

/** mulberry32: the same "random" bytes on every run. */
function seededBytes(length: number, seed: number): Uint8Array {
  let state = seed >>> 0;
  return Uint8Array.from({ length }, () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = Math.imul(state ^ (state >>> 15), state | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) & 0xff;
  });
}

function garbageBody(kind: GarbageKind, query: URLSearchParams): Uint8Array {
  switch (kind) {
    case "random_bytes":
      return seededBytes(512, 0x5eed);
    case "framed_noise": {
      // A correct size prefix around noise: the frame loop ends, the tables are nonsense.
      const body = seededBytes(512, 0xbad);
      new DataView(body.buffer).setInt32(0, body.length - 4, true);
      return body;
    }
    case "negative_size_prefix": {
      // A frame length of −12: the client's size-prefix loop never ends on it.
      const body = new Uint8Array(16);
      new DataView(body.buffer).setInt32(0, -12, true);
      return body;
    }
    case "truncated": {
      const whole = encodeLocation(forecastLocations(query, 0)[0]!);
      return whole.slice(0, Math.floor(whole.length / 2));
    }
    default:
      return encodeResponse(forecastLocations(query, 0, kind));
  }
}

function sendJson(res: http.ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json" }).end(JSON.stringify(body));
}

function sendBytes(res: http.ServerResponse, body: Uint8Array): void {
  res.writeHead(200, { "content-type": "application/octet-stream", "content-length": body.length }).end(body);
}

async function readJson(req: http.IncomingMessage): Promise<unknown> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > 10_000) throw new RequestError("control body too large");
    chunks.push(chunk as Buffer);
  }
  try {
    return JSON.parse(Buffer.concat(chunks).toString("utf8"));
  } catch {
    throw new RequestError("control body is not JSON");
  }
}

/** Starts the fake on `port` (0 picks a free one) with a starting scenario. */
export async function startOpenMeteoFake(
  options: { port?: number; host?: string; scenario?: WeatherScenario } & ScenarioOptions = {},
): Promise<OpenMeteoFake> {
  const host = options.host ?? "127.0.0.1";
  let scenario: WeatherScenario = "normal";
  let scenarioOptions: ScenarioOptions = {};
  const requests: RecordedRequest[] = [];
  const pending = new Set<NodeJS.Timeout>();

  const setScenario = (next: WeatherScenario, nextOptions: ScenarioOptions = {}) => {
    if (!WEATHER_SCENARIOS.includes(next)) throw new RangeError(`unknown scenario ${String(next)}`);
    if (nextOptions.garbage !== undefined && !GARBAGE_KINDS.includes(nextOptions.garbage))
      throw new RangeError(`unknown garbage kind ${String(nextOptions.garbage)}`);
    if (nextOptions.slowMs !== undefined && !(nextOptions.slowMs >= 0)) throw new RangeError("slowMs must be ≥ 0");
    scenario = next;
    scenarioOptions = nextOptions;
  };
  setScenario(options.scenario ?? "normal", { garbage: options.garbage, slowMs: options.slowMs });

  const answerForecast = (url: URL, req: http.IncomingMessage, res: http.ServerResponse) => {
    const query = url.searchParams;
    switch (scenario) {
      case "outage":
        res
          .writeHead(503, { "content-type": "text/html", "retry-after": "120" })
          .end("<html><body><h1>503 Service Unavailable</h1></body></html>");
        return;
      case "reset":
        req.socket.destroy();
        return;
      case "redirect":
        if (url.pathname === "/v1/forecast") {
          res.writeHead(302, { location: `/v1/forecast-moved${url.search}` }).end();
          return;
        }
        break;
      case "garbage":
        sendBytes(res, garbageBody(scenarioOptions.garbage ?? "random_bytes", query));
        return;
      case "slow": {
        const timer = setTimeout(() => {
          pending.delete(timer);
          if (!res.destroyed) sendBytes(res, encodeResponse(forecastLocations(query, 0)));
        }, scenarioOptions.slowMs ?? DEFAULT_SLOW_MS);
        pending.add(timer);
        return;
      }
    }
    const shiftC = scenario === "heat_wave" || scenario === "cold_snap" ? SCENARIO_SHIFT_C[scenario] : 0;
    sendBytes(res, encodeResponse(forecastLocations(query, shiftC)));
  };

  const handle = async (req: http.IncomingMessage, res: http.ServerResponse) => {
    const url = new URL(req.url ?? "/", `http://${host}`);
    if (url.pathname === "/__control" && req.method === "POST") {
      const body = (await readJson(req)) as { scenario?: WeatherScenario } & ScenarioOptions;
      try {
        setScenario(body.scenario ?? "normal", { garbage: body.garbage, slowMs: body.slowMs });
      } catch (error) {
        throw new RequestError((error as Error).message);
      }
      sendJson(res, 200, { scenario, ...scenarioOptions });
    } else if (url.pathname === "/__control" && req.method === "GET") {
      sendJson(res, 200, { scenario, ...scenarioOptions, scenarios: WEATHER_SCENARIOS, garbageKinds: GARBAGE_KINDS });
    } else if (url.pathname === "/__requests" && req.method === "GET") {
      sendJson(res, 200, requests);
    } else if (url.pathname === "/__requests" && req.method === "DELETE") {
      requests.length = 0;
      res.writeHead(204).end();
    } else if (FORECAST_PATHS.has(url.pathname) && req.method === "GET") {
      requests.push({
        method: req.method,
        path: url.pathname,
        query: Object.fromEntries(url.searchParams),
        receivedAt: new Date().toISOString(),
      });
      answerForecast(url, req, res);
    } else {
      sendJson(res, 404, { error: true, reason: "Not found" });
    }
  };

  const server = http.createServer((req, res) => {
    handle(req, res).catch((error: unknown) => {
      if (res.headersSent) return res.destroy();
      // The real service answers bad parameters with 400 and a JSON reason.
      if (error instanceof RequestError) return sendJson(res, 400, { error: true, reason: error.message });
      sendJson(res, 500, { error: true, reason: "fake failed" });
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port ?? 0, host, () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  const url = `http://${host}:${port}`;

  return {
    url,
    port,
    controlUrl: `${url}/__control`,
    setScenario,
    get scenario() {
      return scenario;
    },
    get requests() {
      return requests;
    },
    clearRequests: () => {
      requests.length = 0;
    },
    close: () =>
      new Promise<void>((resolve, reject) => {
        for (const timer of pending) clearTimeout(timer);
        pending.clear();
        server.close((error) => (error ? reject(error) : resolve()));
        server.closeAllConnections();
      }),
  };
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const { values } = parseArgs({
    options: {
      port: { type: "string", default: "4102" },
      host: { type: "string", default: "127.0.0.1" },
      scenario: { type: "string", default: "normal" },
    },
  });
  const fake = await startOpenMeteoFake({
    port: Number(values.port),
    host: values.host,
    scenario: values.scenario as WeatherScenario,
  });
  process.stdout.write(
    `open-meteo fake (${fake.scenario}) on ${fake.url}/v1/forecast; control at ${fake.controlUrl}\n`,
  );
  const stop = () => void fake.close().then(() => process.exit(0));
  process.once("SIGINT", stop);
  process.once("SIGTERM", stop);
}
