import { describe, expect, it } from "vitest";
import { cToF, fToC } from "../units";
import { fakeTemperatureC } from "../../fakes/open-meteo/climate";
import { ambientFromOverride, type AmbientByHour } from "./ambient";
import { assessTransit } from "./assess";
import { boxThermal, simulateInterior, type BoxSpec } from "./box-model";
import {
  PARKED_CAR,
  aroundAtC,
  aroundBoxSeries,
  exposureSpans,
  parkedCabinF,
  steadyAroundF,
  type ExposurePlan,
} from "./exposure";
import type { TransitPlace } from "./places";
import { DEFAULT_PROFILES } from "./profiles";
import { buildTransitTimeline, type TransitTimeline } from "./timeline";

// Invented trips between real coordinates.
const knoxville: TransitPlace = { label: "Knoxville, TN", lat: 35.96, lon: -83.92, timeZone: "America/New_York" };
const eugene: TransitPlace = { label: "Eugene, OR", lat: 44.05, lon: -123.09, timeZone: "America/Los_Angeles" };
const atlanta: TransitPlace = { label: "Atlanta, GA", lat: 33.75, lon: -84.39, timeZone: "America/New_York" };
const macon: TransitPlace = { label: "Macon, GA", lat: 32.84, lon: -83.63, timeZone: "America/New_York" };
const miami: TransitPlace = { label: "Miami, FL", lat: 25.77, lon: -80.19, timeZone: "America/New_York" };
const minneapolis: TransitPlace = { label: "Minneapolis, MN", lat: 44.98, lon: -93.27, timeZone: "America/Chicago" };
const phoenix: TransitPlace = { label: "Phoenix, AZ", lat: 33.45, lon: -112.07, timeZone: "America/Phoenix" };
const nashville: TransitPlace = { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" };
const losAngeles: TransitPlace = { label: "Los Angeles, CA", lat: 33.94, lon: -118.4, timeZone: "America/Los_Angeles" };

// A foam shipper with one animal and its cup: a demo box.
const box: BoxSpec = {
  wall: "eps",
  wallThicknessMm: 38,
  lengthMm: 355,
  widthMm: 305,
  heightMm: 254,
  contentsG: 900,
  pack: "none",
};

const constant = (timeline: TransitTimeline, tempF: number): AmbientByHour =>
  ambientFromOverride(timeline, [{ at: timeline.departAt, tempF }]);

const unconditioned: ExposurePlan = { vehicle: "unconditioned", vehicleRangeF: { min: 65, max: 80 }, stopParking: [] };

describe("a closed car parked in the sun (McLaren, Null and Quinn, Pediatrics 2005)", () => {
  it("is 40 ± 8 °F warmer than the outside air after an hour at 85 °F", () => {
    // McLaren 2005: mean rise about 40 °F in 60 min for outside air of 72–96 °F [published]
    const cabin = parkedCabinF({ startF: 85, outsideF: 85, minutes: 60, parked: "sun" });
    expect(cabin - 85).toBeGreaterThanOrEqual(32);
    expect(cabin - 85).toBeLessThanOrEqual(48);
  });

  it("takes 80 % of the hour's rise in the first 30 minutes", () => {
    // McLaren 2005: 80 % of the rise within the first 30 min [published]
    const at = (minutes: number) => parkedCabinF({ startF: 85, outsideF: 85, minutes, parked: "sun" }) - 85;
    expect(at(30) / at(60)).toBeCloseTo(0.8, 2);
  });

  it("rises about 3.2 °F per 5 minutes over the hour, whatever the outside air", () => {
    // McLaren 2005: mean 3.2 °F per 5 min; the rise did not depend on the outside temperature [published]
    for (const outsideF of [72, 85, 96]) {
      const perFive = (parkedCabinF({ startF: outsideF, outsideF, minutes: 60, parked: "sun" }) - outsideF) / 12;
      expect(perFive).toBeGreaterThan(3.2 - 0.6);
      expect(perFive).toBeLessThan(3.2 + 0.6);
    }
  });

  it("reaches cabin maxima in the range measured on clear summer days", () => {
    // Grundstein, Meentemeyer and Dowd 2009: maximum cabin temperatures 41–76 °C [published]
    for (const outsideC of [24, 30, 36]) {
      const cabinF = parkedCabinF({
        startF: cToF(outsideC),
        outsideF: cToF(outsideC),
        minutes: 180,
        parked: "sun",
        radiationWm2: 950,
      });
      expect(fToC(cabinF)).toBeGreaterThanOrEqual(41);
      expect(fToC(cabinF)).toBeLessThanOrEqual(76);
    }
  });

  it("warms less in the shade, and not at all at night", () => {
    // shaded cars warm more slowly and end near the outside air (Selover et al. 2016; Vanos et al. 2018) [published, secondary]
    const sun = parkedCabinF({ startF: 85, outsideF: 85, minutes: 60, parked: "sun" });
    const shade = parkedCabinF({ startF: 85, outsideF: 85, minutes: 60, parked: "shade" });
    expect(shade).toBeGreaterThan(85);
    expect(shade - 85).toBeLessThan((sun - 85) / 2);
    expect(parkedCabinF({ startF: 60, outsideF: 60, minutes: 60, parked: "sun", radiationWm2: 0 })).toBeCloseTo(60, 6);
  });

  it("keeps its time constant from McLaren's 80 % in 30 minutes: τ = 30 / ln 4", () => {
    expect(PARKED_CAR.timeConstantMin).toBeCloseTo(21.64, 2);
  });
});

describe("a climate-controlled vehicle against an unconditioned one, 48 h at 10 °F", () => {
  // Nashville → Los Angeles by ground courier: more than 48 h on the road [practice: hours of service]
  const trip = buildTransitTimeline({
    mode: "ground_courier",
    origin: nashville,
    destination: losAngeles,
    departAt: "2027-01-12T06:00:00-06:00",
  });
  const turtles = DEFAULT_PROFILES.temperate_aquatic_turtle;
  const assess = (vehicle: "climate_controlled" | "unconditioned") =>
    assessTransit({
      timeline: trip,
      ambientByHour: constant(trip, 10),
      box,
      profile: turtles,
      exposure: { vehicle, vehicleRangeF: vehicle === "climate_controlled" ? { min: 68, max: 68 } : null },
      brief: true,
    });

  it("keeps the box inside the temperate-turtle band in a van held at 68 °F", () => {
    // issue 13 §3; temperate aquatic turtles travel at 50–85 °F (profile default, keepers' practice) [practice]
    expect(trip.durationH).toBeGreaterThan(48);
    const result = assess("climate_controlled");
    expect(result.insideF!.min).toBeGreaterThanOrEqual(turtles.safeTransitF.min);
    expect(result.insideF!.max).toBeLessThanOrEqual(turtles.safeTransitF.max);
    expect(result.hoursOutsideRange).toBe(0);
    expect(result.verdict).not.toBe("do_not_ship");
  });

  it("lets the same box fall out of the band in an unconditioned van", () => {
    const result = assess("unconditioned");
    expect(result.insideF!.min).toBeLessThan(turtles.safeTransitF.min);
    expect(result.hoursOutsideRange).toBeGreaterThan(12);
    expect(result.verdict).toBe("do_not_ship");
  });
});

describe("the overnight carrier's profile against the ISTA 7E parcel envelope", () => {
  // ISTA 7E summaries: boxes in US parcel lanes between 1.9 °C and 30.9 °C [published, secondary]
  const envelopeF = { min: cToF(1.9), max: cToF(30.9) };
  const routes: [TransitPlace, TransitPlace][] = [
    [knoxville, eugene],
    [miami, minneapolis],
    [phoenix, nashville],
    [minneapolis, miami],
  ];
  // Tuesdays in mid-July and mid-January; the fake's climate stands in for the forecast (fake data).
  for (const departAt of ["2026-07-14T10:00:00-05:00", "2027-01-12T10:00:00-06:00"]) {
    it(`keeps the indoor exposures inside the envelope (${departAt.slice(0, 7)})`, () => {
      for (const [origin, destination] of routes) {
        const timeline = buildTransitTimeline({ mode: "overnight_air", origin, destination, departAt });
        const ambient = new Map(
          timeline.points.map((p) => [p.at, cToF(fakeTemperatureC(p.lat, p.lon, Date.parse(p.at) / 1000))]),
        );
        const spans = exposureSpans(timeline, unconditioned);
        const series = aroundBoxSeries(timeline, spans, { ambient }, unconditioned.vehicleRangeF);
        const indoor = series.hourExposure
          .map((exposure, i) => ({ exposure, aroundF: series.hourAroundF[i]! }))
          .filter((h) => h.exposure === "carrier_building" || h.exposure === "indoors");
        expect(indoor.length).toBeGreaterThan(6);
        for (const hour of indoor) {
          expect(hour.aroundF, `${origin.label} → ${destination.label}`).toBeGreaterThanOrEqual(envelopeF.min);
          expect(hour.aroundF, `${origin.label} → ${destination.label}`).toBeLessThanOrEqual(envelopeF.max);
        }
      }
    });
  }

  it("goes sender's room, pickup van, carrier's buildings, delivery van, doorstep", () => {
    // the overnight carrier's day [practice]
    const timeline = buildTransitTimeline({
      mode: "overnight_air",
      origin: knoxville,
      destination: eugene,
      departAt: "2026-07-14T10:00:00-04:00",
    });
    const order = exposureSpans(timeline, unconditioned).map((s) => s.exposure);
    expect(order[0]).toBe("indoors");
    expect(order[1]).toBe("vehicle_unconditioned");
    expect(order).toContain("carrier_building");
    expect(order.slice(-2)).toEqual(["vehicle_unconditioned", "outdoors"]);
  });
});

describe("the air around the box: monotone and bounded", () => {
  /** A mulberry32 generator: the same "random" cases on every run. */
  function random(seed: number) {
    let state = seed >>> 0;
    return () => {
      state = (state + 0x6d2b79f5) >>> 0;
      let t = Math.imul(state ^ (state >>> 15), state | 1);
      t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
      return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
    };
  }

  // Atlanta → Macon by hand, with a lunch stop parked in the sun.
  const trip = buildTransitTimeline({
    mode: "hand_delivery",
    origin: atlanta,
    destination: macon,
    departAt: "2026-07-14T11:00:00-04:00",
    options: { driving: { plannedStops: [{ afterDepartMin: 60, durationMin: 60 }] } },
  });
  const plan: ExposurePlan = { ...unconditioned, stopParking: ["sun"] };
  const radiationAll = (wm2: number) => new Map(trip.points.map((p) => [p.at, wm2]));

  it("never cools the box with more sun", () => {
    const next = random(13);
    const ambient = constant(trip, 88);
    const thermal = boxThermal(box);
    const insideWith = (wm2: number) => {
      const series = aroundBoxSeries(
        trip,
        exposureSpans(trip, plan),
        { ambient, radiation: radiationAll(wm2) },
        plan.vehicleRangeF,
      );
      return simulateInterior({
        ...thermal,
        initialInsideC: fToC(72),
        ambientC: (s) => aroundAtC(series, s),
        durationS: (trip.points.length - 1) * 3600,
        pack: { kind: "none" },
      }).insideC;
    };
    for (let i = 0; i < 20; i++) {
      const low = next() * 900;
      const high = low + next() * 300;
      const [cooler, warmer] = [insideWith(low), insideWith(high)];
      cooler.forEach((value, hour) => expect(warmer[hour]!).toBeGreaterThanOrEqual(value - 1e-9));
    }
  });

  it("never lets the inside overshoot the air around it without a pack", () => {
    // lumped capacitance without a source stays between its start and the extremes of its forcing
    // (Çengel, Heat Transfer, ch. 4) [published]
    const next = random(7);
    const thermal = boxThermal(box);
    for (let i = 0; i < 20; i++) {
      const samples = trip.points.map((p) => ({ at: p.at, tempF: 20 + next() * 80 }));
      const ambient = ambientFromOverride(trip, samples);
      const series = aroundBoxSeries(
        trip,
        exposureSpans(trip, plan),
        { ambient, radiation: radiationAll(next() * 1000) },
        plan.vehicleRangeF,
      );
      const packedC = fToC(72);
      const result = simulateInterior({
        ...thermal,
        initialInsideC: packedC,
        ambientC: (s) => aroundAtC(series, s),
        durationS: (trip.points.length - 1) * 3600,
        pack: { kind: "none" },
      });
      const aroundMax = Math.max(packedC, ...series.aroundC);
      const aroundMin = Math.min(packedC, ...series.aroundC);
      expect(result.maxC).toBeLessThanOrEqual(aroundMax + 1e-9);
      expect(result.minC).toBeGreaterThanOrEqual(aroundMin - 1e-9);
    }
  });

  it("holds a climate-controlled vehicle in its range and draws buildings toward theirs", () => {
    const range = { min: 65, max: 80 };
    for (const outsideF of [-20, 10, 50, 70, 100, 115]) {
      const held = steadyAroundF("vehicle_climate_controlled", outsideF, range);
      expect(held).toBeGreaterThanOrEqual(65);
      expect(held).toBeLessThanOrEqual(80);
      const building = steadyAroundF("carrier_building", outsideF, range);
      // between the outside air and the building's band, never past either
      expect(building).toBeGreaterThanOrEqual(Math.min(outsideF, 50));
      expect(building).toBeLessThanOrEqual(Math.max(outsideF, 80));
    }
  });
});

describe("where the box is on a hand delivery with a stop", () => {
  const trip = buildTransitTimeline({
    mode: "hand_delivery",
    origin: atlanta,
    destination: macon,
    departAt: "2026-07-14T11:00:00-04:00",
    options: { driving: { plannedStops: [{ afterDepartMin: 45, durationMin: 60 }] } },
  });

  it("loads outdoors, drives, parks where the driver said, and unloads outdoors", () => {
    const spans = exposureSpans(trip, {
      vehicle: "climate_controlled",
      vehicleRangeF: { min: 65, max: 80 },
      stopParking: ["sun"],
    });
    expect(spans[0]).toMatchObject({ exposure: "outdoors" });
    expect(spans[0]!.endMs - spans[0]!.startMs).toBe(15 * 60_000);
    const stop = spans.find((s) => s.plannedStop === 0)!;
    expect(stop.exposure).toBe("parked_sun");
    expect(stop.startMs).toBe(Date.parse("2026-07-14T11:45:00-04:00"));
    expect(stop.endMs).toBe(Date.parse("2026-07-14T12:45:00-04:00"));
    expect(spans.at(-1)).toMatchObject({ exposure: "outdoors" });
    expect(spans.filter((s) => s.exposure === "vehicle_climate_controlled").length).toBeGreaterThan(0);
  });
});
