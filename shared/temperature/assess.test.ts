import { describe, expect, it } from "vitest";
import type { PackKind } from "../constants";
import { ambientFromOverride, type AmbientByHour } from "./ambient";
import { assessTransit, findSaferDeparture, type AssessmentInput } from "./assess";
import { PACK_SPECS, type BoxSpec, type PackSpec } from "./box-model";
import type { TransitPlace } from "./places";
import { DEFAULT_PROFILES } from "./profiles";
import { transitAssessmentSchema } from "./schemas";
import { buildTransitTimeline, type TransitTimeline } from "./timeline";

// Invented senders and receivers at real coordinates; the box and packs are demo values.
const newYork: TransitPlace = { label: "New York, NY", lat: 40.7484, lon: -73.9967, timeZone: "America/New_York" };
const losAngeles: TransitPlace = { label: "Los Angeles, CA", lat: 33.94, lon: -118.4, timeZone: "America/Los_Angeles" };

const airTrip = (departAt: string | number) =>
  buildTransitTimeline({ mode: "overnight_air", origin: newYork, destination: losAngeles, departAt });

// Tuesday 2 June 2026: a departure with no calendar warnings.
const tuesday = airTrip("2026-06-02T10:00:00-04:00");

const box: BoxSpec = {
  wall: "eps",
  wallThicknessMm: 25,
  lengthMm: 300,
  widthMm: 300,
  heightMm: 300,
  contentsG: 800,
  pack: "none",
};

/**
 * Packs strong enough to decide the logic tests whatever the default estimates are: a heat pack
 * that holds ~10 W for the whole trip and a cold pack with ice to spare.
 */
const strongPacks: Record<PackKind, PackSpec> = {
  none: PACK_SPECS.none,
  heat_40h: { kind: "heat", ratedH: 10_000, peakW: 10, warmUpH: 0 },
  heat_72h: { kind: "heat", ratedH: 10_000, peakW: 10, warmUpH: 0 },
  cold: { kind: "cold", iceKg: 20, startC: 0, conductanceWPerK: 0.6 },
};

const constantF = (timeline: TransitTimeline, tempF: number): AmbientByHour =>
  ambientFromOverride(timeline, [{ at: timeline.departAt, tempF }]);

const assess = (overrides: Partial<AssessmentInput> & { tempF?: number }) => {
  const timeline = overrides.timeline ?? tuesday;
  return assessTransit({
    timeline,
    ambientByHour: overrides.ambientByHour ?? constantF(timeline, overrides.tempF ?? 75),
    box: overrides.box ?? box,
    profile: overrides.profile ?? DEFAULT_PROFILES.temperate_snake,
    packs: overrides.packs ?? strongPacks,
    ...(overrides.search ? { search: overrides.search } : {}),
  });
};

describe("assessTransit: verdicts", () => {
  it("ships a mild day as planned, in the exact API shape", () => {
    const result = assess({ tempF: 75 });
    expect(transitAssessmentSchema.parse(result)).toEqual(result);
    expect(result).toMatchObject({
      verdict: "ship",
      advice: { code: "ship_as_planned", pack: "none" },
      hoursOutsideRange: 0,
    });
    expect(result.ambientF).toEqual({ min: 75, max: 75 });
    expect(result.hours).toHaveLength(tuesday.points.length);
    expect(result.hours[0]).toMatchObject({ at: tuesday.points[0]!.at, place: "New York, NY", ambientF: 75 });
    expect(result.sources.map((s) => s.id)).toEqual(["guideline", "profile", "forecast", "box-model"]);
  });

  it("adds a heat pack on a 45 °F day and shows the box as planned going cold", () => {
    // SOURCES.md: 38–59 °F → heat pack for reptiles (REPTILES magazine) [practice]
    const result = assess({ tempF: 45 });
    expect(result).toMatchObject({ verdict: "pack", advice: { code: "add_heat_pack", pack: "heat_40h" } });
    // as planned (no pack) the interior falls from 72 °F toward the 45 °F outside air
    expect(result.insideF!.min).toBeLessThan(55);
    expect(result.insideF!.min).toBeGreaterThanOrEqual(45);
    expect(result.hoursOutsideRange).toBeGreaterThan(10);
    const inside = result.hours.map((h) => h.insideF!);
    expect(inside).toEqual([...inside].sort((a, b) => b - a));
  });

  it("keeps a planned heat pack that already does the job", () => {
    const result = assess({ tempF: 45, box: { ...box, pack: "heat_40h" } });
    expect(result).toMatchObject({
      verdict: "ship",
      advice: { code: "ship_as_planned", pack: "heat_40h" },
      hoursOutsideRange: 0,
    });
  });

  it("asks for the 72 h pack when the trip outlasts a 40 h pack", () => {
    const long = buildTransitTimeline({
      mode: "ground_courier",
      origin: { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" },
      destination: losAngeles,
      departAt: "2026-06-01T06:00:00-05:00",
    });
    expect(long.durationH).toBeGreaterThan(40);
    expect(assess({ timeline: long, tempF: 45 }).advice).toMatchObject({ code: "add_heat_pack", pack: "heat_72h" });
  });

  it("takes a heat pack out when it would overheat a mild-weather box", () => {
    // overheating kills more often than cold (SOURCES.md) [practice]; 75 °F + 10 W × 1.69 K/W
    // is about 105 °F, above the 85 °F top of the range
    const result = assess({ tempF: 75, box: { ...box, pack: "heat_72h" } });
    expect(result).toMatchObject({ verdict: "pack", advice: { code: "remove_pack", pack: "none" } });
    expect(result.insideF!.max).toBeGreaterThan(85);
  });

  it("follows the guideline's 'no pack' over a planned pack the box does not need", () => {
    // SOURCES.md: 70–79 °F → no pack (REPTILES magazine) [practice]; a 0.5 W pack would stay in
    // range (+0.85 K), so only the guideline decides here
    const gentle = { ...strongPacks, heat_40h: { kind: "heat" as const, ratedH: 10_000, peakW: 0.5, warmUpH: 0 } };
    const result = assess({ tempF: 75, box: { ...box, pack: "heat_40h" }, packs: gentle });
    expect(result).toMatchObject({
      verdict: "pack",
      advice: { code: "remove_pack", pack: "none" },
      hoursOutsideRange: 0,
    });
  });

  it("adds a cold pack for amphibians from 80 °F, not for reptiles", () => {
    // SOURCES.md: 80–91 °F → cold pack for amphibians, none for reptiles [practice]
    const frogs = assess({ tempF: 84, profile: DEFAULT_PROFILES.frog_toad });
    expect(frogs).toMatchObject({ verdict: "pack", advice: { code: "add_cold_pack", pack: "cold" } });
    const reptiles = assess({ tempF: 84, profile: DEFAULT_PROFILES.tropical_lizard });
    expect(reptiles).toMatchObject({ verdict: "ship", advice: { code: "ship_as_planned" } });
  });

  it("postpones when no pack keeps the box in range", () => {
    const weakPacks = { ...strongPacks, heat_40h: PACK_SPECS.none, heat_72h: PACK_SPECS.none };
    const result = assess({ tempF: 50, packs: weakPacks, profile: DEFAULT_PROFILES.tropical_snake });
    expect(result).toMatchObject({ verdict: "do_not_ship", advice: { code: "postpone", pack: null } });
  });

  it.each([
    // SOURCES.md band edges (REPTILES magazine) [practice]: <38 and >95 do not ship, 92–95 hold
    [37.9, "do_not_ship", "postpone"],
    [38, "pack", "add_heat_pack"],
    [92, "hold", "hold_at_staffed_facility"],
    [95, "hold", "hold_at_staffed_facility"],
    [95.1, "do_not_ship", "postpone"],
  ] as const)("gates a %s °F day: %s", (tempF, verdict, code) => {
    expect(assess({ tempF })).toMatchObject({ verdict, advice: { code } });
  });

  it("judges by the hottest place on the route", () => {
    // SOURCES.md: highs at origin, destination and hubs all count [practice]
    const hotArrival = ambientFromOverride(tuesday, [
      { at: tuesday.points[0]!.at, tempF: 72 },
      { at: tuesday.points.at(-1)!.at, tempF: 97 },
    ]);
    expect(assess({ ambientByHour: hotArrival }).verdict).toBe("do_not_ship");
  });
});

describe("assessTransit: forecast unavailable", () => {
  const complete = constantF(tuesday, 75);

  it.each([
    ["a missing hour", (m: Map<string, number>) => m.delete(tuesday.points[5]!.at)],
    ["NaN", (m: Map<string, number>) => m.set(tuesday.points[5]!.at, Number.NaN)],
    ["Infinity", (m: Map<string, number>) => m.set(tuesday.points[5]!.at, Number.POSITIVE_INFINITY)],
    // 500 °F is no weather: the recorded extremes are −128.6 and 134 °F (WMO) [memory]
    ["500 °F", (m: Map<string, number>) => m.set(tuesday.points[5]!.at, 500)],
  ])("never says safe with %s", (_label, spoil) => {
    const ambient = new Map(complete);
    spoil(ambient);
    const result = assess({ ambientByHour: ambient });
    expect(transitAssessmentSchema.parse(result)).toEqual(result);
    expect(result).toMatchObject({
      verdict: "forecast_unavailable",
      advice: { code: "retry_when_forecast_available", pack: null },
      ambientF: null,
      insideF: null,
      hoursOutsideRange: null,
      suggestedDeparture: null,
    });
    expect(result.hours[5]).toMatchObject({ ambientF: null, insideF: null });
    expect(result.hours[4]).toMatchObject({ ambientF: 75, insideF: null });
  });

  it("is unavailable with no forecast at all", () => {
    expect(assess({ ambientByHour: new Map() }).verdict).toBe("forecast_unavailable");
  });
});

describe("safer departure", () => {
  /** Outside temperature by the local departure date, 97 °F unless named. */
  const weather = (mildDates: readonly string[]) => (timeline: TransitTimeline) =>
    constantF(timeline, mildDates.some((d) => timeline.points[0]!.localTime.startsWith(d)) ? 75 : 97);
  const search = (mildDates: readonly string[]) => ({ timelineFor: airTrip, ambientFor: weather(mildDates) });
  const monday = airTrip("2026-06-01T10:00:00-04:00");

  it("suggests the first mild weekday at the same local time", () => {
    const result = assess({ timeline: monday, ambientByHour: constantF(monday, 97), search: search(["2026-06-03"]) });
    expect(result.verdict).toBe("do_not_ship");
    // Wednesday 3 June 2026, 10:00 EDT (UTC−4) [published, secondary]
    expect(result.suggestedDeparture).toBe("2026-06-03T14:00:00.000Z");
  });

  it("skips departures that leave the box in a facility over the weekend", () => {
    // never ship into a weekend (SOURCES.md) [practice]: Friday 5 June delivers on Saturday
    const onlyFriday = findSaferDeparture({
      timeline: monday,
      ambientByHour: constantF(monday, 97),
      box,
      profile: DEFAULT_PROFILES.temperate_snake,
      packs: strongPacks,
      search: search(["2026-06-05", "2026-06-06"]),
    });
    expect(onlyFriday).toBeNull();
  });

  it("falls back to a Thursday, which only lacks a day's margin", () => {
    const result = assess({ timeline: monday, ambientByHour: constantF(monday, 97), search: search(["2026-06-04"]) });
    expect(result.suggestedDeparture).toBe("2026-06-04T14:00:00.000Z");
  });

  it("does not search when the trip is fine", () => {
    expect(assess({ timeline: monday, tempF: 75, search: search(["2026-06-03"]) }).suggestedDeparture).toBeNull();
  });
});

describe("default packs", () => {
  it("ship a mild overnight box as planned", () => {
    const result = assessTransit({
      timeline: tuesday,
      ambientByHour: constantF(tuesday, 72),
      box,
      profile: DEFAULT_PROFILES.tropical_snake,
    });
    expect(result).toMatchObject({ verdict: "ship", advice: { code: "ship_as_planned" } });
  });

  it("warm the box by about P·R at the pack's peak", () => {
    // steady state ΔT = P·R (Çengel, thermal resistance network) [published]: 4 W × 1.69 K/W ≈ 6.8 K
    // ≈ 12 °F at the 40 h pack's peak, falling as the pack runs down
    const heated = assessTransit({
      timeline: tuesday,
      ambientByHour: constantF(tuesday, 50),
      box: { ...box, pack: "heat_40h" },
      profile: DEFAULT_PROFILES.temperate_aquatic_turtle,
    });
    const plain = assessTransit({
      timeline: tuesday,
      ambientByHour: constantF(tuesday, 50),
      box,
      profile: DEFAULT_PROFILES.temperate_aquatic_turtle,
    });
    const gainF = heated.hours.map((h, i) => h.insideF! - plain.hours[i]!.insideF!);
    expect(Math.max(...gainF)).toBeGreaterThan(8);
    expect(Math.max(...gainF)).toBeLessThan(4 * 1.69 * 1.8 + 0.5);
  });
});
