import { lookup } from "zipcodes";
import { US_STATES, type UsState } from "../constants";
import { timeZoneAt } from "./zoned-time";

/**
 * A place a box can be at: a label for people, a position and its IANA time zone.
 * This module pulls in the 5 MB ZIP table of `zipcodes`; import it on the server, not the client.
 */
export type TransitPlace = { label: string; lat: number; lon: number; timeZone: string; state?: UsState };

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
