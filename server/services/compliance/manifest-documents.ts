import type { AppContext } from "../../context";
import { askWhom, listInWords, nameInSentence, uncovered } from "@shared/compliance/coverage";
import type { Jurisdiction } from "@shared/compliance/jurisdiction";
import { jurisdictionName } from "@shared/compliance/jurisdiction";
import type { EvaluateResponse } from "@shared/compliance/schemas";
import type { DocumentKind } from "@shared/constants";
import { COMPLIANCE_VERDICT_ON_LABEL, COMPLIANCE_VERDICT_PRINTED, COMPLIANCE_VERDICT_WORDS } from "@shared/words";
import { TransferSchema } from "../../db/entities/transfer.entity";
import type { ManifestVerdict } from "../../pdf/manifest-input";
import { originZoneOf, type ManifestExtras } from "../transfers/manifest-extras";
import { evaluateTransfer } from "./evaluation";
import { currentOverride, findingsWithLines } from "./gate";

const TONE: Readonly<Record<EvaluateResponse["verdict"], ManifestVerdict["tone"]>> = {
  clear: "ok",
  unverified: "caution",
  needs_documents: "block",
  blocked: "block",
};

/** What the verdict rests on, in the words the transfer page uses. */
function detailOf(result: EvaluateResponse): string {
  const open = uncovered(result.coverage);
  const notReviewed = open.length
    ? `The rules of ${listInWords(open.map(nameInSentence))} have not been reviewed in Hatchway's library: confirm with ${listInWords(open.map(askWhom))}.`
    : "";
  const first = findingsWithLines(result).find(
    ({ finding }) => finding.satisfiedBy === null && finding.severity !== "advisory",
  );
  switch (result.verdict) {
    case "clear":
      return `Every jurisdiction on the route (${listInWords(result.coverage.map(nameInSentence))}) was reviewed; no rule in the library stops these animals.`;
    case "unverified":
      return `No rule in Hatchway's library stops these animals. ${notReviewed}`;
    case "needs_documents":
    case "blocked":
      return [
        first
          ? `${first.scientificName}: ${first.finding.missing ? `still needed: ${first.finding.missing}.` : first.finding.message}`
          : "",
        notReviewed,
      ]
        .filter(Boolean)
        .join(" ");
  }
}

/**
 * The compliance part of the manifest, from one evaluation made when the PDF is made (it reads the
 * database only, so it is always current): the verdict in the words and colour the page shows,
 * and the permits and certificates to list (those attached to the transfer and those that satisfy
 * one of its findings).
 */
export async function manifestDocuments(ctx: AppContext, transferId: string): Promise<ManifestExtras> {
  const em = ctx.orm.em.fork();
  const transfer = await em.findOne(TransferSchema, { id: transferId });
  if (!transfer) return {};
  const checkedAt = new Date();
  const { result, documents } = await evaluateTransfer(em, transfer);
  const overridable = result.verdict === "blocked" || result.verdict === "needs_documents";
  const override = overridable ? await currentOverride(em, transfer) : null;
  const verdict: ManifestVerdict = override
    ? {
        check: "compliance",
        headline: `${COMPLIANCE_VERDICT_WORDS[result.verdict]}, overridden by an administrator`,
        short: "overridden",
        tone: "caution",
        detail: `${detailOf(result)} Reason given: ${override.reason}`,
        checkedAt: checkedAt.toISOString(),
        tz: originZoneOf(transfer),
      }
    : {
        check: "compliance",
        headline: COMPLIANCE_VERDICT_PRINTED[result.verdict],
        short: COMPLIANCE_VERDICT_ON_LABEL[result.verdict],
        tone: TONE[result.verdict],
        detail: detailOf(result),
        checkedAt: checkedAt.toISOString(),
        tz: originZoneOf(transfer),
      };
  const satisfying = new Set(
    [...result.shipmentFindings, ...result.animals.flatMap((a) => a.findings)]
      .map((f) => (f.satisfiedBy as { id?: string } | null)?.id)
      .filter((id): id is string => Boolean(id)),
  );
  return {
    verdicts: [verdict],
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
