import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { createdAtProperty, idProperty } from "./base";
import { ACCOUNT_TOKEN_PURPOSES, USER_ROLES } from "@shared/constants";
import { OrganizationSchema } from "./organization.entity";
import { UserSchema } from "./user.entity";

/**
 * A one-time link sent by e-mail: choose a first password (invitations), confirm a sign-up,
 * reset a forgotten password, or accept joining an organisation (`purpose`). Only the SHA-256 of
 * the token is kept, so a database reader cannot use a pending link.
 */
export const PasswordTokenSchema = defineEntity({
  name: "PasswordToken",
  tableName: "password_token",
  properties: {
    id: idProperty(),
    /** Null for `invite_organization`: the invited organisation has nobody yet. */
    user: () => p.manyToOne(UserSchema).ref().nullable(),
    /** Who sent an `invite_organization`: named in the e-mail and on the sign-up page. */
    invitedBy: () => p.manyToOne(UserSchema).ref().nullable(),
    purpose: p.enum([...ACCOUNT_TOKEN_PURPOSES]).default("set_password"),
    /** For `join_organization`: the organisation the account is asked to join, and as what. */
    organization: () => p.manyToOne(OrganizationSchema).ref().nullable(),
    role: p.enum([...USER_ROLES]).nullable(),
    tokenHash: p.string().length(64).unique(),
    expiresAt: p.datetime(),
    usedAt: p.datetime().nullable(),
    createdAt: createdAtProperty(),
  },
});

export type PasswordToken = InferEntity<typeof PasswordTokenSchema>;
