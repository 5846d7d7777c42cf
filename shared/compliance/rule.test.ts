import { describe, expect, it } from "vitest";
import { FEDERAL_RULES } from "./federal-rules";
import { DEMO_RULE_NOTICE, ruleSchema, type Rule } from "./rule";
import { STATE_RULES } from "./state-rules.demo";

const federal = FEDERAL_RULES[0] as Rule;
const demo = STATE_RULES.find((rule) => rule.demo) as Rule;

function issues(candidate: unknown): string[] {
  return ruleSchema.safeParse(candidate).error?.issues.map((issue) => issue.path.join(".")) ?? [];
}

describe("ruleSchema", () => {
  it("refuses a demo rule whose citation does not say it is a demo", () => {
    // [practice] house rule: demo data says so ("demo rule, not a statement of that state's law")
    expect(issues(demo)).toEqual([]);
    expect(issues({ ...demo, citation: { text: "Ohio Admin. Code 1501", url: null } })).toEqual(["citation.text"]);
    expect(demo.citation.text).toContain(DEMO_RULE_NOTICE);
  });

  it("refuses a federal rule on import, export or transit, an end before the start, and unknown keys", () => {
    // [published] 18 U.S.C. 42 and 9 CFR 74.1 speak of interstate movement: a federal import/export/transit scope has no meaning for a domestic transfer
    expect(issues({ ...federal, governs: "import" })).toEqual(["governs"]);
    expect(issues({ ...federal, effectiveFrom: "2026-02-01", effectiveTo: "2026-01-31" })).toEqual(["effectiveTo"]);
    expect(issues({ ...federal, note: "x" })).toEqual([""]);
    expect(issues({ ...federal, conditions: { lengthBelow: 100 } })).toEqual(["conditions"]);
  });

  it("refuses a version below 1, a plain-http link, and an effect of an unknown kind", () => {
    // [practice] citations link to the official text over HTTPS (ecfr.gov, law.cornell.edu)
    expect(issues({ ...federal, version: 0 })).toEqual(["version"]);
    expect(issues({ ...federal, citation: { ...federal.citation, url: "http://www.ecfr.gov/x" } })).toEqual([
      "citation.url",
    ]);
    expect(issues({ ...federal, effect: { kind: "fine" } })).toEqual(["effect.kind"]);
  });
});
