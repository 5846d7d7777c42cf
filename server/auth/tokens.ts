import { createHash, randomBytes } from "node:crypto";
import { LockMode } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { AccountTokenPurpose, UserRole } from "@shared/constants";
import { PasswordTokenSchema, type PasswordToken } from "../db/entities/password-token.entity";
import type { Organization } from "../db/entities/organization.entity";
import type { User } from "../db/entities/user.entity";
import { HttpError } from "../http/errors";

/** How long a link to confirm a sign-up, reset a password or join an organisation works. */
export const ACCOUNT_LINK_HOURS = 24;

export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

/**
 * Issues a one-time link token: 32 random bytes (256 bits, OWASP Forgot Password Cheat Sheet:
 * "cryptographically secure random") [published]; only its SHA-256 is stored. Returns the token
 * to put in the e-mail. The row joins the caller's unit of work.
 */
export function issueAccountToken(
  em: EntityManager,
  user: User | null,
  purpose: AccountTokenPurpose,
  options: { hours?: number; organization?: Organization; role?: UserRole; invitedBy?: User } = {},
): string {
  const token = randomBytes(32).toString("base64url");
  em.create(PasswordTokenSchema, {
    user,
    purpose,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + (options.hours ?? ACCOUNT_LINK_HOURS) * 3600_000),
    organization: options.organization ?? null,
    role: options.role ?? null,
    invitedBy: options.invitedBy ?? null,
  });
  return token;
}

/** What to say when a link does not work: expired, used, forged or meant for something else. */
const NO_LONGER_WORKS: Record<AccountTokenPurpose, string> = {
  set_password: "This link has expired or was already used. Ask the person who invited you for a new invitation.",
  confirm_email:
    "This confirmation link has expired or was already used. Sign up again, or sign in if you already confirmed.",
  reset_password: 'This link has expired or was already used. Ask for a new one with "Forgot your password?".',
  join_organization:
    "This invitation has expired or was already used. Ask the organisation's manager to invite you again.",
  invite_organization:
    "This invitation has expired or was already used. Ask the person who invited you to invite you again.",
};

/**
 * Finds a usable token for one of `purposes`, locked for this transaction, and marks it used.
 * Anything else — unknown, used, expired or another purpose — is one 400 that changes nothing.
 */
export async function consumeAccountToken(
  em: EntityManager,
  token: string,
  purposes: readonly AccountTokenPurpose[],
): Promise<PasswordToken> {
  const row = await em.findOne(
    PasswordTokenSchema,
    { tokenHash: hashToken(token) },
    { populate: ["user"], lockMode: LockMode.PESSIMISTIC_WRITE },
  );
  if (!row || row.usedAt || row.expiresAt.getTime() < Date.now() || !purposes.includes(row.purpose)) {
    throw new HttpError(400, "invalid_token", NO_LONGER_WORKS[purposes[0]!], { field: "token" });
  }
  row.usedAt = new Date();
  return row;
}
