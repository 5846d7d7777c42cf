import type pg from "pg";
import { z } from "zod";
import type { RegisterQuery } from "@shared/schemas/register";
import type { registerQuerySchema } from "@shared/schemas/register";
import { badRequest } from "../../http/errors";
import type { RegisterEntryRow, RegisterEventRow } from "../../presenters/register.presenter";

type Query = z.output<typeof registerQuerySchema>;
export type { RegisterQuery };

/** The columns every register read returns (`e` the entry, `t` its species). */
const ENTRY_COLUMNS = `e.id, e.kind, e.taxon_id, t.scientific_name, t.common_names, t.venomous, e.sex, e.count, e.count_in_care, e.status,
  e.identifier, e.identifier_kind, e.origin, to_char(e.hatch_date, 'YYYY-MM-DD') AS hatch_date,
  to_char(e.date_acquired, 'YYYY-MM-DD') AS date_acquired, e.acquired_how, e.source_organization_name, e.source_permit_number,
  e.transfer_number, e.transfer_id, e.condition, e.notes, e.weight_g, e.length_mm, e.permit_ids::text[] AS permit_ids,
  to_char(e.quarantine_started_on, 'YYYY-MM-DD') AS quarantine_started_on, to_char(e.quarantine_until, 'YYYY-MM-DD') AS quarantine_until,
  e.previous_entry_id, e.parent_entry_id`;

const cursorSchema = z.tuple([z.string().max(200), z.uuid()]);

function decodeCursor(cursor: string): [string, string] {
  try {
    const parsed = cursorSchema.safeParse(JSON.parse(Buffer.from(cursor, "base64url").toString("utf8")));
    if (parsed.success) return parsed.data;
  } catch {
    // falls through to the refusal below
  }
  throw badRequest("The page link is not valid: go back to the first page of the register.", { field: "cursor" });
}

const encodeCursor = (value: string, id: string) => Buffer.from(JSON.stringify([value, id])).toString("base64url");

/**
 * A page of the organisation's register, newest acquisition first (or by species), with keyset
 * paging on (sort value, id) over the `register_entry_org_page_index` index. Filters: species,
 * status, permit, in quarantine, sex, acquisition days, free text.
 */
export async function readRegisterPage(
  pool: pg.Pool,
  organizationId: string,
  query: Query,
  today: string,
): Promise<{ rows: RegisterEntryRow[]; nextCursor: string | null }> {
  const params: unknown[] = [organizationId];
  const add = (value: unknown) => `$${params.push(value)}`;
  const where = ["e.organization_id = $1"];
  if (query.taxonId) where.push(`e.taxon_id = ${add(query.taxonId)}`);
  if (query.species) where.push(`t.scientific_name ILIKE ${add(`%${escapeLike(query.species)}%`)}`);
  if (query.sex) where.push(`e.sex = ${add(query.sex)}`);
  if (query.status) where.push(`e.status = ${add(query.status)}`);
  if (query.permitId) where.push(`e.permit_ids @> ARRAY[${add(query.permitId)}::uuid]`);
  if (query.quarantine === "yes") where.push(`e.quarantine_until >= ${add(today)}::date AND e.count_in_care > 0`);
  if (query.quarantine === "no")
    where.push(`(e.quarantine_until IS NULL OR e.quarantine_until < ${add(today)}::date OR e.count_in_care = 0)`);
  if (query.from) where.push(`e.date_acquired >= ${add(query.from)}::date`);
  if (query.to) where.push(`e.date_acquired <= ${add(query.to)}::date`);
  if (query.q) {
    const like = add(`%${escapeLike(query.q)}%`);
    where.push(
      `(e.transfer_number ILIKE ${like} OR e.source_organization_name ILIKE ${like} OR e.identifier ILIKE ${like} OR t.scientific_name ILIKE ${like})`,
    );
  }
  const sortColumn = query.sort === "species" ? "t.scientific_name" : "to_char(e.date_acquired, 'YYYY-MM-DD')";
  const orderColumn = query.sort === "species" ? "t.scientific_name" : "e.date_acquired";
  const dir = query.dir === "asc" ? "ASC" : "DESC";
  if (query.cursor) {
    const [value, id] = decodeCursor(query.cursor);
    const typed = query.sort === "species" ? add(value) : `${add(value)}::date`;
    where.push(`(${orderColumn}, e.id) ${dir === "ASC" ? ">" : "<"} (${typed}, ${add(id)}::uuid)`);
  }
  const limit = query.limit;
  const { rows } = await pool.query<RegisterEntryRow & { sort_value: string }>(
    `SELECT ${ENTRY_COLUMNS}, ${sortColumn} AS sort_value FROM register_entry e JOIN taxon t ON t.id = e.taxon_id
      WHERE ${where.join(" AND ")} ORDER BY ${orderColumn} ${dir}, e.id ${dir} LIMIT ${add(limit + 1)}`,
    params,
  );
  const more = rows.length > limit;
  const page = more ? rows.slice(0, limit) : rows;
  const last = page.at(-1);
  return { rows: page, nextCursor: more && last ? encodeCursor(last.sort_value, last.id) : null };
}

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

/** One entry of the organisation, or null. */
export async function readRegisterEntry(pool: pg.Pool, organizationId: string | null, id: string) {
  const { rows } = await pool.query<RegisterEntryRow & { organization_id: string }>(
    `SELECT ${ENTRY_COLUMNS}, e.organization_id FROM register_entry e JOIN taxon t ON t.id = e.taxon_id
      WHERE e.id = $1 ${organizationId ? "AND e.organization_id = $2" : ""}`,
    organizationId ? [id, organizationId] : [id],
  );
  return rows[0] ?? null;
}

const EVENT_COLUMNS = `v.id, v.entry_id, v.kind, to_char(v."on", 'YYYY-MM-DD') AS "on", v.count, v.note, v.cause, v.acquired_how,
  v.counterparty_name, v.counterparty_address, v.counterparty_permit_number, v.corrects_event_id, v.transfer_id, v.other_entry_id,
  v.weight_g, v.length_mm, v.recorded_by_name, v.created_at`;

/** The events of one entry, in the order they happened (then recorded). */
export async function readRegisterEvents(pool: pg.Pool, entryId: string): Promise<RegisterEventRow[]> {
  const { rows } = await pool.query<RegisterEventRow>(
    `SELECT ${EVENT_COLUMNS} FROM register_event v WHERE v.entry_id = $1 ORDER BY v."on", v.created_at, v.id`,
    [entryId],
  );
  return rows;
}
