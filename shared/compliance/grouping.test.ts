import { describe, expect, it } from "vitest";
import { DEMO_TAXA as T } from "./demo-taxa";
import { evaluateCompliance } from "./evaluate";
import { buildAnimal, buildFacts, buildInput } from "./evaluate-fixtures";
import { groupShipmentFindings } from "./grouping";
import type { Finding } from "./schemas";

const finding = (ruleId: string, message: string, overrides: Partial<Finding> = {}): Finding => ({
  ruleId,
  ruleVersion: 1,
  jurisdiction: "US",
  citation: { text: "test", url: null },
  severity: "advisory",
  message,
  satisfiedBy: null,
  ...overrides,
});

describe("groupShipmentFindings", () => {
  it("says once what every line carries word for word, and keeps on each line what differs", () => {
    // source: issue 12 §1 (product requirement): findings that apply to every animal appear once; the per-animal list shows only what differs
    const lacey = finding("lacey", "Moving an animal against a state's law is a federal offence.");
    const perLine = (name: string) => finding("per-line", `It applies to this ${name}.`, { severity: "blocks" });
    const grouped = groupShipmentFindings([
      { scientificName: "Pogona vitticeps", findings: [perLine("Pogona vitticeps"), lacey] },
      { scientificName: "Python regius", findings: [{ ...lacey }] },
    ]);
    expect(grouped.shipmentFindings.map((f) => f.ruleId)).toEqual(["lacey"]);
    expect(grouped.animals.map((a) => a.findings.map((f) => f.ruleId))).toEqual([["per-line"], []]);
  });

  it("keeps on the lines a finding that only some lines carry, or whose outcome differs", () => {
    // source: issue 12 §1: only what applies to every animal is grouped
    const covered = finding("permit", "A permit is needed.", { satisfiedBy: { kind: "cvi", jurisdiction: "TN" } });
    const missing = finding("permit", "A permit is needed.");
    const grouped = groupShipmentFindings([
      { scientificName: "A a", findings: [covered] },
      { scientificName: "B b", findings: [missing] },
      { scientificName: "C c", findings: [] },
    ]);
    expect(grouped.shipmentFindings).toEqual([]);
    expect(grouped.animals.map((a) => a.findings.length)).toEqual([1, 1, 0]);
  });

  it("groups the Lacey Act and box marking of a real evaluation, and keeps the small-turtle ban per line", () => {
    // [published] 16 U.S.C. 3372 and 50 CFR 14.81 concern every animal moved across a state line;
    // [published] 21 CFR 1240.62 concerns the turtle under 4 in only
    const result = evaluateCompliance(
      buildInput({
        facts: buildFacts({ sale: true }),
        animals: [buildAnimal(T.redEaredSlider, { lengthMm: 60 }), buildAnimal(T.beardedDragon)],
      }),
    );
    expect(result.shipmentFindings.map((f) => f.ruleId)).toEqual([
      "us-16usc3372-lacey-act",
      "us-50cfr14.81-container-marking",
      "us-9cfr1.1-no-transport-standard",
    ]);
    expect(result.animals[0]?.findings.map((f) => f.ruleId)).toEqual(["us-21cfr1240.62-small-turtles"]);
    expect(result.animals[1]?.findings).toEqual([]);
  });
});
