import type { Actor } from "../auth/actor";

/** Who the caller is to a run: the courier service's manager, one of its couriers, an admin, or nobody. */
export type RunViewerRole = "manager" | "courier" | "admin";

const ofService = (actor: Actor, courierOrganizationId: string) =>
  !actor.disabled && actor.organization?.kind === "courier_service" && actor.organization.id === courierOrganizationId;

/**
 * Runs are the courier service's own work (issue 16). Its manager plans and changes them; its
 * couriers read them (the run sheet, the stops on their phone) but do not plan: a change moves
 * other people's arrivals, and the manager assigns the work. Admins read. Anyone else gets a 404.
 */
export function runViewerRole(actor: Actor, run: { courierOrganizationId: string }): RunViewerRole | null {
  if (ofService(actor, run.courierOrganizationId)) {
    if (actor.role === "manager") return "manager";
    if (actor.role === "courier") return "courier";
  }
  if (actor.role === "admin" && !actor.disabled) return "admin";
  return null;
}

/** Only a courier service's manager plans runs. */
export function mayPlanRuns(actor: Actor): boolean {
  return !actor.disabled && actor.role === "manager" && actor.organization?.kind === "courier_service";
}

export function runAbilities(role: RunViewerRole): { edit: boolean } {
  return { edit: role === "manager" };
}

/** Whether a caller has runs to read: the manager and couriers of a courier service (GET /api/runs answers theirs). */
export function mayReadRuns(actor: Actor): boolean {
  return (
    !actor.disabled &&
    actor.organization?.kind === "courier_service" &&
    (actor.role === "manager" || actor.role === "courier")
  );
}
