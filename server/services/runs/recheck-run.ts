import { CHECK_MARK_WORDS } from "@shared/words";
import type { RunRecheckDto } from "@shared/schemas/run";
import type { AppContext } from "../../context";
import { TransferSchema } from "../../db/entities/transfer.entity";
import { latestCheck, raiseAlert, recordCheck } from "../temperature/checks";
import { assessTransferTemperature } from "../temperature/transfer-temperature";
import { notifyParty } from "../transfers/notify";

/**
 * After a run changes, each of its transfers is assessed again with the new times and van, and
 * the check kept; where the advice differs from the last check, the transfer is flagged and both
 * parties are e-mailed, as the scheduled re-checks do. One transfer's failure (a forecast outage)
 * leaves the others checked and is reported as not re-checked.
 */
export async function recheckRunTransfers(ctx: AppContext, transferIds: readonly string[]): Promise<RunRecheckDto[]> {
  const results: RunRecheckDto[] = [];
  for (const transferId of transferIds) {
    try {
      results.push(
        await ctx.orm.em.fork().transactional(async (em) => {
          const transfer = await em.findOneOrFail(TransferSchema, { id: transferId });
          const previous = await latestCheck(em, transfer.id);
          const now = new Date();
          const report = await assessTransferTemperature({
            em,
            source: ctx.forecastSource,
            transfer,
            nowMs: now.getTime(),
          });
          const check = recordCheck(em, transfer, "manual", report, now);
          const adviceChanged = !!previous && previous.adviceCode !== check.adviceCode;
          if (adviceChanged) {
            raiseAlert(em, transfer, previous, check, now);
            const words = {
              summary: CHECK_MARK_WORDS.manual,
              previousAdvice: previous.result.advice.message,
              advice: report.advice.message,
            };
            await notifyParty(em, ctx.links, transfer, "sender", "temperature_changed", null, words);
            await notifyParty(em, ctx.links, transfer, "receiver", "temperature_changed", null, words);
          }
          return { transferId, verdict: report.verdict as string, adviceChanged };
        }),
      );
    } catch (err) {
      console.error(`[runs] temperature re-check of transfer ${transferId} failed`, (err as Error).message);
      results.push({ transferId, verdict: null, adviceChanged: false });
    }
  }
  return results;
}
