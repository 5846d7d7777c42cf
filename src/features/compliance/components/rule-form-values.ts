import type { AnimalOrigin, DocumentKind, Purpose, Sex } from "@shared/constants";
import type { Rule, RuleConditions, RuleEffect } from "@shared/compliance/rule";
import { ANY_TAXON } from "@shared/compliance/taxon";

/** A yes / no / either choice of the form ("either": the condition is left out). */
export type Either = "either" | "yes" | "no";

/** The rule form's fields: every condition and effect as its own field, nothing as JSON. */
export type RuleFormValues = {
  id: string;
  jurisdiction: Rule["jurisdiction"];
  governs: Rule["governs"];
  summary: string;
  citationText: string;
  citationUrl: string;
  effectiveFrom: string;
  effectiveTo: string;
  reviewedOn: string;
  reviewedBy: string;
  everyAnimal: boolean;
  taxa: string[];
  exceptTaxa: string[];
  origins: AnimalOrigin[];
  purposes: Purpose[];
  exceptPurposes: Purpose[];
  sexes: Sex[];
  sale: Either;
  venomous: Either;
  leavesContinental: Either;
  /** Stored in mm; typed in the unit the person chose (MeasureField). */
  lengthBelowMm: number | null;
  lengthAboveMm: number | null;
  countAbove: string;
  effectKind: RuleEffect["kind"];
  /** Prohibited: a permit lifts the ban. */
  liftedByPermit: boolean;
  permitKinds: Exclude<DocumentKind, "cvi">[];
  permitHolder: "receiver" | "sender" | "either";
  permitNamesSpecies: boolean;
  withinDays: string;
  statements: string[];
  accreditedVeterinarian: boolean;
  certificateNamesSpecies: boolean;
  demo: boolean;
  retired: boolean;
};

const eitherOf = (value: boolean | undefined): Either => (value === undefined ? "either" : value ? "yes" : "no");
const boolOf = (value: Either): boolean | undefined => (value === "either" ? undefined : value === "yes");

/** A blank rule for the "new rule" form. */
export function blankRule(reviewer: string, today: string): Rule {
  return {
    id: "",
    version: 1,
    jurisdiction: "US",
    governs: "import",
    selector: { taxa: [] },
    conditions: {},
    effect: { kind: "advisory" },
    summary: "",
    citation: { text: "", url: null },
    effectiveFrom: null,
    effectiveTo: null,
    reviewedOn: today,
    reviewedBy: reviewer,
    demo: false,
  };
}

/** The form's fields for a rule as stored (a new version starts from the current one). */
export function valuesOf(rule: Rule, retired: boolean, reviewer: string, today: string): RuleFormValues {
  const c = rule.conditions;
  const e = rule.effect;
  const permit = e.kind === "permit_required" ? e.permit : e.kind === "prohibited" ? e.unlessPermit : undefined;
  const everyAnimal = rule.selector.taxa.includes(ANY_TAXON);
  return {
    id: rule.id,
    jurisdiction: rule.jurisdiction,
    governs: rule.governs,
    summary: rule.summary,
    citationText: rule.citation.text,
    citationUrl: rule.citation.url ?? "",
    effectiveFrom: rule.effectiveFrom ?? "",
    effectiveTo: rule.effectiveTo ?? "",
    reviewedOn: today,
    reviewedBy: reviewer,
    everyAnimal,
    taxa: rule.selector.taxa.filter((name) => name !== ANY_TAXON),
    exceptTaxa: rule.selector.exceptTaxa ?? [],
    origins: [...(c.origins ?? [])],
    purposes: [...(c.purposes ?? [])],
    exceptPurposes: [...(c.exceptPurposes ?? [])],
    sexes: [...(c.sexes ?? [])],
    sale: eitherOf(c.sale),
    venomous: eitherOf(c.venomous),
    leavesContinental: eitherOf(c.routeLeavesContinental),
    lengthBelowMm: c.lengthBelowMm ?? null,
    lengthAboveMm: c.lengthAboveMm ?? null,
    countAbove: c.countAbove === undefined ? "" : String(c.countAbove),
    effectKind: e.kind,
    liftedByPermit: e.kind === "prohibited" && e.unlessPermit !== undefined,
    permitKinds: [...(permit?.documentKinds ?? ["state_import_permit"])],
    permitHolder: permit?.holder ?? "receiver",
    permitNamesSpecies: permit?.namesSpecies ?? true,
    withinDays: e.kind === "certificate_required" ? String(e.withinDays) : "30",
    statements: e.kind === "certificate_required" ? [...e.statements] : [],
    accreditedVeterinarian: e.kind === "certificate_required" ? e.accreditedVeterinarian : true,
    certificateNamesSpecies: e.kind === "certificate_required" ? e.namesSpecies : true,
    demo: rule.demo,
    retired,
  };
}

/** A whole number typed in a text field; NaN (refused by the schema) when it is not one. */
const wholeOrUndefined = (text: string): number | undefined => (text.trim() === "" ? undefined : Number(text));

function conditionsOf(v: RuleFormValues): RuleConditions {
  const conditions: RuleConditions = {};
  if (v.origins.length) conditions.origins = v.origins;
  if (v.purposes.length) conditions.purposes = v.purposes;
  if (v.exceptPurposes.length) conditions.exceptPurposes = v.exceptPurposes;
  if (v.sexes.length) conditions.sexes = v.sexes;
  const sale = boolOf(v.sale);
  if (sale !== undefined) conditions.sale = sale;
  const venomous = boolOf(v.venomous);
  if (venomous !== undefined) conditions.venomous = venomous;
  const leaves = boolOf(v.leavesContinental);
  if (leaves !== undefined) conditions.routeLeavesContinental = leaves;
  if (v.lengthBelowMm !== null) conditions.lengthBelowMm = v.lengthBelowMm;
  if (v.lengthAboveMm !== null) conditions.lengthAboveMm = v.lengthAboveMm;
  const count = wholeOrUndefined(v.countAbove);
  if (count !== undefined) conditions.countAbove = count;
  return conditions;
}

function effectOf(v: RuleFormValues): RuleEffect {
  const permit = { documentKinds: v.permitKinds, holder: v.permitHolder, namesSpecies: v.permitNamesSpecies };
  switch (v.effectKind) {
    case "prohibited":
      return v.liftedByPermit ? { kind: "prohibited", unlessPermit: permit } : { kind: "prohibited" };
    case "permit_required":
      return { kind: "permit_required", permit };
    case "certificate_required":
      return {
        kind: "certificate_required",
        withinDays: wholeOrUndefined(v.withinDays) ?? Number.NaN,
        statements: v.statements,
        accreditedVeterinarian: v.accreditedVeterinarian,
        namesSpecies: v.certificateNamesSpecies,
      };
    case "packing":
      return { kind: "packing" };
    case "advisory":
      return { kind: "advisory" };
  }
}

/** The rule the form describes, as the version it will be saved as; the shared schema checks it. */
export function ruleOf(v: RuleFormValues, version: number) {
  const taxa = v.everyAnimal ? [ANY_TAXON] : v.taxa;
  return {
    retired: v.retired,
    rule: {
      id: v.id.trim(),
      version,
      jurisdiction: v.jurisdiction,
      governs: v.governs,
      selector: v.exceptTaxa.length ? { taxa, exceptTaxa: v.exceptTaxa } : { taxa },
      conditions: conditionsOf(v),
      effect: effectOf(v),
      summary: v.summary,
      citation: { text: v.citationText, url: v.citationUrl.trim() === "" ? null : v.citationUrl.trim() },
      effectiveFrom: v.effectiveFrom || null,
      effectiveTo: v.effectiveTo || null,
      reviewedOn: v.reviewedOn,
      reviewedBy: v.reviewedBy,
      demo: v.demo,
    },
  };
}

/** Where an issue of the rule schema is shown on this form. */
const FIELD_OF: Record<string, keyof RuleFormValues> = {
  id: "id",
  jurisdiction: "jurisdiction",
  governs: "governs",
  summary: "summary",
  citation: "citationText",
  "citation.text": "citationText",
  "citation.url": "citationUrl",
  effectiveFrom: "effectiveFrom",
  effectiveTo: "effectiveTo",
  reviewedOn: "reviewedOn",
  reviewedBy: "reviewedBy",
  selector: "taxa",
  "selector.taxa": "taxa",
  "selector.exceptTaxa": "exceptTaxa",
  "conditions.origins": "origins",
  "conditions.purposes": "purposes",
  "conditions.exceptPurposes": "exceptPurposes",
  "conditions.sexes": "sexes",
  "conditions.lengthBelowMm": "lengthBelowMm",
  "conditions.lengthAboveMm": "lengthAboveMm",
  "conditions.countAbove": "countAbove",
  conditions: "countAbove",
  "effect.withinDays": "withinDays",
  "effect.statements": "statements",
  "effect.permit": "permitKinds",
  "effect.unlessPermit": "permitKinds",
  effect: "effectKind",
};

/** The form field a schema issue belongs to (path inside `{ rule, retired }`). */
export function fieldOf(path: readonly PropertyKey[]): keyof RuleFormValues {
  const inRule = path[0] === "rule" ? path.slice(1).map(String) : path.map(String);
  return FIELD_OF[inRule.slice(0, 2).join(".")] ?? FIELD_OF[inRule[0] ?? ""] ?? "summary";
}
