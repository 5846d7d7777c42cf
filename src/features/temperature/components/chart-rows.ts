import type { Exposure } from "@shared/constants";
import type { BoxReadingDto, TemperatureReport } from "@shared/temperature/report";
import { tempInUnit, type UnitSystem } from "@shared/units";

/**
 * One point of the chart: the hour (epoch ms), where the box is, the outside air, the air around
 * the box and the box's inside, in the chosen unit.
 */
export type ChartRow = {
  atMs: number;
  place: string;
  exposure: Exposure;
  outside: number | null;
  around: number | null;
  inside: number | null;
};

const inUnit = (tempF: number | null | undefined, system: UnitSystem) =>
  tempF === null || tempF === undefined ? null : tempInUnit(tempF, system);

/** The assessment's hours as chart points, in °F or °C; missing values stay gaps, never zero. */
export function chartRows(hours: TemperatureReport["hours"], system: UnitSystem): ChartRow[] {
  return hours.map((h) => ({
    atMs: Date.parse(h.at),
    place: h.place,
    exposure: h.exposure,
    outside: inUnit(h.ambientF, system),
    around: inUnit(h.aroundBoxF, system),
    inside: inUnit(h.insideF, system),
  }));
}

/** The safe transit band in the chosen unit, for the shaded area. */
export function safeBand(
  safeTransitF: { min: number; max: number },
  system: UnitSystem,
): { low: number; high: number } {
  return { low: tempInUnit(safeTransitF.min, system), high: tempInUnit(safeTransitF.max, system) };
}

/** A box reading as a chart point: when, what the box read, what the model said, in the chosen unit. */
export type ReadingPoint = { atMs: number; reading: number; model: number | null; place: string };

export function readingPoints(readings: readonly BoxReadingDto[], system: UnitSystem): ReadingPoint[] {
  return readings.map((r) => ({
    atMs: Date.parse(r.at),
    reading: tempInUnit(r.tempF, system),
    model: inUnit(r.modelF, system),
    place: r.place,
  }));
}

/** A stretch of the band under the time axis: where it starts and ends as shares of the chart's width. */
export type BandSegment = {
  exposure: Exposure;
  fromShare: number;
  toShare: number;
  from: string;
  to: string;
  place: string;
};

/**
 * The exposures as stretches of the time axis from its first to its last hour (0 to 1), clipped
 * to it; stretches shorter than the axis can show are kept (a 20-minute stop still shows).
 */
export function bandSegments(
  exposures: TemperatureReport["exposures"],
  axis: { fromMs: number; toMs: number },
): BandSegment[] {
  const span = axis.toMs - axis.fromMs;
  if (!(span > 0)) return [];
  const share = (ms: number) => Math.min(1, Math.max(0, (ms - axis.fromMs) / span));
  return exposures
    .map((e) => ({
      exposure: e.exposure,
      fromShare: share(Date.parse(e.from)),
      toShare: share(Date.parse(e.to)),
      from: e.from,
      to: e.to,
      place: e.place,
    }))
    .filter((s) => s.toShare > s.fromShare);
}

const HOUR_MS = 3_600_000;
const TICK_STEPS_H = [1, 2, 3, 6, 12, 24, 48];

/** Ticks on whole hours of the axis, as few steps as keep them to `most` (the chart's own ticks skip a time axis). */
export function hourTicks(axis: { fromMs: number; toMs: number }, most = 7): number[] {
  const hours = (axis.toMs - axis.fromMs) / HOUR_MS;
  const step = TICK_STEPS_H.find((h) => hours / h <= most) ?? Math.ceil(hours / most);
  const first = Math.ceil(axis.fromMs / HOUR_MS) * HOUR_MS;
  const ticks: number[] = [];
  for (let at = first; at <= axis.toMs; at += step * HOUR_MS) ticks.push(at);
  return ticks;
}
