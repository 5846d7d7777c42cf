import type { UsState } from "@shared/constants";
import { z } from "../validation/zod";
import { FEDERAL, JURISDICTIONS, jurisdictionName, type Jurisdiction } from "./jurisdiction";
import type { Rule } from "./rule";

/** An office a keeper can ask: its name and official web address. */
export const agencySchema = z.strictObject({ name: z.string(), url: z.string() });
export type Agency = z.infer<typeof agencySchema>;

/**
 * What Hatchway knows of a jurisdiction's rules: whether someone reviewed the library's rules
 * for it (when, by whom), and the offices to confirm with. A jurisdiction is covered only when
 * reviewed; until then every verdict on a route through it is "unverified".
 */
export interface CoverageRecord {
  jurisdiction: Jurisdiction;
  /** ISO calendar date of the last review of the library's rules for it; null: never reviewed. */
  reviewedOn: string | null;
  reviewedBy: string | null;
  /** The wildlife agency (the federal one for "US"). */
  wildlifeAgency: Agency;
  /** The state veterinarian's office (the federal animal-health service for "US"). */
  stateVeterinarian: Agency;
}

/** Where a jurisdiction sits on the route. */
export const ROUTE_ROLES = ["federal", "origin", "transit", "destination"] as const;
export type RouteRole = (typeof ROUTE_ROLES)[number];

/** Why a jurisdiction on the route does not count as covered. */
export const UNCOVERED_REASONS = ["not_reviewed", "demo_rules", "no_record"] as const;
export type UncoveredReason = (typeof UNCOVERED_REASONS)[number];

/**
 * One jurisdiction on the route, as `coverage` of the evaluation reports it. The first four
 * fields are the public contract (`jurisdiction`, `covered`, `reviewedOn`, `agency`); the rest
 * help the screens say whom to ask and why it is not covered.
 */
export const coverageEntrySchema = z.strictObject({
  jurisdiction: z.enum(JURISDICTIONS),
  covered: z.boolean(),
  reviewedOn: z.string().nullable(),
  agency: agencySchema,
  name: z.string(),
  role: z.enum(ROUTE_ROLES),
  reviewedBy: z.string().nullable(),
  veterinarian: agencySchema.nullable(),
  /** Null when covered. */
  uncoveredBecause: z.enum(UNCOVERED_REASONS).nullable(),
});
export type CoverageEntry = z.infer<typeof coverageEntrySchema>;

/** The route as coverage reads it. Transit states are in travel order. */
export interface CoverageRoute {
  originState: UsState;
  destinationState: UsState;
  transitStates: readonly UsState[];
}

/**
 * The jurisdictions a move answers to, in the order a keeper reads them: federal law, the
 * origin, every state passed through (in travel order, each once, never an end of the route),
 * then the destination (once, when the move stays within one state).
 */
export function routeJurisdictions(route: CoverageRoute): { jurisdiction: Jurisdiction; role: RouteRole }[] {
  const ends = new Set<string>([route.originState, route.destinationState]);
  const transit = [...new Set(route.transitStates)].filter((state) => !ends.has(state));
  const list: { jurisdiction: Jurisdiction; role: RouteRole }[] = [
    { jurisdiction: FEDERAL, role: "federal" },
    { jurisdiction: route.originState, role: "origin" },
    ...transit.map((state) => ({ jurisdiction: state as Jurisdiction, role: "transit" as const })),
  ];
  if (route.destinationState !== route.originState)
    list.push({ jurisdiction: route.destinationState, role: "destination" });
  return list;
}

/** Jurisdictions with a demo rule among the rules given (retired rules should not be given). */
export function demoRuleJurisdictions(rules: readonly Pick<Rule, "jurisdiction" | "demo">[]): Set<Jurisdiction> {
  return new Set(rules.filter((rule) => rule.demo).map((rule) => rule.jurisdiction));
}

/** The agency to ask when a jurisdiction has no coverage record at all (it should always have one). */
const UNKNOWN_AGENCY: Agency = { name: "the state's wildlife agency", url: "" };

/**
 * Coverage of every jurisdiction on the route. A jurisdiction is covered when its rules in the
 * library were reviewed and no demo rule stands for it: invented rules never count as a review.
 */
export function coverageForRoute(
  route: CoverageRoute,
  records: readonly CoverageRecord[],
  demoJurisdictions: ReadonlySet<Jurisdiction>,
): CoverageEntry[] {
  const byJurisdiction = new Map(records.map((record) => [record.jurisdiction, record]));
  return routeJurisdictions(route).map(({ jurisdiction, role }) => {
    const record = byJurisdiction.get(jurisdiction);
    const uncoveredBecause: UncoveredReason | null = !record
      ? "no_record"
      : record.reviewedOn === null
        ? "not_reviewed"
        : demoJurisdictions.has(jurisdiction)
          ? "demo_rules"
          : null;
    return {
      jurisdiction,
      covered: uncoveredBecause === null,
      reviewedOn: record?.reviewedOn ?? null,
      agency: record?.wildlifeAgency ?? UNKNOWN_AGENCY,
      name: jurisdiction === FEDERAL ? "Federal law" : jurisdictionName(jurisdiction),
      role,
      reviewedBy: record?.reviewedBy ?? null,
      veterinarian: record?.stateVeterinarian ?? null,
      uncoveredBecause,
    };
  });
}

/** The jurisdictions on the route whose rules Hatchway has not verified. */
export function uncovered(coverage: readonly CoverageEntry[]): CoverageEntry[] {
  return coverage.filter((entry) => !entry.covered);
}

/** The jurisdiction's name inside a sentence: "federal law", "Tennessee", "the District of Columbia". */
export function nameInSentence(entry: Pick<CoverageEntry, "jurisdiction" | "name">): string {
  return entry.jurisdiction === FEDERAL ? "federal law" : entry.name;
}

/** "Tennessee (ask Tennessee Wildlife Resources Agency, https://…)": who to ask, in a sentence. */
export function askWhom(entry: Pick<CoverageEntry, "jurisdiction" | "name" | "agency">): string {
  const name = nameInSentence(entry);
  return entry.agency.url ? `${name} (ask ${entry.agency.name}, ${entry.agency.url})` : name;
}

/** "Tennessee, Kentucky and Oregon". */
export function listInWords(names: readonly string[]): string {
  if (names.length <= 1) return names.join("");
  return `${names.slice(0, -1).join(", ")} and ${names.at(-1)}`;
}
