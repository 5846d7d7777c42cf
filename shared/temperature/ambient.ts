import { haversineKm } from "./geo";
import { PLAUSIBLE_AMBIENT_F, PLAUSIBLE_RADIATION_WM2, SAFER_DEPARTURE_SEARCH_DAYS } from "./limits";
import type { TransitTimeline } from "./timeline";
import { MS_PER_DAY, MS_PER_HOUR } from "./zoned-time";

/**
 * One hourly outside temperature, °F, at an ISO 8601 instant; with a forecast, also the solar
 * radiation on the ground (W/m², the mean of the hour that ends at `at`, as Open-Meteo reports it).
 */
export type HourlyTempF = { at: string; tempF: number; radiationWm2?: number };

/** The hourly forecast at one position, as the weather adapter returns it. */
export type PointForecast = { lat: number; lon: number; hours: readonly HourlyTempF[] };

/** Outside temperature (°F) for the hours of a timeline, keyed by the hour's ISO UTC string. */
export type AmbientByHour = ReadonlyMap<string, number>;

/** Solar radiation on the ground (W/m², mean of the hour ending then) for the hours of a timeline. */
export type RadiationByHour = ReadonlyMap<string, number>;

/** Whether a value can be global horizontal radiation at the ground, W/m². */
export function isPlausibleRadiationWm2(value: unknown): value is number {
  return (
    typeof value === "number" &&
    Number.isFinite(value) &&
    value >= PLAUSIBLE_RADIATION_WM2.min &&
    value <= PLAUSIBLE_RADIATION_WM2.max
  );
}

/** Whether a value can be an outside air temperature in °F (finite and within the recorded extremes). */
export function isPlausibleAmbientF(tempF: unknown): tempF is number {
  return (
    typeof tempF === "number" &&
    Number.isFinite(tempF) &&
    tempF >= PLAUSIBLE_AMBIENT_F.min &&
    tempF <= PLAUSIBLE_AMBIENT_F.max
  );
}

/**
 * The hours (ISO UTC, both ends included) a forecast must cover for this trip and for the later
 * departures the safer-departure search may try; one request then serves them all.
 */
export function forecastWindow(
  timeline: TransitTimeline,
  searchDays: number = SAFER_DEPARTURE_SEARCH_DAYS,
): { fromHour: string; toHour: string } {
  const first = timeline.points[0]?.at ?? timeline.departAt;
  const last = timeline.points.at(-1)?.at ?? timeline.arriveAt;
  // One hour of slack: a later departure at the same local time shifts by an hour across DST.
  const toMs = Date.parse(last) + searchDays * MS_PER_DAY + MS_PER_HOUR;
  return { fromHour: new Date(Date.parse(first)).toISOString(), toHour: new Date(toMs).toISOString() };
}

/** Forecasts prepared for repeated lookups by position and hour (ISO UTC key, as timeline points carry). */
export type ForecastIndex = {
  points: {
    lat: number;
    lon: number;
    byHour: ReadonlyMap<string, number>;
    radiationByHour: ReadonlyMap<string, number>;
  }[];
};

/** `toISOString` form of an instant; strings already in that form (the adapter's) pass as they are. */
function isoKey(at: string): string | undefined {
  if (at.length === 24 && at.endsWith(".000Z")) return at;
  const ms = Date.parse(at);
  return Number.isFinite(ms) ? new Date(ms).toISOString() : undefined;
}

/** Indexes point forecasts by hour; build it once per set of forecasts. */
export function indexForecasts(forecasts: readonly PointForecast[]): ForecastIndex {
  return {
    points: forecasts.map((f) => {
      const byHour = new Map<string, number>();
      const radiationByHour = new Map<string, number>();
      for (const h of f.hours) {
        const key = isoKey(h.at);
        if (key === undefined) continue;
        byHour.set(key, h.tempF);
        if (isPlausibleRadiationWm2(h.radiationWm2)) radiationByHour.set(key, h.radiationWm2);
      }
      return { lat: f.lat, lon: f.lon, byHour, radiationByHour };
    }),
  };
}

/**
 * Outside temperature for each hour of the timeline: the forecast nearest to the hour's
 * waypoint (within `maxMatchKm`, since the service answers with its grid cell's centre).
 * Hours without a forecast are left out, and the assessment reports them as unavailable.
 */
export function ambientFromForecasts(timeline: TransitTimeline, index: ForecastIndex, maxMatchKm = 25): AmbientByHour {
  return weatherFromForecasts(timeline, index, maxMatchKm).ambient;
}

/**
 * Outside temperature and solar radiation for each hour of the timeline, from the forecast
 * nearest each hour's waypoint (see ambientFromForecasts). Hours without radiation are left out:
 * the exposure model then takes a clear sky (see exposure.ts).
 */
export function weatherFromForecasts(
  timeline: TransitTimeline,
  index: ForecastIndex,
  maxMatchKm = 25,
): { ambient: AmbientByHour; radiation: RadiationByHour } {
  const matched = timeline.waypoints.map((w) => {
    let best: ForecastIndex["points"][number] | undefined;
    let bestKm = maxMatchKm;
    for (const point of index.points) {
      const km = haversineKm(w, point);
      if (km <= bestKm) [best, bestKm] = [point, km];
    }
    return best;
  });
  const ambient = new Map<string, number>();
  const radiation = new Map<string, number>();
  for (const point of timeline.points) {
    const forecast = matched[point.waypoint];
    const tempF = forecast?.byHour.get(point.at);
    if (tempF !== undefined) ambient.set(point.at, tempF);
    const wm2 = forecast?.radiationByHour.get(point.at);
    if (wm2 !== undefined) radiation.set(point.at, wm2);
  }
  return { ambient, radiation };
}

/**
 * A what-if's own outside temperatures, in place of the forecast: linear between the samples,
 * held constant before the first and after the last.
 */
export function ambientFromOverride(timeline: TransitTimeline, samples: readonly HourlyTempF[]): AmbientByHour {
  const sorted = samples.map((s) => ({ ms: Date.parse(s.at), tempF: s.tempF })).sort((a, b) => a.ms - b.ms);
  const ambient = new Map<string, number>();
  if (sorted.length === 0) return ambient;
  let next = 0;
  for (const point of timeline.points) {
    const ms = Date.parse(point.at);
    while (next < sorted.length && sorted[next]!.ms <= ms) next++;
    const before = sorted[next - 1];
    const after = sorted[next];
    const tempF =
      before && after
        ? before.tempF + ((after.tempF - before.tempF) * (ms - before.ms)) / (after.ms - before.ms)
        : (before ?? after)!.tempF;
    ambient.set(point.at, tempF);
  }
  return ambient;
}
