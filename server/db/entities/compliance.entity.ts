import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { DOCUMENT_KINDS } from "@shared/constants";
import type { Rule } from "@shared/compliance/rule";
import type { DocumentRecord, EvaluateResponse } from "@shared/compliance/schemas";
import { VERDICTS } from "@shared/compliance/schemas";
import { SCAN_CONTENT_TYPES } from "@shared/compliance/scan-type";
import { createdAtProperty, idProperty } from "./base";
import { OrganizationSchema } from "./organization.entity";
import { TransferSchema } from "./transfer.entity";
import { UserSchema } from "./user.entity";

/**
 * One version of a rule of the library. Editing a rule appends a version (the table is
 * append-only); `data` is the whole rule, validated with the shared `ruleSchema`.
 */
export const ComplianceRuleSchema = defineEntity({
  name: "ComplianceRule",
  tableName: "compliance_rule",
  uniques: [{ properties: ["ruleKey", "version"] }],
  properties: {
    id: idProperty(),
    ruleKey: p.text(),
    version: p.integer(),
    data: p.json<Rule>(),
    /** Kept for the record but no longer applied (on the newest version). */
    retired: p.boolean().default(false),
    reviewedOn: p.date(),
    reviewedBy: p.text(),
    createdBy: () => p.manyToOne(UserSchema).ref().nullable(),
    createdAt: createdAtProperty(),
  },
});
export type ComplianceRule = InferEntity<typeof ComplianceRuleSchema>;

/** A permit, licence, registration or certificate held by an organisation. */
export const PermitDocumentSchema = defineEntity({
  name: "PermitDocument",
  tableName: "permit_document",
  properties: {
    id: idProperty(),
    organization: () => p.manyToOne(OrganizationSchema).ref().index(),
    kind: p.enum([...DOCUMENT_KINDS]),
    jurisdiction: p.string().length(2),
    number: p.string().length(200),
    holderName: p.string().length(200),
    speciesCovered: p.array().default([]),
    validFrom: p.date().nullable(),
    validTo: p.date().nullable(),
    issuedOn: p.date().nullable(),
    veterinarian: p.string().length(200).nullable(),
    veterinarianAccredited: p.boolean().nullable(),
    inspectionDate: p.date().nullable(),
    statements: p.array().default([]),
    animalsCovered: p.json<DocumentRecord["animalsCovered"]>(),
    notes: p.text().nullable(),
    createdBy: () => p.manyToOne(UserSchema).ref(),
    createdAt: createdAtProperty(),
    updatedAt: p
      .datetime()
      .onCreate(() => new Date())
      .onUpdate(() => new Date()),
    /** When the holder was told the document expires soon; cleared when validTo changes. */
    reminderSentAt: p.datetime().nullable(),
    /** The first month of the permit's reporting year (1 = a calendar year); null: no yearly report. */
    reportStartMonth: p.integer().nullable(),
    reportDueMonth: p.integer().nullable(),
    reportDueDay: p.integer().nullable(),
    /** The due date the 30-day (7-day) reminder was sent for. */
    reportReminded30For: p.date().nullable().fieldName("report_reminded_30_for"),
    reportReminded7For: p.date().nullable().fieldName("report_reminded_7_for"),
  },
});
export type PermitDocument = InferEntity<typeof PermitDocumentSchema>;

/** A scan of a document: the file is in S3 under a server-made key; its type was read from its bytes. */
export const DocumentScanSchema = defineEntity({
  name: "DocumentScan",
  tableName: "document_scan",
  properties: {
    id: idProperty(),
    document: () => p.manyToOne(PermitDocumentSchema).ref().index(),
    storageKey: p.string().length(300).unique(),
    sha256: p.string().length(64),
    contentType: p.enum([...SCAN_CONTENT_TYPES]),
    sizeBytes: p.integer(),
    originalName: p.string().length(200),
    uploadedBy: () => p.manyToOne(UserSchema).ref(),
    createdAt: createdAtProperty(),
  },
});
export type DocumentScan = InferEntity<typeof DocumentScanSchema>;

/** A document a party attached to a transfer (the other party may then see it). */
export const TransferDocumentSchema = defineEntity({
  name: "TransferDocument",
  tableName: "transfer_document",
  uniques: [{ properties: ["transfer", "document"] }],
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref(),
    document: () => p.manyToOne(PermitDocumentSchema).ref().index(),
    attachedBy: () => p.manyToOne(UserSchema).ref(),
    createdAt: createdAtProperty(),
  },
});

/** The evaluation a transfer was cleared on (or overridden against), with the rule versions it used. */
export const ComplianceEvaluationSchema = defineEntity({
  name: "ComplianceEvaluation",
  tableName: "compliance_evaluation",
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref(),
    evaluatedAt: p.datetime().onCreate(() => new Date()),
    verdict: p.enum([...VERDICTS]),
    rulesUsed: p.json<EvaluateResponse["rulesUsed"]>(),
    result: p.json<EvaluateResponse>(),
    transferVersion: p.integer(),
  },
});

/** An admin's decision to let one version of a transfer become ready despite its verdict. */
export const ComplianceOverrideSchema = defineEntity({
  name: "ComplianceOverride",
  tableName: "compliance_override",
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref(),
    transferVersion: p.integer(),
    reason: p.text(),
    admin: () => p.manyToOne(UserSchema).ref(),
    createdAt: createdAtProperty(),
  },
});
export type ComplianceOverride = InferEntity<typeof ComplianceOverrideSchema>;

/**
 * What the library knows of one jurisdiction's rules: whether they were reviewed (when, by whom)
 * and the offices to confirm with. One row per jurisdiction, seeded with the offices' published
 * names and addresses (server/db/seeders/jurisdiction-coverage.data.ts); admins record reviews.
 */
export const JurisdictionCoverageSchema = defineEntity({
  name: "JurisdictionCoverage",
  tableName: "jurisdiction_coverage",
  properties: {
    jurisdiction: p.string().length(2).primary(),
    wildlifeAgencyName: p.text(),
    wildlifeAgencyUrl: p.text(),
    stateVeterinarianName: p.text(),
    stateVeterinarianUrl: p.text(),
    /** Where the offices' names and addresses were read ([published] or [memory]). */
    source: p.text(),
    notes: p.text().nullable(),
    reviewedOn: p.date().nullable(),
    reviewedBy: p.text().nullable(),
    updatedAt: p
      .datetime()
      .onCreate(() => new Date())
      .onUpdate(() => new Date()),
    updatedBy: () => p.manyToOne(UserSchema).ref().nullable(),
  },
});
export type JurisdictionCoverage = InferEntity<typeof JurisdictionCoverageSchema>;
