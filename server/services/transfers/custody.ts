import type { EntityManager } from "@mikro-orm/postgresql";
import { GENESIS_HASH, seal, verifyChain, type SealedEntry } from "@shared/custody/hash-chain";
import type { CustodyKind } from "@shared/constants";
import type { CustodyLogDto } from "@shared/schemas/transfer";
import type { Actor } from "../../auth/actor";
import { CustodyEntrySchema } from "../../db/entities/custody-entry.entity";
import { TransferSchema } from "../../db/entities/transfer.entity";

export type { CustodyKind } from "@shared/constants";

/**
 * Appends a sealed entry to a transfer's custody log. Call inside the transaction that makes
 * the change, after locking the transfer row, so the sequence and the chain cannot fork.
 * Actor and time come from the session and the server clock, never from the request.
 */
export async function appendCustody(
  em: EntityManager,
  transferId: string,
  actor: Actor | null,
  kind: CustodyKind,
  payload: Record<string, unknown>,
) {
  const last = await em.findOne(
    CustodyEntrySchema,
    { transfer: transferId },
    { orderBy: { seq: "desc" }, fields: ["seq", "hash"] },
  );
  const sealed = seal(last?.hash ?? GENESIS_HASH, {
    transferId,
    seq: (last?.seq ?? 0) + 1,
    kind,
    actorId: actor?.id ?? null,
    actorName: actor?.displayName ?? "Hatchway",
    at: new Date().toISOString(),
    payload,
  });
  em.create(CustodyEntrySchema, {
    transfer: em.getReference(TransferSchema, transferId),
    seq: sealed.seq,
    kind: sealed.kind,
    actorId: sealed.actorId,
    actorName: sealed.actorName,
    at: new Date(sealed.at),
    payload: sealed.payload as Record<string, unknown>,
    prevHash: sealed.prevHash,
    hash: sealed.hash,
  });
  return sealed;
}

/** The whole log, oldest first, with the result of recomputing the chain. */
export async function readCustodyLog(em: EntityManager, transferId: string): Promise<CustodyLogDto> {
  const rows = await em.find(CustodyEntrySchema, { transfer: transferId }, { orderBy: { seq: "asc" } });
  const sealed: SealedEntry[] = rows.map((r) => ({
    transferId,
    seq: r.seq,
    kind: r.kind,
    actorId: r.actorId ?? null,
    actorName: r.actorName,
    at: r.at.toISOString(),
    payload: r.payload,
    prevHash: r.prevHash,
    hash: r.hash,
  }));
  const check = verifyChain(sealed);
  return {
    entries: sealed.map((e) => ({
      seq: e.seq,
      kind: e.kind as CustodyKind,
      at: e.at,
      actor: { id: e.actorId, displayName: e.actorName },
      payload: e.payload as Record<string, unknown>,
      prevHash: e.prevHash,
      hash: e.hash,
    })),
    ...check,
  };
}
