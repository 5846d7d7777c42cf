/**
 * Everything a handoff shows that the record did not expect, before it is confirmed: seals that do
 * not match or are broken, a box count that differs, a pickup long before the departure, a speed
 * the mode cannot reach, custody going to someone not assigned. The courier's phone shows this
 * review before the confirmation; the server runs the same review, refuses a failed plausibility
 * check without a reason, and raises an alert for every finding.
 */
import type { AlertKind, HandoffKind, HandoffReasonKey, TransportMode } from "../constants";
import type { LatLon } from "../temperature/geo";
import { handoffKind } from "../transfer/lifecycle";
import {
  countMismatchMessage,
  earlyPickupMessage,
  handoffMoment,
  implausibleSpeedMessage,
  NOT_CHECKED,
  sealBrokenMessage,
  sealMismatchMessage,
  unexpectedPartyMessage,
  type Recorder,
} from "../words/evidence";
import {
  checkSpeed,
  isEarlyPickup,
  isOneOfNames,
  sealNumbersMatch,
  type CustodyPoint,
  type SpeedCheck,
} from "./plausibility";

type Position = { lat?: number | null; lon?: number | null; accuracyM?: number | null };

/** What the record knows before this handoff. */
export type HandoffContext = {
  mode: TransportMode;
  plannedDepartureAt: string;
  /** The origin's IANA zone, in which the departure is said. */
  originTimeZone: string | null;
  /** The origin and destination addresses' positions (from their ZIP codes), when known. */
  origin: LatLon | null;
  destination: LatLon | null;
  /** The assigned couriers' names, by leg in order. */
  legCourierNames: readonly string[];
  /** Names the receiver may sign with: the contact, the organisation, the person recording when a receiver. */
  receiverNames: readonly string[];
  containers: readonly { id: string; label: string; sealNumber: string | null }[];
  /** Handoffs already recorded, any order. */
  previous: readonly { handoffIndex: number; at: string; place: Position }[];
};

/** The handoff as entered, at the time it is (or would be) recorded. */
export type HandoffDraft = {
  handoffIndex: number;
  boxesCounted: number;
  seals: readonly { containerId: string; sealNumber?: string | null; intact: boolean }[];
  place: Position;
  receivedByName: string;
  /** Epoch milliseconds: the server's clock when recording, the phone's when reviewing. */
  at: number;
  recorder: Recorder;
  reasons?: Partial<Record<HandoffReasonKey, string | null>>;
};

export type HandoffFinding = {
  kind: AlertKind;
  /** In words, with the reason when one was given: stored with the alert and e-mailed. */
  message: string;
  /** Set when the check needs a reason from the person recording. */
  reasonKey: HandoffReasonKey | null;
  data: Record<string, unknown>;
};

export type HandoffReview = {
  kind: HandoffKind;
  findings: HandoffFinding[];
  /** The reasons the findings need that were not given. */
  missingReasons: HandoffReasonKey[];
  /** What could not be checked, in words, for the record. */
  notChecked: string[];
  speed: (SpeedCheck & { fromIndex: number }) | null;
};

const hasPosition = (p: Position): p is { lat: number; lon: number; accuracyM?: number | null } =>
  typeof p.lat === "number" && typeof p.lon === "number";

/** Where custody changed hands: the phone's position, or for the pickup and the delivery the address it is taken to be at. */
function pointOf(
  place: Position,
  at: number,
  kind: HandoffKind,
  context: Pick<HandoffContext, "origin" | "destination">,
): CustodyPoint | null {
  if (hasPosition(place))
    return { lat: place.lat, lon: place.lon, accuracyM: place.accuracyM ?? null, at, source: "recorded" };
  if (kind === "pickup" && context.origin) return { ...context.origin, accuracyM: null, at, source: "origin" };
  if (kind === "delivery" && context.destination)
    return { ...context.destination, accuracyM: null, at, source: "destination" };
  return null;
}

function sealFindings(context: HandoffContext, draft: HandoffDraft, moment: string): HandoffFinding[] {
  const byId = new Map(context.containers.map((c) => [c.id, c]));
  const findings: HandoffFinding[] = [];
  for (const seal of draft.seals) {
    const box = byId.get(seal.containerId);
    if (!box) continue;
    const read = seal.sealNumber?.trim() || null;
    const facts = { label: box.label, expected: box.sealNumber, read, recorder: draft.recorder, moment };
    const matches = sealNumbersMatch(box.sealNumber, read);
    const data = {
      handoffIndex: draft.handoffIndex,
      containerId: box.id,
      label: box.label,
      expected: box.sealNumber,
      read,
    };
    if (!seal.intact)
      findings.push({
        kind: "seal_broken",
        message: sealBrokenMessage({ ...facts, differs: !matches }),
        reasonKey: null,
        data: { ...data, intact: false },
      });
    else if (!matches)
      findings.push({ kind: "seal_mismatch", message: sealMismatchMessage(facts), reasonKey: null, data });
  }
  return findings;
}

/** The last point before this handoff: the latest earlier handoff with a position (the pickup stands at the origin). */
function previousPoint(context: HandoffContext, index: number, legCount: number) {
  const earlier = [...context.previous]
    .filter((h) => h.handoffIndex < index)
    .sort((a, b) => b.handoffIndex - a.handoffIndex);
  for (const h of earlier) {
    const kind = handoffKind(h.handoffIndex, legCount);
    const point = pointOf(h.place, Date.parse(h.at), kind, context);
    if (point) return { point, handoffIndex: h.handoffIndex, kind };
  }
  return null;
}

/**
 * Reviews a handoff against the record. `plausibility: false` (data loaded as demo or bench) skips
 * the time, place and person checks and says so; seals and the count are always checked.
 */
export function reviewHandoff(
  context: HandoffContext,
  draft: HandoffDraft,
  options: { plausibility: boolean } = { plausibility: true },
): HandoffReview {
  const legCount = context.legCourierNames.length;
  const kind = handoffKind(draft.handoffIndex, legCount);
  const moment = handoffMoment(kind, draft.handoffIndex);
  const reasons = draft.reasons ?? {};
  const reasonOf = (key: HandoffReasonKey) => reasons[key]?.trim() || null;
  const findings = sealFindings(context, draft, moment);
  const notChecked: string[] = [];

  const checked = new Set(draft.seals.map((s) => s.containerId));
  const unchecked = context.containers.filter((c) => !checked.has(c.id));
  if (unchecked.length) notChecked.push(NOT_CHECKED.sealsUnchecked(unchecked.map((c) => c.label)));

  if (draft.boxesCounted !== context.containers.length)
    findings.push({
      kind: "count_mismatch",
      message: countMismatchMessage(draft.boxesCounted, context.containers.length, draft.recorder, moment),
      reasonKey: null,
      data: { handoffIndex: draft.handoffIndex, counted: draft.boxesCounted, expected: context.containers.length },
    });

  let speed: HandoffReview["speed"] = null;
  if (!options.plausibility) {
    notChecked.push(NOT_CHECKED.speedLoadedData);
  } else {
    if (kind === "pickup" && isEarlyPickup(draft.at, Date.parse(context.plannedDepartureAt)))
      findings.push({
        kind: "early_pickup",
        message: earlyPickupMessage(
          draft.at,
          context.plannedDepartureAt,
          context.originTimeZone,
          reasonOf("earlyPickup"),
        ),
        reasonKey: "earlyPickup",
        data: {
          handoffIndex: draft.handoffIndex,
          plannedDepartureAt: context.plannedDepartureAt,
          reason: reasonOf("earlyPickup"),
        },
      });

    if (kind !== "pickup") {
      const here = pointOf(draft.place, draft.at, kind, context);
      const before = previousPoint(context, draft.handoffIndex, legCount);
      if (!here || !before) notChecked.push(NOT_CHECKED.speedNoPosition);
      else {
        const check = checkSpeed(context.mode, before.point, here);
        speed = { ...check, fromIndex: before.handoffIndex };
        if (check.implausible)
          findings.push({
            kind: "implausible_speed",
            message: implausibleSpeedMessage(
              {
                kind,
                handoffIndex: draft.handoffIndex,
                previous: { kind: before.kind, handoffIndex: before.handoffIndex, source: before.point.source },
                source: here.source,
                distanceKm: check.distanceKm,
                elapsedMs: here.at - before.point.at,
                averageMph: check.averageMph,
                limitMph: check.limitMph,
                mode: context.mode,
              },
              reasonOf("implausibleSpeed"),
            ),
            reasonKey: "implausibleSpeed",
            data: {
              handoffIndex: draft.handoffIndex,
              fromHandoffIndex: before.handoffIndex,
              distanceKm: Math.round(check.distanceKm * 10) / 10,
              elapsedH: check.elapsedH,
              averageMph: Math.round(check.averageMph),
              limitMph: check.limitMph,
              reason: reasonOf("implausibleSpeed"),
            },
          });
      }
    }

    const expected =
      kind === "delivery"
        ? { role: "receiver" as const, names: context.receiverNames }
        : {
            role: "courier" as const,
            names: context.legCourierNames[draft.handoffIndex] ? [context.legCourierNames[draft.handoffIndex]!] : [],
          };
    if (!isOneOfNames(draft.receivedByName, expected.names))
      findings.push({
        kind: "unexpected_party",
        message: unexpectedPartyMessage(moment, draft.receivedByName.trim(), expected, reasonOf("unexpectedParty")),
        reasonKey: "unexpectedParty",
        data: {
          handoffIndex: draft.handoffIndex,
          receivedByName: draft.receivedByName,
          expected: expected.names,
          reason: reasonOf("unexpectedParty"),
        },
      });
  }

  const missingReasons = findings.flatMap((f) => (f.reasonKey && !reasonOf(f.reasonKey) ? [f.reasonKey] : []));
  return { kind, findings, missingReasons, notChecked, speed };
}
