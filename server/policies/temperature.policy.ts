import type { TransferStatus, ViewerRole } from "@shared/constants";
import { isKeeper, type Actor } from "../auth/actor";

/** Who may plan a trip with the what-if: keepers (members) and admins, not couriers. */
export function canPlanTrips(actor: Actor): boolean {
  return !actor.disabled && (isKeeper(actor) || actor.role === "admin");
}

/** Who may change the temperature profiles every verdict is computed with: admins. */
export function canEditTemperatureProfiles(actor: Actor): boolean {
  return !actor.disabled && actor.role === "admin";
}

/** Who may switch the local weather fake's scenario in the demo: admins. */
export function canSwitchWeatherScenario(actor: Actor): boolean {
  return !actor.disabled && actor.role === "admin";
}

/** Statuses in which how the box travels can still change: until it is delivered. */
const PLAN_OPEN: readonly TransferStatus[] = ["draft", "awaiting_receiver", "ready", "in_transit"];

/** Who may set how a transfer's box travels (vehicle, set range, planned stops): the sender, until delivery. */
export function canEditTripPlan(role: ViewerRole, status: TransferStatus): boolean {
  return role === "sender" && PLAN_OPEN.includes(status);
}

/** Who may declare a leg's vehicle: the leg's own courier, or the sender, until delivery. */
export function canDeclareLegVehicle(
  actor: Actor,
  role: ViewerRole,
  legCourierId: string,
  status: TransferStatus,
): boolean {
  if (!PLAN_OPEN.includes(status)) return false;
  return role === "sender" || (role === "courier" && actor.id === legCourierId);
}

/** Who may see how close the model has been to the box readings across their transfers: keepers and admins. */
export function canReadModelAccuracy(actor: Actor): boolean {
  return canPlanTrips(actor);
}
