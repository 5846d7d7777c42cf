import { isDeepStrictEqual } from "node:util";
import type { ProfileGroup } from "@shared/constants";
import { profileDataOf } from "@shared/temperature/profile-schema";
import { DEFAULT_PROFILES, type TemperatureProfile } from "@shared/temperature/profiles";
import type {
  BoxReadingDto,
  TemperatureCheckDto,
  TemperatureProfileDto,
  TemperatureReport,
  TransferTemperatureDto,
  TripPlanDto,
} from "@shared/temperature/report";
import type { ViewerRole } from "@shared/constants";
import type { Actor } from "../auth/actor";
import type { TemperatureAlert, TemperatureCheck, TemperatureProfileRow } from "../db/entities/temperature.entity";
import type { Leg, Transfer } from "../db/entities/transfer.entity";
import type { User } from "../db/entities/user.entity";
import { canDeclareLegVehicle, canEditTripPlan } from "../policies/temperature.policy";
import { legVehicle, transferVehicle } from "../services/temperature/trip-plan";

export function presentCheck(c: TemperatureCheck): TemperatureCheckDto {
  return {
    id: c.id,
    mark: c.mark,
    checkedAt: c.checkedAt.toISOString(),
    transferVersion: c.transferVersion,
    verdict: c.verdict,
    adviceCode: c.adviceCode,
  };
}

function presentAlert(a: TemperatureAlert): TransferTemperatureDto["alert"] {
  const before = a.previousCheck.getEntity().result.advice;
  const now = a.check.getEntity().result.advice;
  return {
    at: a.createdAt.toISOString(),
    previous: { code: before.code, message: before.message },
    current: { code: now.code, message: now.message },
  };
}

/** How the box travels, with what the caller may change (the policies decide). */
export function presentTripPlan(
  transfer: Transfer,
  legs: readonly (Leg & { courier: { getEntity(): User } })[],
  viewer: { actor: Actor; role: ViewerRole },
  pickedUpAt: Date | null,
): TripPlanDto {
  const applies = transfer.mode !== "overnight_air";
  const own = transferVehicle(transfer);
  return {
    applies,
    vehicle: own.vehicle,
    vehicleRangeF: own.rangeF,
    stops: (transfer.plannedStops ?? []).map((s) => ({ at: s.at, durationMin: s.durationMin, parked: s.parked })),
    legs: legs.map((leg) => {
      const declared = legVehicle(leg);
      return {
        id: leg.id,
        sequence: leg.sequence,
        courierName: leg.courier.getEntity().displayName,
        vehicle: declared.vehicle,
        vehicleRangeF: declared.rangeF,
        canDeclare:
          applies && canDeclareLegVehicle(viewer.actor, viewer.role, leg.courier.getEntity().id, transfer.status),
      };
    }),
    canEdit: applies && canEditTripPlan(viewer.role, transfer.status),
    followingPickupAt: pickedUpAt ? pickedUpAt.toISOString() : null,
  };
}

/** The transfer's temperature answer, its latest advice-change flag, its stored checks, the readings and the plan. */
export function presentTransferTemperature(
  transfer: Transfer,
  report: TemperatureReport,
  alert: TemperatureAlert | null,
  checks: TemperatureCheck[],
  readings: BoxReadingDto[],
  plan: TripPlanDto,
): TransferTemperatureDto {
  return {
    ...report,
    transferVersion: transfer.version,
    alert: alert ? presentAlert(alert) : null,
    checks: checks.map(presentCheck),
    readings,
    plan,
  };
}

/** A group's profile in force, beside the guideline default it started from and who last edited it. */
export function presentProfile(
  group: ProfileGroup,
  profile: TemperatureProfile,
  row: TemperatureProfileRow | undefined,
): TemperatureProfileDto {
  const data = profileDataOf(profile);
  const guidelineDefault = profileDataOf(DEFAULT_PROFILES[group]);
  const editor = row?.updatedBy?.getEntity();
  return {
    group,
    ...data,
    guidelineDefault,
    edited: !isDeepStrictEqual(data, guidelineDefault),
    updatedAt: editor && row ? row.updatedAt.toISOString() : null,
    updatedBy: editor ? { id: editor.id, displayName: editor.displayName } : null,
  };
}
