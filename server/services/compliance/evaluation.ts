import type { EntityManager } from "@mikro-orm/postgresql";
import type { Purpose, UsState } from "@shared/constants";
import {
  evaluateCompliance,
  type EvaluationAnimal,
  type EvaluationDocument,
  type TransferFacts,
} from "@shared/compliance/evaluate";
import type { HolderSide } from "@shared/compliance/rule";
import type { EvaluateRequest, EvaluateResponse } from "@shared/compliance/schemas";
import { STATE_TRANSIT_POLICIES } from "@shared/compliance/state-rules.demo";
import { normalizeTaxonName } from "@shared/compliance/taxon";
import { placeFromZip } from "@shared/temperature/places";
import type { LatLon } from "@shared/temperature/geo";
import { localDate } from "@shared/temperature/zoned-time";
import { loadCoverageRecords } from "./coverage";
import { transitStatesAlong } from "./route-states";
import { PermitDocumentSchema, type PermitDocument } from "../../db/entities/compliance.entity";
import { AnimalSchema, type Transfer } from "../../db/entities/transfer.entity";
import { loadActiveRules } from "./rules";
import { findTaxaByName, resolveTaxaById } from "./taxa";

/** A document held by one of a transfer's parties, as the evaluation of that transfer sees it. */
export type OnFileDocument = { doc: PermitDocument; holderSide: HolderSide | undefined; attached: boolean };

/**
 * The calendar day the animals leave, in the origin's time zone (UTC when the origin has none):
 * certificate ages and validity windows count from it.
 */
export function shipDateOf(transfer: Pick<Transfer, "plannedDepartureAt" | "originTimeZone">): string {
  const departureMs = transfer.plannedDepartureAt.getTime();
  return transfer.originTimeZone
    ? localDate(departureMs, transfer.originTimeZone)
    : transfer.plannedDepartureAt.toISOString().slice(0, 10);
}

/** Where a transfer starts or ends: its stored position or, failing that, its ZIP code's centre. */
function positionOf(transfer: Transfer, side: "origin" | "destination"): LatLon | null {
  const [lat, lon, zip] =
    side === "origin"
      ? [transfer.originLat, transfer.originLon, transfer.originZip]
      : [transfer.destinationLat, transfer.destinationLon, transfer.destinationZip];
  if (lat != null && lon != null) return { lat, lon };
  return placeFromZip(zip.slice(0, 5)) ?? null;
}

/**
 * The states a stored transfer passes through, in travel order (route-states.ts: the great circle
 * from origin to destination, as the temperature timeline lays out a drive; none by air). Empty
 * when an end cannot be located.
 */
export function transitStatesOf(transfer: Transfer): UsState[] {
  const origin = positionOf(transfer, "origin");
  const destination = positionOf(transfer, "destination");
  if (!origin || !destination) return [];
  const ends = new Set([transfer.originState, transfer.destinationState]);
  return transitStatesAlong(origin, destination, transfer.mode).filter((state) => !ends.has(state));
}

/** The facts rules read from a stored transfer, with the transit states along its route. */
export function transferFactsOf(transfer: Transfer): TransferFacts {
  return {
    originState: transfer.originState as UsState,
    destinationState: transfer.destinationState as UsState,
    transitStates: transitStatesOf(transfer),
    shipDate: shipDateOf(transfer),
    purpose: transfer.purpose as Purpose,
    sale: transfer.sale,
  };
}

/**
 * Every document held by the sender's or the receiver's organisation, the ones attached to the
 * transfer first (the evaluation takes the first document that satisfies a rule).
 */
export async function documentsOnFile(em: EntityManager, transfer: Transfer): Promise<OnFileDocument[]> {
  const senderId = transfer.senderOrganization.id;
  const receiverId = transfer.receiverOrganization.id;
  // One query after the other: inside the gate's transaction they share one connection.
  const docs = await em.find(
    PermitDocumentSchema,
    { organization: { $in: [senderId, receiverId] } },
    { orderBy: { createdAt: "asc", id: "asc" } },
  );
  const attachments = await em.execute<{ document_id: string }[]>(
    "SELECT document_id FROM transfer_document WHERE transfer_id = ?",
    [transfer.id],
    "all",
  );
  const attached = new Set(attachments.map((a) => a.document_id));
  const sideOf = (orgId: string): HolderSide | undefined =>
    senderId === receiverId ? undefined : orgId === senderId ? "sender" : "receiver";
  return docs
    .map((doc) => ({ doc, holderSide: sideOf(doc.organization.id), attached: attached.has(doc.id) }))
    .sort((a, b) => Number(b.attached) - Number(a.attached));
}

/** A stored document in the evaluation's terms; an unknown accreditation is not held against it. */
export function evaluationDocumentOf({ doc, holderSide }: OnFileDocument): EvaluationDocument {
  return {
    kind: doc.kind,
    jurisdiction: doc.jurisdiction as EvaluationDocument["jurisdiction"],
    speciesCovered: doc.speciesCovered,
    validFrom: doc.validFrom ?? null,
    validTo: doc.validTo ?? null,
    issuedOn: doc.issuedOn ?? null,
    statements: doc.statements,
    id: doc.id,
    number: doc.number,
    ...(holderSide ? { holderSide } : {}),
    ...(doc.veterinarianAccredited === null || doc.veterinarianAccredited === undefined
      ? {}
      : { veterinarianAccredited: doc.veterinarianAccredited }),
  };
}

/** Evaluates a stored transfer against the rule library and the documents on file. */
export async function evaluateTransfer(em: EntityManager, transfer: Transfer) {
  const animals = await em.find(AnimalSchema, { transfer: transfer.id }, { orderBy: { position: "asc" } });
  const documents = await documentsOnFile(em, transfer);
  const rules = await loadActiveRules(em);
  const coverage = await loadCoverageRecords(em);
  const taxa = await resolveTaxaById(
    em,
    animals.map((a) => a.taxon.id),
  );
  const lines: EvaluationAnimal[] = animals.map((a) => {
    const taxon = taxa.get(a.taxon.id);
    if (!taxon) throw new Error(`animal ${a.id}: taxon ${a.taxon.id} is not in the catalogue`);
    return {
      scientificName: taxon.scientificName,
      taxon,
      count: a.count,
      lengthMm: a.lengthMm ?? null,
      origin: a.origin,
      sex: a.sex,
    };
  });
  const facts = transferFactsOf(transfer);
  const result = evaluateCompliance({
    facts,
    animals: lines,
    documents: documents.map(evaluationDocumentOf),
    rules,
    transitPolicies: STATE_TRANSIT_POLICIES,
    coverage,
  });
  return { result, facts, documents };
}

export type WhatIfOutcome =
  { ok: true; result: EvaluateResponse } | { ok: false; index: number; scientificName: string };

/** The what-if of `POST /api/compliance/evaluate`: nothing is stored. Fails on the first unknown species. */
export async function evaluateWhatIf(em: EntityManager, request: EvaluateRequest): Promise<WhatIfOutcome> {
  const [taxa, rules, coverage] = await Promise.all([
    findTaxaByName(
      em,
      request.animals.map((a) => a.scientificName),
    ),
    loadActiveRules(em),
    loadCoverageRecords(em),
  ]);
  const lines: EvaluationAnimal[] = [];
  for (const [index, animal] of request.animals.entries()) {
    const taxon = taxa.get(normalizeTaxonName(animal.scientificName));
    if (!taxon) return { ok: false, index, scientificName: animal.scientificName };
    lines.push({ ...animal, taxon });
  }
  const { animals: _animals, documents, ...facts } = request;
  const result = evaluateCompliance({
    facts,
    animals: lines,
    documents,
    rules,
    transitPolicies: STATE_TRANSIT_POLICIES,
    coverage,
  });
  return { ok: true, result };
}
