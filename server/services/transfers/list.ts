import { createHash } from "node:crypto";
import type pg from "pg";
import type { z } from "zod";
import type {
  transferListQuerySchema,
  TransferListDto,
  TransferSummaryDto,
  ViewerRole,
} from "@shared/schemas/transfer";
import type { TransferStatus, TransportMode, UsState } from "@shared/constants";
import { isCourier, isKeeper, type Actor } from "../../auth/actor";
import { invalidField } from "../../http/errors";

type Query = z.output<typeof transferListQuerySchema>;

const sha1 = (text: string) => createHash("sha1").update(text).digest("hex").slice(0, 16);

const SORT_COLUMNS = {
  departure: "planned_departure_at",
  number: "number",
  status: "status",
  updated: "updated_at",
} as const;

type Row = {
  id: string;
  number: string;
  status: TransferStatus;
  mode: TransportMode;
  planned_departure_ms: number;
  expected_arrival_ms: number;
  updated_ms: number;
  sender_organization_id: string;
  sender_name: string;
  receiver_organization_id: string;
  receiver_name: string;
  origin_city: string;
  origin_state: UsState;
  origin_time_zone: string | null;
  destination_city: string;
  destination_state: UsState;
  animal_count: number;
  species_count: number;
  sort_value: string;
};

function decodeCursor(cursor: string | undefined): [unknown, string] | null {
  if (!cursor) return null;
  try {
    const value = JSON.parse(Buffer.from(cursor, "base64url").toString("utf8"));
    if (Array.isArray(value) && value.length === 2 && typeof value[1] === "string" && /^[0-9a-f-]{36}$/.test(value[1]))
      return value as [unknown, string];
  } catch {
    // fall through
  }
  throw invalidField(["cursor"], "this page link is not valid; start from the first page");
}

const encodeCursor = (sortValue: string, id: string) =>
  Buffer.from(JSON.stringify([sortValue, id])).toString("base64url");

/**
 * One page of the transfers the caller may see, newest departure first by default, with
 * keyset pagination (stable under inserts, no OFFSET scans). One SQL query per page.
 */
export async function listTransfers(pool: pg.Pool, actor: Actor, q: Query): Promise<TransferListDto> {
  const params: unknown[] = [];
  const p = (v: unknown) => `$${params.push(v)}`;
  const col = SORT_COLUMNS[q.sort];
  const desc = q.dir === "desc";
  const cmp = desc ? "<" : ">";
  const order = `${col} ${desc ? "DESC" : "ASC"}, id ${desc ? "DESC" : "ASC"}`;

  const filters: string[] = [];
  if (q.status) filters.push(`status = ${p(q.status)}`);
  if (q.departFrom) filters.push(`planned_departure_at >= ${p(`${q.departFrom}T00:00:00Z`)}::timestamptz`);
  if (q.departTo)
    filters.push(`planned_departure_at < (${p(`${q.departTo}T00:00:00Z`)}::timestamptz + interval '1 day')`);
  if (q.q) {
    const like = p(`%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`);
    filters.push(
      `(number ILIKE ${like} OR EXISTS (SELECT 1 FROM organization o WHERE o.id IN (transfer.sender_organization_id, transfer.receiver_organization_id) AND o.name ILIKE ${like}))`,
    );
  }
  const cursor = decodeCursor(q.cursor);
  if (cursor)
    filters.push(
      `(${col}, id) ${cmp} (${p(cursor[0])}::${col.endsWith("_at") ? "timestamptz" : "text"}, ${p(cursor[1])}::uuid)`,
    );
  const limit = p(q.limit + 1);

  const orgId = actor.organization?.id ?? null;
  const branches: string[] = [];
  const where = (visibility: string) => [visibility, ...filters].join(" AND ");
  // A draft never sent is the sender's alone (sharedWithOtherParties in transfer.policy.ts).
  const shared = `(first_sent_at IS NOT NULL OR status NOT IN ('draft', 'cancelled'))`;
  if (actor.role === "admin") branches.push(where("TRUE"));
  else if (isCourier(actor))
    branches.push(where(`id IN (SELECT transfer_id FROM leg WHERE courier_id = ${p(actor.id)}) AND ${shared}`));
  else if (orgId && actor.role === "manager" && actor.organization?.kind === "courier_service")
    branches.push(where(`courier_service_id = ${p(orgId)} AND ${shared}`));
  else if (orgId && isKeeper(actor)) {
    const org = p(orgId);
    if (q.role !== "receiving") branches.push(where(`sender_organization_id = ${org}`));
    if (q.role !== "sending") branches.push(where(`receiver_organization_id = ${org} AND ${shared}`));
  }
  if (isKeeper(actor) && q.role === "carrying") branches.length = 0;
  if (branches.length === 0) return { transfers: [], nextCursor: null };

  // Each branch walks its own index in order and stops at the page size; the union is small.
  const picked = branches
    .map((w) => `(SELECT id, ${col} AS sort_value FROM transfer WHERE ${w} ORDER BY ${order} LIMIT ${limit})`)
    .join(" UNION ALL ");
  const sql = `
    WITH page AS (SELECT DISTINCT id, sort_value FROM (${picked}) u ORDER BY ${order.replace(col, "sort_value")} LIMIT ${limit})
    SELECT t.id, t.number, t.status, t.mode,
           -- Times as epoch milliseconds and the sort key as text: parseFloat is far cheaper than
           -- parsing timestamps, and the text keeps microseconds, so the next page starts exactly after it.
           (extract(epoch FROM t.planned_departure_at) * 1000)::float8 AS planned_departure_ms,
           (extract(epoch FROM t.expected_arrival_at) * 1000)::float8 AS expected_arrival_ms,
           (extract(epoch FROM t.updated_at) * 1000)::float8 AS updated_ms,
           t.sender_organization_id, so.name AS sender_name, t.receiver_organization_id, ro.name AS receiver_name,
           t.origin_city, t.origin_state, t.origin_time_zone, t.destination_city, t.destination_state, page.sort_value::text AS sort_value,
           coalesce(a.animal_count, 0)::int AS animal_count, coalesce(a.species_count, 0)::int AS species_count
      FROM page
      JOIN transfer t ON t.id = page.id
      JOIN organization so ON so.id = t.sender_organization_id
      JOIN organization ro ON ro.id = t.receiver_organization_id
      LEFT JOIN LATERAL (SELECT sum(count) AS animal_count, count(DISTINCT taxon_id) AS species_count FROM animal WHERE transfer_id = t.id) a ON TRUE
     ORDER BY ${order.replace(col, "page.sort_value").replace(/\bid\b/, "t.id")}`;
  // Named by the shape of the query, so each combination of filters is planned once per connection.
  const { rows } = await pool.query<Row>({ name: `transfer-list-${sha1(sql)}`, text: sql, values: params });

  const page = rows.slice(0, q.limit);
  const last = page[page.length - 1];
  const roleOf = (r: Row): ViewerRole =>
    actor.role === "admin"
      ? "admin"
      : isCourier(actor)
        ? "courier"
        : r.sender_organization_id === orgId
          ? "sender"
          : "receiver";
  const transfers: TransferSummaryDto[] = page.map((r) => ({
    id: r.id,
    number: r.number,
    status: r.status,
    viewerRole: roleOf(r),
    sender: { id: r.sender_organization_id, name: r.sender_name },
    receiver: { id: r.receiver_organization_id, name: r.receiver_name },
    origin: { city: r.origin_city, state: r.origin_state, timeZone: r.origin_time_zone },
    destination: { city: r.destination_city, state: r.destination_state },
    mode: r.mode,
    plannedDepartureAt: new Date(r.planned_departure_ms).toISOString(),
    expectedArrivalAt: new Date(r.expected_arrival_ms).toISOString(),
    animalCount: r.animal_count,
    speciesCount: r.species_count,
    updatedAt: new Date(r.updated_ms).toISOString(),
  }));
  return { transfers, nextCursor: rows.length > q.limit && last ? encodeCursor(last.sort_value, last.id) : null };
}
