import {
  ALERT_KINDS,
  type ChainProblem,
  DELIVERY_ACKNOWLEDGEMENT_WAYS,
  HANDOFF_KINDS,
  HANDOFF_REASON_KEYS,
  PHOTO_SUBJECTS,
  type AlertKind,
  TRANSFER_STATUSES,
  type CustodyKind,
  type DeliveryAcknowledgementWay,
  type HandoffKind,
  type PhotoSubject,
  type TransferStatus,
} from "../constants";
import { formatDuration, formatInstant } from "../dates";
import { SENT_LATE_MIN } from "../custody/phone-time";
import { VERDICTS as COMPLIANCE_VERDICTS } from "../compliance/schemas";
import { ADVICE_CODES, VERDICTS as TEMPERATURE_VERDICTS } from "../temperature/advice";
import { formatDistance, formatTemp, formatWeight, type UnitSystem } from "../units";
import { ALERT_KIND_WORDS } from "./alerts";
import { boxName, DELIVERY_WAY_WORDS, handoffMoment, PHOTO_SUBJECT_WORDS, REASON_TITLES } from "./evidence";
import { COMPLIANCE_VERDICT_WORDS } from "./compliance";
import { ADVICE_WORDS, TEMPERATURE_VERDICT_WORDS } from "./temperature";
import { HANDOFF_KIND_WORDS, TRANSFER_STATUS_WORDS } from "./transfer";

/** A custody entry's kind as the log's heading says it. */
export const CUSTODY_KIND_WORDS: Readonly<Record<CustodyKind, string>> = {
  created: "Transfer created",
  status_change: "State changed",
  handoff: "Handoff recorded",
  check_in: "Arrival checked in",
  couriers_assigned: "Couriers assigned",
  override: "Check overridden",
  correction: "Correction",
  checks_skipped: "Loaded without checks",
  alert_raised: "Alert raised",
  alert_acknowledged: "Alert acknowledged",
  delivery_acknowledged: "Delivery acknowledged by the receiver",
  photo_added: "Photo added",
};

/** What a break in the custody chain is, as a short heading. */
export const CHAIN_PROBLEM_WORDS: Readonly<Record<ChainProblem, string>> = {
  missing: "Entries missing",
  out_of_order: "Entry out of order",
  changed: "Entry changed",
  unlinked: "Link broken",
  missing_tail: "Entries missing at the end",
  beyond_head: "Entries past the recorded end",
  head_missing: "End of the log not recorded",
  head_mismatch: "Last entry replaced",
};

const entries = (from: number, to: number) => (from === to ? `Entry ${from}` : `Entries ${from} to ${to}`);

/**
 * The sentence for one break: where it is (`from`, and `to` for a run of entries) and what it
 * means. Verification (shared/custody/hash-chain.ts) and the export's checker say these.
 */
export function chainBreakSentence(problem: ChainProblem, from: number, to = from): string {
  switch (problem) {
    case "missing":
      return `${entries(from, to)} ${from === to ? "is" : "are"} missing from the log.`;
    case "out_of_order":
      return `Entry ${from} is out of order.`;
    case "changed":
      return `Entry ${from} was changed after it was written.`;
    case "unlinked":
      return `Entry ${from} does not point at the entry before it: one of the two was changed or replaced.`;
    case "missing_tail":
      return `${entries(from, to)} at the end of the log ${from === to ? "is" : "are"} missing: the log's recorded end is entry ${to}.`;
    case "beyond_head":
      return `${entries(from, to)} ${from === to ? "was" : "were"} added past the log's recorded end (entry ${from - 1}), bypassing the database's safeguards.`;
    case "head_missing":
      return `The log's recorded end is missing, so entries after entry ${from} could have been removed unnoticed.`;
    case "head_mismatch":
      return `Entry ${from} is not the entry the log's recorded end names: it was replaced.`;
  }
}

/** Which check an override went past. */
const GATE_WORDS: Readonly<Record<"compliance" | "temperature", string>> = {
  compliance: "the rules and permits check",
  temperature: "the temperature check",
};

const isOneOf = <T extends string>(list: readonly T[], value: unknown): value is T =>
  typeof value === "string" && (list as readonly string[]).includes(value);
const textOf = (value: unknown): string | null => (typeof value === "string" && value.trim() !== "" ? value : null);
const numberOf = (value: unknown): number | null =>
  typeof value === "number" && Number.isFinite(value) ? value : null;
const recordOf = (value: unknown): Record<string, unknown> =>
  value && typeof value === "object" && !Array.isArray(value) ? (value as Record<string, unknown>) : {};
const listOf = (value: unknown): unknown[] => (Array.isArray(value) ? value : []);

const statusText = (value: unknown): string | null =>
  isOneOf<TransferStatus>(TRANSFER_STATUSES, value) ? `“${TRANSFER_STATUS_WORDS[value]}”` : null;
/** A state inside a sentence: "waiting for the receiver". */
const statusInSentence = (value: unknown): string | null =>
  isOneOf<TransferStatus>(TRANSFER_STATUSES, value) ? lowerFirst(TRANSFER_STATUS_WORDS[value]) : null;
const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);

function statusChange(payload: Record<string, unknown>): string[] {
  const from = statusInSentence(payload.from);
  const to = statusInSentence(payload.to);
  const lines = [from && to ? `Status: ${from} → ${to}.` : to ? `Status: now ${to}.` : "The state changed."];
  const reason = textOf(payload.reason);
  if (reason) lines.push(`Reason: ${reason}`);
  return lines;
}

/** Each seal as read: the ones that differ or are broken one by one, never summed up as "intact". */
function sealLines(payload: Record<string, unknown>): string[] {
  const seals = listOf(payload.seals).map(recordOf);
  const lines: string[] = [];
  let good = 0;
  for (const seal of seals) {
    const label = textOf(seal.label);
    const box = label ? boxName(label) : "A box";
    const expected = textOf(seal.expected);
    const read = textOf(seal.sealNumber);
    if (seal.intact === false)
      lines.push(
        `${box}: ${expected ? `seal ${expected} broken or missing` : "opened or damaged"}${read && read !== expected ? `; read ${read}` : ""}.`,
      );
    else if (seal.matches === false)
      lines.push(`${box}: seal ${expected ?? "none on record"} → read ${read ?? "no number"}.`);
    else good += 1;
  }
  if (good)
    lines.unshift(
      good === seals.length
        ? `Seals read on ${good} ${good === 1 ? "box" : "boxes"}: each matches the record and is unbroken.`
        : `Seals read on ${good} more ${good === 1 ? "box match" : "boxes match"} the record and are unbroken.`,
    );
  const unchecked = listOf(payload.sealsUnchecked).length;
  if (unchecked) lines.push(`Seals not checked on ${unchecked} ${unchecked === 1 ? "box" : "boxes"}.`);
  return lines;
}

function handoff(payload: Record<string, unknown>, system: UnitSystem): string[] {
  const kind = isOneOf<HandoffKind>(HANDOFF_KINDS, payload.handoffKind) ? payload.handoffKind : null;
  const lines: string[] = [];
  if (kind) lines.push(`${HANDOFF_KIND_WORDS[kind]}.`);
  const released = textOf(payload.releasedByName);
  const received = textOf(payload.receivedByName);
  if (released && received) lines.push(`${released} handed the boxes to ${received}.`);
  const counted = numberOf(payload.boxesCounted);
  const expected = numberOf(payload.boxesExpected);
  if (counted !== null && expected !== null)
    lines.push(`${counted} of ${expected} boxes counted${counted === expected ? "" : " — the count differs"}.`);
  lines.push(...sealLines(payload));
  const temperature = numberOf(payload.boxTempF);
  lines.push(temperature === null ? "Box temperature not taken." : `Box at ${formatTemp(temperature, system)}.`);
  const phoneAt = textOf(payload.confirmedOnPhoneAt);
  const waited = numberOf(payload.waitedOnPhoneMin);
  if (phoneAt && waited !== null && waited >= SENT_LATE_MIN)
    lines.push(
      `Confirmed on the phone at ${formatInstant(phoneAt)} (the phone's clock) and kept there without signal; it reached Hatchway ${formatDuration(waited * 60_000)} later.`,
    );
  const place = recordOf(payload.place);
  const placeText = textOf(place.text);
  const lat = numberOf(place.lat);
  const lon = numberOf(place.lon);
  if (placeText) lines.push(`Place: ${placeText}.`);
  if (lat !== null && lon !== null) lines.push(`Position: ${lat.toFixed(4)}, ${lon.toFixed(4)}.`);
  const plausibility = recordOf(payload.plausibility);
  const speed = recordOf(plausibility.speed);
  const distanceKm = numberOf(speed.distanceKm);
  const elapsedH = numberOf(speed.elapsedH);
  const fromIndex = numberOf(speed.fromHandoffIndex);
  if (distanceKm !== null && elapsedH !== null && fromIndex !== null)
    lines.push(
      `${formatDistance(distanceKm, system)} from handoff ${fromIndex + 1} in ${formatDuration(elapsedH * 3_600_000)}.`,
    );
  const reasons = recordOf(payload.reasons);
  for (const key of HANDOFF_REASON_KEYS) {
    const reason = textOf(reasons[key]);
    if (reason) lines.push(`${REASON_TITLES[key]}: ${reason}`);
  }
  for (const line of listOf(plausibility.notChecked)) if (textOf(line)) lines.push(String(line));
  if (payload.receiverAcknowledgement === "pending")
    lines.push("Recorded by the courier alone: the receiver's acknowledgement is awaited.");
  const notes = textOf(payload.notes);
  if (notes) lines.push(`Notes: ${notes}`);
  return lines;
}

function checkIn(payload: Record<string, unknown>, system: UnitSystem): string[] {
  const lines: string[] = [];
  const signed = textOf(payload.signedName);
  if (signed) lines.push(`Signed by ${signed}.`);
  const summary = textOf(payload.summary);
  if (summary) lines.push(summary);
  const temperature = numberOf(payload.boxTempF);
  if (temperature !== null) lines.push(`Box at ${formatTemp(temperature, system)} on opening.`);
  for (const line of listOf(payload.lines).map(recordOf)) {
    const name = textOf(line.scientificName) ?? "An animal line";
    const parts: string[] = [];
    const dead = numberOf(line.deadOnArrival);
    const missing = numberOf(line.missing);
    if (dead) parts.push(`${dead} dead on arrival`);
    if (missing) parts.push(`${missing} missing`);
    const problem = textOf(line.problem);
    if (problem) parts.push(`problem: ${problem}`);
    const weight = numberOf(line.weightG);
    if (weight !== null) parts.push(`weight ${formatWeight(weight, system)}`);
    const notes = textOf(line.notes);
    if (notes) parts.push(`notes: ${notes}`);
    if (parts.length) lines.push(`${name}: ${parts.join("; ")}`.replace(/([^.!?])$/, "$1."));
  }
  const notes = textOf(payload.notes);
  if (notes) lines.push(`Notes: ${notes}`);
  return lines;
}

function deliveryAcknowledged(payload: Record<string, unknown>): string[] {
  const name = textOf(payload.receiverName) ?? "The receiver";
  const way = isOneOf<DeliveryAcknowledgementWay>(DELIVERY_ACKNOWLEDGEMENT_WAYS, payload.way)
    ? ` ${DELIVERY_WAY_WORDS[payload.way]}`
    : "";
  return [`${name} confirmed having the boxes${way}.`];
}

function photoAdded(payload: Record<string, unknown>): string[] {
  const subject = isOneOf<PhotoSubject>(PHOTO_SUBJECTS, payload.subject)
    ? PHOTO_SUBJECT_WORDS[payload.subject]
    : "Photo";
  const index = numberOf(payload.handoffIndex);
  const kind = isOneOf<HandoffKind>(HANDOFF_KINDS, payload.handoffKind) ? payload.handoffKind : null;
  const moment =
    payload.moment === "check_in" ? "at the check-in" : kind && index !== null ? handoffMoment(kind, index) : "";
  const shows = textOf(payload.shows);
  const lines = [`${subject}${moment ? ` ${moment}` : ""}${shows ? ` — ${shows}` : ""}.`];
  const caption = textOf(payload.caption);
  if (caption) lines.push(caption);
  return lines;
}

function couriersAssigned(payload: Record<string, unknown>): string[] {
  if ("courierService" in payload) {
    const service = payload.courierService ? textOf(recordOf(payload.courierService).name) : null;
    return [service ? `Courier service asked to carry it: ${service}.` : "No courier service asked to carry it."];
  }
  const legs = listOf(payload.legs).map(recordOf);
  if (legs.length === 0) return ["No couriers."];
  return legs.map((leg, i) => `Leg ${numberOf(leg.sequence) ?? i + 1}: ${textOf(leg.courierName) ?? "a courier"}.`);
}

/** "Tennessee, Kentucky and Oregon". */
const inWords = (names: readonly string[]) =>
  names.length <= 1 ? names.join("") : `${names.slice(0, -1).join(", ")} and ${names.at(-1)}`;

function override(payload: Record<string, unknown>): string[] {
  const gate = payload.gate === "compliance" || payload.gate === "temperature" ? payload.gate : null;
  const verdict =
    gate === "compliance" && isOneOf(COMPLIANCE_VERDICTS, payload.verdict)
      ? COMPLIANCE_VERDICT_WORDS[payload.verdict]
      : gate === "temperature" && isOneOf(TEMPERATURE_VERDICTS, payload.verdict)
        ? TEMPERATURE_VERDICT_WORDS[payload.verdict]
        : null;
  const unverified = listOf(payload.unverified)
    .map((entry) => textOf(recordOf(entry).name))
    .filter((n) => n !== null);
  const lines =
    payload.acknowledgement === true && gate === "compliance"
      ? [
          `Accepted ${GATE_WORDS.compliance}${verdict ? ` as “${verdict}”` : ""}: the rules of ${unverified.length ? inWords(unverified) : "a state on the route"} are not reviewed in Hatchway's library.`,
        ]
      : [gate ? `Went past ${GATE_WORDS[gate]}${verdict ? `, which said “${verdict}”` : ""}.` : "Went past a check."];
  if (isOneOf(ADVICE_CODES, payload.advice)) lines.push(`The advice was: ${ADVICE_WORDS[payload.advice]}.`);
  const findings = listOf(payload.findings).length;
  if (findings) lines.push(`${findings} open ${findings === 1 ? "finding" : "findings"} at the time.`);
  const reason = textOf(payload.reason);
  if (reason) lines.push(`Reason: ${reason}`);
  return lines;
}

function created(payload: Record<string, unknown>): string[] {
  const number = textOf(payload.number);
  const status = statusText(payload.status);
  return [`${number ? `Transfer ${number}` : "The transfer"} was started${status ? `, ${status}` : ""}.`];
}

/**
 * What a custody entry says, in sentences: the heading and the lines under it. The entry's data
 * is kept as it was recorded (its hash covers it); only the way it reads is ours.
 */
export function describeCustodyEntry(
  entry: { kind: string; payload: Record<string, unknown> },
  system: UnitSystem,
): { title: string; lines: string[] } {
  const payload = recordOf(entry.payload);
  switch (entry.kind as CustodyKind) {
    case "created":
      return { title: CUSTODY_KIND_WORDS.created, lines: created(payload) };
    case "status_change":
      return { title: CUSTODY_KIND_WORDS.status_change, lines: statusChange(payload) };
    case "handoff":
      return { title: CUSTODY_KIND_WORDS.handoff, lines: handoff(payload, system) };
    case "check_in":
      return { title: CUSTODY_KIND_WORDS.check_in, lines: checkIn(payload, system) };
    case "delivery_acknowledged":
      return { title: CUSTODY_KIND_WORDS.delivery_acknowledged, lines: deliveryAcknowledged(payload) };
    case "photo_added":
      return { title: CUSTODY_KIND_WORDS.photo_added, lines: photoAdded(payload) };
    case "couriers_assigned":
      return { title: CUSTODY_KIND_WORDS.couriers_assigned, lines: couriersAssigned(payload) };
    case "override":
      return { title: CUSTODY_KIND_WORDS.override, lines: override(payload) };
    case "correction": {
      const reason = textOf(payload.reason);
      return { title: CUSTODY_KIND_WORDS.correction, lines: reason ? [`Reason: ${reason}`] : [] };
    }
    case "checks_skipped": {
      const reason = textOf(payload.reason);
      return {
        title: CUSTODY_KIND_WORDS.checks_skipped,
        lines: reason ? [reason] : ["Cleared to ship without the compliance and temperature checks."],
      };
    }
    case "alert_raised": {
      const message = textOf(payload.message);
      const kind = isOneOf<AlertKind>(ALERT_KINDS, payload.alertKind) ? ALERT_KIND_WORDS[payload.alertKind] : null;
      return {
        title: kind ? `${CUSTODY_KIND_WORDS.alert_raised}: ${kind}` : CUSTODY_KIND_WORDS.alert_raised,
        lines: message ? [message] : [],
      };
    }
    case "alert_acknowledged": {
      const message = textOf(payload.message);
      const note = textOf(payload.note);
      return {
        title: CUSTODY_KIND_WORDS.alert_acknowledged,
        lines: [...(message ? [`Alert: ${message}`] : []), ...(note ? [`Note: ${note}`] : [])],
      };
    }
    default:
      return { title: "Other entry", lines: [] };
  }
}
