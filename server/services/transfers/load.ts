import type { EntityManager } from "@mikro-orm/postgresql";
import { LockMode } from "@mikro-orm/core";
import type { Actor } from "../../auth/actor";
import { LegSchema, TransferSchema } from "../../db/entities/transfer.entity";
import { CustodyEntrySchema } from "../../db/entities/custody-entry.entity";
import { notFound } from "../../http/errors";
import { viewerRoleFor, type TransferFacts } from "../../policies/transfer.policy";

/**
 * Loads a transfer the caller may see, with what the policy needs. Anyone else gets the same
 * 404 as for a transfer that does not exist: existence must not leak.
 */
export async function loadTransferForActor(
  em: EntityManager,
  id: string,
  actor: Actor,
  options: { lock?: boolean } = {},
) {
  const transfer = await em.findOne(
    TransferSchema,
    { id },
    options.lock ? { lockMode: LockMode.PESSIMISTIC_WRITE } : {},
  );
  if (!transfer) throw notFound("That transfer");
  const legs = await em.find(LegSchema, { transfer }, { orderBy: { sequence: "asc" } });
  const handoffsDone = await em.count(CustodyEntrySchema, { transfer, kind: "handoff" });
  const facts: TransferFacts = {
    status: transfer.status,
    senderOrganizationId: transfer.senderOrganization.id,
    receiverOrganizationId: transfer.receiverOrganization.id,
    legCourierIds: legs.map((l) => l.courier.id),
    handoffsDone,
    everSent: transfer.firstSentAt != null,
    courierServiceId: transfer.courierService?.id ?? null,
  };
  const role = viewerRoleFor(actor, facts);
  if (!role) throw notFound("That transfer");
  return { transfer, legs, facts, role };
}

export type LoadedTransfer = Awaited<ReturnType<typeof loadTransferForActor>>;
