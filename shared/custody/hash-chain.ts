import { sha256 } from "@noble/hashes/sha256";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils";
import type { ChainProblem } from "../constants";
import { chainBreakSentence } from "../words/custody";

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

/** The hashing rule in words, carried in every export so that a reader can recompute it anywhere. */
export const CHAIN_RULE =
  'hash = lower-case hex SHA-256 of the UTF-8 bytes of prevHash + "\\n" + the canonical JSON of the entry\'s ' +
  "{transferId, seq, kind, actorId, actorName, at, payload}; canonical JSON sorts object keys (by UTF-16 code units), " +
  "omits white space and writes strings and numbers as ECMAScript's JSON.stringify does (RFC 8785). The first " +
  "entry's prevHash is 64 zeros; each later entry's prevHash is the hash of the entry before it; the head names " +
  "the last entry's seq and hash.";

export function seal(prevHash: string, entry: ChainEntry): SealedEntry {
  return { ...entry, prevHash, hash: entryHash(prevHash, entry) };
}

/** The chain's end as recorded apart from the entries (the `custody_head` row, D19). */
export type ChainHead = { seq: number; hash: string };

/** One place where the chain is not what was written. `seq` is where it breaks, `toSeq` the end of a run. */
export type ChainBreak = { seq: number; toSeq: number; problem: ChainProblem; message: string };

export type ChainCheck = {
  intact: boolean;
  /** The first sequence number at which the log is not what was written, or null. */
  brokenAt: number | null;
  /** That first break in a sentence, or null. */
  reason: string | null;
  /** Every break found, in order. */
  breaks: ChainBreak[];
};

function breakAt(problem: ChainProblem, seq: number, toSeq = seq): ChainBreak {
  return { seq, toSeq, problem, message: chainBreakSentence(problem, seq, toSeq) };
}

/**
 * Recomputes the chain from the first entry and compares its end with the head kept apart
 * from it. An edited, removed, inserted or re-ordered entry breaks it where that happened; so
 * do entries removed from the end (the head names a later one), entries added with the
 * safeguards off (past the head), and a replaced last entry (the head names another hash).
 * `head` null means no head was recorded; the log must then be empty.
 */
export function verifyChain(entries: readonly SealedEntry[], head: ChainHead | null): ChainCheck {
  const breaks: ChainBreak[] = [];
  let prev = GENESIS_HASH;
  let expected = 1;
  let linkKnown = true;
  let last: SealedEntry | null = null;
  for (const entry of entries) {
    if (entry.seq < expected) {
      breaks.push(breakAt("out_of_order", entry.seq));
      continue;
    }
    if (entry.seq > expected) {
      breaks.push(breakAt("missing", expected, entry.seq - 1));
      linkKnown = false;
    }
    const { prevHash, hash, ...body } = entry;
    if (entryHash(prevHash, body) !== hash) breaks.push(breakAt("changed", entry.seq));
    else if (linkKnown && prevHash !== prev) breaks.push(breakAt("unlinked", entry.seq));
    prev = hash;
    expected = entry.seq + 1;
    linkKnown = true;
    last = entry;
  }
  const lastSeq = last?.seq ?? 0;
  if (head === null) {
    if (last) breaks.push(breakAt("head_missing", lastSeq));
  } else if (head.seq > lastSeq) {
    breaks.push(breakAt("missing_tail", lastSeq + 1, head.seq));
  } else if (head.seq < lastSeq) {
    const atHead = entries.find((entry) => entry.seq === head.seq);
    if (atHead && atHead.hash !== head.hash) breaks.push(breakAt("head_mismatch", head.seq));
    breaks.push(breakAt("beyond_head", head.seq + 1, lastSeq));
  } else if (last && last.hash !== head.hash) {
    breaks.push(breakAt("head_mismatch", lastSeq));
  }
  breaks.sort((a, b) => a.seq - b.seq);
  const first = breaks[0] ?? null;
  return { intact: first === null, brokenAt: first?.seq ?? null, reason: first?.message ?? null, breaks };
}
