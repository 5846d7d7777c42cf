#!/usr/bin/env node
/**
 * Checks a Hatchway custody export with nothing but Node.js (any version from 18 on): every
 * entry's hash, every link to the entry before, the sequence, and the end against the head.
 * Give an earlier export of the same transfer as a second file to check that the log you kept
 * then is still, unchanged, the start of the log now.
 *
 *   node verify-custody-export.mjs HW-26-ABCDE-custody.json [an-earlier-export.json]
 *
 * Exit status 0: intact; 1: broken (each break is printed); 2: the file could not be read.
 * Self-contained on purpose (node:crypto and node:fs only): copy it anywhere.
 */
import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";

const GENESIS = "0".repeat(64);
const run = (from, to) => (from === to ? `Entry ${from} is` : `Entries ${from} to ${to} are`);

/** JSON with sorted keys and no white space (RFC 8785 key order; strings and numbers as JSON.stringify). */
function canonical(value) {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value))
    return `[${value.map((item) => (item === undefined ? "null" : canonical(item))).join(",")}]`;
  const keys = Object.keys(value)
    .filter((key) => value[key] !== undefined)
    .sort();
  return `{${keys.map((key) => `${JSON.stringify(key)}:${canonical(value[key])}`).join(",")}}`;
}

function entryHash(entry) {
  const { transferId, seq, kind, actorId, actorName, at, payload } = entry;
  const body = canonical({ transferId, seq, kind, actorId, actorName, at, payload });
  return createHash("sha256").update(`${entry.prevHash}\n${body}`, "utf8").digest("hex");
}

/** Every break in the export's chain, as sentences; empty when it is intact. */
function verifyExport(exported) {
  const problems = [];
  const entries = [...exported.entries].sort((a, b) => a.seq - b.seq);
  let expected = 1;
  let previous = GENESIS;
  let linkKnown = true;
  for (const entry of entries) {
    if (entry.transferId !== exported.transfer.id) problems.push(`Entry ${entry.seq} belongs to another transfer.`);
    if (entry.seq < expected) {
      problems.push(`Entry ${entry.seq} appears twice.`);
      continue;
    }
    if (entry.seq > expected) {
      problems.push(`${run(expected, entry.seq - 1)} missing from the log.`);
      linkKnown = false;
    }
    if (entryHash(entry) !== entry.hash) problems.push(`Entry ${entry.seq} was changed after it was written.`);
    else if (linkKnown && entry.prevHash !== previous)
      problems.push(`Entry ${entry.seq} does not point at the entry before it.`);
    previous = entry.hash;
    expected = entry.seq + 1;
    linkKnown = true;
  }
  const last = entries.at(-1);
  const head = exported.head;
  if (!head) {
    if (last) problems.push("The export names no head, so the end of the log cannot be confirmed.");
  } else if (head.seq > (last?.seq ?? 0)) {
    problems.push(`${run((last?.seq ?? 0) + 1, head.seq)} missing at the end of the log.`);
  } else {
    const atHead = entries.find((entry) => entry.seq === head.seq);
    if (head.seq < last.seq) problems.push(`${run(head.seq + 1, last.seq)} past the head: added behind its back.`);
    if (atHead && atHead.hash !== head.hash) problems.push(`Entry ${head.seq} is not the entry the head names.`);
  }
  return problems;
}

/** Whether an earlier export's log is still the unchanged start of this one. */
function verifyContinuation(earlier, later) {
  if (earlier.transfer.id !== later.transfer.id) return ["The two exports are of different transfers."];
  if (!earlier.head) return [];
  const same = later.entries.find((entry) => entry.seq === earlier.head.seq);
  if (!same) return [`Entry ${earlier.head.seq}, the end of the earlier export, is no longer in the log.`];
  if (same.hash !== earlier.head.hash)
    return [`Entry ${earlier.head.seq} differs from the earlier export: the log was rewritten since.`];
  return [];
}

function read(file) {
  try {
    return JSON.parse(readFileSync(file, "utf8"));
  } catch (err) {
    console.error(`Cannot read ${file}: ${err.message}`);
    process.exit(2);
  }
}

const [file, earlierFile] = process.argv.slice(2);
if (!file) {
  console.error("Usage: node verify-custody-export.mjs <export.json> [<earlier-export.json>]");
  process.exit(2);
}
const exported = read(file);
const problems = verifyExport(exported);
if (earlierFile) problems.push(...verifyContinuation(read(earlierFile), exported));
const name = `${exported.transfer.number} (${exported.entries.length} entries, head ${exported.head?.seq ?? "none"})`;
if (problems.length === 0) {
  console.log(`Intact: the custody log of ${name} checks out.`);
  process.exit(0);
}
console.log(`Broken: the custody log of ${name} does not check out.`);
for (const problem of problems) console.log(`- ${problem}`);
process.exit(1);
