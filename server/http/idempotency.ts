import type { Request, Response } from "express";
import { canonicalJson, sha256Hex } from "@shared/custody/hash-chain";
import { newId } from "../db/entities/base";
import { HttpError } from "./errors";

const KEY_PATTERN = /^[\x21-\x7e]{1,255}$/;
/** A submission still "in progress" after this long was abandoned (the process died): take it over. */
const STALE_MS = 60_000;

type Outcome = { status: number; body: unknown };

/**
 * Runs a state-changing submission at most once per Idempotency-Key (IETF httpapi
 * Idempotency-Key draft): a retry with the same key and body replays the stored answer, the
 * same key with a different body is 422, and a duplicate while the first is still running is 409.
 */
export async function idempotent(
  req: Request,
  res: Response,
  scope: string,
  run: () => Promise<Outcome>,
): Promise<void> {
  const key = req.header("Idempotency-Key");
  if (!key || !KEY_PATTERN.test(key)) {
    throw new HttpError(
      400,
      "idempotency_key_required",
      "Send an Idempotency-Key header (a fresh random value per submission, reused on retries).",
      { field: "Idempotency-Key" },
    );
  }
  const actorId = req.user!.id;
  const requestHash = sha256Hex(canonicalJson({ scope, body: req.body ?? null }));
  const pool = req.ctx.pool;

  const claimed = await pool.query(
    `INSERT INTO idempotency_key (id, actor_id, key, scope, request_hash, status, created_at)
     VALUES ($1, $2, $3, $4, $5, 'in_progress', now())
     ON CONFLICT (actor_id, key) DO UPDATE SET created_at = now()
       WHERE idempotency_key.status = 'in_progress' AND idempotency_key.request_hash = EXCLUDED.request_hash
         AND idempotency_key.created_at < now() - ($6 * interval '1 millisecond')
     RETURNING id`,
    [newId(), actorId, key, scope, requestHash, STALE_MS],
  );
  if (claimed.rowCount === 0) {
    const { rows } = await pool.query<{
      request_hash: string;
      status: string;
      response_status: number | null;
      response_body: unknown;
    }>(
      "SELECT request_hash, status, response_status, response_body FROM idempotency_key WHERE actor_id = $1 AND key = $2",
      [actorId, key],
    );
    const prior = rows[0];
    if (!prior || prior.request_hash !== requestHash) {
      throw new HttpError(
        422,
        "idempotency_key_reused",
        "This Idempotency-Key was already used for a different submission.",
      );
    }
    if (prior.status === "in_progress")
      throw new HttpError(
        409,
        "in_progress",
        "The same submission is still being processed. Wait a moment, then reload.",
      );
    res.setHeader("Idempotent-Replayed", "true");
    res.status(prior.response_status ?? 200).json(prior.response_body);
    return;
  }

  let outcome: Outcome;
  try {
    outcome = await run();
  } catch (err) {
    if (err instanceof HttpError && err.status < 500) {
      // A refusal is the answer to this submission: a retry gets the same refusal.
      outcome = {
        status: err.status,
        body: { error: { code: err.code, message: err.message, ...(err.details ?? {}) } },
      };
      await store(pool, actorId, key, outcome);
      throw err;
    }
    await pool.query("DELETE FROM idempotency_key WHERE actor_id = $1 AND key = $2 AND status = 'in_progress'", [
      actorId,
      key,
    ]);
    throw err;
  }
  await store(pool, actorId, key, outcome);
  res.status(outcome.status).json(outcome.body);
}

async function store(pool: Request["ctx"]["pool"], actorId: string, key: string, outcome: Outcome) {
  await pool.query(
    "UPDATE idempotency_key SET status = 'done', response_status = $3, response_body = $4 WHERE actor_id = $1 AND key = $2",
    [actorId, key, outcome.status, JSON.stringify(outcome.body)],
  );
}
