import type pg from "pg";
import { randomUUID } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import { noticesForMove, STATE_NOTICE_RULES, type StateNoticeTodo } from "@shared/register/state-notices";
import type { StateNoticeDoneInput, StateNoticeDto } from "@shared/schemas/register";
import type { Actor } from "../../auth/actor";
import { CheckInSchema } from "../../db/entities/check-in.entity";
import { conflict, forbidden, notFound } from "../../http/errors";
import { loadTransferForActor, type LoadedTransfer } from "../transfers/load";

type DoneRow = {
  notice_key: string;
  done_by_name: string;
  done_at: Date;
  note: string | null;
  reference: string | null;
};

/** Every notice the move calls for (both sides), once the check-in is signed; null before. */
async function noticesOfMove(
  em: EntityManager,
  pool: pg.Pool,
  loaded: LoadedTransfer,
): Promise<StateNoticeTodo[] | null> {
  const { transfer } = loaded;
  const checkIn = await em.findOne(CheckInSchema, { transfer: transfer.id });
  if (!checkIn) return null;
  const { rows } = await pool.query<{ at: Date }>(
    `SELECT at FROM custody_entry WHERE transfer_id = $1 AND kind = 'status_change' AND payload->>'to' = 'in_transit' ORDER BY seq LIMIT 1`,
    [transfer.id],
  );
  return noticesForMove({
    fromState: transfer.originState,
    toState: transfer.destinationState,
    departedAt: rows[0] ? new Date(rows[0].at).toISOString() : null,
    arrivedAt: checkIn.signedAt.toISOString(),
  });
}

/**
 * The state notices the caller's side owes after a move (an admin sees both sides), each with who
 * marked it done, once the animals have arrived (D35, D41).
 */
export async function readStateNotices({
  em,
  pool,
  actor,
  transferId,
}: {
  em: EntityManager;
  pool: pg.Pool;
  actor: Actor;
  transferId: string;
}): Promise<{ arrived: boolean; notices: StateNoticeDto[] }> {
  const loaded = await loadTransferForActor(em, transferId, actor);
  const all = await noticesOfMove(em, pool, loaded);
  if (!all) return { arrived: false, notices: [] };
  const { rows } = await pool.query<DoneRow>(
    `SELECT notice_key, done_by_name, done_at, note, reference FROM state_notice_done WHERE transfer_id = $1`,
    [loaded.transfer.id],
  );
  const done = new Map(rows.map((row) => [row.notice_key, row]));
  return {
    arrived: true,
    notices: all
      .filter((notice) => loaded.role === "admin" || notice.side === loaded.role)
      .map((notice) => {
        const row = done.get(notice.key);
        return {
          ...notice,
          done: row
            ? {
                byName: row.done_by_name,
                at: new Date(row.done_at).toISOString(),
                note: row.note,
                reference: row.reference,
              }
            : null,
        };
      }),
  };
}

/**
 * Marks one of the caller's side's notices done, once (append-only: a second mark is refused).
 * Only the side the rule binds may mark it; the notice must apply to this move and the animals
 * must have arrived.
 */
export async function markStateNoticeDone({
  em,
  pool,
  actor,
  transferId,
  key,
  input,
}: {
  em: EntityManager;
  pool: pg.Pool;
  actor: Actor;
  transferId: string;
  key: string;
  input: StateNoticeDoneInput;
}): Promise<StateNoticeDto> {
  const loaded = await loadTransferForActor(em, transferId, actor);
  const rule = STATE_NOTICE_RULES.find((candidate) => candidate.key === key);
  if (!rule) throw notFound("That state notice");
  if (loaded.role !== rule.side)
    throw forbidden(`Only the ${rule.side} of this transfer marks this notice done: it is their duty.`);
  const all = await noticesOfMove(em, pool, loaded);
  if (!all) throw conflict("The animals have not arrived yet: state notices start with the check-in.");
  const notice = all.find((candidate) => candidate.key === key);
  if (!notice)
    throw conflict(
      `This notice (${rule.citation}) does not apply to a move from ${loaded.transfer.originState} to ${loaded.transfer.destinationState}.`,
    );
  const at = new Date();
  const { rows } = await pool.query<DoneRow>(
    `INSERT INTO state_notice_done (id, transfer_id, notice_key, organization_id, done_by_id, done_by_name, done_at, note, reference)
     VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9)
     ON CONFLICT (transfer_id, notice_key) DO NOTHING
     RETURNING notice_key, done_by_name, done_at, note, reference`,
    [
      randomUUID(),
      loaded.transfer.id,
      key,
      actor.organization!.id,
      actor.id,
      actor.displayName,
      at,
      input.note ?? null,
      input.reference ?? null,
    ],
  );
  const row = rows[0];
  if (!row) throw conflict("This notice is already marked done.");
  return {
    ...notice,
    done: {
      byName: row.done_by_name,
      at: new Date(row.done_at).toISOString(),
      note: row.note,
      reference: row.reference,
    },
  };
}
