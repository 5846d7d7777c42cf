import type { EntityManager } from "@mikro-orm/postgresql";
import type { Actor } from "../../auth/actor";
import { ComplianceOverrideSchema } from "../../db/entities/compliance.entity";
import { conflict, forbidden } from "../../http/errors";
import { canOverrideCompliance } from "../../policies/compliance.policy";
import { appendCustody } from "../transfers/custody";
import { loadTransferForActor } from "../transfers/load";
import { evaluateTransfer } from "./evaluation";
import { currentOverride, findingsWithLines, recordEvaluation } from "./gate";

/**
 * An admin lets the current version of a transfer that waits for the receiver become ready
 * despite a blocked or documents-needed compliance verdict (an unverified one is the confirming
 * party's to acknowledge, in the gate). The override, the evaluation it answers and a custody entry
 * with the verdict and the reason are written in one transaction. An edit of the transfer
 * (a new version) ends the override.
 */
export async function overrideCompliance({
  em,
  actor,
  transferId,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  input: { reason: string };
}) {
  return em.transactional(async (tx) => {
    const { transfer, role } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    if (!canOverrideCompliance(actor, role))
      throw forbidden("Only an administrator can override the compliance check.");
    if (transfer.status !== "awaiting_receiver") {
      throw conflict("An override applies to a transfer waiting for the receiver's confirmation.");
    }
    if (await currentOverride(tx, transfer)) throw conflict("This version of the transfer is already overridden.");
    const { result } = await evaluateTransfer(tx, transfer);
    if (result.verdict === "clear") throw conflict("There is nothing to override: the compliance check is clear.");
    if (result.verdict === "unverified")
      throw conflict(
        "Nothing in the rule library blocks this transfer: it is unverified because a state on the route has no reviewed rules. The receiver confirms it with a reason after asking the agencies named; an administrator's override does not apply.",
      );
    const override = tx.create(ComplianceOverrideSchema, {
      transfer: transfer.id,
      transferVersion: transfer.version,
      reason: input.reason,
      admin: actor.id,
    });
    recordEvaluation(tx, transfer, result);
    const open = findingsWithLines(result)
      .filter(({ finding }) => finding.satisfiedBy === null && finding.severity !== "advisory")
      .map(({ scientificName, finding }) => ({
        scientificName,
        ruleId: finding.ruleId,
        ruleVersion: finding.ruleVersion,
      }));
    await appendCustody(tx, transfer.id, actor, "override", {
      gate: "compliance",
      verdict: result.verdict,
      reason: input.reason,
      transferVersion: transfer.version,
      findings: open,
    });
    await tx.flush();
    return override;
  });
}
