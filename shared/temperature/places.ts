import { codes, lookup, type ZipRecord } from "zipcodes";
import { US_STATES, type UsState } from "../constants";
import { timeZoneAt } from "./zoned-time";

/**
 * A place a box can be at: a label for people, a position and its IANA time zone.
 * This module pulls in the 5 MB ZIP table of `zipcodes`; import it on the server, not the client.
 */
export type TransitPlace = {
  label: string;
  lat: number;
  lon: number;
  timeZone: string;
  state?: UsState;
  /** For a point along the way: "near Macon, GA", the town of the nearest ZIP code. */
  near?: string;
};

/** What a user gives for a place: a five-digit US ZIP code or a position in decimal degrees. */
export type PlaceInput = { zip: string } | { lat: number; lon: number };

const isUsState = (code: string): code is UsState => (US_STATES as readonly string[]).includes(code);

/** The centre, city and state of a five-digit US ZIP code, or undefined when the table lacks it. */
export function placeFromZip(zip: string): TransitPlace | undefined {
  if (!/^\d{5}$/.test(zip)) return undefined;
  const record = lookup(zip);
  if (!record || record.country !== "US" || !isUsState(record.state)) return undefined;
  return {
    label: `${record.city}, ${record.state} ${record.zip}`,
    lat: record.latitude,
    lon: record.longitude,
    timeZone: timeZoneAt(record.latitude, record.longitude),
    state: record.state,
  };
}

/** A place at a position (decimal degrees), labelled with its rounded coordinates. */
export function placeFromPosition(lat: number, lon: number, label?: string): TransitPlace {
  return { label: label ?? `${lat.toFixed(3)}, ${lon.toFixed(3)}`, lat, lon, timeZone: timeZoneAt(lat, lon) };
}

/** Resolves a what-if place input; undefined when a ZIP code is unknown. */
export function resolvePlace(input: PlaceInput): TransitPlace | undefined {
  return "zip" in input ? placeFromZip(input.zip) : placeFromPosition(input.lat, input.lon);
}

/** ZIP centres by 1° cell of latitude and longitude, built on first use (about 42,000 entries). */
const townGrid: { cells?: Map<string, ZipRecord[]> } = {};
/** Towns already named, by position to 0.01°: a route's points are named again for every later departure tried. */
const namedTowns = new Map<string, string | undefined>();
const NAMED_TOWNS_MAX = 10_000;

const cellKey = (lat: number, lon: number) => `${Math.floor(lat)},${Math.floor(lon)}`;

function gridOfTowns(): Map<string, ZipRecord[]> {
  if (townGrid.cells) return townGrid.cells;
  const cells = new Map<string, ZipRecord[]>();
  for (const record of Object.values(codes)) {
    if (record.country !== "US" || !isUsState(record.state) || !record.latitude || !record.longitude) continue;
    const key = cellKey(record.latitude, record.longitude);
    const cell = cells.get(key);
    if (cell) cell.push(record);
    else cells.set(key, [record]);
  }
  townGrid.cells = cells;
  return cells;
}

/** Farthest a town may be from the road for "near …": about 45 miles. */
const NEAR_TOWN_MAX_DEG = 0.75;

/**
 * "Macon, GA": the town of the ZIP code whose centre is nearest a position within about 45 miles,
 * or undefined (open water, another country). Good enough to say where a stop is; not an address.
 */
export function townNear(lat: number, lon: number): string | undefined {
  const key = `${lat.toFixed(2)},${lon.toFixed(2)}`;
  if (namedTowns.has(key)) return namedTowns.get(key);
  const town = nearestTown(lat, lon);
  if (namedTowns.size >= NAMED_TOWNS_MAX) namedTowns.clear();
  namedTowns.set(key, town);
  return town;
}

function nearestTown(lat: number, lon: number): string | undefined {
  const cells = gridOfTowns();
  const cosLat = Math.cos((lat * Math.PI) / 180);
  let best: ZipRecord | undefined;
  let bestDistance = NEAR_TOWN_MAX_DEG * NEAR_TOWN_MAX_DEG;
  for (let dLat = -1; dLat <= 1; dLat++) {
    for (let dLon = -1; dLon <= 1; dLon++) {
      for (const record of cells.get(cellKey(lat + dLat, lon + dLon)) ?? []) {
        const y = record.latitude - lat;
        const x = (record.longitude - lon) * cosLat;
        const distance = x * x + y * y;
        if (distance < bestDistance) [best, bestDistance] = [record, distance];
      }
    }
  }
  return best ? `${best.city}, ${best.state}` : undefined;
}
