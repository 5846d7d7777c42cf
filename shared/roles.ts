import type { OrganizationKind, UserRole } from "./constants";

/**
 * The roles a person can hold in an organisation of this kind: a keeper organisation has
 * managers and members, a courier service managers and couriers. Nobody is made site admin here.
 */
export function rolesInOrganization(kind: OrganizationKind): readonly UserRole[] {
  return kind === "courier_service" ? ["manager", "courier"] : ["manager", "member"];
}

/**
 * Why a role does not fit where the person belongs, in words for the organisation field, or null
 * when it fits: the site admin fits anywhere; a courier may work on their own (no organisation);
 * a manager or member needs an organisation, and every role must be one its kind has.
 */
export function roleMisfit(role: UserRole, kind: OrganizationKind | null): string | null {
  if (role === "admin") return null;
  if (kind === null) return role === "courier" ? null : "a manager or member needs an organisation";
  if (rolesInOrganization(kind).includes(role)) return null;
  return kind === "courier_service"
    ? "a courier service's people are managers or couriers"
    : "a keeper organisation's people are managers or members";
}
