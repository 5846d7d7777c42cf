import type { EvaluationAnimal, EvaluationDocument, EvaluationInput, TransferFacts } from "./evaluate";
import { FEDERAL_RULES } from "./federal-rules";
import { STATE_RULES, STATE_TRANSIT_POLICIES } from "./state-rules.demo";
import type { ResolvedTaxon } from "./taxon";

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
    ...overrides,
  };
}
