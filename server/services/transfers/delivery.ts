/**
 * The receiver's acknowledgement of a delivery (issue 12): a delivery is never recorded on one
 * party's word alone. The receiver says "I have the boxes" from their own account, or shows a
 * one-time code there that the courier types on the phone. Codes are six digits, kept only as a
 * SHA-256, valid for ten minutes, used once, and dead after five wrong tries (DEVELOPERS.md D20).
 */
import { createHash, randomInt } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { DeliveryAcknowledgementWay } from "@shared/constants";
import type { Actor } from "../../auth/actor";
import { DeliveryCodeSchema, type DeliveryCode } from "../../db/entities/custody-evidence.entity";
import { TransferSchema, type Transfer } from "../../db/entities/transfer.entity";
import { conflict, forbidden, HttpError } from "../../http/errors";
import type { AppLinks } from "../../mail/links";
import { transferAbilities } from "../../policies/transfer.policy";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";
import { notifyParty } from "./notify";

/** How long a code shown to the receiver stays valid: enough to read it out at the door. */
export const DELIVERY_CODE_TTL_MS = 10 * 60_000;
/** Wrong codes tried against one code before it is revoked. */
export const DELIVERY_CODE_MAX_FAILURES = 5;

const hashCode = (transferId: string, code: string) =>
  createHash("sha256").update(`${transferId}:${code}`).digest("hex");

/** A 400 about the code that also says which stored code took a wrong try (counted after the rollback). */
export class DeliveryCodeRefused extends HttpError {
  constructor(
    field: string,
    code: string,
    message: string,
    public readonly wrongTryOn: string | null = null,
  ) {
    super(400, code, message, { field });
  }
}

/**
 * A new code for the receiver to show; any earlier code still open is revoked. The code itself is
 * returned once and never stored.
 */
export async function issueDeliveryCode({
  em,
  actor,
  transferId,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
}): Promise<{ code: string; expiresAt: Date }> {
  return em.transactional(async (tx) => {
    const { role, facts } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    if (!transferAbilities(actor, role, facts).showDeliveryCode)
      throw role === "receiver"
        ? conflict("A delivery code is for a transfer on the road whose delivery is not yet acknowledged.")
        : forbidden("Only a member of the receiving organisation can show a delivery code.");
    const now = new Date();
    await tx.nativeUpdate(
      DeliveryCodeSchema,
      { transfer: transferId, usedAt: null, revokedAt: null },
      { revokedAt: now },
    );
    const code = String(randomInt(0, 1_000_000)).padStart(6, "0");
    const expiresAt = new Date(now.getTime() + DELIVERY_CODE_TTL_MS);
    tx.create(DeliveryCodeSchema, {
      transfer: tx.getReference(TransferSchema, transferId),
      codeHash: hashCode(transferId, code),
      issuedById: actor.id,
      issuedByName: actor.displayName,
      expiresAt,
      usedAt: null,
      usedById: null,
      revokedAt: null,
      failedAttempts: 0,
    });
    await tx.flush();
    return { code, expiresAt };
  });
}

/**
 * Checks a code inside the caller's transaction and marks it used. Refusals name the field and say
 * what to do; a wrong code is counted against the open code once the caller's transaction is gone.
 */
export async function useDeliveryCode(
  tx: EntityManager,
  transferId: string,
  code: string,
  actor: Actor,
  field: string,
): Promise<DeliveryCode> {
  const hash = hashCode(transferId, code);
  const now = new Date();
  const matching = await tx.findOne(
    DeliveryCodeSchema,
    { transfer: transferId, codeHash: hash },
    { orderBy: { createdAt: "desc" } },
  );
  if (matching?.usedAt)
    throw new DeliveryCodeRefused(
      field,
      "code_used",
      "This code was already used. Ask the receiver to show a new one in their account.",
    );
  if (matching && matching.revokedAt)
    throw new DeliveryCodeRefused(
      field,
      "code_revoked",
      "This code was replaced or blocked. Ask the receiver to show a new one in their account.",
    );
  if (matching && matching.expiresAt <= now)
    throw new DeliveryCodeRefused(
      field,
      "code_expired",
      "This code has expired (codes last 10 minutes). Ask the receiver to show a new one in their account.",
    );
  if (!matching) {
    const open = await tx.findOne(
      DeliveryCodeSchema,
      { transfer: transferId, usedAt: null, revokedAt: null, expiresAt: { $gt: now } },
      { orderBy: { createdAt: "desc" } },
    );
    throw new DeliveryCodeRefused(
      field,
      open ? "code_wrong" : "no_code",
      open
        ? "This code does not match the one shown in the receiver's account. Check the six digits with the receiver."
        : "There is no open code for this transfer. Ask the receiver to show one in their account (Transfer page, “Show a code for the courier”).",
      open?.id ?? null,
    );
  }
  matching.usedAt = now;
  matching.usedById = actor.id;
  return matching;
}

/** Counts a wrong try against an open code, in its own transaction; the fifth one revokes it. */
export async function countWrongCode(em: EntityManager, codeId: string): Promise<void> {
  await em.getConnection().execute(
    `UPDATE delivery_code SET failed_attempts = failed_attempts + 1,
        revoked_at = CASE WHEN failed_attempts + 1 >= ? THEN now() ELSE revoked_at END
      WHERE id = ? AND used_at IS NULL AND revoked_at IS NULL`,
    [DELIVERY_CODE_MAX_FAILURES, codeId],
  );
}

/** Runs `work`; a wrong delivery code it refuses is counted after its transaction rolled back. */
export async function countingWrongCodes<T>(em: EntityManager, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (err) {
    if (err instanceof DeliveryCodeRefused && err.wrongTryOn) await countWrongCode(em.fork(), err.wrongTryOn);
    throw err;
  }
}

/**
 * Completes the delivery inside the caller's locked transaction: the custody log records who
 * acknowledged and how, the transfer becomes "delivered", and the sender hears of it.
 */
export async function completeDelivery(
  tx: EntityManager,
  links: AppLinks,
  transfer: Transfer,
  actor: Actor,
  acknowledgement: { way: DeliveryAcknowledgementWay; handoffIndex: number; receiverName: string; summary: string },
): Promise<void> {
  if (acknowledgement.way !== "recorded_by_receiver")
    await appendCustody(tx, transfer.id, actor, "delivery_acknowledged", {
      handoffIndex: acknowledgement.handoffIndex,
      way: acknowledgement.way,
      receiverName: acknowledgement.receiverName,
    });
  const from = transfer.status;
  transfer.status = "delivered";
  await appendCustody(tx, transfer.id, actor, "status_change", {
    from,
    to: "delivered",
    reason:
      acknowledgement.way === "recorded_by_receiver"
        ? "delivery recorded by the receiver"
        : `delivery acknowledged by ${acknowledgement.receiverName}`,
  });
  await notifyParty(tx, links, transfer, "sender", "delivered", actor, { summary: acknowledgement.summary });
}

/**
 * The receiver's "I have the boxes" for a delivery the courier recorded, from their own account
 * (no code) or typed on the courier's phone (the receiver's code).
 */
export async function acknowledgeDelivery({
  em,
  actor,
  transferId,
  code,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  code: string | undefined;
  links: AppLinks;
}): Promise<void> {
  await countingWrongCodes(em, () =>
    em.transactional(async (tx) => {
      const { transfer, role, facts } = await loadTransferForActor(tx, transferId, actor, { lock: true });
      const abilities = transferAbilities(actor, role, facts);
      const handoffIndex = facts.legCourierIds.length;
      if (role === "receiver") {
        if (!abilities.acknowledgeDelivery)
          throw conflict("There is no delivery waiting for your acknowledgement on this transfer.");
        await completeDelivery(tx, links, transfer, actor, {
          way: "receiver_account",
          handoffIndex,
          receiverName: actor.displayName,
          summary: `${actor.displayName} acknowledged the delivery from their own account.`,
        });
      } else {
        if (!abilities.enterDeliveryCode)
          throw role === "courier"
            ? conflict("There is no delivery of yours waiting for the receiver's acknowledgement.")
            : forbidden(
                "Only the receiver, or the delivering courier with the receiver's code, can acknowledge a delivery.",
              );
        if (!code)
          throw new HttpError(400, "bad_request", "Code: type the six digits shown in the receiver's account.", {
            field: "code",
          });
        const used = await useDeliveryCode(tx, transferId, code, actor, "code");
        await completeDelivery(tx, links, transfer, actor, {
          way: "one_time_code",
          handoffIndex,
          receiverName: used.issuedByName,
          summary: `${used.issuedByName} acknowledged the delivery with a one-time code on the courier's phone.`,
        });
      }
      transfer.version += 1;
      await tx.flush();
    }),
  );
}
