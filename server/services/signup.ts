import type { EntityManager } from "@mikro-orm/postgresql";
import type { SignupInput } from "@shared/schemas/account";
import { emailKey } from "@shared/schemas/common";
import { OrganizationSchema, type Organization } from "../db/entities/organization.entity";
import { UserSchema, type User } from "../db/entities/user.entity";
import { hashPassword } from "../auth/passwords";
import { ACCOUNT_LINK_HOURS, consumeAccountToken, hashToken, issueAccountToken } from "../auth/tokens";
import { PasswordTokenSchema } from "../db/entities/password-token.entity";
import { invalidField } from "../http/errors";
import { enqueueMail } from "./outbox";
import { passwordResetMail, signupAddressTakenMail, signupConfirmationMail } from "../mail/templates";
import type { AppLinks } from "../mail/links";

/**
 * A sign-up (issue 14, §1). Whatever happens the caller gets the same answer, so nobody can
 * learn from it whether an address has an account:
 * - a free address: the organisation and its first person (its manager) are made, the account
 *   waits for its address to be confirmed, and a one-time link is mailed;
 * - an address whose sign-up is still unconfirmed: a fresh confirmation link is mailed;
 * - an address with an account: that address is told someone tried, and nothing is made.
 * With an invitation token the new organisation is the pending one that was invited (§3): its
 * name and state are kept from the invitation, and the rest is filled from the form.
 */
export async function signUp({ em, input, links }: { em: EntityManager; input: SignupInput; links: AppLinks }) {
  // The password is hashed on every path, so the answer takes the same time whatever the address.
  const passwordHash = await hashPassword(input.user.password);
  await em.transactional(async (tx) => {
    const key = emailKey(input.user.email);
    const existing = await tx.findOne(UserSchema, { emailKey: key }, { populate: ["organization"] });
    if (existing && existing.awaitingConfirmation && existing.organization) {
      const token = issueAccountToken(tx, existing, "confirm_email");
      enqueueMail(tx, confirmationMail(existing, existing.organization.getEntity(), token, links));
      return;
    }
    if (existing) {
      enqueueMail(
        tx,
        signupAddressTakenMail({
          to: existing.email,
          name: existing.displayName,
          signInLink: links.to("/sign-in"),
          resetLink: links.to("/forgot-password"),
        }),
      );
      return;
    }
    const organization = input.invitation
      ? await invitedOrganization(tx, input)
      : tx.create(OrganizationSchema, { ...input.organization, pending: false, listed: false });
    const user = tx.create(UserSchema, {
      email: input.user.email,
      emailKey: key,
      displayName: input.user.displayName,
      passwordHash,
      // The first person of an organisation runs it, in a keeper organisation as in a courier service.
      role: "manager",
      organization,
      disabled: false,
      awaitingConfirmation: true,
    });
    const token = issueAccountToken(tx, user, "confirm_email");
    enqueueMail(tx, confirmationMail(user, organization, token, links));
  });
}

function confirmationMail(user: User, organization: Organization, token: string, links: AppLinks) {
  return signupConfirmationMail({
    to: user.email,
    name: user.displayName,
    organization: organization.name,
    link: links.to(`/sign-up/confirm?token=${token}`),
    hours: ACCOUNT_LINK_HOURS,
  });
}

/**
 * The pending organisation an invitation named, taken over by the sign-up: the invitation is
 * used up, the organisation keeps its name and state and is pending no more once confirmed.
 */
async function invitedOrganization(em: EntityManager, input: SignupInput): Promise<Organization> {
  const invitation = await em.findOne(PasswordTokenSchema, { tokenHash: hashToken(input.invitation!) });
  const organization = invitation?.organization
    ? await em.findOne(OrganizationSchema, invitation.organization.id)
    : null;
  if (
    !invitation ||
    invitation.purpose !== "invite_organization" ||
    invitation.usedAt ||
    invitation.expiresAt.getTime() < Date.now() ||
    !organization ||
    !organization.pending
  )
    throw invalidField(
      ["invitation"],
      "this invitation has expired or was already used; sign up without it, or ask the sender to invite you again",
    );
  invitation.usedAt = new Date();
  const { name: _name, state: _state, ...rest } = input.organization;
  Object.assign(organization, rest);
  return organization;
}

/** Confirms a sign-up: the account opens, and its organisation (if it was a pending invitee) is pending no more. */
export async function confirmSignup({ em, token }: { em: EntityManager; token: string }): Promise<User> {
  return em.transactional(async (tx) => {
    const row = await consumeAccountToken(tx, token, ["confirm_email"]);
    const user = await tx.findOneOrFail(UserSchema, { id: row.user!.id }, { populate: ["organization"] });
    user.awaitingConfirmation = false;
    const organization = user.organization?.getEntity();
    if (organization?.pending) organization.pending = false;
    // Other confirmation links of the same sign-up stop working too.
    await tx.nativeUpdate(
      PasswordTokenSchema,
      { user: user.id, purpose: "confirm_email", usedAt: null },
      { usedAt: new Date() },
    );
    return user;
  });
}

/** "Forgot your password?": a link for a known, enabled account; nothing for anyone else. Same answer either way. */
export async function requestPasswordReset({
  em,
  email,
  links,
}: {
  em: EntityManager;
  email: string;
  links: AppLinks;
}): Promise<void> {
  await em.transactional(async (tx) => {
    const user = await tx.findOne(UserSchema, { emailKey: emailKey(email) });
    if (!user || user.disabled) return;
    const token = issueAccountToken(tx, user, "reset_password");
    enqueueMail(
      tx,
      passwordResetMail({
        to: user.email,
        name: user.displayName,
        link: links.to(`/reset-password?token=${token}`),
        hours: ACCOUNT_LINK_HOURS,
      }),
    );
  });
}

/** The invitation a sign-up page was opened from, to fill in its name and state; null when it no longer works. */
export async function readInvitation(em: EntityManager, token: string) {
  const invitation = await em.findOne(
    PasswordTokenSchema,
    { tokenHash: hashToken(token), purpose: "invite_organization" },
    { populate: ["organization", "invitedBy", "invitedBy.organization"] },
  );
  const organization = invitation?.organization?.getEntity();
  if (!invitation || invitation.usedAt || invitation.expiresAt.getTime() < Date.now() || !organization?.pending)
    return null;
  const inviter = invitation.invitedBy?.getEntity();
  return {
    organization: { name: organization.name, kind: organization.kind, state: organization.state },
    invitedBy: {
      displayName: inviter?.displayName ?? "A Hatchway member",
      organizationName: inviter?.organization?.getEntity()?.name ?? null,
    },
  };
}
