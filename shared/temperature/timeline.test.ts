import { describe, expect, it } from "vitest";
import { haversineKm } from "./geo";
import type { TransitPlace } from "./places";
import {
  ARRIVAL_SLACK_H,
  buildTransitTimeline,
  hasCalendarWarning,
  plannedArrivalWarning,
  sameLocalTimeLater,
} from "./timeline";

// Invented endpoints at real coordinates (the Rosetta Code airports and city centres).
const nashville: TransitPlace = { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" };
const losAngeles: TransitPlace = { label: "Los Angeles, CA", lat: 33.94, lon: -118.4, timeZone: "America/Los_Angeles" };
const newYork: TransitPlace = { label: "New York, NY", lat: 40.7484, lon: -73.9967, timeZone: "America/New_York" };
const memphis: TransitPlace = { label: "Memphis hub", lat: 35.04, lon: -89.98, timeZone: "America/Chicago" };
const atlanta: TransitPlace = { label: "Atlanta, GA", lat: 33.749, lon: -84.388, timeZone: "America/New_York" };

describe("overnight air", () => {
  // Tuesday 2 June 2026, 10:00 EDT (UTC−4, 15 U.S.C. 260a) [published, secondary]
  const tuesday = buildTransitTimeline({
    mode: "overnight_air",
    origin: newYork,
    destination: losAngeles,
    departAt: "2026-06-02T10:00:00-04:00",
  });

  it("keeps the box at the origin until the 18:00 pickup and delivers at 10:30 the next morning", () => {
    // 18:00 EDT = 22:00Z; delivery 10:30 PDT (UTC−7) on 3 June = 17:30Z [published, secondary]
    expect(tuesday.arriveAt).toBe("2026-06-03T17:30:00.000Z");
    expect(tuesday.durationH).toBeCloseTo(27.5, 9);
    const at = (iso: string) => tuesday.points.find((p) => p.at === iso);
    expect(at("2026-06-02T21:00:00.000Z")).toMatchObject({ segment: "origin", localTime: "2026-06-02T17:00-04:00" });
    expect(tuesday.points.at(-1)).toMatchObject({
      segment: "destination",
      timeZone: "America/Los_Angeles",
      localTime: "2026-06-03T11:00-07:00",
    });
    // hourly from 14:00Z on 2 June to 18:00Z on 3 June, both ends included
    expect(tuesday.points).toHaveLength(29);
  });

  it("charges half the night to each end without a hub", () => {
    // pickup 22:00Z, sort arrival 04:00 PDT = 11:00Z: the halves meet at 04:30Z
    const at = (iso: string) => tuesday.points.find((p) => p.at === iso)?.segment;
    expect(at("2026-06-03T04:00:00.000Z")).toBe("origin");
    expect(at("2026-06-03T05:00:00.000Z")).toBe("destination");
  });

  it("puts the night at the named hub", () => {
    const viaHub = buildTransitTimeline({
      mode: "overnight_air",
      origin: newYork,
      destination: losAngeles,
      hub: memphis,
      departAt: "2026-06-02T10:00:00-04:00",
    });
    const hubHours = viaHub.points.filter((p) => p.segment === "hub");
    expect(hubHours[0]?.at).toBe("2026-06-02T22:00:00.000Z");
    expect(hubHours.at(-1)?.at).toBe("2026-06-03T10:00:00.000Z");
    expect(hubHours.every((p) => p.place === "Memphis hub" && p.timeZone === "America/Chicago")).toBe(true);
    expect(viaHub.greatCircleKm).toBeCloseTo(haversineKm(newYork, memphis) + haversineKm(memphis, losAngeles), 6);
  });

  it("has no calendar warnings for a Tuesday departure", () => {
    // Ship Monday to Wednesday overnight (SOURCES.md, REPTILES magazine) [practice]
    expect(tuesday.warnings).toEqual([]);
    expect(hasCalendarWarning(tuesday)).toBe(false);
  });

  it("warns of a Saturday delivery and of Thursday's missing margin", () => {
    // 5 June 2026 is a Friday; 4 June a Thursday (Gregorian calendar) [practice]
    const friday = buildTransitTimeline({
      mode: "overnight_air",
      origin: newYork,
      destination: losAngeles,
      departAt: "2026-06-05T09:00:00-04:00",
    });
    expect(friday.warnings).toContainEqual(
      expect.objectContaining({ code: "weekend_in_transit", date: "2026-06-06", severity: "warning" }),
    );
    const thursday = buildTransitTimeline({
      mode: "overnight_air",
      origin: newYork,
      destination: losAngeles,
      departAt: "2026-06-04T09:00:00-04:00",
    });
    expect(thursday.warnings.map((w) => w.code)).toEqual(["no_delay_margin"]);
    expect(hasCalendarWarning(thursday)).toBe(false);
  });

  it("warns when the box arrives on an observed federal holiday", () => {
    // 5 U.S.C. 6103 via OPM: Independence Day 2026 (Saturday) is observed Friday 3 July [published]
    const beforeHoliday = buildTransitTimeline({
      mode: "overnight_air",
      origin: newYork,
      destination: losAngeles,
      departAt: "2026-07-02T09:00:00-04:00",
    });
    expect(beforeHoliday.warnings).toContainEqual(
      expect.objectContaining({ code: "federal_holiday_in_transit", date: "2026-07-03" }),
    );
  });

  it("moves a departure after the pickup to the next day's pickup", () => {
    const late = buildTransitTimeline({
      mode: "overnight_air",
      origin: newYork,
      destination: losAngeles,
      departAt: "2026-06-01T19:30:00-04:00",
    });
    expect(late.warnings[0]).toMatchObject({ code: "after_pickup_cutoff", date: "2026-06-01" });
    expect(late.arriveAt).toBe("2026-06-03T17:30:00.000Z");
  });
});

describe("ground courier", () => {
  // Monday 1 June 2026, 06:00 CDT
  const trip = buildTransitTimeline({
    mode: "ground_courier",
    origin: nashville,
    destination: losAngeles,
    departAt: "2026-06-01T06:00:00-05:00",
  });

  it("drives the great circle times the circuity factor", () => {
    // road ≈ great circle × 1.2 (Ballou, Rahardja and Sakai 2002) [memory]; BNA–LAX great
    // circle 2886.4444 km at R = 6371.0 km (Rosetta Code) [published], scaled to R = 6371.0088
    const greatCircleKm = (2886.4444 * 6371.0088) / 6371.0;
    expect(trip.greatCircleKm).toBeCloseTo(greatCircleKm, 2);
    expect(trip.roadKm).toBeCloseTo(greatCircleKm * 1.2, 2);
  });

  it("places forecast points about every 150 km", () => {
    // 2886 km / 150 km ≈ 19.2 → 19 legs, 20 points
    expect(trip.waypoints).toHaveLength(20);
    const legs = trip.waypoints.slice(1).map((w, i) => haversineKm(trip.waypoints[i]!, w));
    for (const leg of legs) expect(leg).toBeCloseTo(trip.greatCircleKm / 19, 6);
  });

  it("follows 11 h of driving a day, 30 min breaks every 4 h and 10 h rests", () => {
    // 49 CFR 395.3 limits [memory]; by hand: 39.36 h at the wheel (3463.8 km at 88 km/h),
    // three overnight rests and seven breaks → 39.36 + 30 + 3.5 h
    const drivingH = trip.roadKm! / 88;
    expect(trip.durationH).toBeCloseTo(drivingH + 3 * 10 + 7 * 0.5, 6);
    expect(trip.points.filter((p) => p.segment === "overnight_rest")).toHaveLength(30);
  });

  it("moves west hour by hour through the time zones", () => {
    const waypoints = trip.points.map((p) => p.waypoint);
    expect(waypoints).toEqual([...waypoints].sort((a, b) => a - b));
    expect(trip.points[0]).toMatchObject({ place: "Nashville, TN", localTime: "2026-06-01T06:00-05:00" });
    expect(trip.points.at(-1)).toMatchObject({ place: "Los Angeles, CA", timeZone: "America/Los_Angeles" });
    // the route crosses Central, Mountain (Denver or Phoenix) and Pacific Time [practice]
    const zones = new Set(trip.points.map((p) => p.timeZone));
    expect(zones.has("America/Chicago") && zones.has("America/Los_Angeles")).toBe(true);
    expect(zones.has("America/Denver") || zones.has("America/Phoenix")).toBe(true);
  });

  it("warns when a long drive runs into the weekend", () => {
    // Thursday 4 June 2026 + 73 h reaches Sunday 7 June [practice]
    const thursday = buildTransitTimeline({
      mode: "ground_courier",
      origin: nashville,
      destination: losAngeles,
      departAt: "2026-06-04T06:00:00-05:00",
    });
    const codes = thursday.warnings.map((w) => `${w.code} ${w.date}`);
    expect(codes).toContain("weekend_in_transit 2026-06-06");
    expect(codes).toContain("weekend_in_transit 2026-06-07");
  });
});

describe("hand delivery", () => {
  it("uses the driver's own stops instead of the automatic breaks", () => {
    const trip = buildTransitTimeline({
      mode: "hand_delivery",
      origin: nashville,
      destination: atlanta,
      departAt: "2026-06-02T08:00:00-05:00",
      options: { driving: { averageSpeedKmh: 100, stops: [{ afterDrivingH: 2, durationH: 1 }] } },
    });
    const drivingH = (haversineKm(nashville, atlanta) * 1.2) / 100;
    expect(trip.durationH).toBeCloseTo(drivingH + 1, 9);
    const stopHour = trip.points.find((p) => p.at === "2026-06-02T15:00:00.000Z");
    expect(stopHour?.segment).toBe("rest_stop");
  });

  it("refuses impossible options and dates", () => {
    const base = {
      mode: "hand_delivery" as const,
      origin: nashville,
      destination: atlanta,
      departAt: "2026-06-02T08:00:00-05:00",
    };
    expect(() => buildTransitTimeline({ ...base, options: { driving: { averageSpeedKmh: 0 } } })).toThrow(RangeError);
    expect(() => buildTransitTimeline({ ...base, options: { driving: { circuityFactor: 0.9 } } })).toThrow(RangeError);
    expect(() => buildTransitTimeline({ ...base, departAt: "next Tuesday" })).toThrow(RangeError);
    expect(() => buildTransitTimeline({ ...base, options: { driving: { averageSpeedKmh: 1 } } })).toThrow(/more than/);
  });
});

describe("sameLocalTimeLater", () => {
  it("keeps the local clock across a DST change", () => {
    // DST ends Sunday 1 November 2026 (15 U.S.C. 260a): 09:00 CDT → 09:00 CST is 25 h later [published, secondary]
    const trip = buildTransitTimeline({
      mode: "overnight_air",
      origin: nashville,
      destination: newYork,
      departAt: "2026-10-31T09:00:00-05:00",
    });
    expect(new Date(sameLocalTimeLater(trip, 2)).toISOString()).toBe("2026-11-02T15:00:00.000Z");
  });
});

describe("planned arrival against the modelled trip", () => {
  const tuesday = buildTransitTimeline({
    mode: "overnight_air",
    origin: newYork,
    destination: losAngeles,
    departAt: "2026-06-02T10:00:00-04:00",
  });
  const delivery = Date.parse(tuesday.arriveAt); // 10:30 PDT on 3 June (see above)
  const h = 3_600_000;

  it("says nothing within the courier's slack", () => {
    expect(plannedArrivalWarning(tuesday, delivery)).toBeNull();
    expect(plannedArrivalWarning(tuesday, delivery - (ARRIVAL_SLACK_H - 0.5) * h)).toBeNull();
    expect(plannedArrivalWarning(tuesday, delivery + (ARRIVAL_SLACK_H - 0.5) * h)).toBeNull();
  });

  it("warns when the trip cannot arrive as early as planned, in the receiver's local time", () => {
    // Planned 3 June 00:30 PDT, modelled 10:30 PDT (PDT = UTC−7, 15 U.S.C. 260a) [published, secondary]
    const w = plannedArrivalWarning(tuesday, delivery - 10 * h);
    expect(w).toMatchObject({ code: "arrives_after_planned", severity: "warning", date: "2026-06-03" });
    expect(w?.message).toContain(
      "Wed, Jun 3, 2026, 10:30 PDT, 10 h after the planned arrival (Wed, Jun 3, 2026, 00:30 PDT)",
    );
  });

  it("explains a road trip by the driver's hours", () => {
    // Nashville → Los Angeles by road is about 3,300 km: more than a day at the wheel under 49 CFR 395.3 [memory]
    const road = buildTransitTimeline({
      mode: "ground_courier",
      origin: nashville,
      destination: losAngeles,
      departAt: "2026-06-02T08:00:00-05:00",
    });
    const w = plannedArrivalWarning(road, Date.parse("2026-06-03T08:00:00-07:00"));
    expect(w?.code).toBe("arrives_after_planned");
    expect(w?.message).toMatch(/hours-of-service/);
    expect(Date.parse(road.arriveAt)).toBeGreaterThan(Date.parse("2026-06-04T00:00:00Z"));
  });

  it("cautions when the box would wait long before the planned arrival", () => {
    const w = plannedArrivalWarning(tuesday, delivery + 24 * h);
    expect(w).toMatchObject({ code: "arrives_before_planned", severity: "caution", date: "2026-06-04" });
    expect(w?.message).toMatch(/24 h after the trip as modelled arrives/);
  });
});
