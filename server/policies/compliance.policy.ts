import type { ViewerRole } from "@shared/schemas/transfer";
import type { Actor } from "../auth/actor";

/** Admins keep the rule library (each rule with its citation and review date). */
export function canManageRules(actor: Actor): boolean {
  return actor.role === "admin" && !actor.disabled;
}

/** Only an admin may let a transfer become ready despite its compliance verdict, and says why. */
export function canOverrideCompliance(actor: Actor, role: ViewerRole): boolean {
  return role === "admin" && canManageRules(actor);
}
