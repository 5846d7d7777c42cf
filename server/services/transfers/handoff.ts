import type { EntityManager } from "@mikro-orm/postgresql";
import { UniqueConstraintViolationException } from "@mikro-orm/core";
import type { z } from "zod";
import type { handoffInputSchema } from "@shared/schemas/transfer";
import { handoffKind } from "@shared/transfer/lifecycle";
import type { TransferStatus } from "@shared/constants";
import { formatTempBoth } from "@shared/units";
import { TRANSFER_STATUS_WORDS } from "@shared/words";
import type { Actor } from "../../auth/actor";
import { ContainerSchema } from "../../db/entities/transfer.entity";
import { conflict, forbidden, invalidField } from "../../http/errors";
import { handoffAllowed } from "../../policies/transfer.policy";
import { checkBoxReading } from "../temperature/readings";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";
import { notifyParty } from "./notify";
import type { AppLinks } from "../../mail/links";

type HandoffParsed = z.output<typeof handoffInputSchema>;

/**
 * Records a pickup, a handoff between couriers, or the delivery to the receiver. The time
 * and the recorder come from the server; a box count or seal that differs is recorded as
 * found, never corrected. The first handoff puts the transfer on the road; the last one
 * delivers it.
 */
export async function recordHandoff({
  em,
  actor,
  transferId,
  input,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  /** Where the e-mails this step queues link to (the app's public URL). */
  links: AppLinks;
  input: HandoffParsed;
}) {
  try {
    return await em.transactional(async (tx) => {
      const { transfer: t, role, facts, legs } = await loadTransferForActor(tx, transferId, actor, { lock: true });
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

      const containers = await tx.find(ContainerSchema, { transfer: t }, { orderBy: { position: "asc" } });
      const known = new Map(containers.map((c) => [c.id, c]));
      input.seals.forEach((s, i) => {
        if (!known.has(s.containerId))
          throw invalidField(["seals", i, "containerId"], "this box is not one of this transfer's");
      });
      const kind = handoffKind(input.handoffIndex, legs.length);
      const seals = input.seals.map((s) => {
        const expected = known.get(s.containerId)!.sealNumber ?? null;
        return {
          containerId: s.containerId,
          sealNumber: s.sealNumber ?? null,
          expected,
          matches: expected === null || s.sealNumber === expected,
          intact: s.intact,
        };
      });
      const payload = {
        handoffIndex: input.handoffIndex,
        handoffKind: kind,
        releasedByName: input.releasedByName,
        receivedByName: input.receivedByName,
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
        acknowledged: true,
      };
      await appendCustody(tx, t.id, actor, "handoff", payload);
      await checkBoxReading(tx, links, t, actor, { tempF: input.boxTempF, place: input.place.text, source: kind });

      const from = t.status;
      const summary = `${input.boxesCounted} of ${containers.length} boxes counted${payload.boxCountMatches ? "" : " (the count differs)"}${input.boxTempF === null ? "" : `, box at ${formatTempBoth(input.boxTempF)}`}${input.place.text ? `, at ${input.place.text}` : ""}.`;
      if (kind === "pickup") {
        t.status = "in_transit";
        await appendCustody(tx, t.id, actor, "status_change", { from, to: "in_transit", reason: "pickup recorded" });
        await notifyParty(tx, links, t, "sender", "picked_up", actor, { summary });
        await notifyParty(tx, links, t, "receiver", "picked_up", actor, { summary });
      }
      if (kind === "delivery") {
        t.status = "delivered";
        await appendCustody(tx, t.id, actor, "status_change", { from, to: "delivered", reason: "delivery recorded" });
        await notifyParty(tx, links, t, "sender", "delivered", actor, { summary });
      }
      t.version += 1;
      await tx.flush();
      return t;
    });
  } catch (err) {
    // Two confirmations racing past the checks: the database's unique index keeps one.
    if (err instanceof UniqueConstraintViolationException) throw conflict("This handoff has already been recorded.");
    throw err;
  }
}
