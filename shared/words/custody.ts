import {
  ALERT_KINDS,
  HANDOFF_KINDS,
  type AlertKind,
  TRANSFER_STATUSES,
  type CustodyKind,
  type HandoffKind,
  type TransferStatus,
} from "../constants";
import { VERDICTS as COMPLIANCE_VERDICTS } from "../compliance/schemas";
import { ADVICE_CODES, VERDICTS as TEMPERATURE_VERDICTS } from "../temperature/advice";
import { formatTemp, type UnitSystem } from "../units";
import { ALERT_KIND_WORDS } from "./alerts";
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
};

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

function statusChange(payload: Record<string, unknown>): string[] {
  const from = statusText(payload.from);
  const to = statusText(payload.to);
  const lines = [from && to ? `From ${from} to ${to}.` : to ? `Now ${to}.` : "The state changed."];
  const reason = textOf(payload.reason);
  if (reason) lines.push(`Reason: ${reason}`);
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
  const seals = listOf(payload.seals).map(recordOf);
  if (seals.length) {
    const broken = seals.filter((s) => s.intact === false).length;
    const mismatched = seals.filter((s) => s.matches === false).length;
    const parts = [broken === 0 ? "all intact" : `${broken} not intact`];
    if (mismatched) parts.push(`${mismatched} with a number other than the one on record`);
    lines.push(`Seals checked on ${seals.length} ${seals.length === 1 ? "box" : "boxes"}: ${parts.join(", ")}.`);
  }
  const unchecked = listOf(payload.sealsUnchecked).length;
  if (unchecked) lines.push(`Seals not checked on ${unchecked} ${unchecked === 1 ? "box" : "boxes"}.`);
  const temperature = numberOf(payload.boxTempF);
  lines.push(temperature === null ? "Box temperature not taken." : `Box at ${formatTemp(temperature, system)}.`);
  const place = recordOf(payload.place);
  const placeText = textOf(place.text);
  const lat = numberOf(place.lat);
  const lon = numberOf(place.lon);
  if (placeText) lines.push(`Place: ${placeText}.`);
  if (lat !== null && lon !== null) lines.push(`Position: ${lat.toFixed(4)}, ${lon.toFixed(4)}.`);
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
  return lines;
}

function couriersAssigned(payload: Record<string, unknown>): string[] {
  const legs = listOf(payload.legs).map(recordOf);
  if (legs.length === 0) return ["No couriers."];
  return legs.map((leg, i) => `Leg ${numberOf(leg.sequence) ?? i + 1}: ${textOf(leg.courierName) ?? "a courier"}.`);
}

function override(payload: Record<string, unknown>): string[] {
  const gate = payload.gate === "compliance" || payload.gate === "temperature" ? payload.gate : null;
  const verdict =
    gate === "compliance" && isOneOf(COMPLIANCE_VERDICTS, payload.verdict)
      ? COMPLIANCE_VERDICT_WORDS[payload.verdict]
      : gate === "temperature" && isOneOf(TEMPERATURE_VERDICTS, payload.verdict)
        ? TEMPERATURE_VERDICT_WORDS[payload.verdict]
        : null;
  const lines = [
    gate ? `Went past ${GATE_WORDS[gate]}${verdict ? `, which said “${verdict}”` : ""}.` : "Went past a check.",
  ];
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
