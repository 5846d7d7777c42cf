import type { EntityManager } from "@mikro-orm/postgresql";
import { LockMode } from "@mikro-orm/core";
import type { ViewerRole } from "@shared/schemas/transfer";
import type { Actor } from "../../auth/actor";
import { AnimalSchema, ContainerSchema, LegSchema, TransferSchema, type Transfer } from "../../db/entities/transfer.entity";
import { CustodyEntrySchema } from "../../db/entities/custody-entry.entity";
import { CheckInExtraSchema, CheckInItemSchema, CheckInSchema } from "../../db/entities/check-in.entity";
import { notFound } from "../../http/errors";
import { viewerRoleFor, type TransferFacts } from "../../policies/transfer.policy";

/**
 * Loads a transfer the caller may see, with what the policy needs. Anyone else gets the same
 * 404 as for a transfer that does not exist: existence must not leak.
 */
export async function loadTransferForActor(em: EntityManager, id: string, actor: Actor, options: { lock?: boolean } = {}) {
  const transfer = await em.findOne(TransferSchema, { id }, options.lock ? { lockMode: LockMode.PESSIMISTIC_WRITE } : { populate: ["senderOrganization", "receiverOrganization", "senderContact", "receiverContact"] });
  if (!transfer) throw notFound("That transfer");
  const legs = await em.find(LegSchema, { transfer }, { orderBy: { sequence: "asc" }, populate: ["courier", "courier.organization"] });
  const handoffsDone = await em.count(CustodyEntrySchema, { transfer, kind: "handoff" });
  const facts: TransferFacts = {
    status: transfer.status,
    senderOrganizationId: transfer.senderOrganization.id,
    receiverOrganizationId: transfer.receiverOrganization.id,
    legCourierIds: legs.map((l) => l.courier.id),
    handoffsDone,
  };
  const role = viewerRoleFor(actor, facts);
  if (!role) throw notFound("That transfer");
  return { transfer, legs, facts, role };
}

export type LoadedTransfer = Awaited<ReturnType<typeof loadTransferForActor>>;

/** The rest of the record for the transfer page: boxes, animals with their taxa, handoffs, check-in. */
export async function loadTransferDetail(em: EntityManager, transfer: Transfer, role: ViewerRole) {
  await em.populate(transfer, ["senderOrganization", "receiverOrganization", "senderContact", "receiverContact"]);
  const [containers, animals, handoffs, checkIn] = await Promise.all([
    em.find(ContainerSchema, { transfer }, { orderBy: { position: "asc" } }),
    em.find(AnimalSchema, { transfer }, { orderBy: { position: "asc" }, populate: ["taxon"] }),
    em.find(CustodyEntrySchema, { transfer, kind: "handoff" }, { orderBy: { seq: "asc" } }),
    ["checked_in", "closed"].includes(transfer.status) || role === "admin" ? em.findOne(CheckInSchema, { transfer }, { populate: ["signedBy"] }) : null,
  ]);
  const [items, extras] = checkIn
    ? await Promise.all([em.find(CheckInItemSchema, { checkIn }), em.find(CheckInExtraSchema, { checkIn }, { populate: ["taxon"] })])
    : [[], []];
  return { containers, animals, handoffs, checkIn, checkInItems: items, checkInExtras: extras };
}

export type TransferDetail = Awaited<ReturnType<typeof loadTransferDetail>>;
