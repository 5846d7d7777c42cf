import {
  CHECK_MARK_WORDS,
  TEMPERATURE_VERDICT_ON_LABEL,
  TEMPERATURE_VERDICT_PRINTED,
  TEMPERATURE_VERDICT_WORDS,
} from "@shared/words";
import { formatInstant } from "@shared/dates";
import type { TemperatureReport } from "@shared/temperature/report";
import { formatTempRangeBoth } from "@shared/units";
import type { AppContext } from "../../context";
import { TransferChangeSchema, TransferSchema } from "../../db/entities/transfer.entity";
import type { ManifestTemperature, ManifestVerdict } from "../../pdf/manifest-input";
import { originZoneOf, type ManifestExtras } from "../transfers/manifest-extras";
import type { Verdict } from "@shared/temperature/advice";
import { latestCheck } from "./checks";
import { assessTransferTemperature } from "./transfer-temperature";

/** The band every box must stay in: the warmest of the minimums to the coolest of the maximums. */
function safeRangeOf(report: TemperatureReport): ManifestTemperature["safeRangeF"] {
  const ranges = report.boxes.length ? report.boxes.map((b) => b.profile.safeTransitF) : [report.profile.safeTransitF];
  const minF = Math.max(...ranges.map((r) => r.min));
  const maxF = Math.min(...ranges.map((r) => r.max));
  return minF < maxF ? { minF, maxF } : null;
}

/** Each box's own band by container id, for its label. */
function boxRangesOf(report: TemperatureReport): NonNullable<ManifestTemperature["boxRangesF"]> {
  return Object.fromEntries(
    report.boxes.flatMap((b) =>
      b.containerId ? [[b.containerId, { minF: b.profile.safeTransitF.min, maxF: b.profile.safeTransitF.max }]] : [],
    ),
  );
}

const rangeText = (b: TemperatureReport["boxes"][number]) =>
  formatTempRangeBoth(b.profile.safeTransitF.min, b.profile.safeTransitF.max);

function packingNotesOf(report: TemperatureReport, withAdvice: boolean): string | null {
  const lines = report.boxes.map(
    (b) => `${b.label}: ${b.profile.label}, ${rangeText(b)}${withAdvice ? ` — ${b.advice.message}` : ""}`,
  );
  return lines.length ? lines.join("\n") : null;
}

const TONE: Readonly<Record<Verdict, ManifestVerdict["tone"]>> = {
  ship: "ok",
  pack: "ok",
  hold: "caution",
  do_not_ship: "block",
  forecast_unavailable: "block",
};

function verdictOf(report: TemperatureReport, checkedAt: Date, tz: string, when: string): ManifestVerdict {
  return {
    check: "temperature",
    headline: TEMPERATURE_VERDICT_PRINTED[report.verdict],
    short: TEMPERATURE_VERDICT_ON_LABEL[report.verdict],
    tone: TONE[report.verdict],
    detail: `${report.advice.message} (${when})`,
    checkedAt: checkedAt.toISOString(),
    tz,
  };
}

/**
 * What the manifest says about temperature: the last stored check (made when the transfer was
 * cleared to ship, or a re-check before departure) while nothing in the transfer changed since,
 * otherwise a check made now with the app's forecast source. With no forecast the verdict says so
 * ("not checked"), never a kind of "fine". The time of the check is printed in the origin's zone.
 */
export async function manifestTemperature(ctx: AppContext, transferId: string): Promise<ManifestExtras> {
  const em = ctx.orm.em.fork();
  const transfer = await em.findOne(TransferSchema, { id: transferId });
  if (!transfer) return {};
  const tz = originZoneOf(transfer);
  const check = await latestCheck(em, transferId);
  // A check still speaks for the record when nothing in it (route, dates, boxes, animals) was edited
  // since; courier assignments, handoffs and status changes do not change the temperature picture.
  const editedSince = check
    ? await em.count(TransferChangeSchema, { transfer: transferId, createdAt: { $gt: check.checkedAt } })
    : 0;
  if (check && editedSince === 0) {
    const report = check.result as TemperatureReport;
    // In the origin's zone, like the departure on the same page.
    const at = formatInstant(check.checkedAt, tz);
    const when = `${at}, ${CHECK_MARK_WORDS[check.mark as keyof typeof CHECK_MARK_WORDS] ?? "on record"}`;
    return {
      verdicts: [verdictOf(report, check.checkedAt, tz, `forecast checked ${when}`)],
      temperature: {
        advice: [
          `${TEMPERATURE_VERDICT_WORDS[report.verdict]} (forecast checked ${when}). ${report.advice.message}`,
          ...report.warnings.filter((w) => w.severity === "warning").map((w) => w.message),
        ].join("\n"),
        safeRangeF: safeRangeOf(report),
        packingNotes: packingNotesOf(report, true),
        boxRangesF: boxRangesOf(report),
      },
    };
  }
  const now = new Date();
  const report = await assessTransferTemperature({ em, source: ctx.forecastSource, transfer, nowMs: now.getTime() });
  const when = `forecast checked ${formatInstant(now, tz)}, when this was printed`;
  return {
    verdicts: [verdictOf(report, now, tz, when)],
    temperature: {
      advice: [
        `${TEMPERATURE_VERDICT_WORDS[report.verdict]} (${when}). ${report.advice.message}`,
        ...report.warnings.filter((w) => w.severity === "warning").map((w) => w.message),
      ].join("\n"),
      safeRangeF: safeRangeOf(report),
      packingNotes: packingNotesOf(report, true),
      boxRangesF: boxRangesOf(report),
    },
  };
}
