import { isCourier, isKeeper, type Actor } from "../auth/actor";
import { mayPlanRuns, mayReadRuns } from "./run.policy";

/** Who may manage accounts: admins only. */
export function canManageUsers(actor: Actor): boolean {
  return actor.role === "admin" && !actor.disabled;
}

/** The abilities the client uses to decide what to show; the server decides again on each request. */
export function abilitiesOf(actor: Actor) {
  return {
    manageUsers: canManageUsers(actor),
    manageOrganizations: actor.role === "admin",
    readCaughtMail: actor.role === "admin",
    draftTransfers: isKeeper(actor),
    carryTransfers: isCourier(actor),
    manageOwnOrganization: actor.role === "manager" && actor.organization != null && !actor.disabled,
    /** A courier service's people read its runs; its manager plans them (issue 16). */
    readRuns: mayReadRuns(actor),
    planRuns: mayPlanRuns(actor),
  };
}
