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

// Tuesday 2 June 2026: a departure with no calendar warnings, handed to the carrier at its 18:00
// pickup (so the box spends no hours in the sender's room before it).
const tuesday = airTrip("2026-06-02T18:00:00-04:00");

/** The keys of the public contract (issue 5); the exposure model's extras are checked apart. */
const contractOf = (result: Record<string, unknown>) =>
  Object.fromEntries(
    ["verdict", "advice", "ambientF", "insideF", "hoursOutsideRange", "hours", "suggestedDeparture", "sources"].map(
      (key) => [key, result[key]],
    ),
  );

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
    expect(transitAssessmentSchema.parse(contractOf(result))).toEqual(contractOf(result));
    expect(result).toMatchObject({
      verdict: "ship",
      advice: { code: "ship_as_planned", pack: "none" },
      hoursOutsideRange: 0,
    });
    expect(result.ambientF).toEqual({ min: 75, max: 75 });
    expect(result.hours).toHaveLength(tuesday.points.length);
    expect(result.hours[0]).toMatchObject({ at: tuesday.points[0]!.at, place: "New York, NY", ambientF: 75 });
    expect(result.sources.map((s) => s.id)).toEqual(["guideline", "profile", "forecast", "box-model", "exposure"]);
  });

  it("adds a heat pack on a 45 °F day and shows the box as planned going cold", () => {
    // SOURCES.md: 38–59 °F → heat pack for reptiles (REPTILES magazine) [practice]
    const result = assess({ tempF: 45 });
    expect(result).toMatchObject({ verdict: "pack", advice: { code: "add_heat_pack", pack: "heat_40h" } });
    // as planned (no pack) the interior falls from 72 °F toward the 45 °F outside air
    expect(result.insideF!.min).toBeLessThan(55);
    expect(result.insideF!.min).toBeGreaterThanOrEqual(45);
    expect(result.hoursOutsideRange).toBeGreaterThan(10);
    // it never warms above the packing room: the carrier's buildings and vans are all colder
    const inside = result.hours.map((h) => h.insideF!);
    expect(Math.max(...inside.slice(1))).toBeLessThan(72);
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
    // a courier's van held at the outside temperature: the air around the box is 45 °F throughout
    const held = assessTransit({
      timeline: long,
      ambientByHour: constantF(long, 45),
      box,
      profile: DEFAULT_PROFILES.temperate_snake,
      packs: strongPacks,
      exposure: { vehicle: "climate_controlled", vehicleRangeF: { min: 45, max: 45 } },
    });
    expect(held.advice).toMatchObject({ code: "add_heat_pack", pack: "heat_72h" });
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
    expect(transitAssessmentSchema.parse(contractOf(result))).toEqual(contractOf(result));
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
  const search = (mildDates: readonly string[]) => ({
    timelineFor: airTrip,
    weatherFor: (timeline: TransitTimeline) => ({ ambient: weather(mildDates)(timeline) }),
  });
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

describe("where the box really is (issue 13)", () => {
  const atlanta: TransitPlace = { label: "Atlanta, GA", lat: 33.75, lon: -84.39, timeZone: "America/New_York" };
  const macon: TransitPlace = { label: "Macon, GA", lat: 32.84, lon: -83.63, timeZone: "America/New_York" };
  const nashville: TransitPlace = { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" };
  const handDelivery = (parked: "sun" | "shade" | "indoors") => {
    const timeline = buildTransitTimeline({
      mode: "hand_delivery",
      origin: atlanta,
      destination: macon,
      departAt: "2026-07-14T11:30:00-04:00",
      options: { driving: { plannedStops: [{ afterDepartMin: 60, durationMin: 60 }] } },
    });
    return assessTransit({
      timeline,
      ambientByHour: constantF(timeline, 90),
      box,
      profile: DEFAULT_PROFILES.temperate_snake,
      exposure: { vehicle: "climate_controlled", stopParking: [parked] },
    });
  };

  it("flags a lunch stop in a car parked in the sun on a 90 °F day, naming the stretch", () => {
    // McLaren 2005: a closed car in the sun gains about 40 °F in an hour [published]
    const result = handDelivery("sun");
    expect(["ship"]).not.toContain(result.verdict);
    expect(result.decidingStretch).toMatchObject({ exposure: "parked_sun", direction: "hot" });
    expect(result.decidingStretch!.aroundF).toBeGreaterThan(120);
    expect(result.advice.message).toContain("12:30–13:30");
    expect(result.advice.message).toContain("parked in the sun");
    expect(result.advice.message).toMatch(/the car reaches about 1\d\d °F; the box inside reaches \d+ °F/);
    expect(result.advice.message).toMatch(/shade|indoors/);
    const stopHour = result.hours.find((h) => h.at === "2026-07-14T17:00:00.000Z")!;
    expect(stopHour.exposure).toBe("parked_sun");
    expect(stopHour.aroundBoxF!).toBeGreaterThan(stopHour.ambientF! + 20);
  });

  it("clears the same stop taken indoors", () => {
    const result = handDelivery("indoors");
    expect(result.verdict).toBe("ship");
    expect(result.decidingStretch?.suggestions).toEqual([]);
  });

  it("lets a December ground trip go in a heated van while saying what an unconditioned one does", () => {
    // issue 13: couriers who carry reptiles drive heated vans all winter [practice]
    const timeline = buildTransitTimeline({
      mode: "ground_courier",
      origin: nashville,
      destination: losAngeles,
      departAt: "2026-12-08T06:00:00-06:00",
    });
    const input = {
      timeline,
      ambientByHour: constantF(timeline, 30),
      box,
      profile: DEFAULT_PROFILES.temperate_snake,
    };
    const heated = assessTransit({ ...input, exposure: { vehicle: "climate_controlled" } });
    expect(["ship", "pack"]).toContain(heated.verdict);
    expect(heated.vehicle).toMatchObject({ conditioning: "climate_controlled", declared: true, note: null });

    const unsaid = assessTransit(input);
    expect(unsaid.verdict).toBe("do_not_ship");
    expect(unsaid.vehicle).toMatchObject({ conditioning: "unconditioned", declared: false });
    expect(unsaid.vehicle.note).toContain("not climate-controlled");
    expect(unsaid.vehicle.ifClimateControlled?.verdict).toBe(heated.verdict);
    expect(unsaid.advice.message).toContain("A climate-controlled vehicle");
  });

  it("never turns a verdict green on an assumption", () => {
    // issue 13: where nobody said how the vehicle is held, the verdict is never better than either case
    const order = ["forecast_unavailable", "do_not_ship", "hold", "pack", "ship"];
    for (const tempF of [20, 45, 62, 75, 88, 93]) {
      const timeline = buildTransitTimeline({
        mode: "hand_delivery",
        origin: atlanta,
        destination: macon,
        departAt: "2026-07-14T09:00:00-04:00",
      });
      const common = {
        timeline,
        ambientByHour: constantF(timeline, tempF),
        box,
        profile: DEFAULT_PROFILES.tropical_snake,
      };
      const unsaid = assessTransit(common).verdict;
      for (const vehicle of ["climate_controlled", "unconditioned"] as const) {
        const said = assessTransit({ ...common, exposure: { vehicle } }).verdict;
        expect(order.indexOf(unsaid), `${tempF} °F vs ${vehicle}`).toBeLessThanOrEqual(order.indexOf(said));
      }
    }
  });
});
