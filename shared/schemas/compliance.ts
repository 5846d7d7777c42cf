import type { DocumentKind } from "@shared/constants";
import { JURISDICTIONS, type Jurisdiction } from "@shared/compliance/jurisdiction";
import type { ExpiryStatus } from "@shared/compliance/expiry";
import { ruleSchema, type HolderSide, type Rule } from "@shared/compliance/rule";
import { documentRecordSchema, type DocumentRecord, type EvaluateResponse } from "@shared/compliance/schemas";
import type { ScanContentType } from "@shared/compliance/scan-type";
import { z } from "../validation/zod";
import { idSchema, optionalText, requiredText, text } from "./common";
import type { Agency } from "@shared/compliance/coverage";

// ---------------------------------------------------------------- rule library

/**
 * A new version of a rule: the whole rule as it should read, its version one above the current
 * one (a stale version is refused, so two admins never overwrite each other), and whether it is
 * retired (a retired rule is kept for the record but no longer applied).
 */
export const ruleVersionInputSchema = z.strictObject({ rule: ruleSchema, retired: z.boolean() });
export type RuleVersionInput = z.infer<typeof ruleVersionInputSchema>;

export const ruleListQuerySchema = z.strictObject({
  jurisdiction: z.enum(JURISDICTIONS).optional(),
  taxon: text(200).optional(),
});
export type RuleListQuery = z.infer<typeof ruleListQuerySchema>;

export type RuleVersionDto = {
  rule: Rule;
  retired: boolean;
  createdAt: string;
  createdBy: { id: string; displayName: string } | null;
};

/** The current version of each rule, with how many versions it has had. */
export type RuleSummaryDto = { ruleKey: string; current: RuleVersionDto; versionCount: number };
export type RuleHistoryDto = { ruleKey: string; versions: RuleVersionDto[] };

// ---------------------------------------------------------------- permits and certificates

/** A permit or certificate as the form sends it: the shared record plus the holder's own notes. */
export const documentInputSchema = documentRecordSchema.extend({ notes: optionalText(2000) });
export type DocumentInput = z.input<typeof documentInputSchema>;

export const documentListQuerySchema = z.strictObject({ transferId: idSchema.optional() });

export type ScanDto = {
  id: string;
  contentType: ScanContentType;
  sizeBytes: number;
  sha256: string;
  originalName: string;
  uploadedAt: string;
  /** Streams the file as an attachment. */
  downloadUrl: string;
};

export type DocumentAbilitiesDto = { edit: boolean; upload: boolean; readScans: boolean };

/**
 * A permit or certificate as the caller may see it. Couriers see the manifest entry only: the
 * record's details and scans are null for them.
 */
export type DocumentDto = {
  id: string;
  organization: { id: string; name: string };
  kind: DocumentKind;
  jurisdiction: Jurisdiction;
  number: string;
  holderName: string;
  validFrom: string | null;
  validTo: string | null;
  issuedOn: string | null;
  expiry: { status: ExpiryStatus; daysLeft: number | null };
  details:
    | (Pick<
        DocumentRecord,
        | "speciesCovered"
        | "veterinarianName"
        | "veterinarianAccredited"
        | "inspectionDate"
        | "statements"
        | "animalsCovered"
      > & {
        notes: string | null;
      })
    | null;
  scans: ScanDto[] | null;
  abilities: DocumentAbilitiesDto;
  createdAt: string;
  updatedAt: string;
};

/** A document as one transfer uses it: whose it is, whether attached, which findings it satisfies. */
export type TransferDocumentDto = DocumentDto & {
  /** Null when the sender and the receiver are one organisation. */
  holderSide: HolderSide | null;
  attached: boolean;
  satisfies: { ruleId: string; scientificName: string }[];
};

export const attachDocumentSchema = z.strictObject({ documentId: idSchema });

// ---------------------------------------------------------------- a transfer's compliance

export const overrideInputSchema = z.strictObject({ reason: requiredText(1000) });

export type ComplianceOverrideDto = {
  reason: string;
  at: string;
  admin: { id: string; displayName: string };
  transferVersion: number;
};

/**
 * `GET /api/transfers/:id/compliance`: the evaluation's public shape, then what the screen needs
 * around it (the ship date used, the override standing for this version, the caller's abilities).
 */
export type TransferComplianceDto = EvaluateResponse & {
  shipDate: string;
  override: ComplianceOverrideDto | null;
  /** readDocuments: the documents list of the transfer (its parties and couriers, not admins). */
  abilities: { override: boolean; attachDocuments: boolean; readDocuments: boolean };
};

// ---------------------------------------------------------------- rule coverage

/**
 * An administrator's review of a jurisdiction's rules in the library: the day it was done and by
 * whom, or both null to withdraw the review. Notes say what was read and what is missing.
 */
export const coverageReviewInputSchema = z
  .strictObject({
    reviewedOn: z.iso.date().nullable(),
    reviewedBy: requiredText(200).nullable(),
    notes: optionalText(2000),
  })
  .refine((input) => (input.reviewedOn === null) === (input.reviewedBy === null), {
    params: { instruction: "give both the day of the review and who made it, or neither" },
    path: ["reviewedBy"],
  });
export type CoverageReviewInput = z.output<typeof coverageReviewInputSchema>;

/** A jurisdiction's coverage record as the coverage screen shows it. */
export type JurisdictionCoverageDto = {
  jurisdiction: Jurisdiction;
  name: string;
  /** Reviewed, and no demo rule stands for it. */
  covered: boolean;
  reviewedOn: string | null;
  reviewedBy: string | null;
  notes: string | null;
  wildlifeAgency: Agency;
  stateVeterinarian: Agency;
  /** Where the offices' names and addresses were read. */
  source: string;
  /** Rules in force in the library for it (not retired), published and demo. */
  rules: { published: number; demo: number };
  updatedAt: string;
  updatedBy: { id: string; displayName: string } | null;
};
