import type { EntityManager } from "@mikro-orm/postgresql";
import { ref } from "@mikro-orm/core";
import type { MemberInviteInput, MemberPatchInput } from "@shared/schemas/auth";
import { emailKey } from "@shared/schemas/common";
import { USER_ROLE_WORDS } from "@shared/words";
import type { Actor } from "../auth/actor";
import { ACCOUNT_LINK_HOURS, consumeAccountToken, issueAccountToken } from "../auth/tokens";
import { endOtherSessions } from "../auth/session";
import { OrganizationSchema, type Organization } from "../db/entities/organization.entity";
import { UserSchema, type User } from "../db/entities/user.entity";
import { conflict, HttpError, invalidField, notFound } from "../http/errors";
import { rolesInOrganization } from "@shared/roles";
import { enqueueMail } from "./outbox";
import { invitationMail, joinOrganizationMail } from "../mail/templates";
import type { AppLinks } from "../mail/links";
import type pg from "pg";

function assertRoleFits(organization: Organization, role: string) {
  if (!rolesInOrganization(organization.kind).includes(role as never))
    throw invalidField(
      ["role"],
      organization.kind === "courier_service"
        ? "a courier service has managers and couriers"
        : "a keeper organisation has managers and members",
    );
}

/**
 * A manager invites a person (issue 14, §2; §5). A new address gets an account without a password
 * and a one-time link to choose one. An address that already has an account is joined to nothing:
 * it gets a link to accept, and only accepting moves the account.
 */
export async function inviteMember({
  em,
  actor,
  organization,
  input,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  organization: Organization;
  input: MemberInviteInput;
  links: AppLinks;
}): Promise<{ member: User | null }> {
  assertRoleFits(organization, input.role);
  const key = emailKey(input.email);
  return em.transactional(async (tx) => {
    const existing = await tx.findOne(UserSchema, { emailKey: key });
    if (existing?.organization?.id === organization.id)
      throw conflict("This person is already in the organisation.", { field: "email" });
    if (existing) {
      const token = issueAccountToken(tx, existing, "join_organization", { organization, role: input.role });
      enqueueMail(
        tx,
        joinOrganizationMail({
          to: existing.email,
          name: existing.displayName,
          invitedBy: actor.displayName,
          organization: organization.name,
          role: USER_ROLE_WORDS[input.role].toLowerCase(),
          link: links.to(`/join?token=${token}`),
          hours: ACCOUNT_LINK_HOURS,
        }),
      );
      return { member: null };
    }
    const user = tx.create(UserSchema, {
      email: input.email,
      emailKey: key,
      displayName: input.displayName,
      role: input.role,
      organization,
      passwordHash: null,
      disabled: false,
      awaitingConfirmation: false,
    });
    const token = issueAccountToken(tx, user, "set_password");
    enqueueMail(
      tx,
      invitationMail({
        to: input.email,
        name: input.displayName,
        invitedBy: `${actor.displayName} of ${organization.name}`,
        link: links.to(`/welcome?token=${token}`),
        hours: ACCOUNT_LINK_HOURS,
      }),
    );
    return { member: user };
  });
}

/**
 * A manager changes a person's role within the organisation or disables them. An organisation
 * always keeps one enabled manager, so nobody locks the organisation out of its own people.
 * A disabled person's sessions end at once.
 */
export async function changeMember({
  em,
  pool,
  actor,
  organization,
  userId,
  input,
}: {
  em: EntityManager;
  pool: pg.Pool;
  actor: Actor;
  organization: Organization;
  userId: string;
  input: MemberPatchInput;
}): Promise<User> {
  const user = await em.transactional(async (tx) => {
    const member = await tx.findOne(UserSchema, { id: userId, organization: organization.id });
    if (!member) throw notFound("That person");
    if ("role" in input) assertRoleFits(organization, input.role);
    if ("disabled" in input && input.disabled && member.id === actor.id)
      throw invalidField(["disabled"], "you cannot disable yourself; ask another manager");
    const losesManager =
      member.role === "manager" &&
      (("role" in input && input.role !== "manager") || ("disabled" in input && input.disabled));
    if (losesManager && !member.disabled) {
      const managers = await tx.count(UserSchema, { organization: organization.id, role: "manager", disabled: false });
      if (managers <= 1)
        throw conflict("An organisation needs at least one manager: make someone else a manager first.", {
          field: "role" in input ? "role" : "disabled",
        });
    }
    if ("role" in input) member.role = input.role;
    if ("disabled" in input) member.disabled = input.disabled;
    return member;
  });
  if ("disabled" in input && input.disabled) await endOtherSessions(pool, user.id, null);
  return user;
}

/** Accepting an invitation to join an organisation with the account one already has. */
export async function acceptMembership({ em, actor, token }: { em: EntityManager; actor: Actor; token: string }) {
  return em.transactional(async (tx) => {
    const row = await consumeAccountToken(tx, token, ["join_organization"]);
    if (row.user?.id !== actor.id)
      throw new HttpError(
        400,
        "invalid_token",
        "This invitation is for another account: sign in with the address it was sent to.",
        {
          field: "token",
        },
      );
    const organization = await tx.findOneOrFail(OrganizationSchema, { id: row.organization!.id });
    const user = await tx.findOneOrFail(UserSchema, { id: actor.id });
    user.organization = ref(organization);
    // An organisation invited to a transfer becomes a full one when its first person accepts.
    if (organization.pending) organization.pending = false;
    user.role = row.role ?? rolesInOrganization(organization.kind)[1]!;
    return { user, organization };
  });
}
