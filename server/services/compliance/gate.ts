import type { EntityManager } from "@mikro-orm/postgresql";
import type { EvaluateResponse } from "@shared/compliance/schemas";
import { askWhom, listInWords, nameInSentence, uncovered, type CoverageEntry } from "@shared/compliance/coverage";
import { ComplianceEvaluationSchema, ComplianceOverrideSchema } from "../../db/entities/compliance.entity";
import type { Transfer } from "../../db/entities/transfer.entity";
import { conflict, invalidField } from "../../http/errors";
import { appendCustody } from "../transfers/custody";
import { overrides, type ReadyGate } from "../transfers/transition";
import { evaluateTransfer } from "./evaluation";

/** Records an evaluation in the caller's unit of work, against the transfer version it judged. */
export function recordEvaluation(em: EntityManager, transfer: Transfer, result: EvaluateResponse): void {
  em.create(ComplianceEvaluationSchema, {
    transfer: transfer.id,
    verdict: result.verdict,
    rulesUsed: result.rulesUsed,
    result,
    transferVersion: transfer.version,
  });
}

/** The override standing for the transfer's current version, if any. */
export function currentOverride(em: EntityManager, transfer: Pick<Transfer, "id" | "version">) {
  return em.findOne(
    ComplianceOverrideSchema,
    { transfer: transfer.id, transferVersion: transfer.version },
    { orderBy: { createdAt: "desc" }, populate: ["admin"] },
  );
}

/** Every finding with the line it belongs to; shipment-wide findings are named for the shipment. */
export function findingsWithLines(result: EvaluateResponse) {
  return [
    ...result.shipmentFindings.map((finding) => ({ scientificName: "every animal", finding })),
    ...result.animals.flatMap((a) => a.findings.map((finding) => ({ scientificName: a.scientificName, finding }))),
  ];
}

/** The 409's sentence: what stops the transfer, in the words of its findings. */
function blockedMessage(result: EvaluateResponse): string {
  const open = findingsWithLines(result)
    .filter(({ finding }) => finding.satisfiedBy === null && finding.severity !== "advisory")
    .map(({ scientificName, finding }) => ({ animal: scientificName, f: finding }));
  const first = open[0];
  const more = open.length > 1 ? ` (and ${open.length - 1} more finding${open.length > 2 ? "s" : ""})` : "";
  const what =
    result.verdict === "blocked"
      ? "The compliance check blocks this transfer"
      : "The compliance check still needs documents for this transfer";
  const detail = first
    ? `: ${first.animal}: ${first.f.missing ? `missing ${first.f.missing}` : first.f.message}${more}`
    : "";
  return `${what}${detail}. Add the documents, change the transfer, or ask an administrator to override with a reason.`;
}

/** The 409's sentence when nothing blocks but a state on the route has no reviewed rules. */
function unverifiedMessage(open: readonly CoverageEntry[]): string {
  const states = listInWords(open.map(nameInSentence));
  return `The rules and permits check is unverified: Hatchway's rule library has not been reviewed for ${states}. Confirm with ${listInWords(open.map(askWhom))}, then confirm the transfer with a reason; it goes into the custody log.`;
}

/**
 * The "ready to ship" gate: runs inside the transition's locked transaction, evaluates the
 * transfer with the documents on file and records the evaluation. A blocked or documents-needed
 * verdict stops the step unless an admin overrode this very version of the transfer. A route
 * through a jurisdiction whose rules were not reviewed ("unverified") needs the confirming party's
 * acknowledgement with a reason (`override: true` and `reason` on the step), never an admin's
 * override; it is logged in the custody log with the jurisdictions and the agencies to ask.
 */
export const complianceGate: ReadyGate = Object.freeze({
  name: "compliance",
  async check({ em, actor, transfer, input }) {
    const { result } = await evaluateTransfer(em, transfer);
    const blocking = result.verdict === "blocked" || result.verdict === "needs_documents";
    if (blocking && !(await currentOverride(em, transfer))) {
      throw conflict(blockedMessage(result), { compliance: result });
    }
    const open = uncovered(result.coverage);
    if (open.length > 0) {
      if (!overrides(input, "compliance")) {
        throw conflict(unverifiedMessage(open), { compliance: result, acknowledgeUnverified: true });
      }
      if (!input.reason)
        throw invalidField(
          ["reason"],
          "say why the animals may travel although the rules of a state on the route were not verified; it goes into the custody log",
        );
      await appendCustody(em, transfer.id, actor, "override", {
        gate: "compliance",
        verdict: "unverified",
        acknowledgement: true,
        unverified: open.map((entry) => ({
          jurisdiction: entry.jurisdiction,
          name: entry.name,
          agency: entry.agency,
        })),
        reason: input.reason,
        transferVersion: transfer.version,
      });
    }
    recordEvaluation(em, transfer, result);
  },
});
