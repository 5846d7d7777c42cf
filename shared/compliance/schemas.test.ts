import { describe, expect, it } from "vitest";
import { LIMITS } from "@shared/constants";
import { DEMO_TAXA as T } from "./demo-taxa";
import { evaluateCompliance, type EvaluationDocument } from "./evaluate";
import { buildAnimal, buildCvi, buildFacts, buildInput, findingsForLine } from "./evaluate-fixtures";
import { documentRecordSchema, evaluateRequestSchema, evaluateResponseSchema, type EvaluateRequest } from "./schemas";

/** The request body of issue 4, filled with invented demo values. */
const body: EvaluateRequest = {
  originState: "TN",
  destinationState: "OH",
  transitStates: ["KY"],
  shipDate: "2026-05-12",
  purpose: "breeding",
  sale: true,
  animals: [
    { scientificName: "Stigmochelys pardalis", count: 2, lengthMm: 120, origin: "captive_bred", sex: "unknown" },
  ],
  documents: [
    {
      kind: "cvi",
      jurisdiction: "TN",
      speciesCovered: ["Geochelone pardalis"],
      validFrom: null,
      validTo: null,
      issuedOn: "2026-05-01",
      statements: ["Examined and found free of ticks"],
    },
  ],
};

const accepts = (candidate: unknown) => evaluateRequestSchema.safeParse(candidate).success;

describe("evaluateRequestSchema", () => {
  it("accepts the contract's body and refuses unknown keys at every level", () => {
    // source: issue 4 §3 (HTTP contract, not an outside value): strict body, unknown keys rejected
    expect(accepts(body)).toBe(true);
    expect(accepts({ ...body, debug: true })).toBe(false);
    expect(accepts({ ...body, animals: [{ ...body.animals[0], colour: "yellow" }] })).toBe(false);
    expect(accepts({ ...body, documents: [{ ...body.documents[0], scan: "x" }] })).toBe(false);
  });

  it("takes counts as whole numbers from 1, caps strings and refuses NUL", () => {
    // source: issue 4 §3 (HTTP contract): counts whole >= 1, strings capped, NUL rejected; LIMITS in shared/constants.ts
    const animal = body.animals[0];
    for (const count of [1, LIMITS.animalCountMax])
      expect(accepts({ ...body, animals: [{ ...animal, count }] })).toBe(true);
    for (const count of [0, 1.5, -1, LIMITS.animalCountMax + 1])
      expect(accepts({ ...body, animals: [{ ...animal, count }] })).toBe(false);
    expect(accepts({ ...body, animals: [{ ...animal, scientificName: "P".repeat(LIMITS.nameMax) }] })).toBe(true);
    expect(accepts({ ...body, animals: [{ ...animal, scientificName: "P".repeat(LIMITS.nameMax + 1) }] })).toBe(false);
    expect(accepts({ ...body, animals: [{ ...animal, scientificName: "Python\u0000" }] })).toBe(false);
    expect(accepts({ ...body, documents: [{ ...body.documents[0], statements: ["ok\u0000"] }] })).toBe(false);
  });

  it("refuses impossible dates, an empty animal list and a window that ends before it starts", () => {
    // [published] Gregorian calendar: 2026 is not a leap year, so 2026-02-29 does not exist
    expect(accepts({ ...body, shipDate: "2026-02-29" })).toBe(false);
    expect(accepts({ ...body, shipDate: "2028-02-29" })).toBe(true);
    expect(accepts({ ...body, animals: [] })).toBe(false);
    expect(
      accepts({ ...body, documents: [{ ...body.documents[0], validFrom: "2026-05-02", validTo: "2026-05-01" }] }),
    ).toBe(false);
  });

  it("parses documents the evaluation takes as they are", () => {
    // source: issue 4 §3: the server validates with this schema, then calls the function
    const parsed = evaluateRequestSchema.parse(body);
    const documents: EvaluationDocument[] = parsed.documents;
    const result = evaluateCompliance(
      buildInput({
        facts: buildFacts({ ...parsed, transitStates: parsed.transitStates }),
        animals: [buildAnimal(T.leopardTortoise, { count: 2, lengthMm: 120 })],
        documents,
      }),
    );
    // [published] 9 CFR 74.1: 11-day-old certificate naming Geochelone pardalis, stating free of ticks
    expect(findingsForLine(result).find((f) => f.ruleId === "us-9cfr74.1-land-tortoises")?.satisfiedBy).toEqual({
      kind: "cvi",
      jurisdiction: "TN",
    });
  });
});

describe("evaluateResponseSchema", () => {
  it("describes what the evaluation returns", () => {
    // source: issue 4 §3 (HTTP contract): { verdict, animals: [{ scientificName, findings }] }
    const result = evaluateCompliance(
      buildInput({
        facts: buildFacts({ destinationState: "HI" }),
        animals: [buildAnimal(T.burmesePython), buildAnimal(T.leopardTortoise)],
        documents: [
          buildCvi({ speciesCovered: ["Stigmochelys pardalis"], statements: ["examined and found free of ticks"] }),
        ],
      }),
    );
    expect(evaluateResponseSchema.safeParse(result).error).toBeUndefined();
    expect(result.verdict).toBe("blocked");
  });
});

describe("documentRecordSchema", () => {
  const record = {
    kind: "cvi",
    jurisdiction: "TN",
    number: "DEMO-CVI-0042",
    holderName: "Demo Ridge Reptiles (invented)",
    speciesCovered: ["Stigmochelys pardalis"],
    validFrom: null,
    validTo: null,
    issuedOn: "2026-05-01",
    veterinarianName: "Dr. Demo Example",
    veterinarianAccredited: true,
    inspectionDate: "2026-04-30",
    statements: ["Examined and found free of ticks"],
    animalsCovered: [{ scientificName: "Stigmochelys pardalis", count: 2, identifier: null }],
  } as const;

  it("needs a certificate's issue date and veterinarian, and an inspection no later than the issue", () => {
    // [published] 9 CFR 74.1: the certificate is signed by an accredited veterinarian after examining the animals
    expect(documentRecordSchema.safeParse(record).success).toBe(true);
    expect(documentRecordSchema.safeParse({ ...record, veterinarianName: null }).success).toBe(false);
    expect(documentRecordSchema.safeParse({ ...record, issuedOn: null }).success).toBe(false);
    expect(documentRecordSchema.safeParse({ ...record, inspectionDate: "2026-05-02" }).success).toBe(false);
    // [practice] a permit carries no veterinarian
    expect(
      documentRecordSchema.safeParse({ ...record, kind: "possession_permit", veterinarianName: null, issuedOn: null })
        .success,
    ).toBe(true);
  });
});
