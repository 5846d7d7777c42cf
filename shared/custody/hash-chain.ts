import { sha256 } from "@noble/hashes/sha256";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils";

/** The `prevHash` of a transfer's first custody entry. */
export const GENESIS_HASH = "0".repeat(64);

/** What is sealed in each custody entry; the server fills actor and time from the session and its clock. */
export type ChainEntry = {
  transferId: string;
  seq: number;
  kind: string;
  actorId: string | null;
  actorName: string;
  /** ISO 8601 instant with milliseconds, UTC. */
  at: string;
  payload: unknown;
};
export type SealedEntry = ChainEntry & { prevHash: string; hash: string };

/**
 * JSON with object keys sorted and no white space, so the same entry always hashes the
 * same (the key-ordering rule of RFC 8785 JCS; numbers and strings as ECMAScript prints them,
 * which is what JCS specifies).
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") {
    if (typeof value === "number" && !Number.isFinite(value)) throw new Error("canonicalJson: non-finite number");
    return JSON.stringify(value) ?? "null";
  }
  if (Array.isArray(value)) return `[${value.map((v) => (v === undefined ? "null" : canonicalJson(v))).join(",")}]`;
  const keys = Object.keys(value as Record<string, unknown>)
    .filter((k) => (value as Record<string, unknown>)[k] !== undefined)
    .sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson((value as Record<string, unknown>)[k])}`).join(",")}}`;
}

export function sha256Hex(text: string): string {
  return bytesToHex(sha256(utf8ToBytes(text)));
}

/** The hash that seals an entry to the one before it: SHA-256 over the previous hash and the entry. */
export function entryHash(prevHash: string, entry: ChainEntry): string {
  return sha256Hex(`${prevHash}\n${canonicalJson(entry)}`);
}

export function seal(prevHash: string, entry: ChainEntry): SealedEntry {
  return { ...entry, prevHash, hash: entryHash(prevHash, entry) };
}

export type ChainCheck = { intact: boolean; brokenAt: number | null; reason: string | null };

/**
 * Recomputes the chain from the first entry. Any edited, removed, inserted or re-ordered
 * entry breaks it at that point, and the answer says where and how.
 */
export function verifyChain(entries: readonly SealedEntry[]): ChainCheck {
  let prev = GENESIS_HASH;
  for (let i = 0; i < entries.length; i++) {
    const e = entries[i]!;
    const expectedSeq = i + 1;
    if (e.seq !== expectedSeq)
      return { intact: false, brokenAt: e.seq, reason: `entry ${expectedSeq} is missing or out of order` };
    if (e.prevHash !== prev)
      return { intact: false, brokenAt: e.seq, reason: `entry ${e.seq} does not point at the entry before it` };
    const { prevHash: _p, hash, ...body } = e;
    if (entryHash(prev, body) !== hash)
      return { intact: false, brokenAt: e.seq, reason: `entry ${e.seq} was changed after it was written` };
    prev = hash;
  }
  return { intact: true, brokenAt: null, reason: null };
}
