import type { EvaluationAnimal, EvaluationDocument, EvaluationInput, TransferFacts } from "./evaluate";
import { FEDERAL_RULES } from "./federal-rules";
import { STATE_RULES, STATE_TRANSIT_POLICIES } from "./state-rules.demo";
import type { ResolvedTaxon } from "./taxon";
import type { EvaluateResponse, Finding } from "./schemas";
import type { CoverageRecord } from "./coverage";
import { JURISDICTIONS } from "./jurisdiction";

/**
 * Every jurisdiction marked reviewed, with invented agency names: for tests of the rules
 * themselves, where coverage is not what is being checked.
 */
export const EVERY_JURISDICTION_REVIEWED: readonly CoverageRecord[] = JURISDICTIONS.map((jurisdiction) => ({
  jurisdiction,
  reviewedOn: "2026-12-01",
  reviewedBy: "test fixture",
  wildlifeAgency: { name: `Test wildlife agency of ${jurisdiction}`, url: "https://example.test/wildlife" },
  stateVeterinarian: { name: `Test state veterinarian of ${jurisdiction}`, url: "https://example.test/vet" },
}));

/** A demo transfer: Tennessee to Ohio, overnight, private keeping, no sale, on 2026-05-12. */
export function buildFacts(overrides: Partial<TransferFacts> = {}): TransferFacts {
  return {
    originState: "TN",
    destinationState: "OH",
    transitStates: [],
    shipDate: "2026-05-12",
    purpose: "private_keeping",
    sale: false,
    ...overrides,
  };
}

/** One captive-bred animal of unknown sex and unmeasured length, entered under its own name. */
export function buildAnimal(taxon: ResolvedTaxon, overrides: Partial<EvaluationAnimal> = {}): EvaluationAnimal {
  return {
    scientificName: taxon.scientificName,
    taxon,
    count: 1,
    lengthMm: null,
    origin: "captive_bred",
    sex: "unknown",
    ...overrides,
  };
}

/** A certificate of veterinary inspection with invented demo details. */
export function buildCvi(overrides: Partial<EvaluationDocument> = {}): EvaluationDocument {
  return {
    kind: "cvi",
    jurisdiction: "TN",
    number: "DEMO-CVI-0001",
    speciesCovered: [],
    issuedOn: "2026-05-01",
    statements: [],
    veterinarianAccredited: true,
    ...overrides,
  };
}

/** A whole evaluation input against the seed rules (federal, demo states, transit policies). */
export function buildInput(overrides: Partial<EvaluationInput> = {}): EvaluationInput {
  return {
    facts: buildFacts(),
    animals: [],
    documents: [],
    rules: [...FEDERAL_RULES, ...STATE_RULES],
    transitPolicies: STATE_TRANSIT_POLICIES,
    coverage: EVERY_JURISDICTION_REVIEWED,
    ...overrides,
  };
}

/** Every finding that applies to one line: the shipment-wide ones, then the line's own. */
export function findingsForLine(result: EvaluateResponse, index = 0): Finding[] {
  return [...result.shipmentFindings, ...(result.animals[index]?.findings ?? [])];
}
