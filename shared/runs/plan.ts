/**
 * A courier's run (issue 16): one van picks up boxes from many senders and drops them at many
 * receivers. This module orders the stops and times them; it is pure (no Node or DOM APIs).
 *
 * Ordering is a pickup-and-delivery problem without time windows: every transfer is a request
 * whose pickup must come before its drop-off, minimising road distance of an open route. No
 * maintained JavaScript library solves it (the npm registry's routing packages are native OR-Tools
 * bindings or plain TSP solvers), so we use the textbook construction and improvement pair:
 * - cheapest insertion of whole requests, pickup and drop-off together, at the pair of positions
 *   that adds the least distance (Rosenkrantz, Stearns and Lewis 1977 for the TSP; the
 *   pickup-and-delivery form as surveyed by Savelsbergh and Sol 1995, "The general pickup and
 *   delivery problem", Transportation Science 29(1), and Parragh, Doerner and Hartl 2008);
 * - then local search until no move improves: pair relocation (take a request out and insert it
 *   again at its cheapest place: the "PD-shift" of Li and Lim 2001), or-opt moves of one stop
 *   (Or 1976) and 2-opt segment reversals (Croes 1958), each accepted only when every pickup
 *   still comes before its drop-off.
 * It is a heuristic: short runs come out optimal or close, long ones good rather than best.
 *
 * Timing: road km = great circle × circuity factor (1.2, Ballou, Rahardja and Sakai 2002 [memory]),
 * the average speed of the temperature timeline's driving options, a dwell at each stop
 * [practice], and rests as planning guidance after the property-carrier hours-of-service limits of
 * 49 CFR 395.3 [published]: no driving after 11 h of driving or beyond the 14th hour after coming
 * on duty, until 10 consecutive hours off duty; a 30-minute break once 8 h of driving have passed
 * without one. The rule binds vehicles over 10,000 lb (49 CFR 390.5); the plan applies it to
 * every van as guidance.
 */
import { DEFAULT_DRIVING_OPTIONS } from "../temperature/timeline";
import { haversineKm, interpolateGreatCircle, type LatLon } from "../temperature/geo";

export type RunStopKind = "pickup" | "dropoff";

/** One transfer the run carries: where its boxes are picked up and where they are dropped. */
export type RunRequest = { transferId: string; pickup: LatLon; dropoff: LatLon };

/** A stop in the order the van makes them. */
export type OrderedStop = { kind: RunStopKind; transferId: string };

export type RunPlanOptions = {
  /** Road distance ÷ great-circle distance (1.2 [memory]: Ballou, Rahardja and Sakai 2002). */
  circuityFactor: number;
  averageSpeedKmh: number;
  /** Time spent at each stop loading or unloading, in minutes [practice]. */
  dwellMin: number;
  /** 49 CFR 395.3(a)(3)(i): driving allowed after 10 h off duty. */
  maxDrivingH: number;
  /** 49 CFR 395.3(a)(2): no driving beyond the 14th hour after coming on duty. */
  dutyWindowH: number;
  /** 49 CFR 395.3(a)(1): 10 consecutive hours off duty. */
  offDutyH: number;
  /** 49 CFR 395.3(a)(3)(ii): a break once 8 h of driving have passed without one … */
  breakAfterDrivingH: number;
  /** … of at least 30 minutes. */
  breakH: number;
};

/** Defaults: circuity and speed as the temperature timeline drives; the limits of 49 CFR 395.3. */
export const DEFAULT_RUN_PLAN_OPTIONS: RunPlanOptions = Object.freeze({
  circuityFactor: DEFAULT_DRIVING_OPTIONS.circuityFactor,
  averageSpeedKmh: DEFAULT_DRIVING_OPTIONS.averageSpeedKmh,
  dwellMin: 20,
  maxDrivingH: 11,
  dutyWindowH: 14,
  offDutyH: 10,
  breakAfterDrivingH: 8,
  breakH: 0.5,
});

export type RestKind = "break" | "off_duty";

/** A rest the plan puts on the road between two stops (planning guidance, not a logbook). */
export type PlannedRest = {
  kind: RestKind;
  /** "driving_8h" (the 30-minute break), "driving_11h" or "window_14h" (10 h off duty). */
  reason: "driving_8h" | "driving_11h" | "window_14h";
  startMs: number;
  endMs: number;
  /** The rest falls on the road after this stop (index into the ordered stops). */
  afterStop: number;
  /** Roughly where: along the great circle between the two stops. */
  position: LatLon;
};

export type TimedStop = OrderedStop & {
  /** Arrival at the stop, epoch ms (the departure for the first stop). */
  arriveMs: number;
  /** When the van leaves after loading or unloading. */
  leaveMs: number;
  /** Road km from the stop before. */
  legKm: number;
};

export type RunSchedule = {
  stops: TimedStop[];
  rests: PlannedRest[];
  drivingH: number;
  roadKm: number;
  finishMs: number;
};

const MS_PER_H = 3_600_000;
const EPSILON_H = 1e-9;

/** Road km between two positions: great circle × circuity factor. */
export function roadKm(from: LatLon, to: LatLon, circuityFactor = DEFAULT_RUN_PLAN_OPTIONS.circuityFactor): number {
  return haversineKm(from, to) * circuityFactor;
}

/** Whether every pickup comes before its drop-off and each transfer appears exactly once each way. */
export function precedenceHolds(stops: readonly OrderedStop[]): boolean {
  const picked = new Set<string>();
  const dropped = new Set<string>();
  for (const stop of stops) {
    if (stop.kind === "pickup") {
      if (picked.has(stop.transferId)) return false;
      picked.add(stop.transferId);
    } else {
      if (!picked.has(stop.transferId) || dropped.has(stop.transferId)) return false;
      dropped.add(stop.transferId);
    }
  }
  return picked.size === dropped.size;
}

/** The first transfer whose drop-off comes before (or without) its pickup, or null. */
export function firstPrecedenceBreak(stops: readonly OrderedStop[]): string | null {
  const picked = new Set<string>();
  for (const stop of stops) {
    if (stop.kind === "pickup") picked.add(stop.transferId);
    else if (!picked.has(stop.transferId)) return stop.transferId;
  }
  const dropped = new Set(stops.filter((s) => s.kind === "dropoff").map((s) => s.transferId));
  return [...picked].find((id) => !dropped.has(id)) ?? null;
}

/**
 * Orders the stops of a run: cheapest insertion of pickup-and-drop-off pairs, then pair
 * relocation, or-opt and 2-opt moves that keep every pickup before its drop-off, until none
 * shortens the route. Deterministic for a given input order. Distances in road km.
 */
export function orderStops(
  requests: readonly RunRequest[],
  options: Pick<RunPlanOptions, "circuityFactor"> = DEFAULT_RUN_PLAN_OPTIONS,
): OrderedStop[] {
  const n = requests.length;
  if (n === 0) return [];
  // Node 2r is request r's pickup, 2r + 1 its drop-off.
  const positions = requests.flatMap((r) => [r.pickup, r.dropoff]);
  const size = positions.length;
  const dist = new Float64Array(size * size);
  for (let a = 0; a < size; a++)
    for (let b = a + 1; b < size; b++) {
      const km = roadKm(positions[a]!, positions[b]!, options.circuityFactor);
      dist[a * size + b] = km;
      dist[b * size + a] = km;
    }
  const d = (a: number, b: number) => dist[a * size + b]!;

  let route = cheapestInsertion(n, d);
  for (let round = 0; round < 50; round++) {
    const improved = relocatePairs(route, n, d) || orOpt(route, d) || twoOpt(route, d);
    if (!improved) break;
    route = improved;
  }
  return route.map((node) => ({
    kind: node % 2 === 0 ? "pickup" : "dropoff",
    transferId: requests[node >> 1]!.transferId,
  }));
}

/**
 * Puts transfers that are not yet on a run into its current order, each pickup and drop-off where
 * they add the least distance (cheapest insertion), leaving the stops already there in the order
 * the driver chose. `requests` lists every transfer, old and new.
 */
export function insertIntoOrder(
  current: readonly OrderedStop[],
  requests: readonly RunRequest[],
  options: Pick<RunPlanOptions, "circuityFactor"> = DEFAULT_RUN_PLAN_OPTIONS,
): OrderedStop[] {
  const index = new Map(requests.map((r, i) => [r.transferId, i]));
  const positions = requests.flatMap((r) => [r.pickup, r.dropoff]);
  const d = (a: number, b: number) => roadKm(positions[a]!, positions[b]!, options.circuityFactor);
  let route = current.map((stop) => 2 * index.get(stop.transferId)! + (stop.kind === "pickup" ? 0 : 1));
  const placed = new Set(current.map((stop) => stop.transferId));
  for (const request of requests) {
    if (placed.has(request.transferId)) continue;
    const r = index.get(request.transferId)!;
    const at = bestPairInsertion(route, 2 * r, 2 * r + 1, d);
    route = insertPair(route, 2 * r, 2 * r + 1, at.i, at.j);
  }
  return route.map((node) => ({
    kind: node % 2 === 0 ? "pickup" : "dropoff",
    transferId: requests[node >> 1]!.transferId,
  }));
}

/** Open-route length: the sum of the legs between consecutive stops. */
function routeLength(route: readonly number[], d: (a: number, b: number) => number): number {
  let total = 0;
  for (let i = 1; i < route.length; i++) total += d(route[i - 1]!, route[i]!);
  return total;
}

/**
 * Cost of inserting pickup p at index i and drop-off q at index j ≥ i of `route` (indices in
 * the route before insertion; both at the same index means q follows p directly).
 */
function bestPairInsertion(
  route: readonly number[],
  p: number,
  q: number,
  d: (a: number, b: number) => number,
): { cost: number; i: number; j: number } {
  const len = route.length;
  const gap = (prev: number | undefined, x: number, next: number | undefined) =>
    (prev === undefined ? 0 : d(prev, x)) +
    (next === undefined ? 0 : d(x, next)) -
    (prev !== undefined && next !== undefined ? d(prev, next) : 0);
  let best = { cost: Infinity, i: 0, j: 0 };
  for (let i = 0; i <= len; i++) {
    const prev = route[i - 1];
    const next = route[i];
    // Both between the same neighbours: prev → p → q → next.
    const together =
      (prev === undefined ? 0 : d(prev, p)) +
      d(p, q) +
      (next === undefined ? 0 : d(q, next)) -
      (prev !== undefined && next !== undefined ? d(prev, next) : 0);
    if (together < best.cost) best = { cost: together, i, j: i };
    const pCost = gap(prev, p, next);
    for (let j = i + 1; j <= len; j++) {
      const cost = pCost + gap(route[j - 1], q, route[j]);
      if (cost < best.cost) best = { cost, i, j };
    }
  }
  return best;
}

function insertPair(route: readonly number[], p: number, q: number, i: number, j: number): number[] {
  const next = [...route];
  next.splice(j, 0, q);
  next.splice(i, 0, p);
  return next;
}

function cheapestInsertion(n: number, d: (a: number, b: number) => number): number[] {
  const left = new Set(Array.from({ length: n }, (_, r) => r));
  let route: number[] = [];
  while (left.size > 0) {
    let choice = { r: -1, cost: Infinity, i: 0, j: 0 };
    for (const r of left) {
      const at = bestPairInsertion(route, 2 * r, 2 * r + 1, d);
      if (at.cost < choice.cost - 1e-9) choice = { r, ...at };
    }
    route = insertPair(route, 2 * choice.r, 2 * choice.r + 1, choice.i, choice.j);
    left.delete(choice.r);
  }
  return route;
}

/** Takes each request out and puts it back at its cheapest place; the first improvement wins. */
function relocatePairs(route: readonly number[], n: number, d: (a: number, b: number) => number): number[] | null {
  const before = routeLength(route, d);
  for (let r = 0; r < n; r++) {
    const rest = route.filter((node) => node >> 1 !== r);
    const at = bestPairInsertion(rest, 2 * r, 2 * r + 1, d);
    const candidate = insertPair(rest, 2 * r, 2 * r + 1, at.i, at.j);
    if (routeLength(candidate, d) < before - 1e-6) return candidate;
  }
  return null;
}

/** Whether each drop-off (odd node) comes after its pickup (the even node before it). */
function feasible(route: readonly number[]): boolean {
  const seen = new Set<number>();
  for (const node of route) {
    if (node % 2 === 1 && !seen.has(node - 1)) return false;
    seen.add(node);
  }
  return true;
}

/**
 * Or-opt: moves a chain of one to three consecutive stops elsewhere in the route (Or 1976), where
 * that is shorter and every pickup stays before its drop-off.
 */
function orOpt(route: readonly number[], d: (a: number, b: number) => number): number[] | null {
  const len = route.length;
  const link = (a: number | undefined, b: number | undefined) => (a === undefined || b === undefined ? 0 : d(a, b));
  for (let chain = 1; chain <= 3; chain++) {
    for (let from = 0; from + chain <= len; from++) {
      const first = route[from]!;
      const last = route[from + chain - 1]!;
      const prev = route[from - 1];
      const next = route[from + chain];
      const removed = link(prev, first) + link(last, next) - link(prev, next);
      const rest = [...route.slice(0, from), ...route.slice(from + chain)];
      const moved = route.slice(from, from + chain);
      for (let to = 0; to <= rest.length; to++) {
        if (to === from) continue;
        const a = rest[to - 1];
        const b = rest[to];
        const added = link(a, first) + link(last, b) - link(a, b);
        if (added >= removed - 1e-6) continue;
        const candidate = [...rest.slice(0, to), ...moved, ...rest.slice(to)];
        if (feasible(candidate)) return candidate;
      }
    }
  }
  return null;
}

/** Reverses a stretch of the route where that is shorter and no pair ends up backwards. */
function twoOpt(route: readonly number[], d: (a: number, b: number) => number): number[] | null {
  const len = route.length;
  for (let i = 0; i < len - 1; i++) {
    for (let k = i + 1; k < len; k++) {
      const a = route[i - 1];
      const b = route[i]!;
      const c = route[k]!;
      const e = route[k + 1];
      const delta = (a === undefined ? 0 : d(a, c) - d(a, b)) + (e === undefined ? 0 : d(b, e) - d(c, e));
      if (delta >= -1e-6) continue;
      // A reversed stretch must not hold both stops of one request.
      const inside = new Set<number>();
      let pairInside = false;
      for (let x = i; x <= k && !pairInside; x++) {
        const request = route[x]! >> 1;
        if (inside.has(request)) pairInside = true;
        inside.add(request);
      }
      if (pairInside) continue;
      return [...route.slice(0, i), ...route.slice(i, k + 1).reverse(), ...route.slice(k + 1)];
    }
  }
  return null;
}

/**
 * Times a run whose stops are in the given order: leaving the first stop at `departMs` after its
 * dwell, driving each leg at the average speed, with the 30-minute breaks and 10-hour rests of
 * 49 CFR 395.3 placed on the road as the limits fall due. The driver comes on duty at the
 * departure and again after each 10-hour rest; time at stops counts as on duty.
 */
export function scheduleRun(
  stops: readonly (OrderedStop & { position: LatLon })[],
  departMs: number,
  partial: Partial<RunPlanOptions> = {},
): RunSchedule {
  const o = { ...DEFAULT_RUN_PLAN_OPTIONS, ...partial };
  const dwellH = o.dwellMin / 60;
  const rests: PlannedRest[] = [];
  const timed: TimedStop[] = [];
  let t = departMs;
  let dutyStartMs = departMs;
  let drivenSinceOffH = 0;
  let drivenSinceBreakH = 0;
  let totalDrivingH = 0;
  let totalKm = 0;

  const rest = (kind: RestKind, reason: PlannedRest["reason"], afterStop: number, position: LatLon) => {
    const hours = kind === "break" ? o.breakH : o.offDutyH;
    rests.push({ kind, reason, startMs: t, endMs: t + hours * MS_PER_H, afterStop, position });
    t += hours * MS_PER_H;
    drivenSinceBreakH = 0;
    if (kind === "off_duty") {
      drivenSinceOffH = 0;
      dutyStartMs = t;
    }
  };

  stops.forEach((stop, index) => {
    let legKm = 0;
    if (index > 0) {
      const from = stops[index - 1]!.position;
      legKm = roadKm(from, stop.position, o.circuityFactor);
      const legH = legKm / o.averageSpeedKmh;
      let drivenH = 0;
      while (legH - drivenH > EPSILON_H) {
        const windowLeftH = o.dutyWindowH - (t - dutyStartMs) / MS_PER_H;
        const canDriveH = Math.min(
          legH - drivenH,
          o.maxDrivingH - drivenSinceOffH,
          o.breakAfterDrivingH - drivenSinceBreakH,
          windowLeftH,
        );
        if (canDriveH > EPSILON_H) {
          t += canDriveH * MS_PER_H;
          drivenH += canDriveH;
          drivenSinceOffH += canDriveH;
          drivenSinceBreakH += canDriveH;
          continue;
        }
        const where = interpolateGreatCircle(from, stop.position, legH > 0 ? drivenH / legH : 0);
        if (drivenSinceOffH >= o.maxDrivingH - EPSILON_H) rest("off_duty", "driving_11h", index - 1, where);
        else if (windowLeftH <= EPSILON_H) rest("off_duty", "window_14h", index - 1, where);
        else rest("break", "driving_8h", index - 1, where);
      }
      totalDrivingH += legH;
      totalKm += legKm;
    }
    const arriveMs = t;
    t += dwellH * MS_PER_H;
    timed.push({ kind: stop.kind, transferId: stop.transferId, arriveMs, leaveMs: t, legKm });
  });
  return { stops: timed, rests, drivingH: totalDrivingH, roadKm: totalKm, finishMs: t };
}
