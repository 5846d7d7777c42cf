import type { Actor } from "../auth/actor";

/** Organisations are kept by admins. */
export function canManageOrganizations(actor: Actor): boolean {
  return actor.role === "admin" && !actor.disabled;
}
