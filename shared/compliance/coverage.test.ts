import { describe, expect, it } from "vitest";
import { coverageForRoute, demoRuleJurisdictions, routeJurisdictions, type CoverageRecord } from "./coverage";
import { DEMO_TAXA as T } from "./demo-taxa";
import { evaluateCompliance } from "./evaluate";
import { EVERY_JURISDICTION_REVIEWED, buildAnimal, buildFacts, buildInput } from "./evaluate-fixtures";
import { FEDERAL_RULES } from "./federal-rules";
import { STATE_RULES } from "./state-rules.demo";

const reviewed = (jurisdiction: CoverageRecord["jurisdiction"], reviewedOn: string | null = "2026-12-01") => ({
  jurisdiction,
  reviewedOn,
  reviewedBy: reviewedOn ? "test reviewer" : null,
  wildlifeAgency: { name: `Wildlife agency ${jurisdiction}`, url: `https://example.test/${jurisdiction}` },
  stateVeterinarian: { name: `State veterinarian ${jurisdiction}`, url: `https://example.test/vet/${jurisdiction}` },
});

describe("routeJurisdictions", () => {
  it("lists federal law, the origin, each transit state once in travel order, then the destination", () => {
    // source: issue 12 §1 (product requirement): coverage for every jurisdiction on the route (origin, transit, destination) and federal
    expect(
      routeJurisdictions({
        originState: "TN",
        destinationState: "OR",
        transitStates: ["KY", "MO", "KY", "TN", "OR", "KS"],
      }),
    ).toEqual([
      { jurisdiction: "US", role: "federal" },
      { jurisdiction: "TN", role: "origin" },
      { jurisdiction: "KY", role: "transit" },
      { jurisdiction: "MO", role: "transit" },
      { jurisdiction: "KS", role: "transit" },
      { jurisdiction: "OR", role: "destination" },
    ]);
    // [practice] a move within one state answers to that state once, and to federal law
    expect(routeJurisdictions({ originState: "OH", destinationState: "OH", transitStates: [] })).toEqual([
      { jurisdiction: "US", role: "federal" },
      { jurisdiction: "OH", role: "origin" },
    ]);
  });
});

describe("coverageForRoute", () => {
  const route = { originState: "TN", destinationState: "OR", transitStates: ["KY"] } as const;

  it("covers a jurisdiction only when reviewed and free of demo rules, and names the agency to ask", () => {
    // source: issue 12 §1 (product requirement): demo rules never count as coverage; an unreviewed state is not covered
    const records = [reviewed("US"), reviewed("TN"), reviewed("KY", null)];
    const coverage = coverageForRoute(route, records, new Set(["TN"]));
    expect(coverage.map((c) => [c.jurisdiction, c.covered, c.uncoveredBecause])).toEqual([
      ["US", true, null],
      ["TN", false, "demo_rules"],
      ["KY", false, "not_reviewed"],
      ["OR", false, "no_record"],
    ]);
    expect(coverage[2]).toMatchObject({
      jurisdiction: "KY",
      reviewedOn: null,
      agency: { name: "Wildlife agency KY", url: "https://example.test/KY" },
      veterinarian: { name: "State veterinarian KY", url: "https://example.test/vet/KY" },
      name: "Kentucky",
      role: "transit",
    });
    expect(coverage[0]?.reviewedOn).toBe("2026-12-01");
  });

  it("finds the jurisdictions that hold demo rules in the seed library", () => {
    // Every seed rule of a state other than Hawaii's published snake ban is a labelled demo rule.
    const demo = demoRuleJurisdictions([...FEDERAL_RULES, ...STATE_RULES]);
    expect(demo.has("US")).toBe(false);
    expect(demo.has("HI")).toBe(false);
    expect([...demo].sort()).toEqual(["AZ", "CA", "FL", "GA", "MI", "NC", "NY", "OH", "PA", "TX"]);
  });
});

describe("the verdict with coverage", () => {
  const cornSnakeTnToOr = (coverage: readonly CoverageRecord[] | undefined) =>
    evaluateCompliance(
      buildInput({
        facts: buildFacts({ originState: "TN", destinationState: "OR", transitStates: ["KY", "MO"] }),
        animals: [buildAnimal(T.cornSnake)],
        coverage,
      }),
    );

  it("is unverified, never clear, while a jurisdiction on the route is not covered", () => {
    // source: issue 12 §1 (product requirement): "The verdict is never clear while a jurisdiction on the route is not covered"
    expect(cornSnakeTnToOr(undefined).verdict).toBe("unverified");
    expect(cornSnakeTnToOr([reviewed("US"), reviewed("TN"), reviewed("KY"), reviewed("MO")]).verdict).toBe(
      "unverified",
    );
    expect(cornSnakeTnToOr(EVERY_JURISDICTION_REVIEWED).verdict).toBe("clear");
    expect(cornSnakeTnToOr(undefined).coverage.map((c) => c.jurisdiction)).toEqual(["US", "TN", "KY", "MO", "OR"]);
  });

  it("leaves a blocking or documents-needed verdict as it is: coverage never makes a verdict better", () => {
    // [published] HRS 150A-6: no live snake may be brought into Hawaii
    const toHawaii = evaluateCompliance(
      buildInput({
        facts: buildFacts({ originState: "CA", destinationState: "HI" }),
        animals: [buildAnimal(T.cornSnake)],
        coverage: [],
      }),
    );
    expect(toHawaii.verdict).toBe("blocked");
    expect(toHawaii.coverage.every((c) => !c.covered)).toBe(true);
  });
});
