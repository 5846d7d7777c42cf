import type { EntityManager } from "@mikro-orm/postgresql";
import type { Actor } from "../../auth/actor";
import { UserSchema } from "../../db/entities/user.entity";
import { LegSchema } from "../../db/entities/transfer.entity";
import { forbidden, invalidField } from "../../http/errors";
import { transferAbilities } from "../../policies/transfer.policy";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";

type LegsParsed = { legs: { courierId: string; fromLabel?: string | null; toLabel?: string | null }[] };

/** The sender names the couriers, leg by leg, before the animals leave. */
export async function assignLegs({
  em,
  actor,
  transferId,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  input: LegsParsed;
}) {
  return em.transactional(async (tx) => {
    const { transfer, role, facts, legs: old } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    if (!transferAbilities(actor, role, facts).assignCouriers)
      throw forbidden("Only the sender can assign couriers, and only before the animals leave.");
    const ids = [...new Set(input.legs.map((l) => l.courierId))];
    const couriers = await tx.find(UserSchema, { id: { $in: ids }, role: "courier", disabled: false });
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
    await tx.flush();
    return transfer;
  });
}
