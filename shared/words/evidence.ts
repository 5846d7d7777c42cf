/**
 * Custody evidence in sentences: what an alert says when a seal, a count, a time, a place or a
 * person at a handoff is not what the record expects. These sentences are stored with the alert and
 * e-mailed to both parties, whose units are not known, so distances and speeds give both systems.
 */
import type {
  DeliveryAcknowledgementWay,
  DeliveryState,
  HandoffKind,
  HandoffReasonKey,
  PhotoSubject,
  TransportMode,
} from "../constants";
import { formatDuration, formatInstant } from "../dates";
import { formatDistanceBoth, formatSpeedBoth, formatTempBoth } from "../units";
import { TRANSPORT_MODE_WORDS } from "./transfer";

/** A box in a sentence: its label, with "Box" in front unless the label starts with it ("Box A — corn snakes"). */
export function boxName(label: string): string {
  const trimmed = label.trim();
  return /^box\b/i.test(trimmed) ? trimmed : `Box ${trimmed}`;
}

/** Who recorded a handoff, as "courier read …" says it. */
export type Recorder = "sender" | "courier" | "receiver" | "admin";

const capitalized = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** Where in the trip a handoff happened, after a verb: "at the pickup", "at handoff 2 (courier to courier)". */
export function handoffMoment(kind: HandoffKind, handoffIndex: number): string {
  if (kind === "pickup") return "at the pickup";
  if (kind === "delivery") return "at the delivery";
  return `at handoff ${handoffIndex + 1} (courier to courier)`;
}

/** A handoff as the subject of a sentence: "The pickup", "Handoff 2", "The delivery". */
export function handoffName(kind: HandoffKind, handoffIndex: number): string {
  if (kind === "pickup") return "the pickup";
  if (kind === "delivery") return "the delivery";
  return `handoff ${handoffIndex + 1}`;
}

type SealFacts = {
  label: string;
  expected: string | null;
  read: string | null;
  recorder: Recorder;
  moment: string;
};

/** "Box D: expected seal SEAL-0004, courier read SEAL-0044 at the pickup." */
export function sealMismatchMessage({ label, expected, read, recorder, moment }: SealFacts): string {
  if (expected && read) return `${boxName(label)}: expected seal ${expected}, ${recorder} read ${read} ${moment}.`;
  if (expected) return `${boxName(label)}: expected seal ${expected}, ${recorder} read no number ${moment}.`;
  return `${boxName(label)}: no seal on record, ${recorder} read ${read ?? "a number"} ${moment}.`;
}

/** "Box D: seal SEAL-0004 broken or missing at the pickup." */
export function sealBrokenMessage({
  label,
  expected,
  read,
  recorder,
  moment,
  differs,
}: SealFacts & { differs: boolean }) {
  const what = expected ? `seal ${expected} broken or missing` : "found opened or damaged (no seal on record)";
  return `${boxName(label)}: ${what} ${moment}${differs && read ? `; ${recorder} read ${read}` : ""}.`;
}

/** "Courier counted 2 boxes at the pickup; the manifest lists 3." */
export function countMismatchMessage(counted: number, expected: number, recorder: Recorder, moment: string): string {
  return `${capitalized(recorder)} counted ${counted} ${counted === 1 ? "box" : "boxes"} ${moment}; the manifest lists ${expected}.`;
}

const reasonText = (reason: string | null | undefined) => (reason ? ` Reason given: ${reason}` : "");

/** "Pickup recorded 12 days 3 h before the planned departure (Sat, Dec 5, 2026, 06:35 EST). Reason given: …" */
export function earlyPickupMessage(
  pickupAt: number,
  plannedDepartureAt: string,
  timeZone: string | null,
  reason?: string | null,
): string {
  const early = formatDuration(Date.parse(plannedDepartureAt) - pickupAt);
  return `Pickup recorded ${early} before the planned departure (${formatInstant(plannedDepartureAt, timeZone)}).${reasonText(reason)}`;
}

/** Where a position came from, after "from" or "at". */
const POSITION_SOURCE = {
  recorded: "",
  origin: "the origin address",
  destination: "the destination address",
} as const;

export type SpeedFacts = {
  kind: HandoffKind;
  handoffIndex: number;
  previous: { kind: HandoffKind; handoffIndex: number; source: keyof typeof POSITION_SOURCE };
  source: keyof typeof POSITION_SOURCE;
  distanceKm: number;
  elapsedMs: number;
  averageMph: number;
  limitMph: number;
  mode: TransportMode;
};

/**
 * "The delivery was recorded 2,162 mi (3,480 km) from the pickup 1 min after it: 129,720 mph
 * (208,766 km/h) on average; the limit for “Overnight air carrier” is 600 mph (966 km/h). No position
 * was recorded on the phone, so Hatchway placed … at the origin address … Reason given: …"
 */
export function implausibleSpeedMessage(facts: SpeedFacts, reason?: string | null): string {
  const assumed = [
    facts.previous.source !== "recorded"
      ? `${handoffName(facts.previous.kind, facts.previous.handoffIndex)} at ${POSITION_SOURCE[facts.previous.source]}`
      : null,
    facts.source !== "recorded"
      ? `${handoffName(facts.kind, facts.handoffIndex)} at ${POSITION_SOURCE[facts.source]}`
      : null,
  ].filter(Boolean);
  return [
    `${capitalized(handoffName(facts.kind, facts.handoffIndex))} was recorded ${formatDistanceBoth(facts.distanceKm)} from ${handoffName(facts.previous.kind, facts.previous.handoffIndex)} ${formatDuration(facts.elapsedMs)} after it:`,
    `${formatSpeedBoth(facts.averageMph)} on average; the limit for “${TRANSPORT_MODE_WORDS[facts.mode]}” is ${formatSpeedBoth(facts.limitMph)}.`,
    assumed.length ? `No position was recorded on the phone, so Hatchway placed ${assumed.join(" and ")}.` : null,
  ]
    .filter(Boolean)
    .join(" ")
    .concat(reasonText(reason));
}

/** "At the pickup the boxes went to “Sam Doe”, not the assigned courier (Juno Park). Reason given: …" */
export function unexpectedPartyMessage(
  moment: string,
  receivedBy: string,
  expected: { role: "courier" | "receiver"; names: readonly string[] },
  reason?: string | null,
): string {
  const who = expected.role === "courier" ? "the assigned courier" : "the receiver";
  const names = expected.names.length ? ` (${expected.names.join(", ")})` : "";
  return `${capitalized(moment)} the boxes went to “${receivedBy}”, not ${who}${names}.${reasonText(reason)}`;
}

/** What the phone asks for, and the 400 says, when a check fails and no reason was given. */
export const REASON_REQUESTS: Readonly<Record<HandoffReasonKey, string>> = {
  earlyPickup: "say why the boxes are picked up more than 24 hours before the planned departure",
  implausibleSpeed:
    "say how the boxes covered this distance in this time (a wrong place or time on an earlier record?)",
  unexpectedParty: "say why the boxes go to someone other than the assigned courier or the receiver",
};

/** A reason as the record says it: "Reason for the early pickup: …". */
export const REASON_TITLES: Readonly<Record<HandoffReasonKey, string>> = {
  earlyPickup: "Reason for the early pickup",
  implausibleSpeed: "Reason for the distance covered",
  unexpectedParty: "Reason for handing to someone else",
};

/** The reason field's label on the phone. */
export const REASON_LABELS: Readonly<Record<HandoffReasonKey, string>> = {
  earlyPickup: "Why so early?",
  implausibleSpeed: "How did the boxes get here so fast?",
  unexpectedParty: "Why someone else?",
};

/** What could not be checked at a handoff, said on the record instead of a silent pass. */
export const NOT_CHECKED = {
  speedNoPosition:
    "Speed since the last handoff not checked: no position was recorded here or at the handoff before, and no address stands in.",
  speedLoadedData: "Time and place not checked: these handoffs were loaded as demo or benchmark data.",
  sealsUnchecked: (labels: readonly string[]) =>
    `Seals not checked on ${labels.map(boxName).join(", ")}: the record says nothing about them.`,
} as const;

/**
 * A handoff in one sentence for e-mail, honest about the seals: "2 of 2 boxes counted; seals on 2
 * boxes read, matching the record and unbroken; box at 72 °F (22.2 °C); at Depot dock 3." A seal
 * that does not match or is broken is counted out loud, never summed up as intact.
 */
export function handoffSummaryText(h: {
  boxesCounted: number;
  boxesExpected: number;
  seals: readonly { matches: boolean; intact: boolean }[];
  sealsUnchecked: number;
  boxTempF: number | null;
  place: string | null;
  alerts: number;
}): string {
  const parts = [
    `${h.boxesCounted} of ${h.boxesExpected} ${h.boxesExpected === 1 ? "box" : "boxes"} counted${h.boxesCounted === h.boxesExpected ? "" : " (the count differs)"}`,
  ];
  const broken = h.seals.filter((s) => !s.intact).length;
  const mismatched = h.seals.filter((s) => s.intact && !s.matches).length;
  const good = h.seals.length - broken - mismatched;
  const seals: string[] = [];
  if (good) seals.push(`${good} read, matching the record and unbroken`);
  if (mismatched) seals.push(`${mismatched} with a number other than the one on record`);
  if (broken) seals.push(`${broken} broken or missing`);
  if (h.sealsUnchecked) seals.push(`${h.sealsUnchecked} not checked`);
  if (seals.length) parts.push(`seals: ${seals.join(", ")}`);
  parts.push(h.boxTempF === null ? "box temperature not taken" : `box at ${formatTempBoth(h.boxTempF)}`);
  if (h.place) parts.push(`at ${h.place}`);
  const alerts = h.alerts
    ? ` ${h.alerts === 1 ? "An alert was" : `${h.alerts} alerts were`} raised: see the transfer.`
    : "";
  return `${parts.join("; ")}.${alerts}`;
}

/** What a photo shows, as its caption starts. */
export const PHOTO_SUBJECT_WORDS: Readonly<Record<PhotoSubject, string>> = {
  box_outside: "Box from outside",
  seal: "Seal",
  animal: "Animal",
  other: "Other",
};

/** Where the delivery stands, as the transfer page says it. */
export const DELIVERY_STATE_WORDS: Readonly<Record<DeliveryState, string>> = {
  awaiting_receiver: "Delivery recorded by the courier: waiting for the receiver's acknowledgement",
  acknowledged: "Delivery acknowledged by the receiver",
};

/** How the receiver acknowledged, after "acknowledged". */
export const DELIVERY_WAY_WORDS: Readonly<Record<DeliveryAcknowledgementWay, string>> = {
  recorded_by_receiver: "by recording the delivery themselves",
  receiver_account: "from their own account",
  one_time_code: "with a one-time code on the courier's phone",
};
