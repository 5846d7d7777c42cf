/**
 * Benchmark of the temperature check, end to end without the network: a 96-hour ground trip
 * (Atlanta → Seattle, 30 forecast points, four planned stops) with its forecasts already at hand
 * (as the forecast cache serves them), from timeline to verdict: the exposures hour by hour, the air
 * around the box minute by minute, the box under each pack, the advice and its deciding stretch.
 * Forecast values come from the Open-Meteo fake's climate functions (fake data).
 * Target (issue 13): median ≤ 5 ms for the computation.
 * Run standalone: node --import tsx scripts/bench/temperature.ts
 */
import { pathToFileURL } from "node:url";
import { forecastWindow, indexForecasts, weatherFromForecasts, type PointForecast } from "@shared/temperature/ambient";
import { assessTransit, type DepartureSearch, type ExposureInput } from "@shared/temperature/assess";
import type { BoxSpec } from "@shared/temperature/box-model";
import { townNear } from "@shared/temperature/places";
import { DEFAULT_PROFILES } from "@shared/temperature/profiles";
import { buildTransitTimeline, type TimelineRequest, type TransitTimeline } from "@shared/temperature/timeline";
import { cToF } from "@shared/units";
import { SCENARIO_SHIFT_C, fakeShortwaveRadiationWm2, fakeTemperatureC } from "../../fakes/open-meteo/climate";

const WARMUP_RUNS = 20;
const TIMED_RUNS = 200;
export const TEMPERATURE_TARGET = { medianMs: 5 };

export interface BenchResult {
  name: string;
  medianMs: number;
  p95Ms: number;
}

const HOUR_MS = 3_600_000;
const departAt = "2026-07-13T06:00:00-04:00"; // Monday 13 July 2026, 06:00 EDT
const stopAt = (hours: number) => hours * 60;

// Invented parties at real coordinates; the spacing gives 30 forecast points along the way.
const trip: TimelineRequest = {
  mode: "ground_courier",
  origin: { label: "Atlanta, GA", lat: 33.75, lon: -84.39, timeZone: "America/New_York" },
  destination: { label: "Seattle, WA", lat: 47.45, lon: -122.31, timeZone: "America/Los_Angeles" },
  departAt,
  options: {
    driving: {
      waypointSpacingKm: 120,
      nameNear: townNear,
      plannedStops: [
        { afterDepartMin: stopAt(6), durationMin: 60 },
        { afterDepartMin: stopAt(30), durationMin: 45 },
        { afterDepartMin: stopAt(54), durationMin: 60 },
        { afterDepartMin: stopAt(78), durationMin: 150 },
      ],
    },
  },
};
const stopParking = ["sun", "shade", "sun", "indoors"] as const;
const box: BoxSpec = {
  wall: "eps",
  wallThicknessMm: 38,
  lengthMm: 350,
  widthMm: 300,
  heightMm: 250,
  contentsG: 900,
  pack: "none",
};

/** Hourly forecasts (temperature and radiation) at every waypoint over the trip and the seven days after. */
function givenForecasts(timeline: TransitTimeline, shiftC: number): PointForecast[] {
  const { fromHour, toHour } = forecastWindow(timeline);
  const hours = (Date.parse(toHour) - Date.parse(fromHour)) / HOUR_MS + 1;
  return timeline.waypoints.map((w) => ({
    lat: w.lat,
    lon: w.lon,
    hours: Array.from({ length: hours }, (_, h) => {
      const atMs = Date.parse(fromHour) + h * HOUR_MS;
      return {
        at: new Date(atMs).toISOString(),
        tempF: cToF(fakeTemperatureC(w.lat, w.lon, atMs / 1000, shiftC)),
        radiationWm2: fakeShortwaveRadiationWm2(w.lat, w.lon, atMs / 1000, shiftC > 0),
      };
    }),
  }));
}

/** Timeline, weather by hour and verdict, with the safer-departure search wired as a route would. */
function assessTrip(forecasts: readonly PointForecast[], exposure: ExposureInput) {
  const timeline = buildTransitTimeline(trip);
  const index = indexForecasts(forecasts);
  const weather = weatherFromForecasts(timeline, index);
  const search: DepartureSearch = {
    timelineFor: (departMs) => buildTransitTimeline({ ...trip, departAt: departMs }),
    weatherFor: (candidate) => weatherFromForecasts(candidate, index),
  };
  return assessTransit({
    timeline,
    ambientByHour: weather.ambient,
    radiationByHour: weather.radiation,
    box,
    profile: DEFAULT_PROFILES.temperate_snake,
    exposure,
    search,
  });
}

const round = (ms: number): number => Math.round(ms * 1000) / 1000;

function measure(name: string, run: () => unknown): BenchResult {
  for (let i = 0; i < WARMUP_RUNS; i++) run();
  const timesMs: number[] = [];
  for (let i = 0; i < TIMED_RUNS; i++) {
    const start = performance.now();
    run();
    timesMs.push(performance.now() - start);
  }
  timesMs.sort((a, b) => a - b);
  const at = (q: number): number =>
    timesMs[Math.min(timesMs.length - 1, Math.ceil(q * timesMs.length) - 1)] ?? Number.NaN;
  return { name, medianMs: round(at(0.5)), p95Ms: round(at(0.95)) };
}

/**
 * Median and p95 wall time (ms) of the assessment: the van declared climate-controlled, the vehicle
 * not said (two runs of the model, the assumption and the climate-controlled case), and a heat wave
 * (which adds the 7-day search for a safer departure).
 */
export async function benchTemperature(): Promise<BenchResult[]> {
  const timeline = buildTransitTimeline(trip);
  const normal = givenForecasts(timeline, 0);
  const heatWave = givenForecasts(timeline, SCENARIO_SHIFT_C.heat_wave);
  const label = `${Math.round(timeline.durationH)} h ground trip, ${timeline.waypoints.length} points, ${trip.options!.driving!.plannedStops!.length} stops`;
  const declared: ExposureInput = { vehicle: "climate_controlled", stopParking };
  const unsaid: ExposureInput = { vehicle: null, stopParking };
  return [
    measure(`temperature: ${label}, heated van (${assessTrip(normal, declared).verdict})`, () =>
      assessTrip(normal, declared),
    ),
    measure(`temperature: ${label}, vehicle not said (${assessTrip(normal, unsaid).verdict})`, () =>
      assessTrip(normal, unsaid),
    ),
    measure(`temperature: ${label}, heat wave, 7-day search (${assessTrip(heatWave, unsaid).verdict})`, () =>
      assessTrip(heatWave, unsaid),
    ),
  ];
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const results = await benchTemperature();
  for (const { name, medianMs, p95Ms } of results)
    process.stdout.write(`${name}: median ${medianMs} ms, p95 ${p95Ms} ms\n`);
  const first = results[0];
  if (first)
    process.stdout.write(
      `target (median ≤ ${TEMPERATURE_TARGET.medianMs} ms): ${first.medianMs <= TEMPERATURE_TARGET.medianMs ? "met" : "MISSED"}\n`,
    );
}
