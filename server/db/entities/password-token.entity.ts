import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { createdAtProperty, idProperty } from "./base";
import { UserSchema } from "./user.entity";

/**
 * A one-time link to set a password (invitations). Only the SHA-256 of the token is kept,
 * so a database reader cannot use a pending link.
 */
export const PasswordTokenSchema = defineEntity({
  name: "PasswordToken",
  tableName: "password_token",
  properties: {
    id: idProperty(),
    user: () => p.manyToOne(UserSchema).ref(),
    tokenHash: p.string().length(64).unique(),
    expiresAt: p.datetime(),
    usedAt: p.datetime().nullable(),
    createdAt: createdAtProperty(),
  },
});

export type PasswordToken = InferEntity<typeof PasswordTokenSchema>;
