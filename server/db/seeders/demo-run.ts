import type { EntityManager } from "@mikro-orm/postgresql";
import { actorFromUser } from "../../auth/actor";
import type { Organization } from "../entities/organization.entity";
import { TransferSchema } from "../entities/transfer.entity";
import type { User } from "../entities/user.entity";
import { createRun } from "../../services/runs/runs";
import { chooseCourierService } from "../../services/transfers/courier-service";

/**
 * An invented run for the screens (issue 16): the breeder asks Nightjar Ground Couriers to carry
 * its transfer that is cleared to travel by road, and Nightjar's dispatcher puts it on a run in a
 * climate-controlled van driven by the demo courier, leaving at the transfer's planned departure.
 * Through the real services, so the custody log and change history say what happened.
 */
export async function seedDemoRun(
  em: EntityManager,
  people: { breeder: Organization; couriers: Organization; sender: User; dispatcher: User; courier: User },
): Promise<void> {
  const transfer = await em.fork().findOne(TransferSchema, {
    senderOrganization: people.breeder.id,
    status: "ready",
    mode: "ground_courier",
  });
  if (!transfer) return;
  await chooseCourierService({
    em: em.fork(),
    actor: await actorOf(em, people.sender),
    transferId: transfer.id,
    organizationId: people.couriers.id,
  });
  await createRun({
    em: em.fork(),
    actor: await actorOf(em, people.dispatcher),
    input: {
      departAt: transfer.plannedDepartureAt.toISOString(),
      climateControlled: true,
      vehicleRangeF: { min: 68, max: 78 },
      driverIds: [people.courier.id],
      transferIds: [transfer.id],
    },
  });
}

async function actorOf(em: EntityManager, user: User) {
  await em.populate(user, ["organization"]);
  return actorFromUser(user);
}
