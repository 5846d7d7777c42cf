import type pg from "pg";
import { todayUtc } from "@shared/compliance/expiry";
import { EVENT_EFFECT } from "@shared/register/ledger";
import { lastEndedPeriod } from "@shared/register/reporting";
import type { RegisterReportDto, ReportEventDto } from "@shared/schemas/register";
import type { RegisterEventKind, ReportColumn } from "@shared/constants";
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

type TotalsRow = {
  scientific_name: string;
  start: number;
  acquired: number;
  hatched: number;
  died: number;
  transferred_out: number;
  escaped_or_released: number;
};

/** EVENT_EFFECT as three parallel arrays (kind, sign, report column), so the SQL never repeats the table. */
const EFFECT_PARAMS = (() => {
  const effects = Object.entries(EVENT_EFFECT);
  return [
    effects.map(([kind]) => kind),
    effects.map(([, effect]) => effect.sign),
    effects.map(([, effect]) => effect.column),
  ];
})();

/**
 * What both report statements read. `covered`: the organisation's entries linked to the permit ($2, by
 * the GIN index on permit_ids), of a species it lists ($3), or all of them when it lists none,
 * as a union so each branch uses its index. `counted`: their standing events up to the end of the
 * period: none replaced by a correction (the partial index on corrects_event_id), none without
 * effect (a withdrawal, a measurement). Per species: start = the signed sum before `from` ($4);
 * each column the animals within the period; end = start + in − out [practice, SOURCES.md
 * "Records and reports"], the same sum `buildReport` (shared/register/ledger.ts) makes, which
 * tests/api/register-report-sql.test.ts holds this statement to on random ledgers.
 */
const REPORT_COUNTED = `
WITH effect AS (
  SELECT * FROM unnest($6::text[], $7::int[], $8::text[]) AS x(kind, sign, report_column)
), covered AS (
  SELECT e.id, e.identifier, e.transfer_number, e.taxon_id FROM register_entry e
   WHERE e.organization_id = $1 AND e.permit_ids @> ARRAY[$2::uuid]
  UNION
  SELECT e.id, e.identifier, e.transfer_number, e.taxon_id FROM register_entry e
   WHERE e.organization_id = $1 AND e.taxon_id IN (SELECT t.id FROM taxon t WHERE t.scientific_name = ANY($3::text[]))
  UNION
  SELECT e.id, e.identifier, e.transfer_number, e.taxon_id FROM register_entry e
   WHERE e.organization_id = $1 AND cardinality($3::text[]) = 0
), counted AS (
  SELECT v.id, v.kind, v."on", v.count, v.created_at, v.note, v.counterparty_name, v.counterparty_address,
         v.counterparty_permit_number, c.identifier, c.transfer_number, t.scientific_name, x.sign, x.report_column
    FROM covered c
    JOIN register_event v ON v.entry_id = c.id AND v."on" <= $5::date
    JOIN effect x ON x.kind = v.kind AND x.sign <> 0
    JOIN taxon t ON t.id = c.taxon_id
   WHERE NOT EXISTS (SELECT 1 FROM register_event r WHERE r.corrects_event_id = v.id)
)`;

/** Per species: the count at the start and each column's animals within the period, in the report's order. */
const REPORT_TOTALS_SQL = `${REPORT_COUNTED}
SELECT scientific_name,
       coalesce(sum(sign * count) FILTER (WHERE "on" < $4::date), 0)::int AS start,
       coalesce(sum(count) FILTER (WHERE "on" >= $4::date AND report_column = 'acquired'), 0)::int AS acquired,
       coalesce(sum(count) FILTER (WHERE "on" >= $4::date AND report_column = 'hatched'), 0)::int AS hatched,
       coalesce(sum(count) FILTER (WHERE "on" >= $4::date AND report_column = 'died'), 0)::int AS died,
       coalesce(sum(count) FILTER (WHERE "on" >= $4::date AND report_column = 'transferredOut'), 0)::int AS transferred_out,
       coalesce(sum(count) FILTER (WHERE "on" >= $4::date AND report_column = 'escapedOrReleased'), 0)::int AS escaped_or_released
  FROM counted GROUP BY scientific_name ORDER BY scientific_name`;

/** Each counted event of the period, by species, then day, then when it was recorded. */
const REPORT_EVENTS_SQL = `${REPORT_COUNTED}
SELECT scientific_name, "on"::text, kind, report_column, count, identifier, counterparty_name, counterparty_address,
       counterparty_permit_number, transfer_number, note
  FROM counted WHERE "on" >= $4::date AND report_column IS NOT NULL
 ORDER BY scientific_name, "on", created_at, id`;

type EventTuple = [
  scientificName: string,
  on: string,
  kind: RegisterEventKind,
  column: ReportColumn,
  count: number,
  identifier: string | null,
  counterpartyName: string | null,
  counterpartyAddress: string | null,
  counterpartyPermitNumber: string | null,
  transferNumber: string | null,
  note: string | null,
];

/**
 * The yearly report for one of the organisation's permits over `from`..`to` (defaults: the
 * permit's last reporting year that has ended, a calendar year when the permit names none).
 * A permit covers the entries linked to it, and every entry of a species it lists (all the
 * organisation's entries when it lists none). Three statements: the permit, then (at once) the
 * totals PostgreSQL adds up per species and the period's events as plain rows (D41).
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
  const values = [organizationId, permit.id, permit.species_covered ?? [], from, to, ...EFFECT_PARAMS];
  const [totals, events] = await Promise.all([
    pool.query<TotalsRow>({ name: "register-report-totals-v1", text: REPORT_TOTALS_SQL, values }),
    pool.query<EventTuple>({ name: "register-report-events-v1", text: REPORT_EVENTS_SQL, values, rowMode: "array" }),
  ]);
  const bySpecies = new Map<string, ReportEventDto[]>();
  for (const [
    scientificName,
    on,
    kind,
    column,
    count,
    identifier,
    name,
    address,
    permitNumber,
    transferNumber,
    note,
  ] of events.rows) {
    let list = bySpecies.get(scientificName);
    if (!list) bySpecies.set(scientificName, (list = []));
    list.push({
      on,
      kind,
      column,
      count,
      identifier,
      counterparty: name || address || permitNumber ? { name, address, permitNumber } : null,
      transferNumber,
      note,
    });
  }
  const species = totals.rows
    .map((row) => ({
      scientificName: row.scientific_name,
      start: row.start,
      acquired: row.acquired,
      hatched: row.hatched,
      died: row.died,
      transferredOut: row.transferred_out,
      escapedOrReleased: row.escaped_or_released,
      end: row.start + row.acquired + row.hatched - row.died - row.transferred_out - row.escaped_or_released,
      events: bySpecies.get(row.scientific_name) ?? [],
    }))
    .filter((row) => row.start !== 0 || row.end !== 0 || row.events.length > 0);
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
