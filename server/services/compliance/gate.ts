import type { EntityManager } from "@mikro-orm/postgresql";
import type { EvaluateResponse } from "@shared/compliance/schemas";
import { ComplianceEvaluationSchema, ComplianceOverrideSchema } from "../../db/entities/compliance.entity";
import type { Transfer } from "../../db/entities/transfer.entity";
import { conflict } from "../../http/errors";
import type { ReadyGate } from "../transfers/transition";
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

/** The 409's sentence: what stops the transfer, in the words of its findings. */
function blockedMessage(result: EvaluateResponse): string {
  const open = result.animals.flatMap((a) =>
    a.findings
      .filter((f) => f.satisfiedBy === null && f.severity !== "advisory")
      .map((f) => ({ animal: a.scientificName, f })),
  );
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

/**
 * The "ready to ship" gate: runs inside the transition's locked transaction, evaluates the
 * transfer with the documents on file and records the evaluation. A blocked or documents-needed
 * verdict stops the step unless an admin overrode this very version of the transfer.
 */
export const complianceGate: ReadyGate = Object.freeze({
  name: "compliance",
  async check({ em, transfer }) {
    const { result } = await evaluateTransfer(em, transfer);
    if (result.verdict !== "clear" && !(await currentOverride(em, transfer))) {
      throw conflict(blockedMessage(result), { compliance: result });
    }
    recordEvaluation(em, transfer, result);
  },
});
