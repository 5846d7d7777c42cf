import type { Governs, RuleEffect } from "../compliance/rule";
import type { Severity, Verdict } from "../compliance/schemas";
import type { RouteRole, UncoveredReason } from "../compliance/coverage";

/** The compliance verdict's name. "Clear" is said only of what the rule library checked. */
export const COMPLIANCE_VERDICT_WORDS: Readonly<Record<Verdict, string>> = {
  clear: "Clear to travel",
  unverified: "Unverified",
  needs_documents: "Documents needed",
  blocked: "Blocked",
};

/** What each verdict means for the transfer, in a sentence. */
export const COMPLIANCE_VERDICT_EXPLANATIONS: Readonly<Record<Verdict, string>> = {
  clear:
    "No rule in the library stops these animals on this route, and every state on it was reviewed; read the advice below.",
  unverified:
    "No rule in Hatchway's library stops these animals, but the rules of a state on the route have not been reviewed, so nothing here says it is clear. Ask the agencies named below before the animals travel.",
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

/** Where a jurisdiction sits on the route. */
export const ROUTE_ROLE_WORDS: Readonly<Record<RouteRole, string>> = {
  federal: "Federal",
  origin: "Origin",
  transit: "Passed through",
  destination: "Destination",
};

/** Why a jurisdiction on the route is not covered by the rule library. */
export const UNCOVERED_REASON_WORDS: Readonly<Record<UncoveredReason, string>> = {
  not_reviewed: "Its rules have not been reviewed in Hatchway's library.",
  demo_rules: "Its rules in the library are invented demo rules, which never count as a review.",
  no_record: "Hatchway holds no record of its rules.",
};
