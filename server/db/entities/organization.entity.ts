import type { QuarantineOverride } from "@shared/register/quarantine";
import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { ORGANIZATION_KINDS } from "@shared/constants";
import { createdAtProperty, idProperty } from "./base";

export const OrganizationSchema = defineEntity({
  name: "Organization",
  tableName: "organization",
  properties: {
    id: idProperty(),
    name: p.string().length(200),
    kind: p.enum([...ORGANIZATION_KINDS]),
    street: p.string().length(200),
    city: p.string().length(100),
    state: p.string().length(2),
    zip: p.string().length(10),
    phone: p.string().length(40),
    email: p.string().length(254),
    /**
     * Invited by a sender or made by a sign-up not yet confirmed: it can already be the receiver
     * (or courier service) of a transfer, and becomes a full organisation when its first person confirms.
     */
    pending: p.boolean().default(false),
    /** Shown in the directory (name, kind, city and state only); off until the organisation chooses it. */
    listed: p.boolean().default(false),
    /** The organisation whose person invited this one, if it came by invitation. */
    invitedBy: () => p.manyToOne(OrganizationSchema).ref().nullable(),
    /** Days new arrivals stay in quarantine (issue 15 §4; 60 by default [practice]). */
    quarantineDays: p.integer().default(60),
    /** Longer (or shorter) quarantine for a genus or a species, e.g. boas [practice]. */
    quarantineOverrides: p.json<QuarantineOverride[]>().onCreate(() => []),
    createdAt: createdAtProperty(),
  },
});

export type Organization = InferEntity<typeof OrganizationSchema>;
