import { TRANSFER_STATUS_WORDS } from "@shared/words";
import type { EntityManager } from "@mikro-orm/postgresql";
import { ref } from "@mikro-orm/core";
import type { TransferStatus } from "@shared/constants";
import type { TransitionInput, TransferAbilitiesDto } from "@shared/schemas/transfer";
import { canTransition, EVENT_DRIVEN } from "@shared/transfer/lifecycle";
import { packingFindings } from "@shared/transfer/packing";
import type { Actor } from "../../auth/actor";
import { AnimalSchema, ContainerSchema, type Transfer } from "../../db/entities/transfer.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { conflict, forbidden, invalidField } from "../../http/errors";
import { mayRequestTransition, transferAbilities } from "../../policies/transfer.policy";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";
import { notifyParty } from "./notify";
import type { AppLinks } from "../../mail/links";

type Parsed = {
  to: TransferStatus;
  reason?: string | null;
  override?: boolean;
  overrideGates?: readonly ("compliance" | "temperature")[];
};

/**
 * Whether the step answers this gate's block with an override: only a block the party was shown
 * when they name the ones they saw, so acknowledging one never answers another unseen.
 */
export function overrides(input: Parsed, gate: "compliance" | "temperature"): boolean {
  return input.override === true && (input.overrideGates === undefined || input.overrideGates.includes(gate));
}

/** Which ability a requested step needs. */
function abilityFor(from: TransferStatus, to: TransferStatus): keyof TransferAbilitiesDto | null {
  if (to === "cancelled") return "cancel";
  if (from === "draft" && to === "awaiting_receiver") return "submit";
  if (from === "awaiting_receiver" && to === "ready") return "confirm";
  if (from === "awaiting_receiver" && to === "draft") return null; // withdraw (sender) or send back (receiver)
  if (from === "ready" && to === "awaiting_receiver") return "edit";
  if (from === "checked_in" && to === "closed") return "close";
  return null;
}

/**
 * A gate that may stop a transfer from becoming ready to ship (compliance, temperature). Its
 * check runs inside the locked transition transaction and throws a 409 explaining what blocks,
 * or records an override in the custody log. The composition root (server/composition.ts)
 * builds each app's gates in their order; nothing registers itself.
 */
export type ReadyGate = {
  /** What the gate checks, as named in custody entries ("compliance", "temperature"). */
  readonly name: string;
  check(args: { em: EntityManager; actor: Actor; transfer: Transfer; input: Parsed }): Promise<void>;
};

async function checkCanSubmit(em: EntityManager, t: Transfer) {
  const [containers, animals] = await Promise.all([
    em.find(ContainerSchema, { transfer: t }),
    em.find(AnimalSchema, { transfer: t }, { populate: ["taxon"] }),
  ]);
  const findings = packingFindings(
    containers.map((c) => ({ id: c.id, label: c.label })),
    animals.map((a) => ({
      id: a.id,
      containerId: a.container?.id ?? null,
      taxonId: a.taxon.id,
      scientificName: a.taxon.getEntity().scientificName,
    })),
  );
  if (findings.length)
    throw conflict(`Resolve the packing first: ${findings.map((f) => f.message).join(" ")}`, { findings });
  if (t.plannedDepartureAt.getTime() < Date.now())
    throw conflict("The planned departure is in the past: change the date first.");
}

export async function transitionTransfer({
  em,
  actor,
  transferId,
  input,
  gates,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  input: Parsed;
  /** The app's ready-to-ship gates, run in this order when the step is to "ready". */
  gates: readonly ReadyGate[];
  /** Where the e-mails this step queues link to. */
  links: AppLinks;
}) {
  return em.transactional(async (tx) => {
    const { transfer: t, role, facts } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    const from = t.status as TransferStatus;
    const to = input.to;
    const abilities = transferAbilities(actor, role, facts);
    if (!mayRequestTransition(role, to))
      throw forbidden(
        role === "admin"
          ? "Administrators can read transfers but not move them."
          : "Your part in this transfer does not allow that step.",
      );
    if (to === from) throw conflict(`The transfer is already ${TRANSFER_STATUS_WORDS[to].toLowerCase()}.`);
    const viaEvent = EVENT_DRIVEN[to];
    if (viaEvent && canTransition(from, to))
      throw conflict(`A transfer becomes “${TRANSFER_STATUS_WORDS[to]}” through ${viaEvent}, not by request.`);
    if (!canTransition(from, to))
      throw conflict(
        `A transfer that is “${TRANSFER_STATUS_WORDS[from]}” cannot become “${TRANSFER_STATUS_WORDS[to]}”.`,
      );
    const needed = abilityFor(from, to);
    const allowed = needed ? abilities[needed] === true : abilities.withdraw || abilities.sendBack;
    if (!allowed)
      throw forbidden(
        role === "admin"
          ? "Administrators can read transfers but not move them."
          : "Your part in this transfer does not allow that step.",
      );
    if ((to === "cancelled" || (role === "receiver" && to === "draft")) && !input.reason) {
      throw invalidField(["reason"], "say why, so the other party knows");
    }

    if (to === "awaiting_receiver" && from === "draft") await checkCanSubmit(tx, t);
    if (to === "ready") for (const gate of gates) await gate.check({ em: tx, actor, transfer: t, input });

    t.status = to;
    t.version += 1;
    if (to === "ready") {
      t.confirmedAt = new Date();
      t.confirmedBy = ref(tx.getReference(UserSchema, actor.id));
      t.reconfirmationReason = null;
    }
    // From now on the receiver and the couriers see it, also if it is sent back (issue 14, §4).
    if (to === "awaiting_receiver") t.firstSentAt ??= new Date();
    if (to === "cancelled") t.cancelledReason = input.reason ?? null;
    await appendCustody(tx, t.id, actor, "status_change", { from, to, reason: input.reason ?? null });

    if (to === "awaiting_receiver") await notifyParty(tx, links, t, "receiver", "awaiting_confirmation", actor);
    if (to === "ready") await notifyParty(tx, links, t, "sender", "confirmed", actor);
    if (to === "draft" && role === "receiver")
      await notifyParty(tx, links, t, "sender", "sent_back", actor, { reason: input.reason ?? "" });
    if (to === "cancelled" && from !== "draft")
      await notifyParty(tx, links, t, "receiver", "cancelled", actor, { reason: input.reason ?? "" });
    await tx.flush();
    return t;
  });
}

export type { TransitionInput };
