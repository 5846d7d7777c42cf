import type { AppContext } from "../../context";
import type { Jurisdiction } from "@shared/compliance/jurisdiction";
import { jurisdictionName } from "@shared/compliance/jurisdiction";
import type { DocumentKind } from "@shared/constants";
import { TransferSchema } from "../../db/entities/transfer.entity";
import type { ManifestExtras } from "../transfers/manifest-extras";
import { evaluateTransfer } from "./evaluation";

/**
 * The permits and certificates the manifest lists: those attached to the transfer and those
 * that satisfy one of its findings, from the same evaluation the compliance section shows.
 */
export async function manifestDocuments(ctx: AppContext, transferId: string): Promise<ManifestExtras> {
  const em = ctx.orm.em.fork();
  const transfer = await em.findOne(TransferSchema, { id: transferId });
  if (!transfer) return {};
  const { result, documents } = await evaluateTransfer(em, transfer);
  const satisfying = new Set(
    [...result.shipmentFindings, ...result.animals.flatMap((a) => a.findings)]
      .map((f) => (f.satisfiedBy as { id?: string } | null)?.id)
      .filter((id): id is string => Boolean(id)),
  );
  return {
    documents: documents
      .filter((d) => d.attached || satisfying.has(d.doc.id))
      .map(({ doc }) => ({
        kind: doc.kind as DocumentKind,
        number: doc.number,
        issuer: jurisdictionName(doc.jurisdiction as Jurisdiction),
        holder: doc.holderName,
        validFrom: doc.validFrom ?? doc.issuedOn ?? "",
        validTo: doc.validTo ?? null,
      })),
  };
}
