/**
 * Is a handoff plausible? Pure checks of time, place and person, used by the server before it
 * records a handoff and by the courier's phone to say what it will ask for before confirming.
 * Each failed check needs a reason from the person recording and raises an alert (issue 12).
 */
import type { TransportMode } from "../constants";
import { haversineKm, type LatLon } from "../temperature/geo";
import { kmToMiles, milesToKm } from "../units";

/** A pickup more than this many hours before the planned departure needs a reason (issue 12). */
export const EARLY_PICKUP_LIMIT_H = 24;

/**
 * The highest average speed, in mph, a mode allows between two handoffs, measured as the great-circle
 * distance over the time between them.
 * - Ground courier and hand delivery: 80 mph average (issue 12). Legal top speeds on US roads are
 *   70–85 mph [practice], so an average over a whole stretch above 80 mph is not a box in a vehicle.
 * - Overnight air carrier: the carrier's overnight window lets a box reach any place in the
 *   contiguous states by the next morning, so no distance is too far for one night; what the window
 *   cannot do is move a box faster than the aircraft carrying it. Jet freighters cruise near
 *   Mach 0.8, about 530 mph true airspeed [memory], and a strong jet-stream tailwind adds some
 *   70 mph [memory]: 600 mph over the ground is the ceiling. Coast to coast (about 2,700 mi) fits in
 *   4.5 h at that speed, well inside a night.
 */
export const MAX_AVERAGE_MPH: Readonly<Record<TransportMode, number>> = {
  ground_courier: 80,
  hand_delivery: 80,
  overnight_air: 600,
};

/**
 * How far two positions may seem apart without the box having moved, in km, besides each position's
 * own accuracy: a position from the phone (GPS: metres, a street at worst), or an address placed by
 * its ZIP code's centre (a rural ZIP spans tens of kilometres [practice]).
 */
export const POSITION_SLACK_KM = { recorded: 1, address: 30 } as const;

/** Shorter spans than this count as this long: two taps a few seconds apart are not infinitely fast. */
const MIN_SPAN_H = 1 / 60;

/** Where and when custody changed hands, or the address it is taken to have happened at. */
export type CustodyPoint = LatLon & {
  /** Epoch milliseconds. */
  at: number;
  accuracyM: number | null;
  /** A position the phone recorded, or the transfer's origin or destination address (from its ZIP). */
  source: "recorded" | "origin" | "destination";
};

export type SpeedCheck = {
  distanceKm: number;
  elapsedH: number;
  /** Great-circle distance over the time between, in mph. */
  averageMph: number;
  limitMph: number;
  implausible: boolean;
};

const slackKm = (point: CustodyPoint) =>
  (point.accuracyM ?? 0) / 1000 +
  (point.source === "recorded" ? POSITION_SLACK_KM.recorded : POSITION_SLACK_KM.address);

/**
 * Whether the box could have gone from `from` to `to` in the time between by this mode. The distance
 * less both positions' uncertainty must be coverable at the mode's highest average speed.
 */
export function checkSpeed(mode: TransportMode, from: CustodyPoint, to: CustodyPoint): SpeedCheck {
  const distanceKm = haversineKm(from, to);
  const elapsedH = Math.max((to.at - from.at) / 3_600_000, MIN_SPAN_H);
  const limitMph = MAX_AVERAGE_MPH[mode];
  const uncertainKm = Math.max(0, distanceKm - slackKm(from) - slackKm(to));
  return {
    distanceKm,
    elapsedH,
    averageMph: kmToMiles(distanceKm) / elapsedH,
    limitMph,
    implausible: uncertainKm > milesToKm(limitMph) * elapsedH,
  };
}

/** Hours between the pickup and the planned departure; positive when the pickup came first. */
export function hoursBeforeDeparture(pickupAt: number, plannedDepartureAt: number): number {
  return (plannedDepartureAt - pickupAt) / 3_600_000;
}

/** A pickup more than EARLY_PICKUP_LIMIT_H before the planned departure. */
export function isEarlyPickup(pickupAt: number, plannedDepartureAt: number): boolean {
  return hoursBeforeDeparture(pickupAt, plannedDepartureAt) > EARLY_PICKUP_LIMIT_H;
}

/**
 * A name as compared: accents, case, punctuation and spacing do not count ("José  O'Neil" is
 * "jose o neil"), so a courier typing a name by hand is not flagged for a capital letter.
 */
export function nameKey(name: string): string {
  return name
    .normalize("NFKD")
    .replace(/\p{M}/gu, "")
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, " ")
    .trim();
}

/** Whether `name` is one of `expected` (as nameKey compares them). */
export function isOneOfNames(name: string, expected: readonly string[]): boolean {
  const key = nameKey(name);
  return key !== "" && expected.some((e) => nameKey(e) === key);
}

/** A seal number as compared: case and spaces do not count ("seal 0044" is "SEAL0044"). */
export function sealKey(sealNumber: string): string {
  return sealNumber.toUpperCase().replace(/\s+/g, "");
}

/** Whether the number read is the one on record; both missing counts as a match. */
export function sealNumbersMatch(expected: string | null, read: string | null): boolean {
  if (!expected && !read) return true;
  if (!expected || !read) return false;
  return sealKey(expected) === sealKey(read);
}
