import type { EntityManager } from "@mikro-orm/postgresql";
import type { CheckMark, TemperatureReport } from "@shared/temperature/report";
import {
  TemperatureAlertSchema,
  TemperatureCheckSchema,
  type TemperatureCheck,
} from "../../db/entities/temperature.entity";
import { TransferSchema, type Transfer } from "../../db/entities/transfer.entity";

/** Keeps an assessment of a transfer in the caller's unit of work. */
export function recordCheck(
  em: EntityManager,
  transfer: Transfer,
  mark: CheckMark,
  report: TemperatureReport,
  checkedAt: Date,
): TemperatureCheck {
  return em.create(TemperatureCheckSchema, {
    transfer: em.getReference(TransferSchema, transfer.id),
    transferVersion: transfer.version,
    mark,
    checkedAt,
    verdict: report.verdict,
    adviceCode: report.advice.code,
    result: report,
  });
}

/** The most recent stored check of a transfer, any mark. */
export function latestCheck(em: EntityManager, transferId: string): Promise<TemperatureCheck | null> {
  return em.findOne(TemperatureCheckSchema, { transfer: transferId }, { orderBy: { checkedAt: "desc", id: "desc" } });
}

/** Checks of a transfer, newest first. */
export function recentChecks(em: EntityManager, transferId: string, limit = 10): Promise<TemperatureCheck[]> {
  return em.find(
    TemperatureCheckSchema,
    { transfer: transferId },
    { orderBy: { checkedAt: "desc", id: "desc" }, limit },
  );
}

/** The latest advice-change flag of a transfer, with both checks. */
export function latestAlert(em: EntityManager, transferId: string) {
  return em.findOne(
    TemperatureAlertSchema,
    { transfer: transferId },
    { orderBy: { createdAt: "desc", id: "desc" }, populate: ["previousCheck", "check"] },
  );
}

/** Flags the transfer: the advice of `check` differs from that of `previous`. */
export function raiseAlert(
  em: EntityManager,
  transfer: Transfer,
  previous: TemperatureCheck,
  check: TemperatureCheck,
  at: Date,
): void {
  em.create(TemperatureAlertSchema, {
    transfer: em.getReference(TransferSchema, transfer.id),
    previousCheck: previous,
    check,
    previousAdviceCode: previous.adviceCode,
    adviceCode: check.adviceCode,
    createdAt: at,
  });
}
