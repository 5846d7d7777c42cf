import type { Actor } from "../auth/actor";

/** Organisations are kept by admins: listing all of them, creating one by hand. */
export function canManageOrganizations(actor: Actor): boolean {
  return actor.role === "admin" && !actor.disabled;
}

/**
 * Who the caller is to an organisation's people and details: its manager (or the site admin)
 * may change them; its other people may not; anyone else does not see it at all (404).
 */
export function organizationAccess(actor: Actor, organizationId: string): "manage" | "belongs" | null {
  if (actor.disabled) return null;
  if (actor.role === "admin") return "manage";
  if (actor.organization?.id !== organizationId) return null;
  return actor.role === "manager" ? "manage" : "belongs";
}
