import { describe, expect, it } from "vitest";
import { DEMO_TAXA as T } from "./demo-taxa";
import { evaluateCompliance, type EvaluationAnimal, type EvaluationDocument, type TransferFacts } from "./evaluate";
import { buildAnimal, buildCvi, buildFacts, buildInput, findingsForLine } from "./evaluate-fixtures";
import { FEDERAL_RULES } from "./federal-rules";
import { ruleSchema, type Rule } from "./rule";

const SMALL_TURTLES = "us-21cfr1240.62-small-turtles";
const LAND_TORTOISES = "us-9cfr74.1-land-tortoises";
const INJURIOUS_REPTILES = "us-18usc42-injurious-reptiles";
const INJURIOUS_SALAMANDERS = "us-50cfr16.14-injurious-salamanders";
const ENDANGERED = "us-50cfr17.21-endangered-commerce";

function evaluate(
  animal: EvaluationAnimal,
  facts: Partial<TransferFacts> = {},
  documents: EvaluationDocument[] = [],
  rules: readonly Rule[] = FEDERAL_RULES,
) {
  return evaluateCompliance(
    buildInput({ facts: buildFacts(facts), animals: [animal], documents, rules, transitPolicies: [] }),
  );
}

function finding(result: ReturnType<typeof evaluate>, ruleId: string) {
  return findingsForLine(result).find((f) => f.ruleId === ruleId);
}

describe("seed federal rules", () => {
  it("each parses as a rule, with a unique id, the seed review and an official-text link", () => {
    const ids = new Set(FEDERAL_RULES.map((rule) => rule.id));
    expect(ids.size).toBe(FEDERAL_RULES.length);
    for (const rule of FEDERAL_RULES) {
      expect(ruleSchema.safeParse(rule).error).toBeUndefined();
      expect([rule.jurisdiction, rule.reviewedOn, rule.reviewedBy, rule.demo]).toEqual([
        "US",
        "2026-12-01",
        "Hatchway seed",
        false,
      ]);
      expect(rule.citation.url).toMatch(/^https:\/\/(www\.ecfr\.gov|www\.law\.cornell\.edu|uscode\.house\.gov)\//);
    }
  });
});

describe("21 CFR 1240.62: turtles under 4 inches", () => {
  const sale = { sale: true, purpose: "breeding" } as const;

  it("blocks the sale of a 100.0 mm slider and lets a 101.6 mm one through", () => {
    // [published] 21 CFR 1240.62(b): "carapace length of less than 4 inches"; 4 in = 101.6 mm (international inch, 25.4 mm)
    const small = evaluate(buildAnimal(T.redEaredSlider, { lengthMm: 100.0 }), sale);
    expect(finding(small, SMALL_TURTLES)?.severity).toBe("blocks");
    expect(small.verdict).toBe("blocked");
    // [published] 21 CFR 1240.62(b): exactly 4 inches is not "less than 4 inches"
    const atLimit = evaluate(buildAnimal(T.redEaredSlider, { lengthMm: 101.6 }), sale);
    expect(finding(atLimit, SMALL_TURTLES)).toBeUndefined();
    expect(atLimit.verdict).toBe("clear");
  });

  it("still blocks just under the limit and says why in plain words", () => {
    // [published] 21 CFR 1240.62(b): strictly less than 4 inches
    const result = evaluate(buildAnimal(T.redEaredSlider, { lengthMm: 101.59 }), sale);
    expect(finding(result, SMALL_TURTLES)?.message).toMatch(
      /shorter than 4 inches \(101\.6 mm\).*transfer is blocked\.$/,
    );
  });

  it("exempts the same small turtle moved for a bona fide educational or scientific purpose", () => {
    // [published, secondary] 21 CFR 1240.62 exceptions: bona fide scientific, educational or exhibition purposes other than as pets
    for (const purpose of ["education_exhibition", "scientific"] as const) {
      const result = evaluate(buildAnimal(T.redEaredSlider, { lengthMm: 100.0 }), { sale: true, purpose });
      expect(finding(result, SMALL_TURTLES)).toBeUndefined();
      expect(result.verdict).toBe("clear");
    }
  });

  it("leaves out the sea-turtle families Cheloniidae and Dermochelyidae", () => {
    // [published] 21 CFR 1240.62(a): "except marine species (families Dermachelidae and Chelonidae)"
    for (const taxon of [T.greenSeaTurtle, T.leatherback]) {
      expect(finding(evaluate(buildAnimal(taxon, { lengthMm: 50 }), sale), SMALL_TURTLES)).toBeUndefined();
    }
    // [published] 21 CFR 1240.62(a): tortoises are "turtles" too
    expect(finding(evaluate(buildAnimal(T.sulcataTortoise, { lengthMm: 50 }), sale), SMALL_TURTLES)?.severity).toBe(
      "blocks",
    );
  });

  it("covers sales within one state, and not a gift", () => {
    // [published] 21 CFR 1240.62 is titled "intrastate and interstate requirements"
    const intrastate = evaluate(buildAnimal(T.redEaredSlider, { lengthMm: 60 }), { ...sale, destinationState: "TN" });
    expect(finding(intrastate, SMALL_TURTLES)?.severity).toBe("blocks");
    // [published] 21 CFR 1240.62(b): the ban is on sale or commercial distribution
    expect(finding(evaluate(buildAnimal(T.redEaredSlider, { lengthMm: 60 })), SMALL_TURTLES)).toBeUndefined();
    // [published] 21 CFR 1240.62(b): "any other type of commercial ... distribution", sold or not
    const commercial = evaluate(buildAnimal(T.redEaredSlider, { lengthMm: 60 }), {
      purpose: "commercial_sale",
      sale: false,
    });
    expect(finding(commercial, SMALL_TURTLES)?.severity).toBe("blocks");
  });

  it("takes an unmeasured turtle in a sale to be covered and says the length is missing", () => {
    // [published] 21 CFR 1240.62(b): only a carapace of 4 in or more escapes the ban, so an unknown length cannot clear it
    const result = evaluate(buildAnimal(T.redEaredSlider, { lengthMm: null }), sale);
    expect(finding(result, SMALL_TURTLES)?.message).toContain("no length was given");
    expect(result.verdict).toBe("blocked");
  });
});

describe("9 CFR 74.1: leopard, African spurred and Bell's hinge-back tortoises", () => {
  const shipDate = "2026-05-31";
  const ticks = { speciesCovered: ["Geochelone pardalis"], statements: ["Examined and found free of ticks."] };

  it("accepts a CVI issued 30 days before the move and refuses one issued 31 days before", () => {
    // [published] 9 CFR 74.1: signed by an accredited veterinarian "within 30 days prior to the interstate movement"
    const fresh = evaluate(buildAnimal(T.leopardTortoise), { shipDate }, [
      buildCvi({ ...ticks, issuedOn: "2026-05-01" }),
    ]);
    expect(finding(fresh, LAND_TORTOISES)?.satisfiedBy).toMatchObject({ kind: "cvi", number: "DEMO-CVI-0001" });
    expect(fresh.verdict).toBe("clear");

    const stale = evaluate(buildAnimal(T.leopardTortoise), { shipDate }, [
      buildCvi({ ...ticks, issuedOn: "2026-04-30" }),
    ]);
    expect(finding(stale, LAND_TORTOISES)?.satisfiedBy).toBeNull();
    expect(finding(stale, LAND_TORTOISES)?.message).toContain("issued 31 days before the ship date");
    expect(stale.verdict).toBe("needs_documents");
  });

  it("finds the tortoise under its older genus Geochelone, in the rule and on the certificate", () => {
    // [published] 9 CFR 74.1 names "Geochelone pardalis" and "Geochelone sulcata"; now Stigmochelys and Centrochelys [memory: Reptile Database]
    const oldNamesOnly = FEDERAL_RULES.map((rule) =>
      rule.id === LAND_TORTOISES
        ? { ...rule, selector: { taxa: ["Geochelone pardalis", "Geochelone sulcata"] } }
        : rule,
    );
    for (const taxon of [T.leopardTortoise, T.sulcataTortoise]) {
      expect(finding(evaluate(buildAnimal(taxon), { shipDate }, [], oldNamesOnly), LAND_TORTOISES)?.severity).toBe(
        "needs_document",
      );
    }
    // [published] 9 CFR 74.1: Bell's hinge-back tortoise (Kinixys belliana) too
    expect(finding(evaluate(buildAnimal(T.bellsHingeback), { shipDate }), LAND_TORTOISES)?.missing).toContain(
      "examined and found free of ticks",
    );
  });

  it("refuses a certificate without the tick statement, naming another species, or signed by an unaccredited vet", () => {
    // [published] 9 CFR 74.1: accredited veterinarian; must state "examined ... and found free of ticks"
    const cases: [Partial<EvaluationDocument>, string][] = [
      [{ statements: ["Healthy on inspection"] }, 'does not state "examined and found free of ticks"'],
      [{ speciesCovered: ["Kinixys belliana"] }, "does not name Stigmochelys pardalis"],
      [{ veterinarianAccredited: false }, "not signed by an accredited veterinarian"],
    ];
    for (const [change, reason] of cases) {
      const result = evaluate(buildAnimal(T.leopardTortoise), { shipDate }, [
        buildCvi({ ...ticks, issuedOn: "2026-05-20", ...change }),
      ]);
      expect(finding(result, LAND_TORTOISES)?.message).toContain(reason);
    }
  });

  it("counts a certificate signed on the ship date as 0 days old and refuses one dated after it", () => {
    // [published] 9 CFR 74.1: "prior to the interstate movement"; the same day is within the window
    const sameDay = evaluate(buildAnimal(T.leopardTortoise), { shipDate }, [
      buildCvi({ ...ticks, issuedOn: shipDate }),
    ]);
    expect(finding(sameDay, LAND_TORTOISES)?.satisfiedBy).not.toBeNull();
    const later = evaluate(buildAnimal(T.leopardTortoise), { shipDate }, [
      buildCvi({ ...ticks, issuedOn: "2026-06-01" }),
    ]);
    expect(finding(later, LAND_TORTOISES)?.message).toContain("after the ship date");
  });

  it("does not reach a move within one state", () => {
    // [published] 9 CFR 74.1 governs "interstate movement"
    expect(
      finding(evaluate(buildAnimal(T.leopardTortoise), { destinationState: "TN" }), LAND_TORTOISES),
    ).toBeUndefined();
  });
});

describe("18 U.S.C. 42 and 50 CFR 16.15: injurious reptiles", () => {
  it("does not block a Burmese python between two continental states, and blocks it to Hawaii", () => {
    // [published] USARK v. Zinke, 852 F.3d 1131: 18 U.S.C. 42 does not bar shipments between the continental states
    const continental = evaluate(buildAnimal(T.burmesePython), { originState: "FL", destinationState: "GA" });
    expect(finding(continental, INJURIOUS_REPTILES)).toBeUndefined();
    expect(continental.verdict).toBe("clear");
    // [published] 18 U.S.C. 42(a)(1): shipment between the continental US and Hawaii is barred
    const toHawaii = evaluate(buildAnimal(T.burmesePython), { originState: "FL", destinationState: "HI" });
    expect(finding(toHawaii, INJURIOUS_REPTILES)?.severity).toBe("blocks");
    expect(toHawaii.verdict).toBe("blocked");
  });

  it("covers the other direction and DC, Puerto Rico and the territories", () => {
    // [published] 18 U.S.C. 42(a)(1) lists the District of Columbia, Hawaii, Puerto Rico and possessions
    for (const [originState, destinationState] of [
      ["HI", "CA"],
      ["VA", "DC"],
      ["TX", "PR"],
      ["GU", "HI"],
    ] as const) {
      expect(
        finding(evaluate(buildAnimal(T.burmesePython), { originState, destinationState }), INJURIOUS_REPTILES)
          ?.severity,
      ).toBe("blocks");
    }
  });

  it("finds the reticulated python under Python reticulatus and passes a non-listed python", () => {
    // [published] 50 CFR 16.15 lists the reticulated python (as Python/Broghammerus reticulatus); Python regius is not listed
    expect(
      finding(evaluate(buildAnimal(T.reticulatedPython), { destinationState: "HI" }), INJURIOUS_REPTILES),
    ).toBeDefined();
    expect(
      finding(evaluate(buildAnimal(T.ballPython), { destinationState: "HI" }), INJURIOUS_REPTILES),
    ).toBeUndefined();
  });

  it("is lifted by a federal permit naming the species", () => {
    // [published] 18 U.S.C. 42(a)(3): permits for zoological, educational, medical or scientific purposes
    const permit: EvaluationDocument = {
      kind: "federal_permit",
      jurisdiction: "US",
      number: "DEMO-FWS-0001",
      speciesCovered: ["Python bivittatus"],
      statements: [],
      validFrom: "2026-01-01",
      validTo: "2026-12-31",
    };
    const result = evaluate(buildAnimal(T.burmesePython), { destinationState: "HI" }, [permit]);
    expect(finding(result, INJURIOUS_REPTILES)?.satisfiedBy).toMatchObject({
      kind: "federal_permit",
      number: "DEMO-FWS-0001",
    });
    expect(result.verdict).toBe("clear");
  });
});

describe("50 CFR 16.14: injurious salamanders", () => {
  it("blocks a Cynops newt to Puerto Rico, not between continental states, and not an axolotl", () => {
    // [published] 81 FR 1534 lists Cynops orientalis; 90 FR 2170 limits the scope to shipments to or from non-continental jurisdictions
    expect(
      finding(evaluate(buildAnimal(T.orientalFireBelliedNewt), { destinationState: "PR" }), INJURIOUS_SALAMANDERS)
        ?.severity,
    ).toBe("blocks");
    expect(finding(evaluate(buildAnimal(T.orientalFireBelliedNewt)), INJURIOUS_SALAMANDERS)).toBeUndefined();
    // [published] Ambystoma is not among the 2016 genera
    expect(
      finding(evaluate(buildAnimal(T.axolotl), { destinationState: "PR" }), INJURIOUS_SALAMANDERS),
    ).toBeUndefined();
  });
});

describe("50 CFR 17.21: endangered species in interstate commerce", () => {
  const registration: EvaluationDocument = {
    kind: "captive_bred_registration",
    jurisdiction: "US",
    number: "DEMO-CBW-0001",
    speciesCovered: ["Geochelone radiata"],
    statements: [],
  };

  it("asks for a federal permit or captive-bred registration in a sale, and accepts one under an older name", () => {
    // [memory] 50 CFR 17.21(e)-(g): interstate commerce in the course of a commercial activity needs a permit or CBW registration
    const bare = evaluate(buildAnimal(T.radiatedTortoise), { sale: true });
    expect(finding(bare, ENDANGERED)?.missing).toBe(
      "a federal permit or captive-bred wildlife registration naming Astrochelys radiata",
    );
    expect(
      finding(evaluate(buildAnimal(T.radiatedTortoise), { sale: true }, [registration]), ENDANGERED)?.satisfiedBy,
    ).not.toBeNull();
    // [memory] 50 CFR 17.21(e): a non-commercial move is outside "commercial activity"
    expect(finding(evaluate(buildAnimal(T.radiatedTortoise)), ENDANGERED)).toBeUndefined();
  });
});

describe("advisories: 50 CFR 14.81, the Lacey Act and 9 CFR 1.1", () => {
  it("reminds of box marking and the Lacey Act across state lines, and of the missing transport standard always", () => {
    // [published] 50 CFR 14.81 and 16 U.S.C. 3372(a)(2)(A) concern interstate commerce
    const across = evaluate(buildAnimal(T.beardedDragon));
    expect(findingsForLine(across).map((f) => [f.ruleId, f.severity])).toEqual([
      ["us-16usc3372-lacey-act", "advisory"],
      ["us-50cfr14.81-container-marking", "advisory"],
      ["us-9cfr1.1-no-transport-standard", "advisory"],
    ]);
    expect(across.verdict).toBe("clear");
    // [published] 9 CFR 1.1: "animal" means warm-blooded animals only, within a state or across
    const within = evaluate(buildAnimal(T.beardedDragon), { destinationState: "TN" });
    expect(findingsForLine(within).map((f) => f.ruleId)).toEqual(["us-9cfr1.1-no-transport-standard"]);
  });
});
