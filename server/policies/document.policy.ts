import type { DocumentAbilitiesDto } from "@shared/schemas/compliance";
import type { ViewerRole } from "@shared/schemas/transfer";
import type { TransferStatus } from "@shared/constants";
import { EDITABLE } from "@shared/transfer/lifecycle";
import { isKeeper, type Actor } from "../auth/actor";

/**
 * Who the caller is to a permit or certificate: a member of the organisation holding it, a
 * member of the other party of a transfer that uses it, or the courier of such a transfer.
 * Anyone else does not see it at all.
 */
export type DocumentViewer = "holder" | "party" | "courier";

/** Members of a keeper organisation hold permits and certificates; admins and couriers do not. */
export function canHoldDocuments(actor: Actor): boolean {
  return isKeeper(actor) && !actor.disabled;
}

export function isHolder(actor: Actor, holderOrganizationId: string): boolean {
  return canHoldDocuments(actor) && actor.organization?.id === holderOrganizationId;
}

/** The holder edits and uploads; the other party reads the scans; the courier sees the manifest entry only. */
export function documentAbilities(viewer: DocumentViewer): DocumentAbilitiesDto {
  return { edit: viewer === "holder", upload: viewer === "holder", readScans: viewer !== "courier" };
}

/** Only the sender and the receiver ever attach (or take off) documents; checked before the state. */
export function mayAttachDocuments(role: ViewerRole): boolean {
  return role === "sender" || role === "receiver";
}

/** A party attaches (or takes off) its own organisation's documents while the transfer can still be edited. */
export function canAttachDocuments(role: ViewerRole, status: TransferStatus): boolean {
  return mayAttachDocuments(role) && EDITABLE.includes(status);
}

/** The documents a transfer uses are for its sender, receiver and couriers; admins read the verdict only. */
export function canReadTransferDocuments(role: ViewerRole): boolean {
  return role !== "admin";
}
