import type { AnimalOrigin, DocumentKind, Purpose, Sex, UsState } from "@shared/constants";
import { formatDate } from "@shared/dates";
import { DOCUMENT_KIND_IN_SENTENCE, HOLDER_SIDE_WORDS } from "../words/documents";
import { FEDERAL, jurisdictionName, leavesContinentalUs, type Jurisdiction } from "./jurisdiction";
import type { PermitRequirement, Rule, RuleConditions, RuleEffect, StateTransitPolicy } from "./rule";
import type { EvaluateDocument, EvaluateResponse, Finding, Severity, Verdict } from "./schemas";
import {
  coverageForRoute,
  demoRuleJurisdictions,
  uncovered,
  type CoverageEntry,
  type CoverageRecord,
} from "./coverage";
import { groupShipmentFindings } from "./grouping";
import { indexBySelector, itemsForTaxon, normalizeTaxonName, taxonMatchKeys, type ResolvedTaxon } from "./taxon";

/** The facts of a transfer that rules read. Dates are ISO calendar dates (YYYY-MM-DD). */
export interface TransferFacts {
  originState: UsState;
  destinationState: UsState;
  transitStates: readonly UsState[];
  shipDate: string;
  purpose: Purpose;
  sale: boolean;
}

/** One animal line, with its taxon already resolved by the server. */
export interface EvaluationAnimal {
  /** As entered on the transfer (may be a synonym of taxon.scientificName). */
  scientificName: string;
  taxon: ResolvedTaxon;
  count: number;
  /** Carapace length for chelonians, total length otherwise; null or absent when not measured. */
  lengthMm?: number | null;
  origin: AnimalOrigin;
  sex: Sex;
}

export type EvaluationDocument = EvaluateDocument;

export interface EvaluationInput {
  facts: TransferFacts;
  animals: readonly EvaluationAnimal[];
  documents: readonly EvaluationDocument[];
  /** May hold several versions of a rule; the highest version in force on the ship date is used. */
  rules: readonly Rule[];
  /** States whose import rules spare a shipment that only passes through; others do not. */
  transitPolicies?: readonly StateTransitPolicy[];
  /**
   * What the library knows of each jurisdiction's rules. A jurisdiction on the route with no
   * reviewed record is not covered, so leaving this out makes every verdict at best "unverified".
   */
  coverage?: readonly CoverageRecord[];
}

type RouteRole = "federal" | "origin" | "destination" | "transit";

interface Route {
  facts: TransferFacts;
  transit: ReadonlySet<string>;
  transitExempt: ReadonlySet<string>;
  interstate: boolean;
  leavesContinental: boolean;
  commercial: boolean;
}

/** The conditions left to check per animal once the route has been checked, in one fixed shape. */
interface AnimalTest {
  origins: readonly AnimalOrigin[] | null;
  sexes: readonly Sex[] | null;
  countAbove: number | null;
  venomous: boolean | null;
  lengthBelowMm: number | null;
  lengthAboveMm: number | null;
}

interface ApplicableRule {
  rule: Rule;
  role: RouteRole;
  selector: Rule["selector"];
  test: AnimalTest;
  /** Position in finding order (severity, federal first, state, id). */
  order: number;
}

/** What one taxon's animals share within an evaluation: its names, rules and built findings. */
interface TaxonWork {
  keys: ReadonlySet<string>;
  candidates: readonly ApplicableRule[];
  /** Built findings by candidate position and assumptions (4 slots each), then by line name. */
  findings: Map<string, Finding>[];
}

interface PreparedDocument {
  doc: EvaluationDocument;
  coveredNames: readonly string[];
  statements: readonly string[];
}

type Match = { satisfiedBy: NonNullable<Finding["satisfiedBy"]>; label: string } | { reason: string | null };

const SEVERITY_ORDER: Record<Severity, number> = { blocks: 0, needs_document: 1, advisory: 2 };

/**
 * Evaluates every animal of a transfer against the rules in force on its ship date and the
 * documents on file. Pure and deterministic: findings are sorted by severity, jurisdiction
 * (federal first) and rule id; animals keep their input order. A certificate's age is the
 * number of calendar days from its issue date to the ship date (issued the same day: 0 days),
 * so with a 30-day limit a certificate issued 30 days before passes and one issued 31 days
 * before fails. Validity and effective windows include both end dates. Lines of the same taxon
 * share frozen finding objects: treat the result as read-only.
 *
 * Coverage: every jurisdiction on the route (federal, origin, transit, destination) is reported
 * with whether its rules were reviewed; a verdict that would be "clear" is "unverified" while one
 * of them is not covered. Findings every line shares word for word are reported once, in
 * `shipmentFindings`, and left out of the lines.
 */
export function evaluateCompliance(input: EvaluationInput): EvaluateResponse {
  const route = describeRoute(input.facts, input.transitPolicies ?? []);
  const index = indexBySelector(applicableRules(input.rules, route));
  const documents = input.documents.map(prepareDocument);
  const work = new Map<string, TaxonWork>();
  const used = new Set<ApplicableRule>();
  const animals = input.animals.map((animal) => {
    const workKey = taxonContentKey(animal.taxon);
    let taxonWork = work.get(workKey);
    if (!taxonWork) {
      const keys = taxonMatchKeys(animal.taxon);
      const candidates = itemsForTaxon(index, keys).sort((a, b) => a.order - b.order);
      taxonWork = { keys, candidates, findings: [] };
      work.set(workKey, taxonWork);
    }
    return { scientificName: animal.scientificName, findings: findingsFor(animal, taxonWork, route, documents, used) };
  });
  const coverage = coverageForRoute(
    input.facts,
    input.coverage ?? [],
    demoRuleJurisdictions(rulesInForce(input.rules, input.facts.shipDate)),
  );
  const grouped = groupShipmentFindings(animals);
  return {
    verdict: withCoverage(verdictOf(animals), coverage),
    shipmentFindings: grouped.shipmentFindings,
    animals: grouped.animals,
    rulesUsed: rulesUsedBy(used),
    coverage,
  };
}

/** Nothing is "clear" that was not checked: a clear verdict on a route with an uncovered jurisdiction is unverified. */
function withCoverage(verdict: Verdict, coverage: readonly CoverageEntry[]): Verdict {
  return verdict === "clear" && uncovered(coverage).length > 0 ? "unverified" : verdict;
}

/** Equal for equal taxa, so lines resolved separately still share their work. */
function taxonContentKey(taxon: ResolvedTaxon): string {
  const lineage = taxon.lineage.map((entry) => `${entry.rank}:${entry.scientificName}`);
  return [taxon.scientificName, taxon.rank, taxon.venomous, ...lineage, "=", ...taxon.synonyms].join("\u0001");
}

/**
 * The rules in force whose jurisdiction the route touches and whose transfer-wide conditions
 * (purpose, sale, route) hold, numbered in finding order.
 */
function applicableRules(rules: readonly Rule[], route: Route): ApplicableRule[] {
  const applicable: ApplicableRule[] = [];
  for (const rule of rulesInForce(rules, route.facts.shipDate)) {
    const role = routeRole(rule, route);
    if (role && transferConditionsHold(rule.conditions, route)) {
      applicable.push({ rule, role, selector: rule.selector, test: animalTestOf(rule.conditions), order: 0 });
    }
  }
  applicable.sort((a, b) => compareRules(a.rule, b.rule));
  applicable.forEach((entry, position) => (entry.order = position));
  return applicable;
}

function describeRoute(facts: TransferFacts, policies: readonly StateTransitPolicy[]): Route {
  const ends = [facts.originState, facts.destinationState];
  return {
    facts,
    transit: new Set(facts.transitStates.filter((state) => !ends.includes(state))),
    transitExempt: new Set(policies.filter((p) => p.transitOnlyExempt).map((p) => p.state)),
    interstate: facts.originState !== facts.destinationState,
    leavesContinental: leavesContinentalUs(facts.originState, facts.destinationState),
    commercial: facts.sale || facts.purpose === "commercial_sale",
  };
}

function inForceOn(rule: Rule, isoDate: string): boolean {
  return (
    (rule.effectiveFrom === null || rule.effectiveFrom <= isoDate) &&
    (rule.effectiveTo === null || isoDate <= rule.effectiveTo)
  );
}

/** The highest version of each rule id whose effective dates contain the ship date. */
function rulesInForce(rules: readonly Rule[], shipDate: string): Rule[] {
  const latest = new Map<string, Rule>();
  for (const rule of rules) {
    const current = latest.get(rule.id);
    if (inForceOn(rule, shipDate) && (!current || rule.version > current.version)) latest.set(rule.id, rule);
  }
  return [...latest.values()];
}

/** Where on the route a rule bites, or null when the route does not touch what it governs. */
function routeRole(rule: Rule, route: Route): RouteRole | null {
  const { originState: origin, destinationState: destination } = route.facts;
  const state = rule.jurisdiction;
  if (state === FEDERAL) {
    if (rule.governs === "interstate") return route.interstate ? "federal" : null;
    return rule.governs === "movement" || rule.governs === "possession" ? "federal" : null;
  }
  const inTransit = route.transit.has(state);
  switch (rule.governs) {
    case "import":
      if (route.interstate && destination === state) return "destination";
      return inTransit && !route.transitExempt.has(state) ? "transit" : null;
    case "export":
      return route.interstate && origin === state ? "origin" : null;
    case "transit":
      return inTransit ? "transit" : null;
    case "possession":
      return destination === state ? "destination" : null;
    case "interstate":
      if (!route.interstate) return null;
      return destination === state ? "destination" : origin === state ? "origin" : null;
    case "movement":
      return destination === state ? "destination" : origin === state ? "origin" : inTransit ? "transit" : null;
  }
}

/** Bits of an assumption made for a missing fact; NOT_MET when a condition fails. */
const SEX_ASSUMED = 1;
const LENGTH_ASSUMED = 2;
const NOT_MET = -1;

function transferConditionsHold(conditions: RuleConditions, route: Route): boolean {
  const { purpose } = route.facts;
  return (
    (!conditions.purposes || conditions.purposes.includes(purpose)) &&
    !conditions.exceptPurposes?.includes(purpose) &&
    (conditions.sale === undefined || conditions.sale === route.commercial) &&
    (conditions.routeLeavesContinental === undefined || conditions.routeLeavesContinental === route.leavesContinental)
  );
}

function animalTestOf(conditions: RuleConditions): AnimalTest {
  return {
    origins: conditions.origins ?? null,
    sexes: conditions.sexes ?? null,
    countAbove: conditions.countAbove ?? null,
    venomous: conditions.venomous ?? null,
    lengthBelowMm: conditions.lengthBelowMm ?? null,
    lengthAboveMm: conditions.lengthAboveMm ?? null,
  };
}

/**
 * Whether the animal meets a rule's per-animal conditions: NOT_MET, or the assumptions it took
 * (0 for none). A length or sex the rule needs but the line does not give is assumed to meet it
 * (the cautious reading), and the finding says so.
 */
function testAnimal(test: AnimalTest, animal: EvaluationAnimal): number {
  if (test.origins !== null && !test.origins.includes(animal.origin)) return NOT_MET;
  if (test.countAbove !== null && !(animal.count > test.countAbove)) return NOT_MET;
  if (test.venomous !== null && test.venomous !== animal.taxon.venomous) return NOT_MET;

  let assumed = 0;
  if (test.sexes !== null && !test.sexes.includes(animal.sex)) {
    if (animal.sex !== "unknown") return NOT_MET;
    assumed |= SEX_ASSUMED;
  }
  const { lengthBelowMm: below, lengthAboveMm: above } = test;
  if (below !== null || above !== null) {
    const length = animal.lengthMm ?? null;
    if (length === null) assumed |= LENGTH_ASSUMED;
    else if ((below !== null && !(length < below)) || (above !== null && !(length > above))) return NOT_MET;
  }
  return assumed;
}

/**
 * Findings for one animal line, in rule order. Lines of the same taxon, name and assumptions get
 * the same (frozen) finding objects: the message and document match depend on nothing else.
 */
function findingsFor(
  animal: EvaluationAnimal,
  work: TaxonWork,
  route: Route,
  documents: readonly PreparedDocument[],
  used: Set<ApplicableRule>,
): Finding[] {
  const findings: Finding[] = [];
  for (let position = 0; position < work.candidates.length; position++) {
    const candidate = work.candidates[position] as ApplicableRule;
    const assumed = testAnimal(candidate.test, animal);
    if (assumed === NOT_MET) continue;
    const byName = (work.findings[position * 4 + assumed] ??= new Map());
    let finding = byName.get(animal.scientificName);
    if (!finding) {
      const { rule, role } = candidate;
      finding = Object.freeze(buildFinding({ rule, role, animal, keys: work.keys, assumed, route, documents }));
      byName.set(animal.scientificName, finding);
      used.add(candidate);
    }
    findings.push(finding);
  }
  return findings;
}

/** Code-unit order, so the sort does not depend on the runtime's locale. */
function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

const federalFirst = (jurisdiction: Jurisdiction) => (jurisdiction === FEDERAL ? "" : jurisdiction);

function compareRules(a: Rule, b: Rule): number {
  return (
    SEVERITY_ORDER[severityOf(a.effect)] - SEVERITY_ORDER[severityOf(b.effect)] ||
    compareText(federalFirst(a.jurisdiction), federalFirst(b.jurisdiction)) ||
    compareText(a.id, b.id)
  );
}

interface FindingContext {
  rule: Rule;
  role: RouteRole;
  animal: EvaluationAnimal;
  keys: ReadonlySet<string>;
  /** SEX_ASSUMED and LENGTH_ASSUMED bits. */
  assumed: number;
  route: Route;
  documents: readonly PreparedDocument[];
}

function severityOf(effect: RuleEffect): Severity {
  if (effect.kind === "prohibited") return "blocks";
  return effect.kind === "packing" || effect.kind === "advisory" ? "advisory" : "needs_document";
}

function buildFinding(context: FindingContext): Finding {
  const { rule } = context;
  const severity = severityOf(rule.effect);
  const base = {
    ruleId: rule.id,
    ruleVersion: rule.version,
    jurisdiction: rule.jurisdiction,
    citation: rule.citation,
    severity,
  };
  const requirement = requirementOf(rule.effect, context);
  if (!requirement) {
    const message =
      severity === "blocks" ? `${rule.summary} ${appliesTo(context)}, so the transfer is blocked.` : rule.summary;
    return { ...base, message, satisfiedBy: null };
  }
  const { match, description } = requirement;
  if ("satisfiedBy" in match) {
    const verb = severity === "blocks" ? "allows it" : "covers it";
    return {
      ...base,
      message: `${rule.summary} ${appliesTo(context)}; ${match.label} on file ${verb}.`,
      satisfiedBy: match.satisfiedBy,
    };
  }
  const reason = match.reason ? ` Not accepted: ${match.reason}.` : "";
  const outcome =
    severity === "blocks"
      ? `${appliesTo(context)}, so the transfer is blocked unless there is ${description} on file.`
      : `${appliesTo(context)}. Still needed: ${description}.`;
  return { ...base, message: `${rule.summary} ${outcome}${reason}`, satisfiedBy: null, missing: description };
}

/** "It applies to this Python bivittatus going to Hawaii (no length was given, ...)". */
function appliesTo({ rule, role, animal, assumed }: FindingContext): string {
  const place = jurisdictionName(rule.jurisdiction);
  const where =
    role === "origin"
      ? ` leaving ${place}`
      : role === "destination"
        ? ` going to ${place}`
        : role === "transit"
          ? ` passing through ${place}`
          : "";
  const missing: string[] = [];
  if (assumed & SEX_ASSUMED) missing.push("its sex is not known");
  if (assumed & LENGTH_ASSUMED) missing.push("no length was given");
  const note = missing.length ? ` (${missing.join(" and ")}, so the rule is taken to apply)` : "";
  return `It applies to this ${animal.scientificName}${where}${note}`;
}

/** What would satisfy the rule and whether a document on file does; null when nothing can. */
function requirementOf(effect: RuleEffect, context: FindingContext): { description: string; match: Match } | null {
  switch (effect.kind) {
    case "prohibited":
      return effect.unlessPermit ? permitRequirement(effect.unlessPermit, context) : null;
    case "permit_required":
      return permitRequirement(effect.permit, context);
    case "certificate_required":
      return certificateRequirement(effect, context);
    case "packing":
    case "advisory":
      return null;
  }
}

function permitRequirement(
  requirement: PermitRequirement,
  context: FindingContext,
): { description: string; match: Match } {
  const { rule, animal } = context;
  const kinds = requirement.documentKinds.map((kind) => DOCUMENT_KIND_IN_SENTENCE[kind]).join(" or ");
  const issuer = rule.jurisdiction === FEDERAL ? "" : ` from ${jurisdictionName(rule.jurisdiction)}`;
  const species = requirement.namesSpecies ? ` naming ${animal.scientificName}` : "";
  const holder = requirement.holder === "either" ? "" : `, held by ${HOLDER_SIDE_WORDS[requirement.holder]}`;
  return { description: `${withArticle(kinds)}${issuer}${species}${holder}`, match: matchPermit(requirement, context) };
}

type CertificateEffect = Extract<RuleEffect, { kind: "certificate_required" }>;

function certificateRequirement(
  effect: CertificateEffect,
  context: FindingContext,
): { description: string; match: Match } {
  const signer = effect.accreditedVeterinarian ? " signed by an accredited veterinarian" : "";
  const species = effect.namesSpecies ? `, naming ${context.animal.scientificName}` : "";
  const statements = effect.statements.length ? `, stating "${effect.statements.join('" and "')}"` : "";
  return {
    description: `a ${DOCUMENT_KIND_IN_SENTENCE.cvi}${signer} no more than ${effect.withinDays} days before the ship date${species}${statements}`,
    match: matchCertificate(effect, context),
  };
}

function withArticle(phrase: string): string {
  return `${/^[aeiou]/i.test(phrase) ? "an" : "a"} ${phrase}`;
}

function prepareDocument(doc: EvaluationDocument): PreparedDocument {
  return {
    doc,
    coveredNames: doc.speciesCovered.map(normalizeTaxonName),
    statements: doc.statements.map(normalizeStatement),
  };
}

/** Statements compare on their words only: case, punctuation and spacing do not matter. */
function normalizeStatement(statement: string): string {
  return statement
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, " ")
    .trim();
}

/** "the certificate no. DEMO-1 from Tennessee": short, since the kind was named just before. */
function documentLabel(doc: EvaluationDocument): string {
  const number = doc.number ? ` no. ${doc.number}` : "";
  const issuer = doc.jurisdiction === FEDERAL ? "" : ` from ${jurisdictionName(doc.jurisdiction)}`;
  return `the ${doc.kind === "cvi" ? "certificate" : DOCUMENT_KIND_IN_SENTENCE[doc.kind]}${number}${issuer}`;
}

function satisfied(doc: EvaluationDocument): Match {
  const satisfiedBy = {
    kind: doc.kind,
    jurisdiction: doc.jurisdiction,
    ...(doc.id === undefined ? {} : { id: doc.id }),
    ...(doc.number === undefined ? {} : { number: doc.number }),
  };
  return { satisfiedBy, label: documentLabel(doc) };
}

/**
 * The first document (in input order) of an accepted kind, issued by the rule's jurisdiction,
 * that passes every check; otherwise why the first such document failed.
 */
function matchPermit(requirement: PermitRequirement, context: FindingContext): Match {
  const kinds: readonly DocumentKind[] = requirement.documentKinds;
  let reason: string | null = null;
  for (const prepared of context.documents) {
    const { doc } = prepared;
    if (!kinds.includes(doc.kind) || doc.jurisdiction !== context.rule.jurisdiction) continue;
    const failure =
      holderFailure(requirement, doc) ??
      (requirement.namesSpecies ? speciesFailure(prepared, context) : null) ??
      windowFailure(doc, context.route.facts.shipDate);
    if (failure === null) return satisfied(doc);
    reason ??= failure;
  }
  return { reason };
}

/** As matchPermit, for certificates: from any jurisdiction, since the veterinarian's state issues them. */
function matchCertificate(effect: CertificateEffect, context: FindingContext): Match {
  const shipDate = context.route.facts.shipDate;
  let reason: string | null = null;
  for (const prepared of context.documents) {
    const { doc } = prepared;
    if (doc.kind !== "cvi") continue;
    const failure =
      (effect.namesSpecies ? speciesFailure(prepared, context) : null) ??
      windowFailure(doc, shipDate) ??
      ageFailure(doc, shipDate, effect.withinDays) ??
      (effect.accreditedVeterinarian && doc.veterinarianAccredited === false
        ? `${documentLabel(doc)} was not signed by an accredited veterinarian`
        : null) ??
      statementFailure(effect.statements, prepared);
    if (failure === null) return satisfied(doc);
    reason ??= failure;
  }
  return { reason };
}

function holderFailure(requirement: PermitRequirement, doc: EvaluationDocument): string | null {
  const { holder } = requirement;
  return holder !== "either" && doc.holderSide !== undefined && doc.holderSide !== holder
    ? `${documentLabel(doc)} is held by ${HOLDER_SIDE_WORDS[doc.holderSide]}, not ${HOLDER_SIDE_WORDS[holder]}`
    : null;
}

function speciesFailure({ doc, coveredNames }: PreparedDocument, context: FindingContext): string | null {
  for (const name of coveredNames) if (context.keys.has(name)) return null;
  return `${documentLabel(doc)} does not name ${context.animal.scientificName}`;
}

function statementFailure(wanted: readonly string[], { doc, statements }: PreparedDocument): string | null {
  for (const statement of wanted) {
    const normalized = normalizeStatement(statement);
    if (!statements.some((onFile) => onFile.includes(normalized)))
      return `${documentLabel(doc)} does not state "${statement}"`;
  }
  return null;
}

function windowFailure(doc: EvaluationDocument, shipDate: string): string | null {
  const startsLater = doc.validFrom && shipDate < doc.validFrom;
  const endedBefore = doc.validTo && doc.validTo < shipDate;
  if (!startsLater && !endedBefore) return null;
  const from = doc.validFrom ? formatDate(doc.validFrom) : "an open date";
  const to = doc.validTo ? formatDate(doc.validTo) : "an open date";
  return `${documentLabel(doc)} is valid from ${from} to ${to}, which does not include the ship date ${formatDate(shipDate)}`;
}

/** Whole calendar days from one ISO date to another (UTC, so no time zone or DST shifts it). */
function daysBetween(fromIso: string, toIso: string): number {
  const dayNumber = (iso: string) => {
    const [year, month, day] = iso.split("-").map(Number) as [number, number, number];
    return Date.UTC(year, month - 1, day) / 86_400_000;
  };
  return dayNumber(toIso) - dayNumber(fromIso);
}

function ageFailure(doc: EvaluationDocument, shipDate: string, withinDays: number): string | null {
  if (!doc.issuedOn) return `${documentLabel(doc)} has no issue date`;
  const ageDays = daysBetween(doc.issuedOn, shipDate);
  if (ageDays < 0)
    return `${documentLabel(doc)} is dated ${formatDate(doc.issuedOn)}, after the ship date ${formatDate(shipDate)}`;
  return ageDays > withinDays
    ? `${documentLabel(doc)} was issued ${ageDays} days before the ship date; it may be at most ${withinDays} days old`
    : null;
}

/** Blocked while any blocking finding stands; needs documents while a required one is missing. */
function verdictOf(animals: readonly { findings: readonly Finding[] }[]): Verdict {
  let verdict: Verdict = "clear";
  for (const { findings } of animals) {
    for (const finding of findings) {
      if (finding.satisfiedBy !== null) continue;
      if (finding.severity === "blocks") return "blocked";
      if (finding.severity === "needs_document") verdict = "needs_documents";
    }
  }
  return verdict;
}

function rulesUsedBy(used: ReadonlySet<ApplicableRule>): EvaluateResponse["rulesUsed"] {
  return [...used]
    .map(({ rule }) => ({ ruleId: rule.id, version: rule.version }))
    .sort((a, b) => compareText(a.ruleId, b.ruleId));
}
