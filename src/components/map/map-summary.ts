import { airBand } from "@shared/temperature/air-band";
import { formatTemp, type UnitSystem } from "@shared/units";
import type { RouteMapProps } from "./map-types";

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * What the map shows, in sentences, for its text alternative: from where to where, the stops
 * between, and how the air around the box stood against the safe range hour by hour.
 */
export function mapSummary(
  { title, stops, hours = [], safeF }: Pick<RouteMapProps, "title" | "stops" | "hours" | "safeF">,
  system: UnitSystem,
): string {
  const first = stops[0];
  const last = stops.at(-1);
  const sentences: string[] = [];
  if (!first || !last || stops.length < 2) sentences.push(`Map of ${title}: no route to draw.`);
  else {
    const between = stops.length - 2;
    sentences.push(
      `Map of ${title} from ${first.place} to ${last.place}` +
        (between > 0 ? `, with ${count(between, "stop", "stops")} between.` : ", with no stop between."),
    );
  }
  if (hours.length === 0) return sentences.join(" ");
  const known = hours.flatMap((h) => (h.aroundF === null ? [] : [h.aroundF]));
  sentences.push(`${count(hours.length, "dot marks", "dots mark")} where the box is each hour.`);
  if (known.length === 0) {
    sentences.push("The air around the box is not known: there is no forecast for the trip.");
    return sentences.join(" ");
  }
  sentences.push(
    `The air around the box runs from ${formatTemp(Math.min(...known), system)} to ${formatTemp(Math.max(...known), system)}.`,
  );
  if (safeF) {
    const bands = hours.map((h) => airBand(h.aroundF, safeF));
    const colder = bands.filter((b) => b === "below" || b === "well_below").length;
    const warmer = bands.filter((b) => b === "above" || b === "well_above").length;
    const range = `${formatTemp(safeF.min, system)} to ${formatTemp(safeF.max, system)}`;
    sentences.push(
      colder + warmer === 0
        ? `Every hour with a forecast is within the safe range, ${range}.`
        : `Outside the safe range (${range}): ${count(colder, "hour", "hours")} colder, ${count(warmer, "hour", "hours")} warmer.`,
    );
  }
  const unknown = hours.length - known.length;
  if (unknown > 0) sentences.push(`${count(unknown, "hour has", "hours have")} no forecast.`);
  return sentences.join(" ");
}
