import type { TransportMode } from "../constants";
import { formatInstant } from "../dates";
import { formatDistance } from "../units";
import { haversineKm, interpolateGreatCircle } from "./geo";
import { federalHolidayOn } from "./holidays";
import type { TransitPlace } from "./places";
import {
  MS_PER_DAY,
  MS_PER_HOUR,
  addDays,
  localClockToUtcMs,
  localDate,
  localIsoTime,
  parseClock,
  timeZoneAt,
  weekdayOf,
} from "./zoned-time";

/** Where the box is during an hour of the trip. "planned_stop": a stop the driver named. */
export type TimelineSegment =
  "origin" | "hub" | "en_route" | "rest_stop" | "overnight_rest" | "planned_stop" | "destination";

/** One hour of the trip: where the box is, in that place's own time zone. */
export type TimelinePoint = {
  /** ISO 8601 UTC, on the hour. */
  at: string;
  place: string;
  lat: number;
  lon: number;
  timeZone: string;
  /** Wall-clock time with offset, e.g. `2026-06-02T18:00-05:00`. */
  localTime: string;
  segment: TimelineSegment;
  /** Index into `waypoints`: the forecast point that stands for this hour. */
  waypoint: number;
};

export type TransitWarningCode =
  | "weekend_in_transit"
  | "federal_holiday_in_transit"
  | "no_delay_margin"
  | "after_pickup_cutoff"
  | "arrives_after_planned"
  | "arrives_before_planned";

export type TransitWarning = {
  code: TransitWarningCode;
  /** "warning": the plan breaks a shipping practice; "caution": it leaves no margin. */
  severity: "warning" | "caution";
  /** Local calendar date `YYYY-MM-DD` the warning is about. */
  date: string;
  message: string;
};

/** A stretch of the trip in one state, as scheduled (ms since the epoch, UTC). */
export type TimelineStay = {
  startMs: number;
  endMs: number;
  segment: TimelineSegment;
  /** The waypoint nearest the stretch's middle. */
  waypoint: number;
  /** For a driver's planned stop: its index in the request's `plannedStops`. */
  plannedStop?: number;
};

export type TransitTimeline = {
  mode: TransportMode;
  departAt: string;
  arriveAt: string;
  durationH: number;
  greatCircleKm: number;
  /** Road distance for ground modes (great circle × circuity); null by air. */
  roadKm: number | null;
  /** The forecast points: origin, hub or points along the way, destination. */
  waypoints: TransitPlace[];
  points: TimelinePoint[];
  /** The schedule behind the points: departure to delivery, stretch by stretch. */
  stays: TimelineStay[];
  /** Indexes of planned stops that fall after the modelled arrival, so are not in the trip. */
  skippedStops: number[];
  warnings: TransitWarning[];
};

/**
 * A stop the driver plans, timed from the departure: it interrupts the driving wherever the car
 * is then, and counts as the break the hours-of-service plan would otherwise add.
 */
export type PlannedStop = { afterDepartMin: number; durationMin: number };

/** Overnight air carrier schedule, as local clock times `HH:MM`. */
export type AirOptions = {
  /** Evening pickup at the origin. */
  pickupLocal: string;
  /** Arrival at the destination station, the next morning. */
  stationArrivalLocal: string;
  /** Delivery to the receiver, the next morning. */
  deliveryLocal: string;
};

/** A stop the driver plans: after so many hours at the wheel, for so long. */
export type DrivingStop = { afterDrivingH: number; durationH: number };

export type DrivingOptions = {
  /** Road distance ÷ great-circle distance. */
  circuityFactor: number;
  averageSpeedKmh: number;
  /** Spacing of the forecast points along the great circle. */
  waypointSpacingKm: number;
  breakEveryDrivingH: number;
  breakDurationH: number;
  maxDrivingHPerDay: number;
  overnightRestH: number;
  /** The driver's own stops; when given they replace the automatic breaks and overnight rests. */
  stops?: readonly DrivingStop[];
  /** Stops at given times, added into the hours-of-service plan (see PlannedStop). */
  plannedStops?: readonly PlannedStop[];
  /** Names the town nearest a position ("Macon, GA"), for the points along the way. */
  nameNear?: (lat: number, lon: number) => string | undefined;
};

export type TimelineOptions = { air?: Partial<AirOptions>; driving?: Partial<DrivingOptions> };

/** Overnight air defaults: evening pickup, early sort arrival, morning delivery [practice]. */
export const DEFAULT_AIR_OPTIONS: AirOptions = {
  pickupLocal: "18:00",
  stationArrivalLocal: "04:00",
  deliveryLocal: "10:30",
};

/**
 * Ground defaults. Circuity 1.2: Ballou, Rahardja and Sakai 2002 [memory]. 88 km/h ≈ 55 mph
 * average with traffic [practice]. 11 h driving a day after a 10 h rest: the property-carrier
 * hours-of-service limits of 49 CFR 395.3 [memory]. A 30 min break every 4 h [practice].
 */
export const DEFAULT_DRIVING_OPTIONS: DrivingOptions = {
  circuityFactor: 1.2,
  averageSpeedKmh: 88,
  waypointSpacingKm: 150,
  breakEveryDrivingH: 4,
  breakDurationH: 0.5,
  maxDrivingHPerDay: 11,
  overnightRestH: 10,
};

/** Longest trip the timeline models; anything longer is a planning error, not a shipment. */
export const MAX_TRANSIT_H = 14 * 24;

/** A driver's stop of this length or more is a night's rest rather than a break [practice]. */
const OVERNIGHT_STOP_MIN_H = 6;

export type TimelineRequest = {
  mode: TransportMode;
  origin: TransitPlace;
  destination: TransitPlace;
  /** ISO 8601 with offset, or epoch ms. */
  departAt: string | number;
  /** Air hub the sender names; ignored by ground modes. */
  hub?: TransitPlace;
  options?: TimelineOptions;
};

/** A stretch of time the box spends in one state. Driving stretches carry their road km. */
type Stay = {
  startMs: number;
  endMs: number;
  segment: TimelineSegment;
  waypoint?: number;
  fromKm?: number;
  toKm?: number;
  plannedStop?: number;
};

type Schedule = {
  stays: Stay[];
  waypoints: TransitPlace[];
  roadKm: number | null;
  warnings: TransitWarning[];
  skippedStops?: number[];
};

/**
 * Hour-by-hour positions of the box from departure to delivery, with warnings for weekends and
 * federal holidays in transit. Overnight air: origin until the evening pickup, the hub (or half
 * the night at each end without one), the destination from the early sort until delivery.
 * Ground and hand delivery: points every ~150 km along the great circle, road distance =
 * great circle × circuity, average speed, breaks and overnight rests (or the driver's own stops).
 */
export function buildTransitTimeline(request: TimelineRequest): TransitTimeline {
  const departMs = typeof request.departAt === "number" ? request.departAt : Date.parse(request.departAt);
  if (!Number.isFinite(departMs)) throw new RangeError(`departAt is not a date: ${String(request.departAt)}`);
  const schedule =
    request.mode === "overnight_air"
      ? airSchedule(request, departMs, { ...DEFAULT_AIR_OPTIONS, ...request.options?.air })
      : drivingSchedule(request, departMs, checkedDriving({ ...DEFAULT_DRIVING_OPTIONS, ...request.options?.driving }));
  const arriveMs = schedule.stays.at(-1)?.endMs ?? departMs;
  if (arriveMs - departMs > MAX_TRANSIT_H * MS_PER_HOUR) {
    throw new RangeError(`the trip would last more than ${MAX_TRANSIT_H} h`);
  }
  const points = hourlyPoints(schedule, departMs, arriveMs);
  // Whole milliseconds, as the ISO times of the departure and arrival hold them (Date truncates).
  const stays: TimelineStay[] = schedule.stays.map((stay) => ({
    startMs: Math.trunc(stay.startMs),
    endMs: Math.trunc(stay.endMs),
    segment: stay.segment,
    waypoint: locate(stay, (stay.startMs + stay.endMs) / 2, schedule).waypoint,
    ...(stay.plannedStop === undefined ? {} : { plannedStop: stay.plannedStop }),
  }));
  return {
    mode: request.mode,
    departAt: new Date(departMs).toISOString(),
    arriveAt: new Date(arriveMs).toISOString(),
    durationH: (arriveMs - departMs) / MS_PER_HOUR,
    greatCircleKm: routeKm(schedule.waypoints, request.mode),
    roadKm: schedule.roadKm,
    waypoints: schedule.waypoints,
    points,
    stays,
    skippedStops: schedule.skippedStops ?? [],
    warnings: [...schedule.warnings, ...calendarWarnings(points, departMs, arriveMs, request)],
  };
}

function routeKm(waypoints: readonly TransitPlace[], mode: TransportMode): number {
  const first = waypoints[0];
  const last = waypoints.at(-1);
  if (!first || !last) return 0;
  if (mode !== "overnight_air") return haversineKm(first, last);
  let km = 0;
  for (let i = 1; i < waypoints.length; i++) km += haversineKm(waypoints[i - 1]!, waypoints[i]!);
  return km;
}

function airSchedule(request: TimelineRequest, departMs: number, air: AirOptions): Schedule {
  const { origin, destination, hub } = request;
  const arrival = parseClock(air.stationArrivalLocal);
  const delivery = parseClock(air.deliveryLocal);
  if (delivery.hour * 60 + delivery.minute <= arrival.hour * 60 + arrival.minute) {
    throw new RangeError("deliveryLocal must be later than stationArrivalLocal");
  }
  const warnings: TransitWarning[] = [];
  const departDate = localDate(departMs, origin.timeZone);
  let pickupMs = localClockToUtcMs(departDate, air.pickupLocal, origin.timeZone);
  if (departMs > pickupMs) {
    pickupMs = localClockToUtcMs(addDays(departDate, 1), air.pickupLocal, origin.timeZone);
    warnings.push({
      code: "after_pickup_cutoff",
      severity: "caution",
      date: departDate,
      message: `Departure after the ${air.pickupLocal} pickup: the box waits at the origin for the next day's pickup.`,
    });
  }
  // "Next morning" at the destination; a westward date-line crossing can need one more day.
  let morning = addDays(localDate(pickupMs, origin.timeZone), 1);
  while (localClockToUtcMs(morning, air.stationArrivalLocal, destination.timeZone) <= pickupMs)
    morning = addDays(morning, 1);
  const stationMs = localClockToUtcMs(morning, air.stationArrivalLocal, destination.timeZone);
  const deliveryMs = localClockToUtcMs(morning, air.deliveryLocal, destination.timeZone);
  const waypoints = hub ? [origin, hub, destination] : [origin, destination];
  const last = waypoints.length - 1;
  // Without a named hub the night is charged half to each end: the box sits in sort
  // facilities and on ramps at both, and the hold in flight is not outside air.
  const night: Stay[] = hub
    ? [{ startMs: pickupMs, endMs: stationMs, segment: "hub", waypoint: 1 }]
    : [
        { startMs: pickupMs, endMs: (pickupMs + stationMs) / 2, segment: "origin", waypoint: 0 },
        { startMs: (pickupMs + stationMs) / 2, endMs: stationMs, segment: "destination", waypoint: last },
      ];
  return {
    stays: [
      { startMs: departMs, endMs: pickupMs, segment: "origin", waypoint: 0 },
      ...night,
      { startMs: stationMs, endMs: deliveryMs, segment: "destination", waypoint: last },
    ],
    waypoints,
    roadKm: null,
    warnings,
  };
}

function checkedDriving(options: DrivingOptions): DrivingOptions {
  const positive: (keyof DrivingOptions)[] = [
    "averageSpeedKmh",
    "waypointSpacingKm",
    "breakEveryDrivingH",
    "maxDrivingHPerDay",
  ];
  for (const key of positive) {
    const value = options[key];
    if (typeof value !== "number" || !(value > 0)) throw new RangeError(`${key} must be positive`);
  }
  if (!(options.circuityFactor >= 1)) throw new RangeError("circuityFactor must be at least 1");
  if (!(options.breakDurationH >= 0) || !(options.overnightRestH >= 0))
    throw new RangeError("rest durations must be ≥ 0");
  for (const stop of options.stops ?? []) {
    if (!(stop.afterDrivingH >= 0) || !(stop.durationH > 0))
      throw new RangeError("stops need afterDrivingH ≥ 0 and durationH > 0");
  }
  for (const stop of options.plannedStops ?? []) {
    if (!(stop.afterDepartMin >= 0) || !(stop.durationMin > 0))
      throw new RangeError("planned stops need afterDepartMin ≥ 0 and durationMin > 0");
  }
  return options;
}

function drivingWaypoints(
  origin: TransitPlace,
  destination: TransitPlace,
  roadKm: number,
  options: Pick<DrivingOptions, "waypointSpacingKm" | "nameNear">,
): TransitPlace[] {
  const segments = Math.max(1, Math.round(haversineKm(origin, destination) / options.waypointSpacingKm));
  return Array.from({ length: segments + 1 }, (_, i) => {
    if (i === 0) return origin;
    if (i === segments) return destination;
    const { lat, lon } = interpolateGreatCircle(origin, destination, i / segments);
    const km = (roadKm * i) / segments;
    const town = options.nameNear?.(lat, lon);
    const distance = `${formatDistance(km, "imperial")} (${formatDistance(km, "metric")}) from ${origin.label}`;
    const label = town ? `near ${town}, ${distance}` : `en route, ${distance}`;
    return { label, lat, lon, timeZone: timeZoneAt(lat, lon), ...(town ? { near: `near ${town}` } : {}) };
  });
}

function drivingSchedule(request: TimelineRequest, departMs: number, options: DrivingOptions): Schedule {
  const roadKm = haversineKm(request.origin, request.destination) * options.circuityFactor;
  const waypoints = drivingWaypoints(request.origin, request.destination, roadKm, options);
  if (options.stops)
    return { stays: stopsPlan(departMs, roadKm, options, options.stops), waypoints, roadKm, warnings: [] };
  const { stays, skippedStops } = hoursOfServicePlan(departMs, roadKm, options);
  return { stays, waypoints, roadKm, warnings: [], skippedStops };
}

/** A tiny remainder left by floating-point sums; no leg is this short. */
const EPSILON_H = 1e-9;

function driveStay(startMs: number, hours: number, fromKm: number, speedKmh: number): Stay {
  return {
    startMs,
    endMs: startMs + hours * MS_PER_HOUR,
    segment: "en_route",
    fromKm,
    toKm: fromKm + hours * speedKmh,
  };
}

function restStay(startMs: number, hours: number, km: number, segment: TimelineSegment): Stay {
  return { startMs, endMs: startMs + hours * MS_PER_HOUR, segment, fromKm: km, toKm: km };
}

/**
 * Driving within the hours-of-service limits: a break after so many hours at the wheel, a night's
 * rest when the day's driving is used up. The driver's planned stops interrupt the driving at
 * their time; one at least as long as a break counts as the break (and one as long as a night's
 * rest threshold as the night). A planned stop that starts during a rest splits it. Stops after
 * the arrival are left out and reported.
 */
function hoursOfServicePlan(
  departMs: number,
  roadKm: number,
  o: DrivingOptions,
): { stays: Stay[]; skippedStops: number[] } {
  const planned = (o.plannedStops ?? [])
    .map((stop, index) => ({
      index,
      startMs: departMs + stop.afterDepartMin * 60_000,
      durationMs: stop.durationMin * 60_000,
    }))
    .sort((a, b) => a.startMs - b.startMs || a.index - b.index);
  const stays: Stay[] = [];
  let t = departMs;
  let km = 0;
  let todayH = 0;
  let sinceBreakH = 0;
  let next = 0;
  const remainingH = () => (roadKm - km) / o.averageSpeedKmh;
  const due = () => next < planned.length && planned[next]!.startMs <= t + EPSILON_H * MS_PER_HOUR;
  const placePlanned = () => {
    const stop = planned[next++]!;
    const start = Math.max(t, stop.startMs);
    stays.push({ ...restStay(start, stop.durationMs / MS_PER_HOUR, km, "planned_stop"), plannedStop: stop.index });
    t = start + stop.durationMs;
    const hours = stop.durationMs / MS_PER_HOUR;
    if (hours >= o.breakDurationH) sinceBreakH = 0;
    if (hours >= OVERNIGHT_STOP_MIN_H) todayH = 0;
  };
  while (remainingH() > EPSILON_H) {
    while (due()) placePlanned();
    const untilStopH = next < planned.length ? (planned[next]!.startMs - t) / MS_PER_HOUR : Infinity;
    const hours = Math.min(remainingH(), o.breakEveryDrivingH - sinceBreakH, o.maxDrivingHPerDay - todayH, untilStopH);
    if (hours > EPSILON_H) {
      const drive = driveStay(t, hours, km, o.averageSpeedKmh);
      stays.push(drive);
      [t, km, todayH, sinceBreakH] = [drive.endMs, drive.toKm!, todayH + hours, sinceBreakH + hours];
    }
    if (remainingH() <= EPSILON_H) break;
    if (due()) continue;
    const overnight = todayH >= o.maxDrivingHPerDay - EPSILON_H;
    if (overnight || sinceBreakH >= o.breakEveryDrivingH - EPSILON_H) {
      const segment = overnight ? "overnight_rest" : "rest_stop";
      const restEndMs = t + (overnight ? o.overnightRestH : o.breakDurationH) * MS_PER_HOUR;
      while (next < planned.length && planned[next]!.startMs < restEndMs) {
        const splitMs = Math.max(t, planned[next]!.startMs);
        if (splitMs > t) stays.push(restStay(t, (splitMs - t) / MS_PER_HOUR, km, segment));
        t = splitMs;
        placePlanned();
      }
      if (restEndMs > t) stays.push(restStay(t, (restEndMs - t) / MS_PER_HOUR, km, segment));
      t = Math.max(t, restEndMs);
      sinceBreakH = 0;
      if (overnight) todayH = 0;
    }
    if (t - departMs > MAX_TRANSIT_H * MS_PER_HOUR) break;
  }
  return { stays, skippedStops: planned.slice(next).map((stop) => stop.index) };
}

function stopsPlan(departMs: number, roadKm: number, o: DrivingOptions, stops: readonly DrivingStop[]): Stay[] {
  const totalH = roadKm / o.averageSpeedKmh;
  const ordered = [...stops].filter((s) => s.afterDrivingH < totalH).sort((a, b) => a.afterDrivingH - b.afterDrivingH);
  const stays: Stay[] = [];
  let t = departMs;
  let drivenH = 0;
  for (const stop of [...ordered, { afterDrivingH: totalH, durationH: 0 }]) {
    if (stop.afterDrivingH > drivenH) {
      const drive = driveStay(t, stop.afterDrivingH - drivenH, drivenH * o.averageSpeedKmh, o.averageSpeedKmh);
      stays.push(drive);
      [t, drivenH] = [drive.endMs, stop.afterDrivingH];
    }
    if (stop.durationH > 0) {
      const segment = stop.durationH >= OVERNIGHT_STOP_MIN_H ? "overnight_rest" : "rest_stop";
      const rest = restStay(t, stop.durationH, drivenH * o.averageSpeedKmh, segment);
      stays.push(rest);
      t = rest.endMs;
    }
  }
  return stays;
}

function locate(
  stay: Stay | undefined,
  atMs: number,
  schedule: Schedule,
): { waypoint: number; segment: TimelineSegment } {
  const last = schedule.waypoints.length - 1;
  if (!stay) return { waypoint: last, segment: "destination" };
  if (stay.waypoint !== undefined) return { waypoint: stay.waypoint, segment: stay.segment };
  const span = stay.endMs - stay.startMs;
  const share = span > 0 ? (atMs - stay.startMs) / span : 0;
  const km = stay.fromKm! + share * (stay.toKm! - stay.fromKm!);
  const roadKm = schedule.roadKm ?? 0;
  return { waypoint: roadKm > 0 ? Math.round((km / roadKm) * last) : 0, segment: stay.segment };
}

function hourlyPoints(schedule: Schedule, departMs: number, arriveMs: number): TimelinePoint[] {
  const firstMs = Math.floor(departMs / MS_PER_HOUR) * MS_PER_HOUR;
  const lastMs = Math.ceil(arriveMs / MS_PER_HOUR) * MS_PER_HOUR;
  const points: TimelinePoint[] = [];
  let stayIndex = 0;
  for (let atMs = firstMs; atMs <= lastMs; atMs += MS_PER_HOUR) {
    while (stayIndex < schedule.stays.length && schedule.stays[stayIndex]!.endMs <= atMs) stayIndex++;
    const located =
      atMs < departMs ? { waypoint: 0, segment: "origin" as const } : locate(schedule.stays[stayIndex], atMs, schedule);
    const place = schedule.waypoints[located.waypoint]!;
    points.push({
      at: new Date(atMs).toISOString(),
      place: place.label,
      lat: place.lat,
      lon: place.lon,
      timeZone: place.timeZone,
      localTime: localIsoTime(atMs, place.timeZone),
      segment: located.segment,
      waypoint: located.waypoint,
    });
  }
  return points;
}

const WEEKDAY_NAMES = ["Sunday", "Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday"];

/** A weekend day or an observed federal holiday: carriers do not move or deliver the box. */
function nonWorkingDay(dateYmd: string): { code: TransitWarningCode; label: string } | undefined {
  const holiday = federalHolidayOn(dateYmd);
  if (holiday) return { code: "federal_holiday_in_transit", label: `${holiday} (observed ${dateYmd})` };
  const weekday = weekdayOf(dateYmd);
  if (weekday === 0 || weekday === 6)
    return { code: "weekend_in_transit", label: `${WEEKDAY_NAMES[weekday]} ${dateYmd}` };
  return undefined;
}

function calendarWarnings(
  points: readonly TimelinePoint[],
  departMs: number,
  arriveMs: number,
  request: TimelineRequest,
): TransitWarning[] {
  const dates = new Set<string>([localDate(departMs, request.origin.timeZone)]);
  for (const point of points) {
    const atMs = Date.parse(point.at);
    // localTime starts with the point's own local date
    if (atMs >= departMs && atMs <= arriveMs) dates.add(point.localTime.slice(0, 10));
  }
  const arrivalDate = localDate(arriveMs, request.destination.timeZone);
  dates.add(arrivalDate);
  const warnings: TransitWarning[] = [];
  for (const date of [...dates].sort()) {
    const day = nonWorkingDay(date);
    if (day) {
      warnings.push({
        code: day.code,
        severity: "warning",
        date,
        message: `${day.label} falls within the transit window: the box may sit in a facility until the next working day.`,
      });
    }
  }
  const nextDay = addDays(arrivalDate, 1);
  const after = nonWorkingDay(nextDay);
  if (after && !dates.has(nextDay)) {
    warnings.push({
      code: "no_delay_margin",
      severity: "caution",
      date: nextDay,
      message: `The day after arrival is ${after.label}: a one-day delay would leave the box in transit over it.`,
    });
  }
  return warnings;
}

/** Whether the timeline breaks a shipping practice (severity "warning", not just "caution"). */
export function hasCalendarWarning(timeline: TransitTimeline): boolean {
  return timeline.warnings.some((w) => w.severity === "warning");
}

/** Departure `days` later at the same local clock time at the origin, as epoch ms. */
export function sameLocalTimeLater(timeline: TransitTimeline, days: number): number {
  const origin = timeline.waypoints[0];
  const departMs = Date.parse(timeline.departAt);
  if (!origin) return departMs + days * MS_PER_DAY;
  const local = localIsoTime(departMs, origin.timeZone);
  return localClockToUtcMs(addDays(local.slice(0, 10), days), local.slice(11, 16), origin.timeZone);
}

/** Hours between the modelled and the planned arrival that go unremarked: a courier's own slack. */
export const ARRIVAL_SLACK_H = 6;

const MODE_REASON: Readonly<Record<TransportMode, string>> = {
  overnight_air: "the carrier's overnight schedule delivers then",
  ground_courier: "one driver within the federal hours-of-service limits cannot cover the road distance sooner",
  hand_delivery: "one driver within the federal hours-of-service limits cannot cover the road distance sooner",
};

function clockText(utcMs: number, timeZone: string): string {
  return formatInstant(utcMs, timeZone);
}

/**
 * The sender's planned arrival against the trip as modelled. Later than planned is a warning: the
 * box is out longer than the parties think, and the check covers the modelled trip. Much earlier
 * is a caution: the hours the box may wait somewhere before the planned arrival are not modelled.
 */
export function plannedArrivalWarning(timeline: TransitTimeline, plannedArrivalMs: number): TransitWarning | null {
  const modelledMs = Date.parse(timeline.arriveAt);
  const destination = timeline.waypoints.at(-1);
  if (!destination || !Number.isFinite(plannedArrivalMs) || !Number.isFinite(modelledMs)) return null;
  const gapH = (modelledMs - plannedArrivalMs) / MS_PER_HOUR;
  if (Math.abs(gapH) < ARRIVAL_SLACK_H) return null;
  const tz = destination.timeZone;
  const planned = clockText(plannedArrivalMs, tz);
  const modelled = clockText(modelledMs, tz);
  if (gapH > 0) {
    return {
      code: "arrives_after_planned",
      severity: "warning",
      date: localDate(modelledMs, tz),
      message: `The trip as modelled arrives ${modelled}, ${Math.round(gapH)} h after the planned arrival (${planned}): ${MODE_REASON[timeline.mode]}. The temperature check covers the longer trip; agree the timing with the courier and the receiver.`,
    };
  }
  return {
    code: "arrives_before_planned",
    severity: "caution",
    date: localDate(plannedArrivalMs, tz),
    message: `The planned arrival (${planned}) is ${Math.round(-gapH)} h after the trip as modelled arrives (${modelled}). Hours the box waits somewhere before it is delivered are not in this check.`,
  };
}
