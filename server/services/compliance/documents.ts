import { createHash, randomUUID } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import { UniqueConstraintViolationException, type FilterQuery } from "@mikro-orm/core";
import { sniffScanType, SCAN_EXTENSIONS } from "@shared/compliance/scan-type";
import type { TransferStatus } from "@shared/constants";
import type { DocumentInput, TransferDocumentDto } from "@shared/schemas/compliance";
import { documentInputSchema } from "@shared/schemas/compliance";
import { isCourier, type Actor } from "../../auth/actor";
import type { Storage } from "../../adapters/storage";
import {
  DocumentScanSchema,
  PermitDocumentSchema,
  TransferDocumentSchema,
  type DocumentScan,
  type PermitDocument,
} from "../../db/entities/compliance.entity";
import { LegSchema, TransferSchema, type Transfer } from "../../db/entities/transfer.entity";
import { conflict, forbidden, HttpError, notFound } from "../../http/errors";
import { parse } from "../../http/validate";
import {
  canAttachDocuments,
  canHoldDocuments,
  canReadTransferDocuments,
  isHolder,
  mayAttachDocuments,
  type DocumentViewer,
} from "../../policies/document.policy";
import { presentDocument } from "../../presenters/document.presenter";
import { loadTransferForActor } from "../transfers/load";
import { evaluateTransfer } from "./evaluation";
import { scanContentProblem } from "./scan-content";

const ONLY_PARTIES_ATTACH = "Only the sender and the receiver attach documents to a transfer.";

/** A draft never sent is the sender's alone (sharedWithOtherParties in transfer.policy.ts). */
const SHARED_WITH_OTHER_PARTIES: FilterQuery<Transfer> = {
  $or: [{ firstSentAt: { $ne: null } }, { status: { $nin: ["draft", "cancelled"] } }],
};

/** Most scans one document keeps (front and back of a few pages). */

export const SCANS_PER_DOCUMENT_MAX = 20;
/** Transfers between the same two parties looked at when deciding whether a document is shared. */
const SHARED_TRANSFERS_LOOKED_AT = 50;

type Parsed = ReturnType<typeof documentInputSchema.parse>;

function columnsOf(input: Parsed) {
  return {
    kind: input.kind,
    jurisdiction: input.jurisdiction,
    number: input.number,
    holderName: input.holderName,
    speciesCovered: input.speciesCovered,
    validFrom: input.validFrom,
    validTo: input.validTo,
    issuedOn: input.issuedOn,
    veterinarian: input.veterinarianName,
    veterinarianAccredited: input.veterinarianAccredited,
    inspectionDate: input.inspectionDate,
    statements: input.statements,
    animalsCovered: input.animalsCovered,
    notes: input.notes ?? null,
  };
}

/** The stored record in the form's terms, so an edit can be checked as a whole. */
function inputOf(doc: PermitDocument): DocumentInput {
  return {
    kind: doc.kind,
    jurisdiction: doc.jurisdiction as DocumentInput["jurisdiction"],
    number: doc.number,
    holderName: doc.holderName,
    speciesCovered: doc.speciesCovered,
    validFrom: doc.validFrom ?? null,
    validTo: doc.validTo ?? null,
    issuedOn: doc.issuedOn ?? null,
    veterinarianName: doc.veterinarian ?? null,
    veterinarianAccredited: doc.veterinarianAccredited ?? null,
    inspectionDate: doc.inspectionDate ?? null,
    statements: doc.statements,
    animalsCovered: doc.animalsCovered,
    notes: doc.notes ?? null,
  };
}

/** A new permit or certificate of the caller's organisation. */
export async function createDocument({ em, actor, input }: { em: EntityManager; actor: Actor; input: Parsed }) {
  if (!canHoldDocuments(actor))
    throw forbidden("Permits and certificates belong to a keeper organisation; sign in as one of its members.");
  const doc = em.create(PermitDocumentSchema, {
    ...columnsOf(input),
    organization: actor.organization!.id,
    createdBy: actor.id,
    reminderSentAt: null,
  });
  await em.flush();
  return doc;
}

/**
 * Changes the fields given, then checks the whole record again (dates against each other, a
 * certificate's veterinarian). A new end date earns a new expiry reminder.
 */
export async function updateDocument({
  em,
  actor,
  documentId,
  patch,
}: {
  em: EntityManager;
  actor: Actor;
  documentId: string;
  patch: unknown;
}) {
  const doc = await em.findOne(PermitDocumentSchema, { id: documentId });
  if (!doc || !isHolder(actor, doc.organization.id)) throw notFound("That document");
  if (!patch || typeof patch !== "object" || Array.isArray(patch))
    throw new HttpError(400, "invalid", "Send the fields to change as an object.", { field: "body" });
  const input = parse(documentInputSchema, { ...inputOf(doc), ...patch });
  const previousValidTo = doc.validTo ?? null;
  em.assign(doc, columnsOf(input));
  if (input.validTo !== previousValidTo) doc.reminderSentAt = null;
  await em.flush();
  return doc;
}

/** Whether any of these transfers uses the document: attached to it, or satisfying one of its findings. */
async function someTransferUses(
  em: EntityManager,
  doc: PermitDocument,
  transfers: readonly Transfer[],
): Promise<boolean> {
  if (transfers.length === 0) return false;
  if (await em.count(TransferDocumentSchema, { document: doc.id, transfer: { $in: transfers.map((t) => t.id) } }))
    return true;
  for (const transfer of transfers) {
    if (satisfiedIds((await evaluateTransfer(em, transfer)).result).has(doc.id)) return true;
  }
  return false;
}

function satisfiedIds(result: Awaited<ReturnType<typeof evaluateTransfer>>["result"]): Set<string> {
  return new Set(
    [...result.shipmentFindings, ...result.animals.flatMap((a) => a.findings)].flatMap((f) =>
      f.satisfiedBy?.id ? [f.satisfiedBy.id] : [],
    ),
  );
}

/**
 * Who the caller is to a document (see DocumentViewer), or null: then the document does not
 * exist for them. The other party and the courier see it only through a transfer that uses it.
 */
export async function documentViewer(
  em: EntityManager,
  actor: Actor,
  doc: PermitDocument,
): Promise<DocumentViewer | null> {
  if (actor.disabled) return null;
  const holderOrg = doc.organization.id;
  if (isHolder(actor, holderOrg)) return "holder";
  let candidates: Transfer[] = [];
  const options = { orderBy: { createdAt: "desc" as const }, limit: SHARED_TRANSFERS_LOOKED_AT };
  if (canHoldDocuments(actor)) {
    const mine = actor.organization!.id;
    candidates = await em.find(
      TransferSchema,
      {
        $or: [
          { $and: [{ senderOrganization: holderOrg, receiverOrganization: mine }, SHARED_WITH_OTHER_PARTIES] },
          { senderOrganization: mine, receiverOrganization: holderOrg },
        ],
      },
      options,
    );
  } else if (isCourier(actor)) {
    const carried = (await em.find(LegSchema, { courier: actor.id })).map((leg) => leg.transfer.id);
    if (carried.length)
      candidates = await em.find(
        TransferSchema,
        {
          id: { $in: carried },
          $and: [
            { $or: [{ senderOrganization: holderOrg }, { receiverOrganization: holderOrg }] },
            SHARED_WITH_OTHER_PARTIES,
          ],
        },
        options,
      );
  }
  if (!(await someTransferUses(em, doc, candidates))) return null;
  return isCourier(actor) ? "courier" : "party";
}

/** Loads a document the caller may see, with its organisation; 404 for anyone else. */
export async function loadDocumentForActor(em: EntityManager, actor: Actor, documentId: string) {
  const doc = await em.findOne(PermitDocumentSchema, { id: documentId }, { populate: ["organization"] });
  const viewer = doc ? await documentViewer(em, actor, doc) : null;
  if (!doc || !viewer) throw notFound("That document");
  return { doc, viewer };
}

export async function scansOf(
  em: EntityManager,
  docs: readonly PermitDocument[],
): Promise<Map<string, DocumentScan[]>> {
  const scans = docs.length
    ? await em.find(DocumentScanSchema, { document: { $in: docs.map((d) => d.id) } }, { orderBy: { createdAt: "asc" } })
    : [];
  const byDocument = new Map<string, DocumentScan[]>();
  for (const scan of scans) byDocument.set(scan.document.id, [...(byDocument.get(scan.document.id) ?? []), scan]);
  return byDocument;
}

/**
 * The documents a transfer uses (attached, or satisfying a finding), for its sender, receiver
 * and couriers. Admins and strangers get the transfer's 404.
 */
export async function documentsForTransfer(
  em: EntityManager,
  actor: Actor,
  transferId: string,
): Promise<TransferDocumentDto[]> {
  const { transfer, role } = await loadTransferForActor(em, transferId, actor);
  if (!canReadTransferDocuments(role)) throw notFound("That transfer");
  const { result, documents } = await evaluateTransfer(em, transfer);
  const satisfies = new Map<string, { ruleId: string; scientificName: string }[]>();
  for (const animal of result.animals) {
    // A shipment-wide finding is satisfied for every line.
    for (const f of [...result.shipmentFindings, ...animal.findings]) {
      if (f.satisfiedBy?.id)
        satisfies.set(f.satisfiedBy.id, [
          ...(satisfies.get(f.satisfiedBy.id) ?? []),
          { ruleId: f.ruleId, scientificName: animal.scientificName },
        ]);
    }
  }
  const used = documents.filter((d) => d.attached || satisfies.has(d.doc.id));
  await em.populate(
    used.map((d) => d.doc),
    ["organization"],
  );
  const scans =
    role === "courier"
      ? new Map<string, DocumentScan[]>()
      : await scansOf(
          em,
          used.map((d) => d.doc),
        );
  return used.map(({ doc, holderSide, attached }) => {
    const viewer: DocumentViewer =
      role === "courier" ? "courier" : isHolder(actor, doc.organization.id) ? "holder" : "party";
    return {
      ...presentDocument(doc, viewer, scans.get(doc.id) ?? []),
      holderSide: holderSide ?? null,
      attached,
      satisfies: satisfies.get(doc.id) ?? [],
    };
  });
}

/** Attaches one of the caller's organisation's documents to a transfer it is party to. Attaching twice is harmless. */
export async function attachDocument({
  em,
  actor,
  transferId,
  documentId,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  documentId: string;
}) {
  const { transfer, role } = await loadTransferForActor(em, transferId, actor);
  if (!mayAttachDocuments(role)) throw forbidden(ONLY_PARTIES_ATTACH);
  const doc = await em.findOne(PermitDocumentSchema, { id: documentId });
  if (!doc || !isHolder(actor, doc.organization.id)) throw notFound("That document");
  if (!canAttachDocuments(role, transfer.status as TransferStatus))
    throw conflict(
      "Documents can be attached only while the transfer can still be changed, by the sender or the receiver.",
    );
  const existing = await em.findOne(TransferDocumentSchema, { transfer: transfer.id, document: doc.id });
  if (existing) return;
  em.create(TransferDocumentSchema, { transfer: transfer.id, document: doc.id, attachedBy: actor.id });
  try {
    await em.flush();
  } catch (err) {
    // The same attachment made a moment ago by another request: the outcome is the same.
    if (!(err instanceof UniqueConstraintViolationException)) throw err;
  }
}

/** Takes one of the caller's organisation's documents off a transfer that can still be changed. */
export async function detachDocument({
  em,
  actor,
  transferId,
  documentId,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  documentId: string;
}) {
  const { transfer, role } = await loadTransferForActor(em, transferId, actor);
  if (!mayAttachDocuments(role)) throw forbidden(ONLY_PARTIES_ATTACH);
  const link = await em.findOne(
    TransferDocumentSchema,
    { transfer: transfer.id, document: documentId },
    { populate: ["document"] },
  );
  if (!link || !isHolder(actor, link.document.getEntity().organization.id)) throw notFound("That attachment");
  if (!canAttachDocuments(role, transfer.status as TransferStatus))
    throw conflict(
      "Documents can be taken off only while the transfer can still be changed, by the sender or the receiver.",
    );
  em.remove(link);
  await em.flush();
}

/** A file name safe to keep and to send back in Content-Disposition: no path, no control characters. */
export function cleanFileName(raw: string | undefined, fallback: string): string {
  let name = raw ?? "";
  try {
    name = decodeURIComponent(name);
  } catch {
    // Not percent-encoded: keep it as sent.
  }
  const base = name.split(/[\\/]/).pop() ?? "";
  const cleaned = base
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u001f\u007f"]/g, "")
    .trim()
    .slice(0, 200);
  return cleaned || fallback;
}

/**
 * Stores a scan: its type is read from the bytes (the declared type is ignored) and the file
 * must open as that type (a PDF with a page, an image of the size it states), the key is
 * ours, the SHA-256 is kept. The object is written first and the row second; if the row cannot
 * be written the object is deleted again, so a failure leaves neither behind.
 */
export async function uploadScan({
  em,
  storage,
  actor,
  documentId,
  body,
  fileName,
}: {
  em: EntityManager;
  storage: Storage;
  actor: Actor;
  documentId: string;
  body: Buffer;
  fileName: string | undefined;
}) {
  const doc = await em.findOne(PermitDocumentSchema, { id: documentId });
  if (!doc || !isHolder(actor, doc.organization.id)) throw notFound("That document");
  if (body.length === 0) throw new HttpError(400, "empty_file", "The file is empty.", { field: "body" });
  const contentType = sniffScanType(body);
  if (!contentType)
    throw new HttpError(
      415,
      "unsupported_file",
      "That file is not a PDF, JPEG or PNG. Scan or save the document in one of those formats.",
    );
  const problem = await scanContentProblem(body, contentType);
  if (problem) throw new HttpError(415, "unsupported_file", problem);
  if ((await em.count(DocumentScanSchema, { document: doc.id })) >= SCANS_PER_DOCUMENT_MAX) {
    throw conflict(`A document keeps at most ${SCANS_PER_DOCUMENT_MAX} scans; remove one first.`);
  }
  const storageKey = `documents/${doc.id}/${randomUUID()}`;
  const sha256 = createHash("sha256").update(body).digest("hex");
  await storage.putObject(storageKey, body, contentType);
  try {
    const scan = em.create(DocumentScanSchema, {
      document: doc.id,
      storageKey,
      sha256,
      contentType,
      sizeBytes: body.length,
      originalName: cleanFileName(fileName, `scan.${SCAN_EXTENSIONS[contentType]}`),
      uploadedBy: actor.id,
    });
    await em.flush();
    return scan;
  } catch (err) {
    await storage
      .deleteObject(storageKey)
      .catch((cleanup) =>
        console.error(`[storage] orphan ${storageKey} left after a failed insert`, (cleanup as Error).message),
      );
    throw err;
  }
}
