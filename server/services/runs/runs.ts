/**
 * A courier service's runs (issue 16): the manager puts transfers assigned to the service on one
 * van's trip; Hatchway orders the stops (shared/runs/plan.ts), times them with the rests of
 * 49 CFR 395.3 as planning guidance, and each transfer takes its planned pickup and drop-off times
 * and the van's exposure from the run (written on the transfer, with the change history, so every
 * screen, the gate and the re-checks follow the run). A change that moves a transfer's arrival by
 * more than 2 h is told to its sender and receiver.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { LockMode, UniqueConstraintViolationException } from "@mikro-orm/core";
import { firstPrecedenceBreak, insertIntoOrder, orderStops, scheduleRun, type OrderedStop } from "@shared/runs/plan";
import type { RunInputParsed, RunNotifiedDto, RunPatchParsed, RunPlace } from "@shared/schemas/run";
import { placeFromZip } from "@shared/temperature/places";
import { timeZoneAt } from "@shared/temperature/zoned-time";
import { formatInstant } from "@shared/dates";
import type { Actor } from "../../auth/actor";
import { RunSchema, RunStopSchema, type Run } from "../../db/entities/run.entity";
import { LegSchema, TransferSchema, type Transfer } from "../../db/entities/transfer.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { conflict, forbidden, invalidField, notFound } from "../../http/errors";
import type { AppLinks } from "../../mail/links";
import { mayPlanRuns, runViewerRole } from "../../policies/run.policy";
import { sharedWithOtherParties } from "../../policies/transfer.policy";
import { logChange } from "../temperature/trip-plan";
import { notifyParty } from "../transfers/notify";

/** Transfers a run may carry: sent to the receiver, not yet on the road. */
const PLANNABLE = new Set(["awaiting_receiver", "ready"]);
/** An arrival that moves by more than this is told to both parties (issue 16). */
export const ARRIVAL_MOVED_NOTICE_H = 2;
const MS_PER_H = 3_600_000;

/** Where a transfer's boxes are picked up or dropped: its stored position, else its ZIP centre. */
function placeOf(t: Transfer, side: "origin" | "destination"): RunPlace | null {
  const [street, city, state, zip, lat, lon] =
    side === "origin"
      ? [t.originStreet, t.originCity, t.originState, t.originZip, t.originLat, t.originLon]
      : [
          t.destinationStreet,
          t.destinationCity,
          t.destinationState,
          t.destinationZip,
          t.destinationLat,
          t.destinationLon,
        ];
  const label = `${street}, ${city}, ${state} ${zip}`;
  if (lat != null && lon != null) return { label, street, city, state, zip, lat, lon, timeZone: timeZoneAt(lat, lon) };
  const centre = placeFromZip(zip.slice(0, 5));
  if (!centre) return null;
  return { label, street, city, state, zip, lat: centre.lat, lon: centre.lon, timeZone: centre.timeZone };
}

type Carried = { transfer: Transfer; pickup: RunPlace; dropoff: RunPlace };

/**
 * Loads and locks the transfers named for a run (in id order, so two runs never deadlock) and
 * checks each: asked of this courier service and sent, before pickup, by road, both ends located,
 * on no other run. A failure names the transfer: by its number when the service may see it, by
 * its place in the list otherwise (so nothing leaks).
 */
async function carriedTransfers(
  em: EntityManager,
  actor: Actor,
  ids: readonly string[],
  field: string,
  runId: string | null,
  kept: ReadonlySet<string> = new Set(),
): Promise<Carried[]> {
  const found = await em.find(
    TransferSchema,
    { id: { $in: [...ids] } },
    { lockMode: LockMode.PESSIMISTIC_WRITE, orderBy: { id: "asc" } },
  );
  const byId = new Map(found.map((t) => [t.id, t]));
  const elsewhere = await em.find(
    RunStopSchema,
    { transfer: { $in: [...ids] }, kind: "pickup", ...(runId ? { run: { $ne: runId } } : {}) },
    { fields: ["transfer", "run"] },
  );
  const onRun = new Map(elsewhere.map((stop) => [stop.transfer.id, stop.run.id]));
  const keptCount = ids.filter((id) => kept.has(id)).length;
  return ids.map((id, index) => {
    const t = byId.get(id);
    const onThisRun = kept.has(id);
    const i = onThisRun ? index : index - keptCount;
    if (onThisRun && t && t.courierService?.id !== actor.organization?.id)
      throw invalidField(
        ["removeTransferIds"],
        `transfer ${t.number} is no longer asked of your courier service; take it off the run`,
      );
    if (
      !t ||
      t.courierService?.id !== actor.organization?.id ||
      !sharedWithOtherParties({ status: t.status, everSent: t.firstSentAt != null })
    )
      throw invalidField([field, i], "this is not a transfer your courier service was asked to carry");
    // A transfer already on the run stays whatever happened to it since (picked up, delivered).
    if (!onThisRun && !PLANNABLE.has(t.status))
      throw invalidField(
        [field, i],
        `transfer ${t.number} is ${t.status === "draft" ? "back with the sender" : "already past its pickup or closed"}; a run carries transfers that are sent and not yet picked up`,
      );
    if (t.mode === "overnight_air")
      throw invalidField([field, i], `transfer ${t.number} goes by overnight air carrier, not by road`);
    if (onRun.has(t.id))
      throw conflict(`Transfer ${t.number} is already on another run; take it off that run first.`, {
        field: `${field}.${i}`,
        runId: onRun.get(t.id),
      });
    const pickup = placeOf(t, "origin");
    const dropoff = placeOf(t, "destination");
    if (!pickup || !dropoff)
      throw invalidField(
        [field, i],
        `the ${pickup ? "destination" : "origin"} ZIP code of transfer ${t.number} could not be located; ask the sender to correct it`,
      );
    return { transfer: t, pickup, dropoff };
  });
}

/** The drivers must be active couriers of the service. */
async function checkedDrivers(em: EntityManager, actor: Actor, ids: readonly string[]): Promise<string[]> {
  if (ids.length === 0) return [];
  const couriers = await em.find(UserSchema, {
    id: { $in: [...ids] },
    role: "courier",
    disabled: false,
    organization: actor.organization!.id,
  });
  const known = new Set(couriers.map((c) => c.id));
  ids.forEach((id, i) => {
    if (!known.has(id)) throw invalidField(["driverIds", i], "choose one of your courier service's active couriers");
  });
  return [...ids];
}

/**
 * Times the run in the given order, stores its stops, and writes each transfer's planned pickup
 * and drop-off and the van on the transfer (each changed field in its change history, the
 * version bumped so the re-checks before departure run again). Returns each transfer's arrival
 * before the change.
 */
async function replan(
  em: EntityManager,
  actor: Actor,
  run: Run,
  carried: readonly Carried[],
  order: readonly OrderedStop[],
): Promise<Map<string, number>> {
  const byId = new Map(carried.map((c) => [c.transfer.id, c]));
  const schedule = scheduleRun(
    order.map((stop) => {
      const c = byId.get(stop.transferId)!;
      const place = stop.kind === "pickup" ? c.pickup : c.dropoff;
      return { ...stop, position: { lat: place.lat, lon: place.lon } };
    }),
    run.departAt.getTime(),
  );
  await em.nativeDelete(RunStopSchema, { run: run.id });
  const legs = await em.find(LegSchema, { transfer: { $in: carried.map((c) => c.transfer.id) } });
  const drivers = new Set(run.driverIds);
  schedule.stops.forEach((stop, position) => {
    const c = byId.get(stop.transferId)!;
    const leg = legs.find((l) => l.transfer.id === stop.transferId && drivers.has(l.courier.id)) ?? null;
    em.create(RunStopSchema, {
      run,
      position,
      kind: stop.kind,
      transfer: c.transfer,
      leg,
      arriveAt: new Date(stop.arriveMs),
      leaveAt: new Date(stop.leaveMs),
      legKm: stop.legKm,
      place: stop.kind === "pickup" ? c.pickup : c.dropoff,
    });
  });
  run.drivingH = schedule.drivingH;
  run.roadKm = schedule.roadKm;
  run.finishAt = new Date(schedule.finishMs);
  run.rests = schedule.rests.map((rest) => ({
    kind: rest.kind,
    reason: rest.reason,
    startAt: new Date(rest.startMs).toISOString(),
    endAt: new Date(rest.endMs).toISOString(),
    afterStop: rest.afterStop,
    position: rest.position,
  }));

  const before = new Map<string, number>();
  const vehicle = run.climateControlled ? ("climate_controlled" as const) : ("unconditioned" as const);
  const range =
    run.climateControlled && run.vehicleMinF != null ? { min: run.vehicleMinF, max: run.vehicleMaxF! } : null;
  for (const c of carried) {
    const t = c.transfer;
    before.set(t.id, t.expectedArrivalAt.getTime());
    const pickupAt = new Date(schedule.stops.find((s) => s.transferId === t.id && s.kind === "pickup")!.arriveMs);
    const dropoffAt = new Date(schedule.stops.find((s) => s.transferId === t.id && s.kind === "dropoff")!.arriveMs);
    const oldRange = t.vehicleMinF != null && t.vehicleMaxF != null ? { min: t.vehicleMinF, max: t.vehicleMaxF } : null;
    // Before pickup the run sets both times; on the road only the arrival is still a plan; once
    // delivered (or cancelled) nothing is rewritten.
    const beforePickup = PLANNABLE.has(t.status);
    if (!beforePickup && t.status !== "in_transit") continue;
    const changed = [
      beforePickup &&
        logChange(em, t, actor, "plannedDepartureAt", t.plannedDepartureAt.toISOString(), pickupAt.toISOString()),
      logChange(em, t, actor, "expectedArrivalAt", t.expectedArrivalAt.toISOString(), dropoffAt.toISOString()),
      logChange(em, t, actor, "vehicle", t.vehicle ?? null, vehicle),
      logChange(em, t, actor, "vehicleRangeF", oldRange, range),
    ].some(Boolean);
    if (!changed) continue;
    if (beforePickup) t.plannedDepartureAt = pickupAt;
    t.expectedArrivalAt = dropoffAt;
    t.vehicle = vehicle;
    t.vehicleMinF = range?.min ?? null;
    t.vehicleMaxF = range?.max ?? null;
    t.version += 1;
  }
  return before;
}

/** Flushes, turning a lost race for a transfer (the unique pickup per transfer) into a 409. */
async function flushRun(em: EntityManager) {
  try {
    await em.flush();
  } catch (err) {
    if (err instanceof UniqueConstraintViolationException)
      throw conflict("One of these transfers was just put on another run; load the runs again.");
    throw err;
  }
}

/** `POST /api/runs`: the manager plans a run; the stops are ordered by the planner. */
export async function createRun({ em, actor, input }: { em: EntityManager; actor: Actor; input: RunInputParsed }) {
  if (!mayPlanRuns(actor)) throw forbidden("Only the manager of a courier service plans its runs.");
  return em.transactional(async (tx) => {
    const carried = await carriedTransfers(tx, actor, input.transferIds, "transferIds", null);
    const driverIds = await checkedDrivers(tx, actor, input.driverIds ?? []);
    const run = tx.create(RunSchema, {
      courierOrganization: tx.getReference(OrganizationSchema, actor.organization!.id),
      departAt: new Date(input.departAt),
      climateControlled: input.climateControlled,
      vehicleMinF: input.climateControlled ? (input.vehicleRangeF?.min ?? null) : null,
      vehicleMaxF: input.climateControlled ? (input.vehicleRangeF?.max ?? null) : null,
      driverIds,
      finishAt: new Date(input.departAt),
      createdBy: tx.getReference(UserSchema, actor.id),
    });
    const order = orderStops(carried.map((c) => ({ transferId: c.transfer.id, pickup: c.pickup, dropoff: c.dropoff })));
    await replan(tx, actor, run, carried, order);
    await flushRun(tx);
    return { runId: run.id, changedTransferIds: carried.map((c) => c.transfer.id) };
  });
}

/** Loads a run the caller may see; a stranger gets the same 404 as for a run that does not exist. */
export async function loadRunForActor(
  em: EntityManager,
  actor: Actor,
  runId: string,
  options: { lock?: boolean } = {},
) {
  const run = await em.findOne(RunSchema, { id: runId }, options.lock ? { lockMode: LockMode.PESSIMISTIC_WRITE } : {});
  const role = run ? runViewerRole(actor, { courierOrganizationId: run.courierOrganization.id }) : null;
  if (!run || !role) throw notFound("That run");
  return { run, role };
}

/**
 * `PATCH /api/runs/:id`: a new order of the stops (checked), transfers added or removed, the van,
 * drivers or departure changed; then the times are planned again and every transfer whose arrival
 * moved by more than 2 h is told to its sender and receiver (through the outbox).
 */
export async function updateRun({
  em,
  actor,
  runId,
  input,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  runId: string;
  input: RunPatchParsed;
  links: AppLinks;
}) {
  return em.transactional(async (tx) => {
    const { run, role } = await loadRunForActor(tx, actor, runId, { lock: true });
    if (role !== "manager") throw forbidden("Only the manager of the courier service changes its runs.");
    if (input.version !== undefined && input.version !== run.version)
      throw conflict("The run changed since you loaded it; load it again and redo your change.", {
        version: run.version,
      });
    const current = await tx.find(RunStopSchema, { run }, { orderBy: { position: "asc" } });
    const currentOrder: OrderedStop[] = current.map((s) => ({ kind: s.kind, transferId: s.transfer.id }));
    const removed = new Set(input.removeTransferIds ?? []);
    (input.removeTransferIds ?? []).forEach((id, i) => {
      if (!currentOrder.some((s) => s.transferId === id))
        throw invalidField(["removeTransferIds", i], "this transfer is not on the run");
    });
    const keptIds = [...new Set(currentOrder.map((s) => s.transferId))].filter((id) => !removed.has(id));
    (input.addTransferIds ?? []).forEach((id, i) => {
      if (keptIds.includes(id)) throw invalidField(["addTransferIds", i], "this transfer is already on the run");
    });
    const ids = [...keptIds, ...(input.addTransferIds ?? [])];
    if (ids.length === 0)
      throw invalidField(["removeTransferIds"], "a run keeps at least one transfer; leave one on it");
    const carried = await carriedTransfers(tx, actor, ids, "addTransferIds", run.id, new Set(keptIds));

    let order = currentOrder.filter((s) => !removed.has(s.transferId));
    if (input.stops) {
      const expected = new Set(order.map((s) => `${s.kind}:${s.transferId}`));
      const given = input.stops.map((s) => `${s.kind}:${s.transferId}`);
      if (given.length !== expected.size || new Set(given).size !== given.length || given.some((k) => !expected.has(k)))
        throw invalidField(["stops"], "list every stop of the run once: each transfer's pickup and its drop-off");
      const broken = firstPrecedenceBreak(input.stops);
      if (broken) {
        const number = carried.find((c) => c.transfer.id === broken)?.transfer.number ?? "on the run";
        throw invalidField(["stops"], `the drop-off of transfer ${number} comes before its pickup; pick up first`);
      }
      order = input.stops;
    }
    if (input.addTransferIds?.length)
      order = insertIntoOrder(
        order,
        carried.map((c) => ({ transferId: c.transfer.id, pickup: c.pickup, dropoff: c.dropoff })),
      );
    if (input.departAt) run.departAt = new Date(input.departAt);
    if (input.climateControlled !== undefined) run.climateControlled = input.climateControlled;
    if (input.vehicleRangeF != null && !run.climateControlled)
      throw invalidField(
        ["vehicleRangeF"],
        "a set range goes with a climate-controlled van; say the van is climate-controlled or leave the range out",
      );
    if (!run.climateControlled || input.vehicleRangeF !== undefined) {
      run.vehicleMinF = input.vehicleRangeF?.min ?? null;
      run.vehicleMaxF = input.vehicleRangeF?.max ?? null;
    }
    if (input.driverIds) run.driverIds = await checkedDrivers(tx, actor, input.driverIds);

    const before = await replan(tx, actor, run, carried, order);
    run.version += 1;
    const notified: RunNotifiedDto[] = [];
    for (const { transfer } of carried) {
      const movedH = (transfer.expectedArrivalAt.getTime() - before.get(transfer.id)!) / MS_PER_H;
      if (Math.abs(movedH) <= ARRIVAL_MOVED_NOTICE_H) continue;
      const summary = `The boxes are now due at ${transfer.destinationCity}, ${transfer.destinationState} at ${formatInstant(
        transfer.expectedArrivalAt.getTime(),
        placeOf(transfer, "destination")?.timeZone ?? "UTC",
      )} (${movedH > 0 ? "later" : "earlier"} by ${Math.abs(movedH).toFixed(1)} h), picked up at ${formatInstant(
        transfer.plannedDepartureAt.getTime(),
        placeOf(transfer, "origin")?.timeZone ?? "UTC",
      )}.`;
      const told: RunNotifiedDto["told"] = [];
      for (const party of ["sender", "receiver"] as const) {
        const names = await notifyParty(tx, links, transfer, party, "arrival_moved", actor, { summary });
        told.push(...names.map((name) => ({ party, name })));
      }
      notified.push({
        transferId: transfer.id,
        transferNumber: transfer.number,
        arrivalMovedH: Math.round(movedH * 100) / 100,
        told,
      });
    }
    await flushRun(tx);
    return { runId: run.id, notified, changedTransferIds: carried.map((c) => c.transfer.id) };
  });
}
