import type { Governs, RuleEffect } from "../compliance/rule";
import type { Severity, Verdict } from "../compliance/schemas";

/** The compliance verdict's name. "Clear" is said only of what the rule library checked. */
export const COMPLIANCE_VERDICT_WORDS: Readonly<Record<Verdict, string>> = {
  clear: "Clear to travel",
  needs_documents: "Documents needed",
  blocked: "Blocked",
};

/** What each verdict means for the transfer, in a sentence. */
export const COMPLIANCE_VERDICT_EXPLANATIONS: Readonly<Record<Verdict, string>> = {
  clear: "No rule in the library stops these animals on this route; read the advice below.",
  needs_documents:
    "A permit or certificate is still missing. The transfer cannot be cleared to travel until it is on file.",
  blocked: "A rule forbids this move as it stands. The transfer cannot be cleared to travel.",
};

export const SEVERITY_WORDS: Readonly<Record<Severity, string>> = {
  blocks: "Blocks",
  needs_document: "Needs a document",
  advisory: "Advice",
};

/** What a rule governs, read against the route. */
export const GOVERNS_WORDS: Readonly<Record<Governs, string>> = {
  import: "Import into the state",
  export: "Export out of the state",
  transit: "Passing through the state",
  possession: "Keeping in the state",
  interstate: "Crossing a state line",
  movement: "Any move touching the state",
};

export const RULE_EFFECT_WORDS: Readonly<Record<RuleEffect["kind"], string>> = {
  prohibited: "Prohibited",
  permit_required: "Permit required",
  certificate_required: "Certificate required",
  packing: "Packing and marking",
  advisory: "Advice",
};
