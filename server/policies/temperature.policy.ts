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
