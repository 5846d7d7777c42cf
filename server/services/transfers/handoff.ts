import type { EntityManager } from "@mikro-orm/postgresql";
import { UniqueConstraintViolationException } from "@mikro-orm/core";
import type { z } from "zod";
import type { handoffInputSchema } from "@shared/schemas/transfer";
import type { TransferStatus } from "@shared/constants";
import { sealNumbersMatch } from "@shared/custody/plausibility";
import { phoneConfirmation } from "@shared/custody/phone-time";
import { handoffSummaryText, TRANSFER_STATUS_WORDS } from "@shared/words";
import type { Actor } from "../../auth/actor";
import { conflict, forbidden, invalidField } from "../../http/errors";
import { handoffAllowed, takesPartInHandoff } from "../../policies/transfer.policy";
import { raiseAlerts } from "./alerts";
import { checkBoxReading } from "../temperature/readings";
import { appendCustody } from "./custody";
import { completeDelivery, countingWrongCodes, useDeliveryCode } from "./delivery";
import { reviewHandoffAgainstRecord, type HandoffChecks } from "./handoff-evidence";
import { loadTransferForActor } from "./load";
import { notifyParty } from "./notify";
import type { AppLinks } from "../../mail/links";

export type { HandoffChecks } from "./handoff-evidence";

type HandoffParsed = z.output<typeof handoffInputSchema>;

/**
 * Records a pickup, a handoff between couriers, or the delivery to the receiver. The time and the
 * recorder come from the server; a box count or seal that differs is recorded as found, never
 * corrected, and raised as an alert; a failed plausibility check needs a reason (handoff-evidence.ts).
 * The first handoff puts the transfer on the road. The delivery makes it "delivered" only with the
 * receiver's word: recorded by the receiver, or by the courier with the receiver's one-time code;
 * recorded by the courier alone it waits for the receiver's acknowledgement (D20).
 */
export async function recordHandoff({
  em,
  actor,
  transferId,
  input,
  links,
  checks = "live",
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  /** Where the e-mails this step queues link to (the app's public URL). */
  links: AppLinks;
  input: HandoffParsed;
  /** Loaded demo or bench data skips the time, place and person checks and says so. */
  checks?: HandoffChecks;
}) {
  try {
    return await countingWrongCodes(em, () =>
      em.transactional(async (tx) => {
        const { transfer: t, role, facts, legs } = await loadTransferForActor(tx, transferId, actor, { lock: true });
        if (!takesPartInHandoff(actor, role, facts, input.handoffIndex))
          throw forbidden(
            role === "admin"
              ? "Administrators can read transfers but not record handoffs."
              : "This handoff is for another courier or the receiver to record.",
          );
        if (input.handoffIndex < facts.handoffsDone) throw conflict("This handoff has already been recorded.");
        const allowed = handoffAllowed(actor, role, facts);
        if (allowed === null) {
          if (facts.legCourierIds.length === 0) throw conflict("No courier is assigned yet.");
          if (!["ready", "in_transit"].includes(t.status))
            throw conflict(
              `A handoff cannot be recorded while the transfer is “${TRANSFER_STATUS_WORDS[t.status as TransferStatus]}”.`,
            );
          throw forbidden("This handoff is for another courier or the receiver to record.");
        }
        if (input.handoffIndex !== allowed) throw conflict(`The next handoff to record is number ${allowed + 1}.`);

        const at = new Date();
        const phone = input.confirmedAt ? phoneConfirmation(input.confirmedAt, at.getTime()) : null;
        if (phone && !phone.ok) throw invalidField(["confirmedAt"], phone.message);
        const { review, containers } = await reviewHandoffAgainstRecord(tx, {
          transfer: t,
          legs,
          actor,
          role,
          input,
          at,
          checks,
        });
        const kind = review.kind;
        // A code that is wrong, used or expired refuses the whole handoff: nothing is recorded.
        const code =
          kind === "delivery" && role !== "receiver" && input.receiverCode
            ? await useDeliveryCode(tx, t.id, input.receiverCode, actor, "receiverCode")
            : null;
        const receiverAcknowledgement =
          kind !== "delivery"
            ? null
            : role === "receiver"
              ? "recorded_by_receiver"
              : code
                ? "one_time_code"
                : "pending";

        const known = new Map(containers.map((c) => [c.id, c]));
        const seals = input.seals.map((s) => {
          const box = known.get(s.containerId)!;
          const expected = box.sealNumber ?? null;
          const sealNumber = s.sealNumber?.trim() || null;
          return {
            containerId: s.containerId,
            label: box.label,
            sealNumber,
            expected,
            matches: sealNumbersMatch(expected, sealNumber),
            intact: s.intact,
          };
        });
        const reasons = Object.fromEntries(
          Object.entries(input.reasons ?? {}).filter(([, reason]) => typeof reason === "string" && reason.trim()),
        );
        const payload = {
          handoffIndex: input.handoffIndex,
          handoffKind: kind,
          releasedByName: input.releasedByName,
          receivedByName: input.receivedByName,
          recordedAs: role,
          boxesExpected: containers.length,
          boxesCounted: input.boxesCounted,
          boxCountMatches: input.boxesCounted === containers.length,
          seals,
          sealsUnchecked: containers.filter((c) => !input.seals.some((s) => s.containerId === c.id)).map((c) => c.id),
          boxTempF: input.boxTempF,
          place: {
            text: input.place.text ?? null,
            lat: input.place.lat ?? null,
            lon: input.place.lon ?? null,
            accuracyM: input.place.accuracyM ?? null,
          },
          notes: input.notes ?? null,
          // The phone's time when the person confirmed; the entry's own time is the server's.
          ...(phone?.ok ? { confirmedOnPhoneAt: phone.confirmedAt, waitedOnPhoneMin: phone.waitedMin } : {}),
          reasons,
          plausibility: {
            checked: checks === "live",
            ...(checks === "live" ? {} : { loadedAs: checks.loadedAs }),
            notChecked: review.notChecked,
            speed: review.speed
              ? {
                  fromHandoffIndex: review.speed.fromIndex,
                  distanceKm: Math.round(review.speed.distanceKm * 10) / 10,
                  elapsedH: Math.round(review.speed.elapsedH * 1000) / 1000,
                  averageMph: Math.round(review.speed.averageMph),
                  limitMph: review.speed.limitMph,
                }
              : null,
          },
          ...(receiverAcknowledgement ? { receiverAcknowledgement } : {}),
          acknowledged: true,
        };
        await appendCustody(tx, t.id, actor, "handoff", payload);
        await checkBoxReading(tx, links, t, actor, { tempF: input.boxTempF, place: input.place.text, source: kind });
        // Every finding at once: one e-mail per party names them all (and a later check can add its own here).
        await raiseAlerts(
          tx,
          links,
          t,
          actor,
          review.findings.map((f) => ({ kind: f.kind, message: f.message, data: f.data })),
        );

        const summary = handoffSummaryText({
          boxesCounted: input.boxesCounted,
          boxesExpected: containers.length,
          seals,
          sealsUnchecked: payload.sealsUnchecked.length,
          boxTempF: input.boxTempF,
          place: input.place.text ?? null,
          alerts: review.findings.length,
        });
        const from = t.status;
        if (kind === "pickup") {
          t.status = "in_transit";
          await appendCustody(tx, t.id, actor, "status_change", { from, to: "in_transit", reason: "pickup recorded" });
          await notifyParty(tx, links, t, "sender", "picked_up", actor, { summary });
          await notifyParty(tx, links, t, "receiver", "picked_up", actor, { summary });
        }
        if (kind === "delivery") {
          if (receiverAcknowledgement === "pending") {
            await notifyParty(tx, links, t, "receiver", "delivery_awaiting_acknowledgement", actor, { summary });
          } else {
            await completeDelivery(tx, links, t, actor, {
              way: receiverAcknowledgement === "one_time_code" ? "one_time_code" : "recorded_by_receiver",
              handoffIndex: input.handoffIndex,
              receiverName: code ? code.issuedByName : actor.displayName,
              summary,
            });
          }
        }
        t.version += 1;
        await tx.flush();
        return t;
      }),
    );
  } catch (err) {
    // Two confirmations racing past the checks: the database's unique index keeps one.
    if (err instanceof UniqueConstraintViolationException) throw conflict("This handoff has already been recorded.");
    throw err;
  }
}
