import type { TemperatureReport } from "@shared/temperature/report";
import { tempInUnit, type UnitSystem } from "@shared/units";

/** One point of the chart: the hour (epoch ms), where the box is, outside and inside in the chosen unit. */
export type ChartRow = { atMs: number; place: string; outside: number | null; inside: number | null };

/** The assessment's hours as chart points, in °F or °C; missing values stay gaps, never zero. */
export function chartRows(hours: TemperatureReport["hours"], system: UnitSystem): ChartRow[] {
  return hours.map((h) => ({
    atMs: Date.parse(h.at),
    place: h.place,
    outside: h.ambientF === null ? null : tempInUnit(h.ambientF, system),
    inside: h.insideF === null ? null : tempInUnit(h.insideF, system),
  }));
}

/** The safe transit band in the chosen unit, for the shaded area. */
export function safeBand(
  safeTransitF: { min: number; max: number },
  system: UnitSystem,
): { low: number; high: number } {
  return { low: tempInUnit(safeTransitF.min, system), high: tempInUnit(safeTransitF.max, system) };
}
