import type { LatLon } from "./geo";
import { interpolateGreatCircle } from "./geo";
import type { TimelineStay, TransitTimeline } from "./timeline";

/** The places a trip stops at, in the order it meets them. */
export const ROUTE_STOP_KINDS = [
  "origin",
  "hub",
  "planned_stop",
  "rest_stop",
  "overnight_rest",
  "destination",
] as const;
export type RouteStopKind = (typeof ROUTE_STOP_KINDS)[number];

/** A stop on the way: what it is, where (decimal degrees, WGS84), and when the box is there (ISO, UTC). */
export type RouteStopDto = LatLon & { kind: RouteStopKind; place: string; from: string; to: string };

/**
 * The trip as a map draws it: the line the model follows (the forecast points in order), its
 * stops, and where the box is at each of the report's hours (`hours[i]` goes with the report's
 * `hours[i]`, same `at`).
 */
export type TripRouteDto = {
  line: LatLon[];
  stops: RouteStopDto[];
  hours: (LatLon & { at: string })[];
};

const MIDDLE_STOPS: ReadonlySet<string> = new Set(["hub", "planned_stop", "rest_stop", "overnight_rest"]);
const iso = (ms: number) => new Date(ms).toISOString();

/**
 * Share of the trip's driving done by `atMs` (0 to 1). Driving runs at one average speed, so the
 * share of the driving time is the share of the road; ground waypoints lie on the great circle.
 */
function drivenShare(stays: readonly TimelineStay[], atMs: number): number {
  let totalMs = 0;
  let doneMs = 0;
  for (const stay of stays) {
    if (stay.segment !== "en_route") continue;
    totalMs += stay.endMs - stay.startMs;
    doneMs += Math.min(Math.max(atMs - stay.startMs, 0), stay.endMs - stay.startMs);
  }
  return totalMs > 0 ? doneMs / totalMs : 0;
}

/**
 * Where the box is on the map, hour by hour, and where it stops. By road the box moves along
 * the great circle at the driving pace and waits where it stops, between the forecast points
 * the model reads the weather at; by air it is at the origin, the hub or the destination, as
 * the timeline places it.
 */
export function tripRoute(timeline: TransitTimeline): TripRouteDto {
  const first = timeline.waypoints[0];
  const last = timeline.waypoints.at(-1);
  if (!first || !last || timeline.stays.length === 0) return { line: [], stops: [], hours: [] };
  const byAir = timeline.mode === "overnight_air";
  const departMs = Date.parse(timeline.departAt);
  const arriveMs = Date.parse(timeline.arriveAt);
  const onRoad = (atMs: number): LatLon => {
    const { lat, lon } = interpolateGreatCircle(first, last, drivenShare(timeline.stays, atMs));
    return { lat, lon };
  };
  const middle = timeline.stays
    .filter((stay) => MIDDLE_STOPS.has(stay.segment))
    .map((stay): RouteStopDto => {
      const waypoint = timeline.waypoints[stay.waypoint]!;
      const position = byAir ? { lat: waypoint.lat, lon: waypoint.lon } : onRoad(stay.startMs);
      return {
        kind: stay.segment as RouteStopKind,
        place: waypoint.label,
        ...position,
        from: iso(stay.startMs),
        to: iso(stay.endMs),
      };
    });
  const leaveOriginMs = byAir ? timeline.stays[0]!.endMs : departMs;
  const reachDestinationMs = byAir ? timeline.stays.at(-1)!.startMs : arriveMs;
  return {
    line: timeline.waypoints.map((w) => ({ lat: w.lat, lon: w.lon })),
    stops: [
      {
        kind: "origin",
        place: first.label,
        lat: first.lat,
        lon: first.lon,
        from: iso(departMs),
        to: iso(leaveOriginMs),
      },
      ...middle,
      {
        kind: "destination",
        place: last.label,
        lat: last.lat,
        lon: last.lon,
        from: iso(reachDestinationMs),
        to: iso(arriveMs),
      },
    ],
    hours: timeline.points.map((point) => {
      const atMs = Date.parse(point.at);
      const position = byAir ? { lat: point.lat, lon: point.lon } : onRoad(atMs);
      return { at: point.at, ...position };
    }),
  };
}
