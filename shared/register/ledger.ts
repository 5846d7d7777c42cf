/**
 * The register's arithmetic (issue 15 §1, §3): what each event does to the count of animals in a
 * keeper's care, which events stand after corrections, and the yearly report per species. Pure:
 * the server reads the rows, this adds them up.
 */
import type { RegisterEventKind, RegisterStatus, ReportColumn } from "../constants";

/** Which report column an event counts in and whether it adds animals (+1), takes them out (−1) or neither (0). */
export const EVENT_EFFECT: Readonly<Record<RegisterEventKind, { column: ReportColumn | null; sign: 1 | -1 | 0 }>> = {
  acquired: { column: "acquired", sign: 1 },
  loan_returned: { column: "acquired", sign: 1 },
  hatched: { column: "hatched", sign: 1 },
  died: { column: "died", sign: -1 },
  euthanised: { column: "died", sign: -1 },
  sold: { column: "transferredOut", sign: -1 },
  given: { column: "transferredOut", sign: -1 },
  transferred_out: { column: "transferredOut", sign: -1 },
  loaned_out: { column: "transferredOut", sign: -1 },
  escaped: { column: "escapedOrReleased", sign: -1 },
  released: { column: "escapedOrReleased", sign: -1 },
  // A split moves animals between two entries of one species, on one day: no report column.
  split_off: { column: null, sign: -1 },
  split_from: { column: null, sign: 1 },
  measured: { column: null, sign: 0 },
  note: { column: null, sign: 0 },
  // Animals on the manifest that never came: recorded, never in the keeper's care.
  missing_on_arrival: { column: null, sign: 0 },
  voided: { column: null, sign: 0 },
};

/** The event kinds a keeper may record by hand (the others are written by check-in, splits and corrections). */
export const RECORDABLE_EVENT_KINDS = [
  "acquired",
  "hatched",
  "measured",
  "died",
  "euthanised",
  "sold",
  "given",
  "transferred_out",
  "loaned_out",
  "loan_returned",
  "escaped",
  "released",
  "note",
  "voided",
] as const satisfies readonly RegisterEventKind[];

/** Kinds that take animals out and so need a counterparty (to whom) in a permit holder's records. */
export const KINDS_WITH_COUNTERPARTY: readonly RegisterEventKind[] = ["sold", "given", "transferred_out", "loaned_out"];

export type LedgerEvent = {
  id: string;
  entryId: string;
  kind: RegisterEventKind;
  /** The day it happened, YYYY-MM-DD. */
  on: string;
  count: number;
  /** The event this one replaces (a correction); null for an original record. */
  correctsEventId: string | null;
};

/**
 * The events that stand: an event replaced by a later correction drops out (the correction takes
 * its place), and a `voided` correction stands for nothing. Chains of corrections resolve to the last.
 */
export function standingEvents<E extends LedgerEvent>(events: readonly E[]): E[] {
  const replaced = new Set(events.flatMap((event) => (event.correctsEventId ? [event.correctsEventId] : [])));
  return events.filter((event) => !replaced.has(event.id) && event.kind !== "voided");
}

/** Animals an event adds (positive) or takes out (negative). */
export const signedCount = (event: Pick<LedgerEvent, "kind" | "count">): number =>
  EVENT_EFFECT[event.kind].sign * event.count;

/** The count in care after the standing events up to and including `on` (all of them without a date). */
export function countInCare(events: readonly LedgerEvent[], on?: string): number {
  return standingEvents(events)
    .filter((event) => on === undefined || event.on <= on)
    .reduce((sum, event) => sum + signedCount(event), 0);
}

/**
 * Where an entry stands: in care while any animal is; otherwise what took the last ones out
 * (never arrived when nothing ever came in).
 */
export function statusOf(events: readonly LedgerEvent[]): RegisterStatus {
  const standing = standingEvents(events);
  if (standing.reduce((sum, event) => sum + signedCount(event), 0) > 0) return "in_care";
  const lastOut = [...standing]
    .filter((event) => EVENT_EFFECT[event.kind].sign < 0)
    .sort((a, b) => (a.on < b.on ? -1 : a.on > b.on ? 1 : 0))
    .at(-1);
  if (!lastOut) return "never_arrived";
  switch (lastOut.kind) {
    case "died":
    case "euthanised":
      return "died";
    case "loaned_out":
      return "on_loan";
    case "escaped":
    case "released":
      return "escaped_or_released";
    case "split_off":
      return "split";
    default:
      return "transferred_out";
  }
}

/**
 * The first day the count would go below zero if `candidate` were added, or null when it never
 * does. Checked over the whole timeline, so a death back-dated before a sale cannot oversell.
 */
export function firstShortfall(events: readonly LedgerEvent[], candidate: LedgerEvent): string | null {
  const all = standingEvents([...events, candidate]).sort((a, b) =>
    a.on === b.on ? signedCount(b) - signedCount(a) : a.on < b.on ? -1 : 1,
  );
  let count = 0;
  for (const event of all) {
    count += signedCount(event);
    if (count < 0) return event.on;
  }
  return null;
}

export type ReportEventRow<E> = E & { column: ReportColumn };

export type SpeciesReport<E> = {
  scientificName: string;
  start: number;
  acquired: number;
  hatched: number;
  died: number;
  transferredOut: number;
  escapedOrReleased: number;
  end: number;
  events: ReportEventRow<E>[];
};

/**
 * The yearly report for the days `from`..`to` (inclusive): per species, the count at the start
 * (standing events before `from`), each column's animals within the period, and the count at the
 * end = start + acquired + hatched − died − transferred out − escaped or released [practice:
 * SOURCES.md, "Records and reports"]. Splits move animals within one species and cancel out.
 */
export function buildReport<E extends LedgerEvent>(
  entries: ReadonlyMap<string, { scientificName: string }>,
  events: readonly E[],
  from: string,
  to: string,
  /** Counts per species already added up from standing events before `from` (a database may sum them). */
  opening: ReadonlyMap<string, number> = new Map(),
): SpeciesReport<E>[] {
  const bySpecies = new Map<string, SpeciesReport<E>>();
  const row = (scientificName: string) => {
    let found = bySpecies.get(scientificName);
    if (!found) {
      found = {
        scientificName,
        start: 0,
        acquired: 0,
        hatched: 0,
        died: 0,
        transferredOut: 0,
        escapedOrReleased: 0,
        end: 0,
        events: [],
      };
      bySpecies.set(scientificName, found);
    }
    return found;
  };
  for (const [scientificName, count] of opening) row(scientificName).start += count;
  for (const event of standingEvents(events)) {
    const entry = entries.get(event.entryId);
    if (!entry || event.on > to) continue;
    const species = row(entry.scientificName);
    if (event.on < from) {
      species.start += signedCount(event);
      continue;
    }
    const column = EVENT_EFFECT[event.kind].column;
    if (column) {
      species[column] += event.count;
      species.events.push({ ...event, column });
    }
  }
  const reports = [...bySpecies.values()];
  for (const species of reports) {
    species.end =
      species.start +
      species.acquired +
      species.hatched -
      species.died -
      species.transferredOut -
      species.escapedOrReleased;
    species.events.sort((a, b) => (a.on < b.on ? -1 : a.on > b.on ? 1 : 0));
  }
  return reports
    .filter((species) => species.start !== 0 || species.end !== 0 || species.events.length > 0)
    .sort((a, b) => a.scientificName.localeCompare(b.scientificName));
}
