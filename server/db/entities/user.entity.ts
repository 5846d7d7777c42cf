import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { USER_ROLES } from "@shared/constants";
import { createdAtProperty, idProperty } from "./base";
import { OrganizationSchema } from "./organization.entity";

export const UserSchema = defineEntity({
  name: "User",
  tableName: "app_user",
  properties: {
    id: idProperty(),
    email: p.string().length(254),
    /** NFC-normalised, lower-cased e-mail: the unique key accounts are found by. */
    emailKey: p.string().length(254).unique(),
    displayName: p.string().length(120),
    /** argon2id PHC string; null until the invited user sets a password. */
    passwordHash: p.string().length(255).nullable(),
    role: p.enum([...USER_ROLES]),
    organization: () => p.manyToOne(OrganizationSchema).ref().nullable(),
    disabled: p.boolean().default(false),
    /** A person who signed up and has not yet confirmed their e-mail address cannot sign in. */
    awaitingConfirmation: p.boolean().default(false),
    /** The e-mails this person turned off (MAIL_CHOICES); safety alerts are never among them. */
    mailOptOuts: p.array().default([]),
    createdAt: createdAtProperty(),
  },
});

export type User = InferEntity<typeof UserSchema>;
