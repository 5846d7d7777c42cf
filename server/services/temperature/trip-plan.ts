/**
 * How a transfer's box travels (issue 13): the vehicle and its set range, the driver's planned
 * stops, and the vehicle each courier declared for their leg. The sender sets the plan; a courier
 * declares their own leg's vehicle (the sender may too). Each change is in the change history.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import type { VehicleConditioning } from "@shared/constants";
import type { RangeF } from "@shared/temperature/exposure";
import type { LegVehicleInput, TripPlanInput } from "@shared/temperature/schemas";
import type { Actor } from "../../auth/actor";
import {
  LegSchema,
  TransferChangeSchema,
  type Leg,
  type StoredStop,
  type Transfer,
} from "../../db/entities/transfer.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { conflict, forbidden, invalidField, notFound } from "../../http/errors";
import { canDeclareLegVehicle, canEditTripPlan } from "../../policies/temperature.policy";
import { loadTransferForActor } from "../transfers/load";
import type { TripExposureFields } from "./exposure-plan";

const rangeOf = (minF: number | null | undefined, maxF: number | null | undefined): RangeF | null =>
  minF != null && maxF != null ? { min: minF, max: maxF } : null;

/** The transfer's own vehicle and range as stored. */
export function transferVehicle(transfer: Transfer): { vehicle: VehicleConditioning | null; rangeF: RangeF | null } {
  return { vehicle: transfer.vehicle ?? null, rangeF: rangeOf(transfer.vehicleMinF, transfer.vehicleMaxF) };
}

/** A leg's declared vehicle and range as stored. */
export function legVehicle(leg: Leg): { vehicle: VehicleConditioning | null; rangeF: RangeF | null } {
  return { vehicle: leg.vehicle ?? null, rangeF: rangeOf(leg.vehicleMinF, leg.vehicleMaxF) };
}

/**
 * The vehicle the model uses for the whole trip: each leg's declaration, else the transfer's.
 * Any leg nobody described makes it unknown (modelled unconditioned, and said so); any
 * unconditioned leg makes it unconditioned; all climate-controlled gives the widest of their
 * ranges, since the box may see any of them.
 */
export function tripExposureFields(transfer: Transfer, legs: readonly Leg[]): TripExposureFields {
  const own = transferVehicle(transfer);
  const perLeg = legs.length > 0 ? legs.map((leg) => (leg.vehicle ? legVehicle(leg) : own)) : [own];
  const stops = transfer.plannedStops ?? [];
  if (perLeg.some((v) => v.vehicle === null)) return { vehicle: null, vehicleRangeF: null, stops };
  if (perLeg.some((v) => v.vehicle === "unconditioned"))
    return { vehicle: "unconditioned", vehicleRangeF: null, stops };
  const ranges = perLeg.map((v) => v.rangeF).filter((r): r is RangeF => r !== null);
  const widest =
    ranges.length === perLeg.length
      ? { min: Math.min(...ranges.map((r) => r.min)), max: Math.max(...ranges.map((r) => r.max)) }
      : null;
  return { vehicle: "climate_controlled", vehicleRangeF: widest, stops };
}

/** Records one changed field of the plan in the transfer's change history. */
export function logChange(
  em: EntityManager,
  transfer: Transfer,
  actor: Actor,
  field: string,
  oldValue: unknown,
  newValue: unknown,
) {
  if (JSON.stringify(oldValue) === JSON.stringify(newValue)) return false;
  em.create(TransferChangeSchema, {
    transfer,
    actor: em.getReference(UserSchema, actor.id),
    field,
    oldValue: oldValue ?? null,
    newValue: newValue ?? null,
  });
  return true;
}

/** The sender sets how the box travels: vehicle, set range and planned stops. */
export async function updateTripPlan({
  em,
  actor,
  transferId,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  input: TripPlanInput;
}) {
  return em.transactional(async (tx) => {
    const { transfer, role } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    if (!canEditTripPlan(role, transfer.status))
      throw forbidden("Only the sender can say how the box travels, and only until it is delivered.");
    if (transfer.mode === "overnight_air" && (input.vehicle !== null || input.stops.length > 0))
      throw invalidField(
        [input.vehicle !== null ? "vehicle" : "stops"],
        "the overnight carrier's vans, stations and hub are modelled as they are; give this for a ground courier or a hand delivery",
      );
    const departMs = transfer.plannedDepartureAt.getTime();
    input.stops.forEach((stop, i) => {
      if (Date.parse(stop.at) < departMs)
        throw invalidField(["stops", i, "at"], "a stop comes after the planned departure");
    });
    const stops: StoredStop[] = [...input.stops]
      .sort((a, b) => Date.parse(a.at) - Date.parse(b.at))
      .map((s) => ({ at: new Date(s.at).toISOString(), durationMin: s.durationMin, parked: s.parked }));
    const range = input.vehicle === "climate_controlled" ? (input.vehicleRangeF ?? null) : null;
    const before = transferVehicle(transfer);
    const changed = [
      logChange(tx, transfer, actor, "vehicle", before.vehicle, input.vehicle),
      logChange(tx, transfer, actor, "vehicleRangeF", before.rangeF, range),
      logChange(tx, transfer, actor, "stops", transfer.plannedStops ?? [], stops),
    ].some(Boolean);
    if (!changed) return transfer;
    transfer.vehicle = input.vehicle;
    transfer.vehicleMinF = range?.min ?? null;
    transfer.vehicleMaxF = range?.max ?? null;
    transfer.plannedStops = stops;
    // A new version: the re-checks before departure assess the plan as it now stands.
    transfer.version += 1;
    await tx.flush();
    return transfer;
  });
}

/** A courier declares the vehicle of their own leg (the sender may declare it for them). */
export async function declareLegVehicle({
  em,
  actor,
  transferId,
  legId,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  legId: string;
  input: LegVehicleInput;
}) {
  return em.transactional(async (tx) => {
    const { transfer, role, legs } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    const leg = legs.find((l) => l.id === legId);
    if (!leg) throw notFound("That leg");
    if (!canDeclareLegVehicle(actor, role, leg.courier.id, transfer.status))
      throw forbidden("Only the leg's courier or the sender can say how this leg's vehicle is held.");
    if (transfer.mode === "overnight_air")
      throw conflict("The overnight carrier's vans are modelled as they are; a leg's vehicle is for ground trips.");
    const range = input.vehicle === "climate_controlled" ? (input.vehicleRangeF ?? null) : null;
    const before = legVehicle(leg);
    const label = `legs[${leg.sequence}]`;
    const changed = [
      logChange(tx, transfer, actor, `${label}.vehicle`, before.vehicle, input.vehicle),
      logChange(tx, transfer, actor, `${label}.vehicleRangeF`, before.rangeF, range),
    ].some(Boolean);
    if (!changed) return transfer;
    leg.vehicle = input.vehicle;
    leg.vehicleMinF = range?.min ?? null;
    leg.vehicleMaxF = range?.max ?? null;
    transfer.version += 1;
    await tx.flush();
    return transfer;
  });
}

/** Legs with the names of their couriers, for the plan's screen. */
export async function legsWithCouriers(em: EntityManager, transferId: string) {
  return em.find(LegSchema, { transfer: transferId }, { orderBy: { sequence: "asc" }, populate: ["courier"] });
}
