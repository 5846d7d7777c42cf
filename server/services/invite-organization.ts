import type { EntityManager } from "@mikro-orm/postgresql";
import { ref } from "@mikro-orm/core";
import type { OrganizationInvitationInput } from "@shared/schemas/account";
import { emailKey } from "@shared/schemas/common";
import { USER_ROLE_WORDS } from "@shared/words";
import type { Actor } from "../auth/actor";
import { ACCOUNT_LINK_HOURS, issueAccountToken } from "../auth/tokens";
import { OrganizationSchema } from "../db/entities/organization.entity";
import { UserSchema } from "../db/entities/user.entity";
import { enqueueMail } from "./outbox";
import { joinOrganizationMail, organizationInvitationMail } from "../mail/templates";
import type { AppLinks } from "../mail/links";

/**
 * A sender invites the other party of a transfer (issue 14, §3): a pending organisation is made
 * at once — it can be the receiver (or the courier service) of a transfer straight away — and
 * the address gets an e-mail naming who invited it and why, with a link to sign up into that
 * organisation. An address that already has an account is joined to nothing: it gets a link to
 * accept instead (§5).
 */
export async function inviteOrganization({
  em,
  actor,
  input,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  input: OrganizationInvitationInput;
  links: AppLinks;
}) {
  return em.transactional(async (tx) => {
    const inviter = await tx.findOneOrFail(UserSchema, { id: actor.id });
    const inviterOrganization = await tx.findOneOrFail(OrganizationSchema, { id: actor.organization!.id });
    const organization = tx.create(OrganizationSchema, {
      name: input.organizationName,
      kind: input.kind,
      street: "",
      city: "",
      state: input.state,
      zip: "",
      phone: "",
      email: input.email,
      pending: true,
      listed: false,
      invitedBy: ref(inviterOrganization),
    });
    const existing = await tx.findOne(UserSchema, { emailKey: emailKey(input.email) });
    if (existing) {
      const token = issueAccountToken(tx, existing, "join_organization", { organization, role: "manager" });
      enqueueMail(
        tx,
        joinOrganizationMail({
          to: existing.email,
          name: existing.displayName,
          invitedBy: `${actor.displayName} of ${inviterOrganization.name}`,
          organization: input.organizationName,
          role: USER_ROLE_WORDS.manager.toLowerCase(),
          link: links.to(`/join?token=${token}`),
          hours: ACCOUNT_LINK_HOURS,
        }),
      );
    } else {
      const token = issueAccountToken(tx, null, "invite_organization", { organization, invitedBy: inviter });
      enqueueMail(
        tx,
        organizationInvitationMail({
          to: input.email,
          organization: input.organizationName,
          invitedBy: actor.displayName,
          invitedByOrganization: inviterOrganization.name,
          asCourier: input.kind === "courier_service",
          link: links.to(`/sign-up?invitation=${token}`),
          hours: ACCOUNT_LINK_HOURS,
        }),
      );
    }
    return organization;
  });
}
