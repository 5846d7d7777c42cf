import type { EntityManager } from "@mikro-orm/postgresql";
import type { Actor } from "../../auth/actor";
import { UserSchema, type User } from "../../db/entities/user.entity";
import { LegSchema, type Leg, type Transfer } from "../../db/entities/transfer.entity";
import { forbidden, invalidField } from "../../http/errors";
import { managesCourierService, transferAbilities } from "../../policies/transfer.policy";
import type { AppLinks } from "../../mail/links";
import { legAssignmentMail } from "../../mail/templates";
import { enqueueMail } from "../outbox";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";

type LegsParsed = { legs: { courierId: string; fromLabel?: string | null; toLabel?: string | null }[] };

/**
 * The sender — or the manager of the courier service the sender chose, with its own couriers —
 * names the couriers, leg by leg, before the animals leave. Each courier given a leg, or whose
 * leg is taken away, is told by e-mail (issue 14, §3).
 */
export async function assignLegs({
  em,
  actor,
  transferId,
  input,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  input: LegsParsed;
  /** Where the couriers' e-mails link to. */
  links: AppLinks;
}) {
  return em.transactional(async (tx) => {
    const { transfer, role, facts, legs: old } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    if (!transferAbilities(actor, role, facts).assignCouriers)
      throw forbidden(
        "Only the sender, or the manager of the courier service carrying it, can assign couriers, and only before the animals leave.",
      );
    const ids = [...new Set(input.legs.map((l) => l.courierId))];
    // A courier service's manager assigns its own couriers only.
    const ownCouriers = managesCourierService(actor, facts) ? { organization: actor.organization!.id } : {};
    const couriers = await tx.find(UserSchema, { id: { $in: ids }, role: "courier", disabled: false, ...ownCouriers });
    const byId = new Map(couriers.map((c) => [c.id, c]));
    input.legs.forEach((l, i) => {
      if (!byId.has(l.courierId)) throw invalidField(["legs", i, "courierId"], "choose an active courier");
      if (i > 0 && input.legs[i - 1]!.courierId === l.courierId)
        throw invalidField(["legs", i, "courierId"], "the same courier cannot hand over to themselves");
    });
    // A courier who keeps a leg keeps the vehicle they declared for it (issue 13).
    const declared = new Map(old.map((leg) => [leg.courier.id, leg]));
    for (const leg of old) tx.remove(leg);
    await tx.flush();
    input.legs.forEach((l, i) => {
      const before = declared.get(l.courierId);
      tx.create(LegSchema, {
        transfer,
        sequence: i + 1,
        courier: byId.get(l.courierId)!,
        fromLabel: l.fromLabel ?? null,
        toLabel: l.toLabel ?? null,
        vehicle: before?.vehicle ?? null,
        vehicleMinF: before?.vehicleMinF ?? null,
        vehicleMaxF: before?.vehicleMaxF ?? null,
      });
    });
    transfer.version += 1;
    await appendCustody(tx, transfer.id, actor, "couriers_assigned", {
      legs: input.legs.map((l, i) => ({
        sequence: i + 1,
        courierId: l.courierId,
        courierName: byId.get(l.courierId)!.displayName,
      })),
    });
    await notifyCouriersOfLegs(tx, links, transfer, actor, old, input.legs, byId);
    await tx.flush();
    return transfer;
  });
}

/** Mails each courier whose legs changed: given a leg, or no longer carrying any. */
async function notifyCouriersOfLegs(
  em: EntityManager,
  links: AppLinks,
  transfer: Transfer,
  actor: Actor,
  old: readonly Leg[],
  legs: LegsParsed["legs"],
  byId: Map<string, User>,
) {
  const before = new Map(old.map((leg) => [leg.courier.id, leg.sequence]));
  const after = new Map(legs.map((leg, i) => [leg.courierId, i + 1]));
  const removedIds = [...before.keys()].filter((id) => !after.has(id));
  const removed = removedIds.length ? await em.find(UserSchema, { id: { $in: removedIds }, disabled: false }) : [];
  const changes: [User, "assigned" | "removed", number][] = [
    ...[...after]
      .filter(([id, seq]) => before.get(id) !== seq)
      .map(([id, seq]) => [byId.get(id)!, "assigned", seq] as const),
    ...removed.map((courier) => [courier, "removed", before.get(courier.id)!] as const),
  ].map(([c, k, s]) => [c, k, s]);
  for (const [courier, change, sequence] of changes) {
    if (courier.mailOptOuts.includes("leg_assignments")) continue;
    enqueueMail(
      em,
      legAssignmentMail({
        to: courier.email,
        name: courier.displayName,
        number: transfer.number,
        change,
        leg: sequence,
        legs: legs.length,
        actor: actor.displayName,
        link: links.to(change === "assigned" ? `/legs/${transfer.id}` : "/"),
      }),
    );
  }
}
