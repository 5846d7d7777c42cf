import type { EntityManager } from "@mikro-orm/postgresql";
import { ref } from "@mikro-orm/core";
import type { Actor } from "../../auth/actor";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { forbidden, invalidField } from "../../http/errors";
import { transferAbilities } from "../../policies/transfer.policy";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";

/**
 * The sender asks a courier service to carry the transfer (issue 14, §3): a listed one, or one it
 * invited by e-mail (pending until someone signs up). The service's manager then assigns its
 * couriers to the legs. Null takes the request back.
 */
export async function chooseCourierService({
  em,
  actor,
  transferId,
  organizationId,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  organizationId: string | null;
}) {
  return em.transactional(async (tx) => {
    const { transfer, role, facts } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    if (role !== "sender" || !transferAbilities(actor, role, facts).edit)
      throw forbidden("Only the sender can choose the courier service, and only before the animals leave.");
    const service = organizationId ? await tx.findOne(OrganizationSchema, { id: organizationId }) : null;
    if (
      organizationId &&
      (!service ||
        service.kind !== "courier_service" ||
        (service.pending && service.invitedBy?.id !== actor.organization?.id) ||
        (!service.pending && !service.listed && service.invitedBy?.id !== actor.organization?.id))
    )
      throw invalidField(["organizationId"], "choose a courier service from the directory, or invite one");
    transfer.courierService = service ? ref(service) : null;
    transfer.version += 1;
    await appendCustody(tx, transfer.id, actor, "couriers_assigned", {
      courierService: service ? { id: service.id, name: service.name } : null,
    });
    await tx.flush();
    const managers = service
      ? await tx.count(UserSchema, { organization: service.id, role: "manager", disabled: false })
      : 0;
    return { transfer, managers };
  });
}
