import type pg from "pg";
import { todayUtc } from "@shared/compliance/expiry";
import { buildReport, EVENT_EFFECT, type LedgerEvent } from "@shared/register/ledger";
import { lastEndedPeriod } from "@shared/register/reporting";
import type { RegisterReportDto } from "@shared/schemas/register";
import type { RegisterEventKind } from "@shared/constants";
import { notFound } from "../../http/errors";

type PermitRow = {
  id: string;
  number: string;
  jurisdiction: string;
  kind: string;
  holder_name: string;
  species_covered: string[];
  report_start_month: number | null;
  report_due_month: number | null;
  report_due_day: number | null;
};

type EventRow = LedgerEvent & {
  scientific_name: string;
  identifier: string | null;
  counterparty_name: string | null;
  counterparty_address: string | null;
  counterparty_permit_number: string | null;
  transfer_number: string | null;
  note: string | null;
};

/**
 * The yearly report for one of the organisation's permits over `from`..`to` (defaults: the
 * permit's last reporting year that has ended, a calendar year when the permit names none).
 * A permit covers the entries linked to it, and every entry of a species it lists (all the
 * organisation's entries when it lists none). Two statements: the permit, then the events.
 */
export async function permitReport(
  pool: pg.Pool,
  organizationId: string,
  permitId: string,
  period: { from?: string; to?: string },
  today = todayUtc(),
): Promise<RegisterReportDto> {
  const { rows: permits } = await pool.query<PermitRow>(
    `SELECT id, number, jurisdiction, kind, holder_name, species_covered, report_start_month, report_due_month, report_due_day
       FROM permit_document WHERE id = $1 AND organization_id = $2`,
    [permitId, organizationId],
  );
  const permit = permits[0];
  if (!permit) throw notFound("That permit");
  const plan = {
    startMonth: permit.report_start_month ?? 1,
    dueMonth: permit.report_due_month ?? permit.report_start_month ?? 1,
    dueDay: permit.report_due_day ?? 31,
  };
  const fallback = lastEndedPeriod(plan, today);
  const from = period.from ?? (period.to ? `${period.to.slice(0, 4)}-01-01` : fallback.from);
  const to = period.to ?? (period.from ? today : fallback.to);
  // The permit's entries (by link or species, within the organisation), then their standing events
  // (not replaced by a correction, not withdrawn): summed per species before the period, one by
  // one within it. The signs come from the shared EVENT_EFFECT table.
  const covered = `covered AS (
       SELECT e.id, e.identifier, e.transfer_number, t.scientific_name
         FROM register_entry e JOIN taxon t ON t.id = e.taxon_id
        WHERE e.organization_id = $1
          AND ($2::uuid = ANY(e.permit_ids) OR cardinality($3::text[]) = 0 OR t.scientific_name = ANY($3::text[])))`;
  const standing = `v.kind <> 'voided' AND NOT EXISTS (SELECT 1 FROM register_event r WHERE r.corrects_event_id = v.id)`;
  const signs = Object.entries(EVENT_EFFECT);
  const ins = signs.filter(([, effect]) => effect.sign > 0).map(([kind]) => kind);
  const outs = signs.filter(([, effect]) => effect.sign < 0).map(([kind]) => kind);
  const [openingRows, { rows }] = await Promise.all([
    pool.query<{ scientific_name: string; count: string }>(
      `WITH ${covered}
       SELECT c.scientific_name, sum(CASE WHEN v.kind = ANY($5::text[]) THEN v.count WHEN v.kind = ANY($6::text[]) THEN -v.count ELSE 0 END) AS count
         FROM covered c JOIN register_event v ON v.entry_id = c.id
        WHERE v."on" < $4::date AND ${standing}
        GROUP BY c.scientific_name`,
      [organizationId, permit.id, permit.species_covered ?? [], from, ins, outs],
    ),
    pool.query<EventRow>(
      `WITH ${covered}
       SELECT v.id, v.entry_id AS "entryId", v.kind, v."on"::text AS "on", v.count, NULL AS "correctsEventId",
              c.scientific_name, c.identifier, v.counterparty_name, v.counterparty_address, v.counterparty_permit_number,
              c.transfer_number, v.note
         FROM covered c JOIN register_event v ON v.entry_id = c.id
        WHERE v."on" BETWEEN $4::date AND $5::date AND ${standing} AND v.kind = ANY($6::text[])`,
      [organizationId, permit.id, permit.species_covered ?? [], from, to, [...ins, ...outs]],
    ),
  ]);
  const opening = new Map(openingRows.rows.map((row) => [row.scientific_name, Number(row.count)]));
  const entries = new Map(rows.map((row) => [row.entryId, { scientificName: row.scientific_name }]));
  const species = buildReport(entries, rows, from, to, opening).map((row) => ({
    ...row,
    events: row.events.map((event) => ({
      on: event.on,
      kind: event.kind as RegisterEventKind,
      column: event.column,
      count: event.count,
      identifier: event.identifier,
      counterparty:
        event.counterparty_name || event.counterparty_address || event.counterparty_permit_number
          ? {
              name: event.counterparty_name,
              address: event.counterparty_address,
              permitNumber: event.counterparty_permit_number,
            }
          : null,
      transferNumber: event.transfer_number,
      note: event.note,
    })),
  }));
  const hasPlan =
    permit.report_start_month !== null && permit.report_due_month !== null && permit.report_due_day !== null;
  return {
    permit: {
      id: permit.id,
      number: permit.number,
      jurisdiction: permit.jurisdiction,
      kind: permit.kind,
      holderName: permit.holder_name,
    },
    from,
    to,
    dueOn: hasPlan && from === fallback.from && to === fallback.to ? fallback.dueOn : null,
    species,
  };
}
