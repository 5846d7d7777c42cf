/**
 * Hourly forecasts for a trip (temperature and solar radiation), cached in PostgreSQL by rounded
 * position and hour: the cache
 * answers what it holds fresh, the weather adapter is asked only for the positions it lacks,
 * and what comes back is stored for the next assessment (another box, the gate, a re-check).
 */
import type pg from "pg";
import { forecastWindow, indexForecasts, type ForecastIndex, type PointForecast } from "@shared/temperature/ambient";
import type { LatLon } from "@shared/temperature/geo";
import { FORECAST_HORIZON_DAYS, FORECAST_POINTS_MAX } from "@shared/temperature/limits";
import type { TransitTimeline } from "@shared/temperature/timeline";
import { MS_PER_DAY, MS_PER_HOUR } from "@shared/temperature/zoned-time";
import type { WeatherService } from "../../adapters/weather";
import type { ForecastUnavailableReason } from "@shared/constants";
import { forecastUnavailableWords } from "@shared/words";

export type Queryable = Pick<pg.Pool, "query">;

/** Where forecasts come from: the weather adapter and the database holding the cache. */
export type WeatherSource = { service: WeatherService; db: Queryable };

/** A cached hour counts as current for this long after it was fetched. */
export const FORECAST_FRESH_MS = 3 * MS_PER_HOUR;

/** Cached hours older than this are of no use to anyone and are pruned. */
export const FORECAST_KEEP_MS = MS_PER_DAY;

/** The weather service's faults and a trip beyond its horizon (words in shared/words). */
export type { ForecastUnavailableReason };

export type ForecastOutcome =
  | { ok: true; index: ForecastIndex; fetchedPoints: number }
  | { ok: false; reason: ForecastUnavailableReason; detail: string };

type Key = { latE2: number; lonE2: number };

/** Cache key of a position: 0.01° (about 1 km), much finer than the forecast's own grid. */
export function positionKey(position: LatLon): Key {
  return { latE2: Math.round(position.lat * 100), lonE2: Math.round(position.lon * 100) };
}

const keyText = (k: Key) => `${k.latE2},${k.lonE2}`;
const positionOf = (k: Key): LatLon => ({ lat: k.latE2 / 100, lon: k.lonE2 / 100 });

/**
 * Forecasts (°F) at every waypoint of the timeline for the trip and the later departures the
 * safer-departure search tries, up to the service's horizon. A trip ending beyond the horizon,
 * or any failure of the service, is "unavailable" with the reason.
 */
export async function forecastIndexFor(
  source: WeatherSource,
  timeline: TransitTimeline,
  nowMs: number,
): Promise<ForecastOutcome> {
  const window = forecastWindow(timeline);
  const fromMs = Math.floor(Date.parse(window.fromHour) / MS_PER_HOUR) * MS_PER_HOUR;
  const horizonMs = Math.floor((nowMs + FORECAST_HORIZON_DAYS * MS_PER_DAY) / MS_PER_HOUR) * MS_PER_HOUR;
  const tripEndMs = Date.parse(timeline.points.at(-1)?.at ?? timeline.arriveAt);
  if (tripEndMs > horizonMs) {
    return {
      ok: false,
      reason: "beyond_horizon",
      detail: `forecasts reach ${FORECAST_HORIZON_DAYS} days ahead; the trip ends later`,
    };
  }
  const toMs = Math.min(Math.ceil(Date.parse(window.toHour) / MS_PER_HOUR) * MS_PER_HOUR, horizonMs);
  const hoursWanted = (toMs - fromMs) / MS_PER_HOUR + 1;
  const keys = [...new Map(timeline.waypoints.map((w) => [keyText(positionKey(w)), positionKey(w)])).values()];

  const series = await readCache(source.db, keys, fromMs, toMs, nowMs - FORECAST_FRESH_MS);
  const missing = keys.filter((k) => (series.get(keyText(k))?.size ?? 0) < hoursWanted);
  for (let i = 0; i < missing.length; i += FORECAST_POINTS_MAX) {
    const chunk = missing.slice(i, i + FORECAST_POINTS_MAX);
    const result = await source.service.hourlyForecastsF({
      points: chunk.map(positionOf),
      fromHour: new Date(fromMs).toISOString(),
      toHour: new Date(toMs).toISOString(),
    });
    if (!result.ok) return { ok: false, reason: result.reason, detail: result.detail };
    await writeCache(source.db, chunk, result.forecasts, nowMs);
    result.forecasts.forEach((f, j) =>
      series.set(
        keyText(chunk[j]!),
        new Map(f.hours.map((h) => [h.at, { tempF: h.tempF, radiationWm2: h.radiationWm2 ?? null }])),
      ),
    );
  }

  const forecasts: PointForecast[] = keys.map((k) => ({
    ...positionOf(k),
    hours: [...(series.get(keyText(k)) ?? new Map<string, CachedHour>())].map(([at, hour]) => ({
      at,
      tempF: hour.tempF,
      ...(hour.radiationWm2 === null ? {} : { radiationWm2: hour.radiationWm2 }),
    })),
  }));
  return { ok: true, index: indexForecasts(forecasts), fetchedPoints: missing.length };
}

type CachedHour = { tempF: number; radiationWm2: number | null };

/**
 * Fresh cached hours per position key, as ISO hour → °F and W/m². Rows cached before radiation
 * was asked for (null) count as missing, so the point is fetched again.
 */
async function readCache(db: Queryable, keys: readonly Key[], fromMs: number, toMs: number, freshSinceMs: number) {
  const { rows } = await db.query<{
    lat_e2: number;
    lon_e2: number;
    hour: Date;
    temp_f: number;
    radiation_wm2: number;
  }>(
    `SELECT f.lat_e2, f.lon_e2, f.hour, f.temp_f, f.radiation_wm2
       FROM forecast_hour f
       JOIN unnest($1::int[], $2::int[]) AS k(lat_e2, lon_e2) ON k.lat_e2 = f.lat_e2 AND k.lon_e2 = f.lon_e2
      WHERE f.hour BETWEEN $3 AND $4 AND f.fetched_at >= $5 AND f.radiation_wm2 IS NOT NULL`,
    [keys.map((k) => k.latE2), keys.map((k) => k.lonE2), new Date(fromMs), new Date(toMs), new Date(freshSinceMs)],
  );
  const series = new Map<string, Map<string, CachedHour>>();
  for (const row of rows) {
    const key = keyText({ latE2: row.lat_e2, lonE2: row.lon_e2 });
    if (!series.has(key)) series.set(key, new Map());
    series.get(key)!.set(row.hour.toISOString(), { tempF: row.temp_f, radiationWm2: row.radiation_wm2 });
  }
  return series;
}

async function writeCache(
  db: Queryable,
  keys: readonly Key[],
  forecasts: readonly PointForecast[],
  nowMs: number,
): Promise<void> {
  const lat: number[] = [];
  const lon: number[] = [];
  const hour: string[] = [];
  const temp: number[] = [];
  const radiation: (number | null)[] = [];
  forecasts.forEach((f, i) => {
    for (const h of f.hours) {
      lat.push(keys[i]!.latE2);
      lon.push(keys[i]!.lonE2);
      hour.push(h.at);
      temp.push(h.tempF);
      radiation.push(h.radiationWm2 ?? null);
    }
  });
  // Rows go in key order so that two writers of overlapping forecasts cannot deadlock.
  await db.query(
    `INSERT INTO forecast_hour (lat_e2, lon_e2, hour, temp_f, radiation_wm2, fetched_at)
     SELECT u.lat_e2, u.lon_e2, u.hour, u.temp_f, u.radiation_wm2, $6
       FROM unnest($1::int[], $2::int[], $3::timestamptz[], $4::float8[], $5::float8[]) AS u(lat_e2, lon_e2, hour, temp_f, radiation_wm2)
      ORDER BY 1, 2, 3
     ON CONFLICT (lat_e2, lon_e2, hour) DO UPDATE
       SET temp_f = EXCLUDED.temp_f, radiation_wm2 = EXCLUDED.radiation_wm2, fetched_at = EXCLUDED.fetched_at`,
    [lat, lon, hour, temp, radiation, new Date(nowMs)],
  );
}

/** Deletes cached hours nobody will use again. Returns how many. */
export async function pruneForecastCache(db: Queryable, nowMs: number): Promise<number> {
  const { rowCount } = await db.query("DELETE FROM forecast_hour WHERE fetched_at < $1", [
    new Date(nowMs - FORECAST_KEEP_MS),
  ]);
  return rowCount ?? 0;
}

/** Plain words for why there is no forecast, for the assessment's `sources`. */
export function unavailableText(reason: ForecastUnavailableReason, detail: string): string {
  return `Forecast unavailable: ${forecastUnavailableWords(reason, detail, FORECAST_HORIZON_DAYS)}. The check cannot say the box is safe.`;
}
