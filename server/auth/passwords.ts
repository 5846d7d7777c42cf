import { hash, verify } from "@node-rs/argon2";
import { computedOnce } from "../computed-once";

/** argon2id with the OWASP-recommended floor: m = 19456 KiB, t = 2, p = 1. */
// `Algorithm` is a const enum that does not exist at run time; 2 is its Argon2id member.
const ARGON2ID = 2;
const OPTIONS = { algorithm: ARGON2ID, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

/** Hashed on the first failed look-up, then reused: a constant, the same for every app. */
const dummyHash = computedOnce(() => hashPassword("hatchway-timing-equaliser"));

/**
 * Verifies a password. With no stored hash (unknown e-mail, invitation pending) it still
 * verifies against a dummy hash, so every failure costs the same time.
 */
export async function verifyPassword(storedHash: string | null | undefined, password: string): Promise<boolean> {
  if (!storedHash) {
    await verify(await dummyHash(), password).catch(() => false);
    return false;
  }
  try {
    return await verify(storedHash, password);
  } catch {
    return false;
  }
}
