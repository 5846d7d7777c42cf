/**
 * Box temperatures read on the way (issue 13 §2): at the pickup, each handoff and the check-in,
 * as the custody log holds them. A reading outside a box's safe range raises an alert at once;
 * each reading is set beside the model's inside temperature for the same moment; across an
 * organisation's transfers, the prediction on record is compared with what the boxes read. The
 * verdict is never adjusted by a reading: the difference is shown, for people to judge.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import type { ReadingSource } from "@shared/constants";
import type { BoxReadingDto, ModelAccuracyDto, TemperatureReport } from "@shared/temperature/report";
import { formatTempBoth, formatTempRangeBoth, round1 } from "@shared/units";
import { READING_SOURCE_WORDS } from "@shared/words";
import type { Actor } from "../../auth/actor";
import type { Transfer } from "../../db/entities/transfer.entity";
import type { AppLinks } from "../../mail/links";
import { raiseAlerts } from "../transfers/alerts";
import { loadProfiles } from "./profiles";
import { boxesOf } from "./transfer-temperature";

const MS_PER_HOUR = 3_600_000;

/** A box temperature as the custody log holds it. */
export type BoxReading = { at: Date; place: string; tempF: number; source: ReadingSource };

type ReadingRow = { at: Date; kind: string; payload: Record<string, unknown> };

function readingOf(row: ReadingRow): BoxReading | null {
  const tempF = row.payload.boxTempF;
  if (typeof tempF !== "number" || !Number.isFinite(tempF)) return null;
  const kind = row.payload.handoffKind;
  const source: ReadingSource =
    row.kind === "check_in" ? "check_in" : kind === "pickup" || kind === "delivery" ? kind : "handoff";
  const placeText = (row.payload.place as { text?: unknown } | undefined)?.text;
  const place = typeof placeText === "string" && placeText.trim() ? placeText : READING_SOURCE_WORDS[source];
  return { at: new Date(row.at), place, tempF, source };
}

/** The box temperatures recorded on a transfer, oldest first. */
export async function transferReadings(em: EntityManager, transferId: string): Promise<BoxReading[]> {
  const rows = await em.execute<ReadingRow[]>(
    `SELECT at, kind, payload FROM custody_entry
      WHERE transfer_id = ? AND kind IN ('handoff', 'check_in') AND jsonb_typeof(payload->'boxTempF') = 'number'
      ORDER BY seq`,
    [transferId],
  );
  return rows.flatMap((row) => readingOf(row) ?? []);
}

/** When the box was picked up (the first handoff), or null before. */
export async function pickupAt(em: EntityManager, transferId: string): Promise<Date | null> {
  const rows = await em.execute<{ at: Date }[]>(
    `SELECT at FROM custody_entry WHERE transfer_id = ? AND kind = 'handoff' AND payload->>'handoffIndex' = '0' LIMIT 1`,
    [transferId],
  );
  return rows[0] ? new Date(rows[0].at) : null;
}

/**
 * The model's inside temperature at `atMs` from hourly values (°F), linear between the hours; null
 * outside the modelled hours (an hour's grace at each end) or where an hour has no value.
 */
export function modelAtF(hours: readonly { at: string; insideF: number | null }[], atMs: number): number | null {
  if (hours.length === 0) return null;
  const firstMs = Date.parse(hours[0]!.at);
  const lastMs = Date.parse(hours.at(-1)!.at);
  if (atMs < firstMs - MS_PER_HOUR || atMs > lastMs + MS_PER_HOUR) return null;
  const position = Math.min(hours.length - 1, Math.max(0, (atMs - firstMs) / MS_PER_HOUR));
  const i = Math.floor(position);
  const before = hours[i]!.insideF;
  const after = hours[Math.min(hours.length - 1, i + 1)]!.insideF;
  if (before === null || after === null) return null;
  return round1(before + (after - before) * (position - i));
}

/** The band every box must stay in: the warmest of the minimums to the coolest of the maximums, °F. */
export function commonSafeRange(report: Pick<TemperatureReport, "boxes" | "profile">): { min: number; max: number } {
  const ranges = report.boxes.length ? report.boxes.map((b) => b.profile.safeTransitF) : [report.profile.safeTransitF];
  return { min: Math.max(...ranges.map((r) => r.min)), max: Math.min(...ranges.map((r) => r.max)) };
}

/** The readings of a transfer beside the model the report draws, with the differences. */
export function readingsAgainstReport(readings: readonly BoxReading[], report: TemperatureReport): BoxReadingDto[] {
  const range = commonSafeRange(report);
  return readings.map((r) => {
    const modelF = modelAtF(report.hours, r.at.getTime());
    return {
      at: r.at.toISOString(),
      place: r.place,
      tempF: r.tempF,
      modelF,
      source: r.source,
      differenceF: modelF === null ? null : round1(r.tempF - modelF),
      outsideSafeRange: r.tempF < range.min || r.tempF > range.max,
    };
  });
}

/**
 * Called by the handoff and check-in services, inside their transaction, for the box temperature
 * just recorded: a reading outside any box's safe range raises a `temperature_out_of_range` alert,
 * e-mailed at once to both parties and the couriers on the transfer. Returns whether it did.
 */
export async function checkBoxReading(
  em: EntityManager,
  links: AppLinks,
  transfer: Transfer,
  actor: Actor | null,
  reading: { tempF: number | null | undefined; place: string | null | undefined; source: ReadingSource },
): Promise<boolean> {
  const tempF = reading.tempF;
  if (typeof tempF !== "number" || !Number.isFinite(tempF)) return false;
  const boxes = await boxesOf(em, transfer, await loadProfiles(em));
  const outside = boxes.filter((b) => tempF < b.profile.safeTransitF.min || tempF > b.profile.safeTransitF.max);
  if (outside.length === 0) return false;
  const hot = outside.some((b) => tempF > b.profile.safeTransitF.max);
  const where = `${READING_SOURCE_WORDS[reading.source].toLowerCase()}${reading.place ? ` (${reading.place})` : ""}`;
  const ranges = outside
    .map(
      (b) =>
        `${b.label}, ${b.profile.label.toLowerCase()}: ${formatTempRangeBoth(b.profile.safeTransitF.min, b.profile.safeTransitF.max)}`,
    )
    .join("; ");
  const act = hot
    ? "Move the box out of the sun and heat now, and check the animals."
    : "Move the box somewhere warm now, and check the animals.";
  await raiseAlerts(em, links, transfer, actor, [
    {
      kind: "temperature_out_of_range",
      message: `Box temperature ${formatTempBoth(tempF)} at the ${where} is ${hot ? "above" : "below"} the safe range (${ranges}). ${act}`,
      data: {
        tempF,
        source: reading.source,
        place: reading.place ?? null,
        boxes: outside.map((b) => ({
          containerId: b.containerId,
          label: b.label,
          safeTransitF: b.profile.safeTransitF,
        })),
      },
      alsoCouriers: true,
    },
  ]);
  return true;
}

type AccuracyRow = {
  transfer_id: string;
  number: string;
  at: Date;
  kind: string;
  payload: Record<string, unknown>;
  picked_up_at: Date | null;
  anchor: string | null;
  hours: { at: string; insideF: number | null }[] | null;
};

/**
 * How far the model has been from the box readings across the transfers an organisation sent or
 * received (all transfers for an admin). The model is the prediction on record when the box left:
 * the last stored check made before the pickup, followed from the actual pickup (its hour n is
 * hour n after the pickup). A later forecast cannot improve it after the fact.
 */
export async function modelAccuracy(em: EntityManager, organizationId: string | null): Promise<ModelAccuracyDto> {
  const rows = await em.execute<AccuracyRow[]>(
    `WITH readings AS (
       SELECT t.id AS transfer_id, t.number, e.at, e.kind, e.payload
         FROM transfer t JOIN custody_entry e ON e.transfer_id = t.id
        WHERE (?::uuid IS NULL OR t.sender_organization_id = ?::uuid OR t.receiver_organization_id = ?::uuid)
          AND e.kind IN ('handoff', 'check_in') AND jsonb_typeof(e.payload->'boxTempF') = 'number'
     ), pickups AS (
       SELECT e.transfer_id, e.at AS picked_up_at FROM custody_entry e
        WHERE e.transfer_id IN (SELECT transfer_id FROM readings)
          AND e.kind = 'handoff' AND e.payload->>'handoffIndex' = '0'
     )
     SELECT r.transfer_id, r.number, r.at, r.kind, r.payload, p.picked_up_at, c.anchor, c.hours
       FROM readings r
       LEFT JOIN pickups p ON p.transfer_id = r.transfer_id
       LEFT JOIN LATERAL (
         SELECT coalesce(k.result->'exposures'->0->>'from', k.result->'hours'->0->>'at') AS anchor,
                k.result->'hours' AS hours
           FROM temperature_check k
          WHERE k.transfer_id = r.transfer_id AND k.checked_at <= p.picked_up_at AND k.verdict <> 'forecast_unavailable'
          ORDER BY k.checked_at DESC, k.id DESC LIMIT 1
       ) c ON true
      ORDER BY r.number, r.at`,
    [organizationId, organizationId, organizationId],
  );
  const compared: {
    transferId: string;
    number: string;
    at: string;
    place: string;
    tempF: number;
    modelF: number;
    differenceF: number;
  }[] = [];
  let withoutModel = 0;
  for (const row of rows) {
    const reading = readingOf(row);
    if (!reading) continue;
    const anchorMs = row.anchor ? Date.parse(row.anchor) : Number.NaN;
    const modelF =
      row.hours && row.picked_up_at && Number.isFinite(anchorMs)
        ? modelAtF(row.hours, anchorMs + (reading.at.getTime() - new Date(row.picked_up_at).getTime()))
        : null;
    if (modelF === null) {
      withoutModel += 1;
      continue;
    }
    compared.push({
      transferId: row.transfer_id,
      number: row.number,
      at: reading.at.toISOString(),
      place: reading.place,
      tempF: reading.tempF,
      modelF,
      differenceF: round1(reading.tempF - modelF),
    });
  }
  const byTransfer = new Map<string, typeof compared>();
  for (const c of compared) byTransfer.set(c.transferId, [...(byTransfer.get(c.transferId) ?? []), c]);
  const meanAbs = (list: typeof compared) =>
    round1(list.reduce((n, c) => n + Math.abs(c.differenceF), 0) / list.length);
  const worstOf = (list: typeof compared) =>
    list.reduce((w, c) => (Math.abs(c.differenceF) > Math.abs(w.differenceF) ? c : w));
  return {
    transfers: new Set(rows.map((r) => r.transfer_id)).size,
    readings: compared.length,
    readingsWithoutModel: withoutModel,
    meanAbsoluteDifferenceF: compared.length ? meanAbs(compared) : null,
    meanDifferenceF: compared.length ? round1(compared.reduce((n, c) => n + c.differenceF, 0) / compared.length) : null,
    worst: compared.length ? worstOf(compared) : null,
    byTransfer: [...byTransfer.values()].map((list) => ({
      transferId: list[0]!.transferId,
      number: list[0]!.number,
      readings: list.length,
      meanAbsoluteDifferenceF: meanAbs(list),
      worstDifferenceF: worstOf(list).differenceF,
    })),
  };
}
