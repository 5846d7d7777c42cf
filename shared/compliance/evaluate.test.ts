import { describe, expect, it } from "vitest";
import { DEMO_TAXA as T } from "./demo-taxa";
import { evaluateCompliance, type EvaluationDocument, type EvaluationInput } from "./evaluate";
import { buildAnimal, buildCvi, buildFacts, buildInput, findingsForLine } from "./evaluate-fixtures";
import type { Rule } from "./rule";

/**
 * A test rule of our own making: a permit-required rule on bearded dragons coming into Ohio. Not
 * flagged demo, so Ohio keeps the fixture's coverage: these tests are about matching, not coverage.
 */
function testRule(overrides: Partial<Rule> = {}): Rule {
  return {
    id: "test-oh-pogona-permit",
    version: 1,
    jurisdiction: "OH",
    governs: "import",
    selector: { taxa: ["Pogona"] },
    conditions: {},
    effect: {
      kind: "permit_required",
      permit: { documentKinds: ["state_import_permit"], holder: "receiver", namesSpecies: true },
    },
    summary: "Test rule: a bearded dragon coming into Ohio needs a permit.",
    citation: { text: "Test rule: demo rule, not a statement of that state's law", url: null },
    effectiveFrom: null,
    effectiveTo: null,
    reviewedOn: "2026-12-01",
    reviewedBy: "test",
    demo: false,
    ...overrides,
  };
}

const ohioPermit = (overrides: Partial<EvaluationDocument> = {}): EvaluationDocument => ({
  kind: "state_import_permit",
  jurisdiction: "OH",
  number: "DEMO-OH-7",
  speciesCovered: ["Pogona vitticeps"],
  statements: [],
  validFrom: "2026-01-01",
  validTo: "2026-12-31",
  ...overrides,
});

function run(overrides: Partial<EvaluationInput>) {
  return evaluateCompliance(buildInput({ animals: [buildAnimal(T.beardedDragon)], rules: [testRule()], ...overrides }));
}

const onlyFinding = (result: ReturnType<typeof run>) => findingsForLine(result)[0];

describe("effective dates and versions", () => {
  it("applies a rule on its first and last day in force and not a day outside", () => {
    // [practice] a rule is in force on its stated first and last day; [published] Gregorian calendar: 05-11, 05-12, 05-13 are consecutive
    const shipDate = buildFacts().shipDate;
    expect(run({ rules: [testRule({ effectiveFrom: shipDate })] }).verdict).toBe("needs_documents");
    expect(run({ rules: [testRule({ effectiveFrom: "2026-05-13" })] }).verdict).toBe("clear");
    expect(run({ rules: [testRule({ effectiveTo: shipDate })] }).verdict).toBe("needs_documents");
    expect(run({ rules: [testRule({ effectiveTo: "2026-05-11" })] }).verdict).toBe("clear");
  });

  it("uses the highest version in force and records it", () => {
    // source: issue 4 §1 (product requirement, not an outside value): an evaluation records the versions it used
    const v1 = testRule();
    const v2 = testRule({ version: 2, effect: { kind: "advisory" }, summary: "Test rule, second version." });
    const both = run({ rules: [v2, v1] });
    expect(both.rulesUsed).toEqual([{ ruleId: v1.id, version: 2 }]);
    expect(both.verdict).toBe("clear");
    const futureV2 = run({ rules: [v1, { ...v2, effectiveFrom: "2027-01-01" }] });
    expect(futureV2.rulesUsed).toEqual([{ ruleId: v1.id, version: 1 }]);
  });
});

describe("document matching", () => {
  it("accepts a permit valid from or until the ship date and refuses one a day outside", () => {
    // [published] Gregorian calendar; a permit "valid from ... to ..." includes both dates [practice]
    const shipDate = buildFacts().shipDate;
    for (const window of [{ validFrom: shipDate }, { validTo: shipDate }, { validFrom: null, validTo: null }]) {
      expect(run({ documents: [ohioPermit(window)] }).verdict).toBe("clear");
    }
    for (const window of [{ validFrom: "2026-05-13" }, { validTo: "2026-05-11" }]) {
      const result = run({ documents: [ohioPermit(window)] });
      // Gregorian calendar [published]: 2026-05-12 is a Tuesday.
      expect(onlyFinding(result)?.message).toContain("does not include the ship date Tue, May 12, 2026");
    }
  });

  it("counts certificate age in calendar days across month ends, leap days and clock changes", () => {
    // [published] Gregorian calendar: Jan 31 to Mar 2 2026 is 30 days (Feb 2026 has 28); Feb 1 to Mar 3 2028 is 31 days (2028 is a leap year);
    // US clocks change on 2026-03-08 (15 U.S.C. 260a) and a whole-day count must not notice
    const rule = testRule({
      effect: {
        kind: "certificate_required",
        withinDays: 30,
        statements: [],
        accreditedVeterinarian: false,
        namesSpecies: false,
      },
    });
    const cases = [
      ["2026-01-31", "2026-03-02", true],
      ["2028-02-01", "2028-03-03", false],
      ["2026-02-20", "2026-03-22", true],
    ] as const;
    for (const [issuedOn, shipDate, passes] of cases) {
      const result = run({ rules: [rule], facts: buildFacts({ shipDate }), documents: [buildCvi({ issuedOn })] });
      expect([issuedOn, result.verdict]).toEqual([issuedOn, passes ? "clear" : "needs_documents"]);
    }
  });

  it("refuses a certificate without an issue date, and skips documents of another kind", () => {
    // [published] 9 CFR 74.1 counts from the veterinarian's signature, so an undated certificate cannot be placed in the window
    const rule = testRule({
      effect: {
        kind: "certificate_required",
        withinDays: 30,
        statements: [],
        accreditedVeterinarian: false,
        namesSpecies: false,
      },
    });
    expect(onlyFinding(run({ rules: [rule], documents: [buildCvi({ issuedOn: null })] }))?.message).toContain(
      "has no issue date",
    );
    const wrongKind = run({ documents: [ohioPermit({ kind: "possession_permit" })] });
    expect(onlyFinding(wrongKind)?.message).not.toContain("Not accepted");
    expect(onlyFinding(wrongKind)?.missing).toBe(
      "an import permit from Ohio naming Pogona vitticeps, held by the receiver",
    );
  });

  it("lets the first matching document win, in input order, when several would do", () => {
    // source: issue 4 §3 (product requirement, not an outside value): the finding names the document that satisfies it
    const result = run({
      documents: [ohioPermit({ validTo: "2026-01-31" }), ohioPermit({ number: "B" }), ohioPermit({ number: "C" })],
    });
    expect(onlyFinding(result)?.satisfiedBy?.number).toBe("B");
  });
});

describe("route", () => {
  it("ignores a transit state repeated as an end, and does not apply an import rule to a move within the state", () => {
    // [practice] a transit state is one the animal passes through, not where it starts or ends
    const transitAtEnd = run({
      facts: buildFacts({ originState: "OH", destinationState: "OH", transitStates: ["OH"] }),
    });
    expect(findingsForLine(transitAtEnd)).toEqual([]);
  });
});

describe("verdict", () => {
  const block = testRule({ id: "test-block", effect: { kind: "prohibited" }, summary: "Test ban." });
  const advisory = testRule({ id: "test-advice", effect: { kind: "advisory" }, summary: "Test advice." });

  it("is clear with advisories only, needs documents while one is missing, clear again once it is on file", () => {
    // source: PRODUCT.md §2 (product requirement, not an outside value): a verdict per line; "cleared to ship" is blocked while a blocking finding stands
    expect(run({ rules: [advisory] }).verdict).toBe("clear");
    expect(run({ rules: [advisory, testRule()] }).verdict).toBe("needs_documents");
    expect(run({ rules: [advisory, testRule()], documents: [ohioPermit()] }).verdict).toBe("clear");
  });

  it("is blocked by one blocking finding on any animal, whatever else is missing or satisfied", () => {
    // source: PRODUCT.md §2 (product requirement, not an outside value)
    const rules = [testRule(), testRule({ ...block, selector: { taxa: ["Python regius"] } })];
    const animals = [buildAnimal(T.beardedDragon), buildAnimal(T.ballPython)];
    const result = run({ rules, animals, documents: [ohioPermit()] });
    expect(result.verdict).toBe("blocked");
    expect(result.animals.map((a) => a.findings.map((f) => [f.ruleId, f.severity, f.satisfiedBy === null]))).toEqual([
      [["test-oh-pogona-permit", "needs_document", false]],
      [["test-block", "blocks", true]],
    ]);
  });

  it("sorts each animal's findings by severity, then federal before state, then rule id", () => {
    // source: issue 4 §3 (product requirement, not an outside value): deterministic, sorted output
    const federalAdvice = testRule({
      id: "test-us-advice",
      jurisdiction: "US",
      governs: "interstate",
      effect: { kind: "advisory" },
    });
    const result = run({ rules: [advisory, federalAdvice, testRule(), block] });
    // Findings that name the animal stay on its line; the advisories, word for word the same
    // on every line, are said once for the shipment: each list keeps the same order.
    expect(result.animals[0]?.findings.map((f) => f.ruleId)).toEqual(["test-block", "test-oh-pogona-permit"]);
    expect(result.shipmentFindings.map((f) => f.ruleId)).toEqual(["test-us-advice", "test-advice"]);
    expect(result.rulesUsed.map((r) => r.ruleId)).toEqual([
      "test-advice",
      "test-block",
      "test-oh-pogona-permit",
      "test-us-advice",
    ]);
  });
});

describe("lines of one taxon", () => {
  it("are judged each on its own facts, and keep the name they were entered under", () => {
    // [published] 21 CFR 1240.62(b): under 4 in (101.6 mm) is covered, 4 in and over is not
    const slider = (lengthMm: number | null, scientificName = "Trachemys scripta elegans") =>
      buildAnimal(structuredClone(T.redEaredSlider), { lengthMm, scientificName });
    const result = evaluateCompliance(
      buildInput({
        facts: buildFacts({ sale: true }),
        animals: [slider(90), slider(120), slider(null), slider(90, "Pseudemys scripta elegans")],
      }),
    );
    const smallTurtle = result.animals.map(
      (a) => a.findings.find((f) => f.ruleId === "us-21cfr1240.62-small-turtles")?.message,
    );
    expect(smallTurtle[0]).toContain("It applies to this Trachemys scripta elegans, so the transfer is blocked");
    expect(smallTurtle[1]).toBeUndefined();
    expect(smallTurtle[2]).toContain("no length was given");
    // source: issue 4 §3 (HTTP contract): each animal's result carries its scientificName as sent
    expect(result.animals[3]?.scientificName).toBe("Pseudemys scripta elegans");
    expect(smallTurtle[3]).toContain("It applies to this Pseudemys scripta elegans");
  });
});

describe("determinism", () => {
  it("gives the same result, byte for byte, whatever the order of rules and documents", () => {
    // source: issue 4 §3 (product requirement, not an outside value): a pure, deterministic function
    const base = buildInput({
      facts: buildFacts({ destinationState: "HI", transitStates: ["OH"], sale: true }),
      animals: [
        buildAnimal(T.burmesePython),
        buildAnimal(T.redEaredSlider, { lengthMm: 90 }),
        buildAnimal(T.leopardTortoise),
      ],
      documents: [buildCvi({ speciesCovered: ["Geochelone pardalis"] }), ohioPermit()],
    });
    const reversed = { ...base, rules: [...base.rules].reverse(), documents: [...base.documents].reverse() };
    const first = JSON.stringify(evaluateCompliance(base));
    expect(JSON.stringify(evaluateCompliance(reversed))).toBe(first);
    expect(JSON.stringify(evaluateCompliance(base))).toBe(first);
    expect(JSON.parse(first).verdict).toBe("blocked");
  });
});
