import type { EntityManager } from "@mikro-orm/postgresql";
import type { AlertKind } from "@shared/constants";
import { ALERT_KIND_WORDS } from "@shared/words";
import type { Actor } from "../../auth/actor";
import { TransferAlertSchema } from "../../db/entities/transfer-alert.entity";
import { LegSchema, TransferSchema, type Transfer } from "../../db/entities/transfer.entity";
import { conflict, forbidden, notFound } from "../../http/errors";
import { transferMail } from "../../mail/templates";
import type { AppLinks } from "../../mail/links";
import { transferAbilities } from "../../policies/transfer.policy";
import { enqueueMail } from "../outbox";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";
import { notifyParty } from "./notify";

export type AlertToRaise = {
  kind: AlertKind;
  /** In words, naming the box, seal or place: "Box D: expected seal SEAL-0004, courier read SEAL-0044". */
  message: string;
  /** The facts behind it, for the record (expected and read values, distances …). */
  data?: Record<string, unknown>;
  /** Also e-mail the couriers assigned to the transfer's legs (e.g. a box temperature out of range). */
  alsoCouriers?: boolean;
};

/**
 * Raises alerts on a transfer inside the caller's transaction (after the transfer row is locked):
 * each is stored, written to the custody log, and e-mailed at once to both parties (and the
 * couriers when asked). Alerts are safety messages: nobody can turn these e-mails off.
 */
export async function raiseAlerts(
  em: EntityManager,
  links: AppLinks,
  transfer: Transfer,
  actor: Actor | null,
  alerts: readonly AlertToRaise[],
): Promise<void> {
  if (alerts.length === 0) return;
  const at = new Date();
  for (const alert of alerts) {
    const entry = await appendCustody(em, transfer.id, actor, "alert_raised", {
      alertKind: alert.kind,
      message: alert.message,
    });
    em.create(TransferAlertSchema, {
      transfer: em.getReference(TransferSchema, transfer.id),
      kind: alert.kind,
      at,
      message: alert.message,
      data: alert.data ?? {},
      custodySeq: entry.seq,
    });
  }
  // One e-mail per party for everything raised at once, so a bad handoff is one message, not five.
  const title = alerts.length === 1 ? ALERT_KIND_WORDS[alerts[0]!.kind] : `${alerts.length} alerts`;
  const message = alerts.map((a) => `• ${ALERT_KIND_WORDS[a.kind]}: ${a.message}`).join("\n");
  const facts = { alertTitle: title, alertMessage: message };
  await notifyParty(em, links, transfer, "sender", "alert", actor, facts);
  await notifyParty(em, links, transfer, "receiver", "alert", actor, facts);
  if (alerts.some((a) => a.alsoCouriers)) {
    const legs = await em.find(LegSchema, { transfer: transfer.id }, { populate: ["courier"] });
    const seen = new Set<string>();
    for (const leg of legs) {
      const courier = leg.courier.getEntity();
      if (courier.disabled || seen.has(courier.id)) continue;
      seen.add(courier.id);
      enqueueMail(
        em,
        transferMail("alert", {
          to: courier.email,
          name: courier.displayName,
          organization: "",
          number: transfer.number,
          actor: actor?.displayName ?? "Hatchway",
          link: links.to(`/legs/${leg.id}`),
          ...facts,
        }),
      );
    }
  }
}

/**
 * A party (or an assigned courier) says they have seen an alert, with a note. The alert stays;
 * the acknowledgement is written once, and the custody log records it.
 */
export async function acknowledgeAlert({
  em,
  actor,
  transferId,
  alertId,
  note,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  alertId: string;
  note: string;
}) {
  return em.transactional(async (tx) => {
    const { role, facts } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    if (!transferAbilities(actor, role, facts).acknowledgeAlerts)
      throw forbidden("Only the sender, the receiver or an assigned courier can acknowledge an alert.");
    const alert = await tx.findOne(TransferAlertSchema, { id: alertId, transfer: transferId });
    if (!alert) throw notFound("That alert");
    if (alert.acknowledgedAt)
      throw conflict(`${alert.acknowledgedByName ?? "Someone"} already acknowledged this alert.`);
    alert.acknowledgedAt = new Date();
    alert.acknowledgedById = actor.id;
    alert.acknowledgedByName = actor.displayName;
    alert.acknowledgementNote = note;
    await appendCustody(tx, transferId, actor, "alert_acknowledged", {
      alertId: alert.id,
      alertKind: alert.kind,
      message: alert.message,
      note,
    });
    await tx.flush();
    return alert;
  });
}
