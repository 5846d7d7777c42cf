import { CHECK_MARK_WORDS } from "@shared/words";
import { LockMode } from "@mikro-orm/core";
import type { CheckMark } from "@shared/temperature/report";
import type { AppContext } from "../../context";
import { TemperatureCheckSchema } from "../../db/entities/temperature.entity";
import { TransferSchema } from "../../db/entities/transfer.entity";
import type { ScheduledTask } from "../scheduler";
import { notifyParty } from "../transfers/notify";
import { latestCheck, raiseAlert, recordCheck } from "./checks";
import { pruneForecastCache } from "./forecasts";
import { assessTransferTemperature } from "./transfer-temperature";

type DueMark = Extract<CheckMark, "24h" | "4h">;

/**
 * Transfers cleared to ship whose departure is within 24 h (mark "24h") or 4 h (mark "4h") and
 * that have no check of that mark for their current version, soonest first.
 */
async function dueChecks(ctx: AppContext, now: Date): Promise<{ id: string; mark: DueMark }[]> {
  const { rows } = await ctx.pool.query<{ id: string; mark: DueMark }>(
    `SELECT t.id, m.mark
       FROM transfer t
       CROSS JOIN LATERAL (SELECT CASE WHEN t.planned_departure_at <= $1::timestamptz + interval '4 hours' THEN '4h' ELSE '24h' END AS mark) m
      WHERE t.status = 'ready'
        AND t.planned_departure_at > $1 AND t.planned_departure_at <= $1::timestamptz + interval '24 hours'
        AND NOT EXISTS (SELECT 1 FROM temperature_check c WHERE c.transfer_id = t.id AND c.transfer_version = t.version AND c.mark = m.mark)
      ORDER BY t.planned_departure_at`,
    [now],
  );
  return rows;
}

/**
 * Re-assesses one transfer under its lock and keeps the result; when the advice differs from the
 * previous stored check, flags the transfer and e-mails both parties. True when it changed.
 */
async function recheckTransfer(ctx: AppContext, transferId: string, mark: DueMark, now: Date): Promise<boolean> {
  return ctx.orm.em.fork().transactional(async (em) => {
    const transfer = await em.findOne(TransferSchema, { id: transferId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
    if (!transfer || transfer.status !== "ready") return false;
    if ((await em.count(TemperatureCheckSchema, { transfer, transferVersion: transfer.version, mark })) > 0)
      return false;
    const previous = await latestCheck(em, transfer.id);
    const report = await assessTransferTemperature({
      em,
      source: ctx.forecastSource,
      transfer,
      nowMs: now.getTime(),
    });
    const check = recordCheck(em, transfer, mark, report, now);
    if (!previous || previous.adviceCode === check.adviceCode) return false;
    raiseAlert(em, transfer, previous, check, now);
    const words = {
      summary: CHECK_MARK_WORDS[mark],
      previousAdvice: previous.result.advice.message,
      advice: report.advice.message,
    };
    await notifyParty(em, ctx.links, transfer, "sender", "temperature_changed", null, words);
    await notifyParty(em, ctx.links, transfer, "receiver", "temperature_changed", null, words);
    return true;
  });
}

/** One round of re-checks; a transfer that fails is logged and tried again next round. */
export async function recheckTransfers(ctx: AppContext): Promise<void> {
  const now = new Date();
  let changed = false;
  for (const due of await dueChecks(ctx, now)) {
    try {
      changed = (await recheckTransfer(ctx, due.id, due.mark, now)) || changed;
    } catch (err) {
      console.error(`[temperature] re-check of transfer ${due.id} failed; will try again`, (err as Error).message);
    }
  }
  if (changed) ctx.kickOutbox();
}

export const TEMPERATURE_RECHECK_TASK: ScheduledTask = Object.freeze({
  name: "temperature-recheck",
  everyMs: 10 * 60_000,
  run: recheckTransfers,
});

export const FORECAST_PRUNE_TASK: ScheduledTask = Object.freeze({
  name: "forecast-cache-prune",
  everyMs: 60 * 60_000,
  run: async (ctx: AppContext) => {
    await pruneForecastCache(ctx.pool, Date.now());
  },
});
