import type { OrganizationKind, UserRole } from "@shared/constants";
import type { UserDto } from "@shared/schemas/auth";
import type { User } from "../db/entities/user.entity";

/**
 * Who is making the request: a plain snapshot read fresh from the database on every
 * request (so a disabled or re-assigned account loses access at once), not an ORM entity.
 */
export type Actor = {
  id: string;
  email: string;
  displayName: string;
  role: UserRole;
  disabled: boolean;
  organization: { id: string; name: string; kind: OrganizationKind } | null;
};

/** The columns an actor is built from; `u` is app_user and `o` its organisation. */
export const ACTOR_COLUMNS = `u.id AS actor_id, u.email AS actor_email, u.display_name AS actor_display_name, u.role AS actor_role,
  u.disabled AS actor_disabled, o.id AS actor_org_id, o.name AS actor_org_name, o.kind AS actor_org_kind`;

export type ActorRow = {
  actor_id: string | null;
  actor_email: string;
  actor_display_name: string;
  actor_role: UserRole;
  actor_disabled: boolean;
  actor_org_id: string | null;
  actor_org_name: string | null;
  actor_org_kind: OrganizationKind | null;
};

export function actorFromRow(row: ActorRow): Actor | null {
  if (!row.actor_id) return null;
  return {
    id: row.actor_id,
    email: row.actor_email,
    displayName: row.actor_display_name,
    role: row.actor_role,
    disabled: row.actor_disabled,
    organization: row.actor_org_id
      ? { id: row.actor_org_id, name: row.actor_org_name!, kind: row.actor_org_kind! }
      : null,
  };
}

/** From a loaded User entity (its organisation populated). */
export function actorFromUser(user: User): Actor {
  const org = user.organization?.unwrap?.() ?? null;
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    disabled: user.disabled,
    organization: org ? { id: org.id, name: org.name, kind: org.kind } : null,
  };
}

export function presentActor(actor: Actor): UserDto {
  return {
    id: actor.id,
    email: actor.email,
    displayName: actor.displayName,
    role: actor.role,
    organization: actor.organization,
  };
}

/**
 * A person who keeps animals for an organisation: a manager or member of a keeper organisation
 * (not of a courier service). Keepers send and receive transfers, hold permits and plan trips.
 */
export function isKeeper(actor: Actor): boolean {
  return (
    (actor.role === "member" || actor.role === "manager") &&
    actor.organization !== null &&
    actor.organization.kind !== "courier_service"
  );
}

/** A courier of a courier service: carries the legs assigned to them. */
export function isCourier(actor: Actor): boolean {
  return actor.role === "courier";
}
