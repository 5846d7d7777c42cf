import { createHash, randomBytes } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { UserInviteInput } from "@shared/schemas/auth";
import { emailKey } from "@shared/schemas/common";
import { roleMisfit } from "@shared/roles";
import { UserSchema } from "../db/entities/user.entity";
import type { Actor } from "../auth/actor";
import { OrganizationSchema } from "../db/entities/organization.entity";
import { PasswordTokenSchema } from "../db/entities/password-token.entity";
import { conflict, invalidField } from "../http/errors";
import { enqueueMail } from "./outbox";
import { invitationMail } from "../mail/templates";
import type { AppLinks } from "../mail/links";

const INVITATION_HOURS = 72;

/** Creates an account without a password and mails a one-time link to choose one. */
export async function inviteUser({
  em,
  actor,
  input,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  input: UserInviteInput;
  links: AppLinks;
}) {
  const key = emailKey(input.email);
  if (await em.count(UserSchema, { emailKey: key }))
    throw conflict("An account with this e-mail already exists.", { field: "email" });
  const organization = input.organizationId ? await em.findOne(OrganizationSchema, { id: input.organizationId }) : null;
  if (input.organizationId && !organization)
    throw invalidField(["organizationId"], "choose an organisation from the list");
  const misfit = roleMisfit(input.role, organization?.kind ?? null);
  if (misfit) throw invalidField(["organizationId"], misfit);

  const user = em.create(UserSchema, {
    email: input.email,
    emailKey: key,
    displayName: input.displayName,
    role: input.role,
    organization,
    passwordHash: null,
    disabled: false,
  });
  const token = randomBytes(32).toString("base64url");
  em.create(PasswordTokenSchema, {
    user,
    tokenHash: createHash("sha256").update(token).digest("hex"),
    expiresAt: new Date(Date.now() + INVITATION_HOURS * 3600_000),
  });
  enqueueMail(
    em,
    invitationMail({
      to: input.email,
      name: input.displayName,
      invitedBy: actor.displayName,
      link: links.to(`/welcome?token=${token}`),
      hours: INVITATION_HOURS,
    }),
  );
  await em.flush();
  return user;
}
