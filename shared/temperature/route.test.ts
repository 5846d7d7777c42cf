import { describe, expect, it } from "vitest";
import { haversineKm } from "./geo";
import type { TransitPlace } from "./places";
import { tripRoute } from "./route";
import { buildTransitTimeline } from "./timeline";

// Invented endpoints at real coordinates (the Rosetta Code airports, as in timeline.test.ts).
const nashville: TransitPlace = { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" };
const losAngeles: TransitPlace = { label: "Los Angeles, CA", lat: 33.94, lon: -118.4, timeZone: "America/Los_Angeles" };
const newYork: TransitPlace = { label: "New York, NY", lat: 40.7484, lon: -73.9967, timeZone: "America/New_York" };
const memphis: TransitPlace = { label: "Memphis hub", lat: 35.04, lon: -89.98, timeZone: "America/Chicago" };

describe("a ground trip on the map", () => {
  const timeline = buildTransitTimeline({
    mode: "ground_courier",
    origin: nashville,
    destination: losAngeles,
    departAt: "2026-06-01T06:00:00-05:00",
  });
  const route = tripRoute(timeline);

  it("gives one position per modelled hour, at the same hours", () => {
    expect(route.hours.map((h) => h.at)).toEqual(timeline.points.map((p) => p.at));
    expect(route.hours[0]).toMatchObject({ lat: nashville.lat, lon: nashville.lon });
    expect(route.hours.at(-1)!.lat).toBeCloseTo(losAngeles.lat, 9);
    expect(route.hours.at(-1)!.lon).toBeCloseTo(losAngeles.lon, 9);
  });

  it("moves the box away from the origin hour by hour and keeps it still while the driver rests", () => {
    const fromOrigin = route.hours.map((h) => haversineKm(nashville, h));
    for (let i = 1; i < fromOrigin.length; i++)
      expect(fromOrigin[i]!).toBeGreaterThanOrEqual(fromOrigin[i - 1]! - 1e-6);
    // At 88 km/h × 1.2 circuity an hour's driving is ≈ 73 km of great circle [practice, the model's defaults].
    const steps = fromOrigin.slice(1).map((km, i) => km - fromOrigin[i]!);
    expect(Math.max(...steps)).toBeLessThan(88 / 1.2 + 1);
    const restHours = timeline.points.flatMap((p, i) =>
      p.segment === "overnight_rest" && timeline.points[i + 1]?.segment === "overnight_rest" ? [i] : [],
    );
    expect(restHours.length).toBeGreaterThan(0);
    for (const i of restHours) expect(steps[i]).toBeCloseTo(0, 6);
  });

  it("stays within half a forecast spacing of the point the model reads the weather at", () => {
    route.hours.forEach((h, i) => {
      const point = timeline.points[i]!;
      // waypoints every ~150 km: the nearest is at most half that away (plus rounding to the hour)
      expect(haversineKm(h, point)).toBeLessThan(150);
    });
  });

  it("lists the origin, each rest in order and the destination as stops", () => {
    const kinds = route.stops.map((s) => s.kind);
    expect(kinds[0]).toBe("origin");
    expect(kinds.at(-1)).toBe("destination");
    // three nights and seven breaks (timeline.test.ts works these out by hand)
    expect(kinds.filter((k) => k === "overnight_rest")).toHaveLength(3);
    expect(kinds.filter((k) => k === "rest_stop")).toHaveLength(7);
    const starts = route.stops.map((s) => Date.parse(s.from));
    expect(starts).toEqual([...starts].sort((a, b) => a - b));
    expect(route.stops.at(-1)!.from).toBe(timeline.arriveAt);
    expect(route.line).toHaveLength(timeline.waypoints.length);
  });
});

describe("an overnight air trip on the map", () => {
  const timeline = buildTransitTimeline({
    mode: "overnight_air",
    origin: newYork,
    destination: losAngeles,
    hub: memphis,
    departAt: "2026-06-02T10:00:00-04:00",
  });
  const route = tripRoute(timeline);

  it("puts the box at the origin, the hub and the destination as the timeline does", () => {
    const hubHours = route.hours.filter((h) => h.lat === memphis.lat && h.lon === memphis.lon);
    expect(hubHours.length).toBe(timeline.points.filter((p) => p.segment === "hub").length);
    expect(route.stops.map((s) => s.kind)).toEqual(["origin", "hub", "destination"]);
    // picked up at 18:00 EDT = 22:00Z, delivered 10:30 PDT = 17:30Z (timeline.test.ts) [published, secondary]
    expect(route.stops[0]).toMatchObject({ to: "2026-06-02T22:00:00.000Z" });
    expect(route.stops[2]).toMatchObject({ to: "2026-06-03T17:30:00.000Z", place: "Los Angeles, CA" });
    expect(route.line).toEqual([newYork, memphis, losAngeles].map(({ lat, lon }) => ({ lat, lon })));
  });
});
