/**
 * Builders for test and demo records. Each creates its own parents when none are given,
 * so a test states only what it cares about. The demo seeder is built from these too.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { ref } from "@mikro-orm/core";
import type { OrganizationKind, UserRole } from "@shared/constants";
import { emailKey } from "@shared/schemas/common";
import { OrganizationSchema, type Organization } from "../server/db/entities/organization.entity";
import { UserSchema, type User } from "../server/db/entities/user.entity";
import { hashPassword } from "../server/auth/passwords";

let counter = 0;
const next = () => `${Date.now().toString(36)}${(++counter).toString(36)}`;

export const DEMO_PASSWORD = "hatchway-demo";

type OrgOverrides = Partial<Pick<Organization, "name" | "kind" | "street" | "city" | "state" | "zip" | "phone" | "email">>;

export async function buildOrganization(em: EntityManager, overrides: OrgOverrides = {}): Promise<Organization> {
  const n = next();
  const org = em.create(OrganizationSchema, {
    name: `Test Keepers ${n}`,
    kind: "breeder" as OrganizationKind,
    street: "1 Test Lane",
    city: "Knoxville",
    state: "TN",
    zip: "37917",
    phone: "+1 865 555 0100",
    email: `org-${n}@example.test`,
    ...overrides,
  });
  await em.flush();
  return org;
}

type UserOverrides = {
  email?: string;
  displayName?: string;
  role?: UserRole;
  organization?: Organization | null;
  password?: string | null;
  disabled?: boolean;
};

/** A user with a password (default "hatchway-demo"); members get an organisation of their own. */
export async function buildUser(em: EntityManager, overrides: UserOverrides = {}): Promise<User> {
  const n = next();
  const role = overrides.role ?? "member";
  const organization =
    overrides.organization !== undefined
      ? overrides.organization
      : role === "member"
        ? await buildOrganization(em)
        : role === "courier"
          ? await buildOrganization(em, { kind: "courier_service" })
          : null;
  const email = overrides.email ?? `user-${n}@example.test`;
  const password = overrides.password === undefined ? DEMO_PASSWORD : overrides.password;
  const user = em.create(UserSchema, {
    email,
    emailKey: emailKey(email),
    displayName: overrides.displayName ?? `Test User ${n}`,
    role,
    organization: organization ? ref(organization) : null,
    passwordHash: password === null ? null : await hashPassword(password),
    disabled: overrides.disabled ?? false,
  });
  await em.flush();
  return user;
}
