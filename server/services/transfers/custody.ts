import type { EntityManager } from "@mikro-orm/postgresql";
import { IsolationLevel } from "@mikro-orm/core";
import {
  CHAIN_RULE,
  GENESIS_HASH,
  seal,
  verifyChain,
  type ChainHead,
  type SealedEntry,
} from "@shared/custody/hash-chain";
import type { CustodyKind } from "@shared/constants";
import type { CustodyExportDto, CustodyLogDto } from "@shared/schemas/transfer";
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
  // The head, not the last row: a log whose end was cut off keeps growing from where it really
  // ended, and the gap stays visible (D19). The database refuses any other sequence or link.
  // Entries appended earlier in this unit of work are written first, so the head includes them.
  await em.flush();
  const [last] = await em.execute<{ seq: number; hash: string }[]>(
    `SELECT seq, hash FROM custody_head WHERE transfer_id = ?`,
    [transferId],
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

type LogRead = { transferId: string; sealed: SealedEntry[]; head: ChainHead | null };

/**
 * The entries and the head in one snapshot (REPEATABLE READ), so an entry appended while this
 * reads cannot look like a tampered end.
 */
async function readChain(em: EntityManager, transferId: string): Promise<LogRead> {
  return em.transactional(
    async (tx) => {
      const rows = await tx.find(CustodyEntrySchema, { transfer: transferId }, { orderBy: { seq: "asc" } });
      const heads = await tx.execute<{ seq: number; hash: string }[]>(
        `SELECT seq, hash FROM custody_head WHERE transfer_id = ?`,
        [transferId],
      );
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
      const head = heads[0] ? { seq: Number(heads[0].seq), hash: heads[0].hash } : null;
      return { transferId, sealed, head };
    },
    { isolationLevel: IsolationLevel.REPEATABLE_READ, readOnly: true },
  );
}

/** The whole log, oldest first, with the result of recomputing the chain against its head. */
export async function readCustodyLog(em: EntityManager, transferId: string): Promise<CustodyLogDto> {
  const { sealed, head } = await readChain(em, transferId);
  const check = verifyChain(sealed, head);
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
    head,
  };
}

/**
 * The log to keep: every entry exactly as sealed, the head, the hashing rule, and what
 * Hatchway found. scripts/verify-custody-export.mjs checks it with nothing but Node.js.
 */
export async function exportCustodyLog(
  em: EntityManager,
  transfer: { id: string; number: string },
): Promise<CustodyExportDto> {
  const { sealed, head } = await readChain(em, transfer.id);
  return {
    format: "hatchway-custody-export/1",
    exportedAt: new Date().toISOString(),
    transfer: { id: transfer.id, number: transfer.number },
    chain: { algorithm: "SHA-256", genesisHash: GENESIS_HASH, rule: CHAIN_RULE },
    entries: sealed,
    head,
    check: verifyChain(sealed, head),
  };
}
