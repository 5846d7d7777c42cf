import { expiryOf, todayUtc } from "@shared/compliance/expiry";
import type { Jurisdiction } from "@shared/compliance/jurisdiction";
import type { DocumentDto, ScanDto } from "@shared/schemas/compliance";
import type { DocumentScan, PermitDocument } from "../db/entities/compliance.entity";
import { documentAbilities, type DocumentViewer } from "../policies/document.policy";

export function presentScan(scan: DocumentScan): ScanDto {
  return {
    id: scan.id,
    contentType: scan.contentType,
    sizeBytes: scan.sizeBytes,
    sha256: scan.sha256,
    originalName: scan.originalName,
    uploadedAt: scan.createdAt.toISOString(),
    downloadUrl: `/api/documents/${scan.document.id}/scans/${scan.id}`,
  };
}

/**
 * A document as this viewer may see it: the courier gets the manifest entry (kind, number,
 * issuer, validity) without the record's details or scans; only the holder reads the notes.
 * `doc.organization` must be populated.
 */
export function presentDocument(
  doc: PermitDocument,
  viewer: DocumentViewer,
  scans: readonly DocumentScan[],
  today = todayUtc(),
): DocumentDto {
  const org = doc.organization.getEntity();
  const validTo = doc.validTo ?? null;
  return {
    id: doc.id,
    organization: { id: org.id, name: org.name },
    kind: doc.kind,
    jurisdiction: doc.jurisdiction as Jurisdiction,
    number: doc.number,
    holderName: doc.holderName,
    validFrom: doc.validFrom ?? null,
    validTo,
    issuedOn: doc.issuedOn ?? null,
    expiry: expiryOf(validTo, today),
    details:
      viewer === "courier"
        ? null
        : {
            speciesCovered: doc.speciesCovered,
            veterinarianName: doc.veterinarian ?? null,
            veterinarianAccredited: doc.veterinarianAccredited ?? null,
            inspectionDate: doc.inspectionDate ?? null,
            statements: doc.statements,
            animalsCovered: doc.animalsCovered,
            notes: viewer === "holder" ? (doc.notes ?? null) : null,
          },
    scans: viewer === "courier" ? null : scans.map(presentScan),
    abilities: documentAbilities(viewer),
    createdAt: doc.createdAt.toISOString(),
    updatedAt: doc.updatedAt.toISOString(),
  };
}
