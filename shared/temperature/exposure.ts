import type { Exposure, ParkedKind, VehicleConditioning } from "../constants";
import { fToC } from "../units";
import type { AmbientByHour, RadiationByHour } from "./ambient";
import { clearSkyHourMeanWm2 } from "./solar";
import type { TimelineStay, TransitTimeline } from "./timeline";
import { MS_PER_HOUR } from "./zoned-time";

/**
 * What surrounds the box, hour by hour, and the air around it: the outside forecast passed
 * through the place the box is in (a vehicle, a carrier's building, a parked car, a doorstep, a
 * home). Every constant below names its source; DEVELOPERS.md D31 records the choices.
 */

export type RangeF = { min: number; max: number };

const MS_PER_MIN = 60_000;

/** A climate-controlled vehicle holds its air in this range unless the courier or driver says otherwise, °F (issue 13). */
export const DEFAULT_VEHICLE_RANGE_F: RangeF = Object.freeze({ min: 65, max: 80 });

/**
 * A closed car parked in the sun, after McLaren, Null and Quinn, Pediatrics 2005;116(1):e109:
 * the cabin rose about 40 °F in an hour whatever the outside air (72–96 °F), 80 % of it in the
 * first 30 minutes, and reached 117 °F at 72 °F outside [published]. As a first-order approach to
 * an equilibrium above the outside air (the form of the dynamic model of Horak, Schmerold,
 * Wimmer and Schauberger, Theor. Appl. Climatol. 2016, doi:10.1007/s00704-016-1861-3, which is
 * driven by air temperature and global radiation [published]):
 *   80 % of the hour's rise in 30 min ⇒ e^(−30/τ) = 1/4 ⇒ τ = 30 / ln 4 ≈ 21.6 min;
 *   the hour's rise is (1 − 1/16) of the equilibrium rise, so 40 °F ⇒ 42.7 °F; 117 − 72 = 45 °F:
 *   the equilibrium rise in full sun is taken as 45 °F.
 * The rise scales with the forecast's solar radiation (Horak et al.); McLaren's clear afternoons
 * are taken as 800 W/m² [estimate], so a 1,000 W/m² noon gives a 56 °F rise, near the clear-day
 * cabin maxima of Grundstein, Meentemeyer and Dowd, Int. J. Biometeorol. 2009 (68 °C on average)
 * [published]. Shade: a car in shade gains far less — shaded cars in Tempe warmed at 0.25 °C/min
 * against 0.41 in the sun from the same air-conditioned start and ended near the outside air
 * (Selover et al., AMS Annual Meeting 2016, TJ14.5; Vanos et al., Temperature 2018;5(3)) [published,
 * secondary]; 30 % of the sun's rise is kept, which errs warm.
 */
export const PARKED_CAR = Object.freeze({
  timeConstantMin: 30 / Math.log(4),
  sunRiseF: 45,
  referenceRadiationWm2: 800,
  shadeShare: 0.3,
});

/**
 * An unconditioned vehicle on the move: outside air, drawn a quarter of the way toward 50 °F in
 * the cold (heat from the cab and engine, the load's own mass) [estimate]; no relief in the heat,
 * since a van's cargo bay under the sun does not run cooler than the air [practice].
 */
export const UNCONDITIONED_VEHICLE = Object.freeze({ coldBandMinF: 50, towardBand: 0.25 });

/**
 * A carrier's building (origin station, sort hub, destination station; the pressurised, heated
 * aircraft hold is counted with them): outside air drawn 80 % of the way toward 50–80 °F, since
 * sort floors are heated in winter and ventilated, not cooled, in summer [practice, estimate].
 * Checked against the ISTA 7E parcel envelope (boxes in US parcel lanes between 1.9 and 30.9 °C)
 * in exposure.test.ts.
 */
export const CARRIER_BUILDING = Object.freeze({ bandF: Object.freeze({ min: 50, max: 80 }), towardBand: 0.8 });

/** A home or a keeper's facility: held between 65 and 80 °F [practice]. */
export const INDOORS_BAND_F: RangeF = Object.freeze({ min: 65, max: 80 });

/** Loading at the start and unloading at the end of a ground trip: outdoors this long, minutes [practice]. */
export const LOADING_MIN = 15;

/**
 * The overnight carrier's day [practice]: the pickup van drives its route for 2 h after the
 * pickup; the box leaves the destination station in the delivery van 2.5 h before the delivery
 * time and waits outdoors on the doorstep for the last 30 min.
 */
export const OVERNIGHT_CARRIER = Object.freeze({ pickupVanH: 2, outForDeliveryH: 2.5, doorstepMin: 30 });

const clamp = (value: number, range: RangeF) => Math.min(range.max, Math.max(range.min, value));

/** Rise of a parked closed car's cabin over the outside air at equilibrium, °F, for the radiation (W/m²). */
export function parkedEquilibriumRiseF(radiationWm2: number, parked: "sun" | "shade"): number {
  const sun = (PARKED_CAR.sunRiseF * Math.max(0, radiationWm2)) / PARKED_CAR.referenceRadiationWm2;
  return parked === "sun" ? sun : sun * PARKED_CAR.shadeShare;
}

/**
 * Cabin air of a closed car parked for `minutes` in steady weather, °F: first-order approach from
 * `startF` to the outside air plus the equilibrium rise. Radiation defaults to McLaren's clear sun.
 */
export function parkedCabinF(input: {
  startF: number;
  outsideF: number;
  minutes: number;
  parked: "sun" | "shade";
  radiationWm2?: number;
}): number {
  const equilibrium =
    input.outsideF + parkedEquilibriumRiseF(input.radiationWm2 ?? PARKED_CAR.referenceRadiationWm2, input.parked);
  return equilibrium + (input.startF - equilibrium) * Math.exp(-input.minutes / PARKED_CAR.timeConstantMin);
}

/** The air around the box for the exposures that follow the weather at once (all but parked cars), °F. */
export function steadyAroundF(exposure: Exposure, outsideF: number, vehicleRangeF: RangeF): number {
  switch (exposure) {
    case "vehicle_climate_controlled":
      return clamp(outsideF, vehicleRangeF);
    case "vehicle_unconditioned":
      return outsideF < UNCONDITIONED_VEHICLE.coldBandMinF
        ? outsideF + UNCONDITIONED_VEHICLE.towardBand * (UNCONDITIONED_VEHICLE.coldBandMinF - outsideF)
        : outsideF;
    case "carrier_building":
      return outsideF + CARRIER_BUILDING.towardBand * (clamp(outsideF, CARRIER_BUILDING.bandF) - outsideF);
    case "indoors":
      return clamp(outsideF, INDOORS_BAND_F);
    default:
      return outsideF;
  }
}

/** How a trip's vehicle is held, and where the driver's planned stops are parked. */
export type ExposurePlan = {
  /** Ground and hand delivery; the overnight carrier's vans are unconditioned whatever this says. */
  vehicle: VehicleConditioning;
  vehicleRangeF: RangeF;
  /** By planned stop index (see PlannedStop in timeline.ts). */
  stopParking: readonly ParkedKind[];
};

/** A stretch of the trip in one exposure. */
export type ExposureSpan = {
  startMs: number;
  endMs: number;
  exposure: Exposure;
  waypoint: number;
  /** The driver's planned stop this span is, by index; null otherwise. */
  plannedStop: number | null;
};

const PARKED_EXPOSURE: Readonly<Record<ParkedKind, Exposure>> = {
  sun: "parked_sun",
  shade: "parked_shade",
  indoors: "indoors",
};

function span(startMs: number, endMs: number, exposure: Exposure, waypoint: number, plannedStop: number | null = null) {
  return { startMs, endMs, exposure, waypoint, plannedStop };
}

/** Cuts `spans` at [startMs, endMs) and puts `exposure` there. */
function overlay(spans: ExposureSpan[], startMs: number, endMs: number, exposure: Exposure): ExposureSpan[] {
  if (!(endMs > startMs)) return spans;
  const out: ExposureSpan[] = [];
  for (const s of spans) {
    if (s.endMs <= startMs || s.startMs >= endMs) {
      out.push(s);
      continue;
    }
    if (s.startMs < startMs) out.push({ ...s, endMs: startMs });
    out.push({
      ...s,
      startMs: Math.max(s.startMs, startMs),
      endMs: Math.min(s.endMs, endMs),
      exposure,
      plannedStop: null,
    });
    if (s.endMs > endMs) out.push({ ...s, startMs: endMs });
  }
  return out;
}

/**
 * Overnight carrier [practice]: the sender's home or facility until the pickup, the pickup van,
 * the carrier's buildings through the night (stations, hub, the aircraft hold), the delivery van
 * through the morning, the doorstep.
 */
function carrierSpans(timeline: TransitTimeline): ExposureSpan[] {
  const stays = timeline.stays;
  const first = stays[0];
  const last = stays.at(-1);
  if (!first || !last || stays.length < 2) return stays.map((s) => span(s.startMs, s.endMs, "indoors", s.waypoint));
  const spans: ExposureSpan[] = [span(first.startMs, first.endMs, "indoors", first.waypoint)];
  const vanEndMs = first.endMs + OVERNIGHT_CARRIER.pickupVanH * MS_PER_HOUR;
  for (const night of stays.slice(1, -1)) {
    const split = Math.min(night.endMs, Math.max(night.startMs, vanEndMs));
    spans.push(span(night.startMs, split, "vehicle_unconditioned", night.waypoint));
    spans.push(span(split, night.endMs, "carrier_building", night.waypoint));
  }
  const outMs = Math.max(last.startMs, last.endMs - OVERNIGHT_CARRIER.outForDeliveryH * MS_PER_HOUR);
  const doorMs = Math.max(outMs, last.endMs - OVERNIGHT_CARRIER.doorstepMin * MS_PER_MIN);
  spans.push(span(last.startMs, outMs, "carrier_building", last.waypoint));
  spans.push(span(outMs, doorMs, "vehicle_unconditioned", last.waypoint));
  spans.push(span(doorMs, last.endMs, "outdoors", last.waypoint));
  return spans.filter((s) => s.endMs > s.startMs);
}

/**
 * Ground courier and hand delivery: the vehicle while driving; the model's own breaks keep a
 * courier's climate-controlled van in its range (its unit runs on its own [practice]) and park any
 * other vehicle, a car with its engine off, in the sun (the cautious case; a driver's own stops
 * say sun, shade or indoors); a night's rest keeps a climate-controlled van as it is, parks an
 * unconditioned one in the shade and, on a hand delivery, has the box taken indoors with the
 * driver [practice]; loading and unloading outdoors.
 */
function drivingSpans(timeline: TransitTimeline, plan: ExposurePlan): ExposureSpan[] {
  const driving: Exposure =
    plan.vehicle === "climate_controlled" ? "vehicle_climate_controlled" : "vehicle_unconditioned";
  const courierVan = timeline.mode === "ground_courier";
  const forStay = (stay: TimelineStay): Exposure => {
    switch (stay.segment) {
      case "planned_stop":
        return PARKED_EXPOSURE[plan.stopParking[stay.plannedStop ?? -1] ?? "sun"];
      case "rest_stop":
        return courierVan && plan.vehicle === "climate_controlled" ? driving : "parked_sun";
      case "overnight_rest":
        // A night's stop is mostly dark and the courier picks the spot: shade, not sun.
        if (courierVan) return plan.vehicle === "climate_controlled" ? driving : "parked_shade";
        return "indoors";
      default:
        return driving;
    }
  };
  let spans = timeline.stays.map((s) => span(s.startMs, s.endMs, forStay(s), s.waypoint, s.plannedStop ?? null));
  const departMs = Date.parse(timeline.departAt);
  const arriveMs = Date.parse(timeline.arriveAt);
  spans = overlay(spans, departMs, Math.min(arriveMs, departMs + LOADING_MIN * MS_PER_MIN), "outdoors");
  spans = overlay(spans, Math.max(departMs, arriveMs - LOADING_MIN * MS_PER_MIN), arriveMs, "outdoors");
  return spans.filter((s) => s.endMs > s.startMs);
}

/** The exposures of a trip, departure to delivery, in order. */
export function exposureSpans(timeline: TransitTimeline, plan: ExposurePlan): ExposureSpan[] {
  return timeline.mode === "overnight_air" ? carrierSpans(timeline) : drivingSpans(timeline, plan);
}

/** The air around the box, minute by minute from the timeline's first hour, with each hour's exposure. */
export type AroundSeries = {
  /** Epoch ms of the first sample (the timeline's first point). */
  startMs: number;
  stepS: number;
  /** Air around the box at each step, °C (what the box model takes). */
  aroundC: Float64Array;
  /** Per timeline point: the exposure then and the air around the box, °F. */
  hourExposure: Exposure[];
  hourAroundF: number[];
  /** Per span: the warmest and coldest air around the box in it, °F. */
  spanExtremesF: { maxF: number; minF: number }[];
  /** Whether a parked car's hour took its radiation from a clear sky for want of a forecast. */
  clearSkyAssumed: boolean;
};

/** Weather of a trip's hours: outside air (°F, every point) and, where forecast, radiation (W/m²). */
export type TripWeather = { ambient: AmbientByHour; radiation?: RadiationByHour };

/**
 * The air around the box every minute: outside air interpolated between the hours, radiation as
 * the forecast's mean of each hour (a clear sky where there is none), passed through each span's
 * exposure; a parked car's cabin follows its first-order approach from the air it was parked
 * with. Before the first span the box is at the origin, after the last at the destination, indoors.
 * Every point of the timeline must have an outside temperature.
 */
export function aroundBoxSeries(
  timeline: TransitTimeline,
  spans: readonly ExposureSpan[],
  weather: TripWeather,
  vehicleRangeF: RangeF,
): AroundSeries {
  const points = timeline.points;
  const startMs = Date.parse(points[0]!.at);
  const lastHour = points.length - 1;
  const outsideF = points.map((p) => weather.ambient.get(p.at)!);
  let clearSkyAssumed = false;
  // Only a parked car needs the sun: radiation is looked up (or taken from a clear sky) on demand.
  const radiation: (number | undefined)[] = [];
  const radiationAt = (hour: number): number => {
    let value = radiation[hour];
    if (value === undefined) {
      const p = points[hour]!;
      value = weather.radiation?.get(p.at);
      if (value === undefined) {
        clearSkyAssumed = true;
        value = clearSkyHourMeanWm2(p.lat, p.lon, Date.parse(p.at));
      }
      radiation[hour] = value;
    }
    return value;
  };
  const steps = lastHour * 60;
  const aroundC = new Float64Array(steps + 1);
  const hourExposure: Exposure[] = [];
  const hourAroundF: number[] = [];
  const spanExtremesF = spans.map(() => ({ maxF: -Infinity, minF: Infinity }));
  const decay = Math.exp(-1 / PARKED_CAR.timeConstantMin);
  let k = 0;
  let previousF = outsideF[0]!;
  for (let i = 0; i <= steps; i++) {
    const atMs = startMs + i * MS_PER_MIN;
    while (k < spans.length - 1 && spans[k]!.endMs <= atMs) k++;
    const current = spans[k];
    const inSpan = current !== undefined && atMs >= current.startMs && atMs < current.endMs;
    const exposure: Exposure = inSpan ? current.exposure : "indoors";
    const hour = Math.floor(i / 60);
    const share = (i % 60) / 60;
    const out = share === 0 ? outsideF[hour]! : outsideF[hour]! + (outsideF[hour + 1]! - outsideF[hour]!) * share;
    let aroundF: number;
    if (exposure === "parked_sun" || exposure === "parked_shade") {
      const radiationWm2 = radiationAt(Math.min(lastHour, Math.ceil(i / 60)));
      const equilibrium = out + parkedEquilibriumRiseF(radiationWm2, exposure === "parked_sun" ? "sun" : "shade");
      // The cabin starts from the air the box had the minute before.
      aroundF = equilibrium + (previousF - equilibrium) * decay;
    } else {
      aroundF = steadyAroundF(exposure, out, vehicleRangeF);
    }
    previousF = aroundF;
    aroundC[i] = fToC(aroundF);
    if (inSpan) {
      const extremes = spanExtremesF[k]!;
      if (aroundF > extremes.maxF) extremes.maxF = aroundF;
      if (aroundF < extremes.minF) extremes.minF = aroundF;
    }
    if (share === 0) {
      hourExposure.push(exposure);
      hourAroundF.push(aroundF);
    }
  }
  return { startMs, stepS: 60, aroundC, hourExposure, hourAroundF, spanExtremesF, clearSkyAssumed };
}

/** The air around the box `elapsedS` after the series' start, °C (linear between the minutes). */
export function aroundAtC(series: AroundSeries, elapsedS: number): number {
  const last = series.aroundC.length - 1;
  const at = Math.min(last, Math.max(0, elapsedS / series.stepS));
  const i = Math.min(last, Math.floor(at));
  const next = series.aroundC[Math.min(last, i + 1)]!;
  return series.aroundC[i]! + (next - series.aroundC[i]!) * (at - i);
}
