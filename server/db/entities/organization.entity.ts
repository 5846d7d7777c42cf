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
    /** Days new arrivals stay in quarantine (issue 15 §4; 60 by default [practice]). */
    quarantineDays: p.integer().default(60),
    createdAt: createdAtProperty(),
  },
});

export type Organization = InferEntity<typeof OrganizationSchema>;
