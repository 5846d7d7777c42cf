import { ANIMAL_ORIGINS, DOCUMENT_KINDS, LIMITS, PURPOSES, SEXES, US_STATES } from "@shared/constants";
import { JURISDICTIONS } from "./jurisdiction";
import { z } from "../validation/zod";
import { NO_CONTROL_CHARACTERS } from "../schemas/common";
import { citationSchema, HOLDER_SIDES } from "./rule";
import { coverageEntrySchema } from "./coverage";

const text = (max: number) =>
  z
    .string()
    .trim()
    .min(1)
    .max(max)
    .refine((value) => !value.includes("\u0000"), { params: { instruction: NO_CONTROL_CHARACTERS } });
const name = text(LIMITS.nameMax);
const isoDate = z.iso.date();

/** Most documents a transfer can carry, and most species or statements one document lists. */
export const COMPLIANCE_LIMITS = {
  documentsPerTransferMax: 200,
  speciesPerDocumentMax: 200,
  statementsPerDocumentMax: 20,
  animalsPerCertificateMax: LIMITS.animalsPerTransferMax,
} as const;

const validityWindow = (doc: { validFrom?: string | null; validTo?: string | null }) =>
  !doc.validFrom || !doc.validTo || doc.validFrom <= doc.validTo;
const windowMessage = {
  params: { instruction: "make it no earlier than the first valid day" },
  path: ["validTo"],
};

export const evaluateAnimalSchema = z.strictObject({
  scientificName: name,
  count: z.int().min(1).max(LIMITS.animalCountMax),
  /** Carapace length for chelonians, total length otherwise; null when not measured. */
  lengthMm: z.number().positive().max(LIMITS.lengthMmMax).nullable().optional(),
  origin: z.enum(ANIMAL_ORIGINS),
  sex: z.enum(SEXES),
});

/** A permit or certificate as the evaluation sees it; the optional keys sharpen the matching. */
export const evaluateDocumentSchema = z
  .strictObject({
    kind: z.enum(DOCUMENT_KINDS),
    jurisdiction: z.enum(JURISDICTIONS),
    speciesCovered: z.array(name).max(COMPLIANCE_LIMITS.speciesPerDocumentMax),
    validFrom: isoDate.nullable().optional(),
    validTo: isoDate.nullable().optional(),
    issuedOn: isoDate.nullable().optional(),
    statements: z.array(name).max(COMPLIANCE_LIMITS.statementsPerDocumentMax),
    id: name.optional(),
    number: name.optional(),
    /** Left out: the document counts for whichever side a rule asks for. */
    holderSide: z.enum(HOLDER_SIDES).optional(),
    /** Left out: the veterinarian's accreditation is not held against the certificate. */
    veterinarianAccredited: z.boolean().optional(),
  })
  .refine(validityWindow, windowMessage);

/** Body of POST /api/compliance/evaluate. */
export const evaluateRequestSchema = z.strictObject({
  originState: z.enum(US_STATES),
  destinationState: z.enum(US_STATES),
  /** States a ground route passes through, in order; the ends are ignored if repeated. */
  transitStates: z.array(z.enum(US_STATES)).max(US_STATES.length),
  shipDate: isoDate,
  purpose: z.enum(PURPOSES),
  sale: z.boolean(),
  animals: z.array(evaluateAnimalSchema).min(1).max(LIMITS.animalsPerTransferMax),
  documents: z.array(evaluateDocumentSchema).max(COMPLIANCE_LIMITS.documentsPerTransferMax),
});
export type EvaluateRequest = z.infer<typeof evaluateRequestSchema>;
export type EvaluateDocument = z.infer<typeof evaluateDocumentSchema>;

export const SEVERITIES = ["blocks", "needs_document", "advisory"] as const;
export type Severity = (typeof SEVERITIES)[number];

/**
 * The compliance verdict, from best to worst. "unverified": no rule in the library stops the
 * move, but a jurisdiction on the route has no reviewed rules, so nothing says it is clear.
 */
export const VERDICTS = ["clear", "unverified", "needs_documents", "blocked"] as const;
export type Verdict = (typeof VERDICTS)[number];

export const findingSchema = z.strictObject({
  ruleId: z.string(),
  ruleVersion: z.int().min(1),
  jurisdiction: z.enum(JURISDICTIONS),
  citation: citationSchema,
  severity: z.enum(SEVERITIES),
  /** Plain sentences: what the rule says, why it applies, and what satisfies it or is missing. */
  message: z.string(),
  satisfiedBy: z
    .strictObject({
      kind: z.enum(DOCUMENT_KINDS),
      jurisdiction: z.enum(JURISDICTIONS),
      id: z.string().optional(),
      number: z.string().optional(),
    })
    .nullable(),
  /** What would satisfy the rule, when nothing on file does. */
  missing: z.string().optional(),
});
export type Finding = z.infer<typeof findingSchema>;

export const evaluateResponseSchema = z.strictObject({
  verdict: z.enum(VERDICTS),
  /** Findings that apply to every animal line, word for word (said once, above the lines). */
  shipmentFindings: z.array(findingSchema),
  /** Per line, the findings that differ from line to line (shipment-wide ones are left out). */
  animals: z.array(z.strictObject({ scientificName: z.string(), findings: z.array(findingSchema) })),
  rulesUsed: z.array(z.strictObject({ ruleId: z.string(), version: z.int().min(1) })),
  /** Every jurisdiction on the route: federal, origin, transit states, destination. */
  coverage: z.array(coverageEntrySchema),
});
export type EvaluateResponse = z.infer<typeof evaluateResponseSchema>;

/**
 * A permit or certificate held by an organisation (database row and upload form). The side it
 * is held on is not stored: it follows from whether the holder sends or receives a transfer.
 */
export const documentRecordSchema = z
  .strictObject({
    kind: z.enum(DOCUMENT_KINDS),
    jurisdiction: z.enum(JURISDICTIONS),
    number: name,
    holderName: name,
    speciesCovered: z.array(name).max(COMPLIANCE_LIMITS.speciesPerDocumentMax),
    validFrom: isoDate.nullable(),
    validTo: isoDate.nullable(),
    issuedOn: isoDate.nullable(),
    veterinarianName: name.nullable(),
    veterinarianAccredited: z.boolean().nullable(),
    inspectionDate: isoDate.nullable(),
    statements: z.array(name).max(COMPLIANCE_LIMITS.statementsPerDocumentMax),
    animalsCovered: z
      .array(
        z.strictObject({
          scientificName: name,
          count: z.int().min(1).max(LIMITS.animalCountMax),
          identifier: name.nullable(),
        }),
      )
      .max(COMPLIANCE_LIMITS.animalsPerCertificateMax),
  })
  .refine(validityWindow, windowMessage)
  .refine((doc) => doc.kind !== "cvi" || (doc.issuedOn !== null && doc.veterinarianName !== null), {
    params: { instruction: "a certificate needs the date it was issued and the veterinarian's name" },
    path: ["issuedOn"],
  })
  .refine((doc) => !doc.inspectionDate || !doc.issuedOn || doc.inspectionDate <= doc.issuedOn, {
    params: { instruction: "the inspection cannot come after the certificate was issued" },
    path: ["inspectionDate"],
  });
export type DocumentRecord = z.infer<typeof documentRecordSchema>;
