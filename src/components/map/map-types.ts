import type { LatLon } from "@shared/temperature/geo";

/** A numbered stop on a map: where, what it is, and when the box is there (words, ready to read). */
export type MapStop = LatLon & {
  /** What the stop is ("Start", "Night's rest", "Pickup"). */
  name: string;
  place: string;
  /** A short name for the label beside the first and last stop ("Knoxville, TN"); `place` when absent. */
  shortPlace?: string;
  /** When, as a person reads it ("Mon, Jun 1, 2026, 06:00 CDT" or a span). */
  when: string;
};

/** Where the box is at one modelled hour, and the air around it (°F; null: not known). */
export type MapHour = LatLon & {
  atMs: number;
  place: string;
  aroundF: number | null;
  /** Where the box is, in words ("Parked vehicle, sun"). */
  exposure: string;
};

export type RouteMapProps = {
  /** Names the map for screen readers and the table toggle ("the trip", "the run"). */
  title: string;
  /** The line the trip follows, in order. */
  line: LatLon[];
  stops: MapStop[];
  /** One position per modelled hour, coloured by the air around the box. */
  hours?: MapHour[];
  /** The animals' safe range in transit, °F: the colours of the hours are read against it. */
  safeF?: { min: number; max: number } | null;
};
