/**
 * Benchmark of the temperature check, end to end without the network: a 72-hour ground trip
 * (Nashville → Los Angeles, 20 forecast points) with its forecasts given, from timeline to
 * verdict. Forecast values come from the Open-Meteo fake's climate function (fake data).
 * Target: median ≤ 5 ms for the computation.
 * Run standalone: node --import tsx scripts/bench/temperature.ts
 */
import { pathToFileURL } from "node:url";
import {
  ambientFromForecasts,
  forecastWindow,
  indexForecasts,
  weatherFromForecasts,
  type PointForecast,
} from "@shared/temperature/ambient";
import { assessTransit, type DepartureSearch } from "@shared/temperature/assess";
import type { BoxSpec } from "@shared/temperature/box-model";
import { DEFAULT_PROFILES } from "@shared/temperature/profiles";
import { buildTransitTimeline, type TimelineRequest, type TransitTimeline } from "@shared/temperature/timeline";
import { cToF } from "@shared/units";
import { SCENARIO_SHIFT_C, fakeTemperatureC } from "../../fakes/open-meteo/climate";

const WARMUP_RUNS = 20;
const TIMED_RUNS = 200;
export const TEMPERATURE_TARGET = { medianMs: 5 };

export interface BenchResult {
  name: string;
  medianMs: number;
  p95Ms: number;
}

// Invented parties at real coordinates; Monday 4 May 2026, 06:00 CDT.
const trip: TimelineRequest = {
  mode: "ground_courier",
  origin: { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" },
  destination: { label: "Los Angeles, CA", lat: 33.94, lon: -118.4, timeZone: "America/Los_Angeles" },
  departAt: "2026-05-04T06:00:00-05:00",
};
const box: BoxSpec = {
  wall: "eps",
  wallThicknessMm: 38,
  lengthMm: 350,
  widthMm: 300,
  heightMm: 250,
  contentsG: 900,
  pack: "none",
};

/** Hourly forecasts at every waypoint over the trip and the seven days after, as the adapter returns them. */
function givenForecasts(timeline: TransitTimeline, shiftC: number): PointForecast[] {
  const { fromHour, toHour } = forecastWindow(timeline);
  const hours = (Date.parse(toHour) - Date.parse(fromHour)) / 3_600_000 + 1;
  return timeline.waypoints.map((w) => ({
    lat: w.lat,
    lon: w.lon,
    hours: Array.from({ length: hours }, (_, h) => {
      const atMs = Date.parse(fromHour) + h * 3_600_000;
      return {
        at: new Date(atMs).toISOString(),
        tempF: cToF(fakeTemperatureC(w.lat, w.lon, atMs / 1000, shiftC)),
      };
    }),
  }));
}

/** Timeline, ambient by hour and verdict, with the safer-departure search wired as a route would. */
function assessTrip(forecasts: readonly PointForecast[]) {
  const timeline = buildTransitTimeline(trip);
  const index = indexForecasts(forecasts);
  const search: DepartureSearch = {
    timelineFor: (departMs) => buildTransitTimeline({ ...trip, departAt: departMs }),
    weatherFor: (candidate) => weatherFromForecasts(candidate, index),
  };
  return assessTransit({
    timeline,
    ambientByHour: ambientFromForecasts(timeline, index),
    box,
    profile: DEFAULT_PROFILES.temperate_snake,
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

/** Median and p95 wall time (ms) of the assessment, in ordinary weather and in a heat wave (which adds the 7-day search). */
export async function benchTemperature(): Promise<BenchResult[]> {
  const timeline = buildTransitTimeline(trip);
  const normal = givenForecasts(timeline, 0);
  const heatWave = givenForecasts(timeline, SCENARIO_SHIFT_C.heat_wave);
  const label = `${Math.round(timeline.durationH)} h ground trip, ${timeline.waypoints.length} points`;
  return [
    measure(`temperature: ${label}, assessed (${assessTrip(normal).verdict})`, () => assessTrip(normal)),
    measure(`temperature: ${label}, heat wave with 7-day search (${assessTrip(heatWave).verdict})`, () =>
      assessTrip(heatWave),
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
