import { KEEPER_ROLES } from "@shared/constants";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { Actor } from "../../auth/actor";
import { UserSchema } from "../../db/entities/user.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import type { Transfer } from "../../db/entities/transfer.entity";
import { enqueueMail } from "../outbox";
import { transferMail, type TransferMailTopic } from "../../mail/templates";
import type { AppLinks } from "../../mail/links";

/**
 * Queues an e-mail to one party of a transfer, in the caller's transaction: the named
 * contact when there is one and the account is active, otherwise every active member.
 * Returns the names of the people it wrote to.
 */
export async function notifyParty(
  em: EntityManager,
  links: AppLinks,
  t: Transfer,
  party: "sender" | "receiver",
  topic: TransferMailTopic,
  actor: Actor | null,
  extra: Record<string, string> = {},
) {
  const orgRef = party === "sender" ? t.senderOrganization : t.receiverOrganization;
  const contactRef = party === "sender" ? t.senderContact : t.receiverContact;
  const contact = contactRef ? await em.findOne(UserSchema, { id: contactRef.id, disabled: false }) : null;
  const recipients = contact
    ? [contact]
    : await em.find(UserSchema, { organization: orgRef.id, role: { $in: KEEPER_ROLES }, disabled: false });
  const org = await em.findOneOrFail(OrganizationSchema, { id: orgRef.id });
  // Alerts and temperature advice carry safety information: sent whatever the person chose.
  // A moved arrival too: someone must be there to take the animals.
  const safety = topic === "alert" || topic === "temperature_changed" || topic === "arrival_moved";
  const told: string[] = [];
  for (const r of recipients) {
    if (!safety && r.mailOptOuts.includes("transfer_steps")) continue;
    told.push(r.displayName);
    enqueueMail(
      em,
      transferMail(topic, {
        to: r.email,
        name: r.displayName,
        organization: org.name,
        number: t.number,
        actor: actor?.displayName ?? "Hatchway",
        link: links.to(`/transfers/${t.id}`),
        ...extra,
      }),
    );
  }
  return told;
}
