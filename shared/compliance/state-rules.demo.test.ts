import { describe, expect, it } from "vitest";
import { DEMO_TAXA as T } from "./demo-taxa";
import {
  evaluateCompliance,
  type EvaluationAnimal,
  type EvaluationDocument,
  type EvaluationInput,
  type TransferFacts,
} from "./evaluate";
import { buildAnimal, buildCvi, buildFacts, buildInput, findingsForLine } from "./evaluate-fixtures";
import { DEMO_RULE_NOTICE, ruleSchema, stateTransitPolicySchema } from "./rule";
import { STATE_RULES, STATE_TRANSIT_POLICIES } from "./state-rules.demo";

const HAWAII_SNAKES = "hi-hrs150a-6-live-snakes";
const OHIO_VENOMOUS = "demo-oh-import-venomous-snakes";

function evaluate(
  animal: EvaluationAnimal,
  facts: Partial<TransferFacts> = {},
  documents: EvaluationDocument[] = [],
  extra: Partial<EvaluationInput> = {},
) {
  return evaluateCompliance(
    buildInput({ facts: buildFacts(facts), animals: [animal], documents, rules: STATE_RULES, ...extra }),
  );
}

function finding(result: ReturnType<typeof evaluate>, ruleId: string) {
  return findingsForLine(result).find((f) => f.ruleId === ruleId);
}

function permit(
  kind: EvaluationDocument["kind"],
  jurisdiction: EvaluationDocument["jurisdiction"],
  overrides: Partial<EvaluationDocument> = {},
): EvaluationDocument {
  return {
    kind,
    jurisdiction,
    number: "DEMO-0001",
    speciesCovered: [],
    statements: [],
    validFrom: "2026-01-01",
    validTo: "2026-12-31",
    ...overrides,
  };
}

describe("seed state rules", () => {
  it("parse, cover at least eight demo states, and label every demo rule as such", () => {
    // [practice] the brief's labelling requirement: demo rules carry the notice, Hawaii's published rule does not
    for (const rule of STATE_RULES) expect(ruleSchema.safeParse(rule).error).toBeUndefined();
    const demo = STATE_RULES.filter((rule) => rule.demo);
    expect(new Set(demo.map((rule) => rule.jurisdiction)).size).toBeGreaterThanOrEqual(8);
    for (const rule of demo) expect(rule.citation.text).toContain(DEMO_RULE_NOTICE);
    expect(STATE_RULES.find((rule) => rule.id === HAWAII_SNAKES)?.demo).toBe(false);
    expect(STATE_RULES.find((rule) => rule.id === "hi-hrs150a-6-gila-monster")?.demo).toBe(false);
    for (const policy of STATE_TRANSIT_POLICIES)
      expect(stateTransitPolicySchema.safeParse(policy).error).toBeUndefined();
  });

  it("include every effect kind and every holder side", () => {
    const kinds = new Set(STATE_RULES.map((rule) => rule.effect.kind));
    expect([...kinds].sort()).toEqual(["advisory", "certificate_required", "permit_required", "prohibited"]);
    const holders = STATE_RULES.flatMap((rule) =>
      rule.effect.kind === "permit_required" ? [rule.effect.permit.holder] : [],
    );
    expect(new Set(holders)).toEqual(new Set(["receiver", "sender"]));
  });
});

describe("HRS 150A-6: no live snake into Hawaii", () => {
  it("blocks any snake, venomous or not, listed as injurious or not, and no lizard", () => {
    // [published] HRS 150A-6(3): "Any live snake" may not be transported to the State
    for (const taxon of [T.cornSnake, T.ballPython, T.westernDiamondback]) {
      const result = evaluate(buildAnimal(taxon), { destinationState: "HI" });
      expect(finding(result, HAWAII_SNAKES)?.severity).toBe("blocks");
      expect(result.verdict).toBe("blocked");
    }
    // [published] HRS 150A-6(3) names snakes (and Gila monsters, which this rule leaves to a separate entry)
    expect(finding(evaluate(buildAnimal(T.beardedDragon), { destinationState: "HI" }), HAWAII_SNAKES)).toBeUndefined();
  });

  it("finds a snake whose lineage skips the suborder, by its family", () => {
    // [published] HRS 150A-6(3): any live snake; Colubridae is a snake family [practice]
    const noSuborder = { ...T.cornSnake, lineage: T.cornSnake.lineage.filter((entry) => entry.rank !== "suborder") };
    expect(finding(evaluate(buildAnimal(noSuborder), { destinationState: "HI" }), HAWAII_SNAKES)?.severity).toBe(
      "blocks",
    );
  });

  it("forbids a Gila monster going to Hawaii, and no other lizard", () => {
    // [published] HRS 150A-6(3): "Any live snake, flying fox, fruit bat, Gila monster …" may not be transported to the State
    const gila = evaluate(buildAnimal(T.gilaMonster), { originState: "AZ", destinationState: "HI" });
    expect(finding(gila, "hi-hrs150a-6-gila-monster")?.severity).toBe("blocks");
    expect(gila.verdict).toBe("blocked");
    expect(
      finding(evaluate(buildAnimal(T.beardedDragon), { destinationState: "HI" }), "hi-hrs150a-6-gila-monster"),
    ).toBeUndefined();
  });

  it("does not reach a snake leaving Hawaii", () => {
    // [published] HRS 150A-6: transport "to the State"
    expect(
      finding(evaluate(buildAnimal(T.cornSnake), { originState: "HI", destinationState: "CA" }), HAWAII_SNAKES),
    ).toBeUndefined();
  });
});

describe("transit-only states (Ohio Rev. Code 1533.31)", () => {
  const throughOhio = { originState: "IN", destinationState: "PA", transitStates: ["OH"] } as const;

  it("leaves a shipment that only passes through Ohio outside Ohio's import rule", () => {
    // [published] Ohio Rev. Code 1533.31: merely passing through by carrier is not an import
    const result = evaluate(buildAnimal(T.westernDiamondback), throughOhio);
    expect(finding(result, OHIO_VENOMOUS)).toBeUndefined();
    // source: issue 12 §1 (product requirement): a state whose rules in the library are demo rules is never covered, so at best "unverified"
    expect(result.verdict).toBe("unverified");
  });

  it("applies the same rule in transit where the state is not marked exempt, and at the destination", () => {
    // [published] Ohio Rev. Code 1533.31 is one state's choice: the setting is per state
    const notExempt = evaluate(buildAnimal(T.westernDiamondback), throughOhio, [], { transitPolicies: [] });
    expect(finding(notExempt, OHIO_VENOMOUS)?.message).toContain("passing through Ohio");
    expect(notExempt.verdict).toBe("needs_documents");
    const destination = evaluate(buildAnimal(T.westernDiamondback));
    expect(finding(destination, OHIO_VENOMOUS)?.missing).toBe(
      "an import permit from Ohio naming Crotalus atrox, held by the receiver",
    );
    // [practice] the corn snake is not venomous, so a rule on venomous snakes leaves it alone
    expect(finding(evaluate(buildAnimal(T.cornSnake)), OHIO_VENOMOUS)).toBeUndefined();
  });

  it("lets a rule that governs transit itself apply in transit", () => {
    // [practice] some states regulate venomous animals driven through them; demo rule for Florida
    const result = evaluate(buildAnimal(T.gilaMonster), {
      originState: "GA",
      destinationState: "AL",
      transitStates: ["FL"],
    });
    expect(finding(result, "demo-fl-transit-venomous-notice")?.severity).toBe("advisory");
  });
});

describe("demo state rules by effect", () => {
  it("import permit held by the receiver: a sender's permit does not do, the receiver's does", () => {
    // [practice] a state import permit is issued to the person receiving the animal
    const senders = evaluate(buildAnimal(T.westernDiamondback), {}, [
      permit("state_import_permit", "OH", { speciesCovered: ["Crotalus atrox"], holderSide: "sender" }),
    ]);
    expect(finding(senders, OHIO_VENOMOUS)?.message).toContain("is held by the sender, not the receiver");
    const receivers = evaluate(buildAnimal(T.westernDiamondback), {}, [
      permit("state_import_permit", "OH", { speciesCovered: ["Crotalus"], holderSide: "receiver" }),
    ]);
    expect(finding(receivers, OHIO_VENOMOUS)?.satisfiedBy).toMatchObject({
      kind: "state_import_permit",
      jurisdiction: "OH",
    });
    // [practice] a permit from another state does not satisfy this one
    const otherState = evaluate(buildAnimal(T.westernDiamondback), {}, [
      permit("state_import_permit", "IN", { speciesCovered: ["Crotalus atrox"] }),
    ]);
    expect(finding(otherState, OHIO_VENOMOUS)?.satisfiedBy).toBeNull();
  });

  it("export permit held by the sender", () => {
    // [practice] export permits are issued to the shipper in the state of origin
    const facts = { originState: "AZ", destinationState: "TX" } as const;
    const none = evaluate(buildAnimal(T.gilaMonster), facts);
    expect(finding(none, "demo-az-export-heloderma")?.missing).toBe(
      "an export permit from Arizona naming Heloderma suspectum, held by the sender",
    );
    const held = evaluate(buildAnimal(T.gilaMonster), facts, [
      permit("export_permit", "AZ", { speciesCovered: ["Heloderma suspectum"], holderSide: "sender" }),
    ]);
    // source: issue 12 §1 (product requirement): a state whose rules in the library are demo rules is never covered, so at best "unverified"
    expect(held.verdict).toBe("unverified");
    // [practice] a move within the state is no export
    expect(
      finding(
        evaluate(buildAnimal(T.gilaMonster), { originState: "AZ", destinationState: "AZ" }),
        "demo-az-export-heloderma",
      ),
    ).toBeUndefined();
  });

  it("possession permit above a length: exactly 2,400 mm is not above it", () => {
    // [practice] a length threshold ("longer than") excludes the threshold itself
    const at = evaluate(buildAnimal(T.ballPython, { lengthMm: 2400 }), { destinationState: "TX" });
    expect(finding(at, "demo-tx-possession-large-constrictors")).toBeUndefined();
    const over = evaluate(buildAnimal(T.burmesePython, { lengthMm: 2401 }), { destinationState: "TX" });
    expect(finding(over, "demo-tx-possession-large-constrictors")?.severity).toBe("needs_document");
    // [practice] a possession rule binds the keeper in the state, not one sending the animal away from it
    const leaving = evaluate(buildAnimal(T.burmesePython, { lengthMm: 2401 }), {
      originState: "TX",
      destinationState: "OK",
    });
    expect(finding(leaving, "demo-tx-possession-large-constrictors")).toBeUndefined();
  });

  it("certificate within 10 days, any species: day 10 passes, day 11 fails", () => {
    // [published] Gregorian calendar: 2026-05-02 to 2026-05-12 is 10 days, 2026-05-01 to 2026-05-12 is 11
    const statement = { statements: ["Examined and found free of signs of infectious disease"] };
    const ok = evaluate(buildAnimal(T.easternBoxTurtle), { destinationState: "GA" }, [
      buildCvi({ ...statement, issuedOn: "2026-05-02" }),
    ]);
    expect(finding(ok, "demo-ga-import-chelonian-cvi")?.satisfiedBy).not.toBeNull();
    const late = evaluate(buildAnimal(T.easternBoxTurtle), { destinationState: "GA" }, [
      buildCvi({ ...statement, issuedOn: "2026-05-01" }),
    ]);
    expect(finding(late, "demo-ga-import-chelonian-cvi")?.message).toContain("issued 11 days before the ship date");
  });

  it("prohibition of a native genus, for wild-caught animals only", () => {
    // [practice] states commonly forbid importing wild-caught native turtles; demo rule
    expect(
      evaluate(buildAnimal(T.easternBoxTurtle, { origin: "wild_caught" }), { destinationState: "PA" }).verdict,
    ).toBe("blocked");
    // source: issue 12 §1 (product requirement): a state whose rules in the library are demo rules is never covered, so at best "unverified"
    expect(evaluate(buildAnimal(T.easternBoxTurtle), { destinationState: "PA" }).verdict).toBe("unverified");
  });

  it("certificate above a count: 25 is not above 25, 26 is", () => {
    // [practice] "more than N" excludes N itself
    const rule = "demo-nc-import-bulk-salamanders";
    expect(finding(evaluate(buildAnimal(T.axolotl, { count: 25 }), { destinationState: "NC" }), rule)).toBeUndefined();
    expect(finding(evaluate(buildAnimal(T.axolotl, { count: 26 }), { destinationState: "NC" }), rule)?.severity).toBe(
      "needs_document",
    );
  });

  it("a condition on sex: males pass, females are caught, unknown sex is taken to be caught", () => {
    // [practice] an unsexed animal cannot be shown to fall outside a rule on females
    const rule = "demo-mi-possession-breeding-sliders";
    const facts = { destinationState: "MI", purpose: "breeding" } as const;
    expect(finding(evaluate(buildAnimal(T.redEaredSlider, { sex: "male" }), facts), rule)).toBeUndefined();
    expect(finding(evaluate(buildAnimal(T.redEaredSlider, { sex: "female" }), facts), rule)?.severity).toBe(
      "needs_document",
    );
    expect(finding(evaluate(buildAnimal(T.redEaredSlider), facts), rule)?.message).toContain("its sex is not known");
  });

  it("a prohibition lifted by the receiver's permit, and a plain advisory", () => {
    // [practice] some states ban a group except under permit; demo rule for New York
    const rule = "demo-ny-import-crocodilians";
    expect(evaluate(buildAnimal(T.americanAlligator), { destinationState: "NY" }).verdict).toBe("blocked");
    const permitted = evaluate(buildAnimal(T.americanAlligator), { destinationState: "NY" }, [
      permit("state_import_permit", "NY", { speciesCovered: ["Alligator mississippiensis"] }),
    ]);
    expect(finding(permitted, rule)?.message).toContain("on file allows it");
    // source: issue 12 §1 (product requirement): a state whose rules in the library are demo rules is never covered, so at best "unverified"
    expect(permitted.verdict).toBe("unverified");
    const advisory = evaluate(buildAnimal(T.dyeingDartFrog), { destinationState: "CA" });
    expect([finding(advisory, "demo-ca-import-amphibian-advisory")?.severity, advisory.verdict]).toEqual([
      "advisory",
      "unverified",
    ]);
  });
});
