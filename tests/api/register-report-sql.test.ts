import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { REGISTER_EVENT_KINDS, type RegisterEventKind } from "@shared/constants";
import { buildReport, type LedgerEvent } from "@shared/register/ledger";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { buildUser } from "../factories";

// The report's totals are added up in SQL (server/services/register/report.ts, D41). Here they are
// held to the shared arithmetic (`buildReport`, itself proved on random ledgers against the
// animals' own lives in shared/register/ledger.test.ts) over random ledgers written straight into
// the database: corrections, chains of corrections, withdrawals, events before, in and after the
// period, and an entry the permit does not cover. The report's arithmetic: start + acquired +
// hatched − died − transferred out − escaped or released = end [practice, SOURCES.md "Records and reports"].

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** mulberry32: a small seeded generator, so a failing ledger can be rebuilt from its seed. */
function seeded(seed: number) {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let x = state;
    x = Math.imul(x ^ (x >>> 15), x | 1);
    x ^= x + Math.imul(x ^ (x >>> 7), x | 61);
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

const day = (n: number) => new Date(Date.UTC(2024, 0, 1) + n * 86_400_000).toISOString().slice(0, 10);
const FROM = "2025-01-01";
const TO = "2025-12-31";
const EDGES = ["2024-12-31", FROM, TO, "2026-01-01"];

async function permitFor(client: Client, speciesCovered: string[]): Promise<string> {
  const res = await client.post("/api/documents", {
    kind: "possession_permit",
    jurisdiction: "IL",
    number: `DEMO-${randomUUID().slice(0, 6)}`,
    holderName: "Demo keeper",
    speciesCovered,
    validFrom: null,
    validTo: null,
    issuedOn: null,
    veterinarianName: null,
    veterinarianAccredited: null,
    inspectionDate: null,
    statements: [],
    animalsCovered: [],
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return (res.body.document ?? res.body).id as string;
}

async function entry(client: Client, scientificName: string, permitIds: string[]): Promise<string> {
  const res = await client.post("/api/register/entries", {
    scientificName,
    count: 50,
    sex: "unknown",
    acquiredOn: day(10),
    permitIds,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.entry.id as string;
}

describe("the yearly report's totals, added up in SQL", () => {
  it("match the shared arithmetic on random ledgers with corrections and withdrawals", async () => {
    const user = await buildUser(t.orm.em.fork(), { role: "member" });
    const client = await signIn(t.app, user.email);
    const organizationId = user.organization!.id;
    // Linked by the permit (corn snakes), listed by species (ball pythons), and one it does not cover.
    const permitId = await permitFor(client, ["Python regius"]);
    const covered = new Map<string, { scientificName: string }>();
    for (const name of ["Pantherophis guttatus", "Pantherophis guttatus"])
      covered.set(await entry(client, name, [permitId]), { scientificName: name });
    for (const name of ["Python regius", "Python regius"])
      covered.set(await entry(client, name, []), { scientificName: name });
    const outside = await entry(client, "Pogona vitticeps", []);

    const kinds = REGISTER_EVENT_KINDS.filter((kind) => kind !== "voided");
    for (const seed of [1, 2, 3, 4, 5, 6]) {
      const random = seeded(seed);
      const pick = <T>(list: readonly T[]) => list[Math.floor(random() * list.length)]!;
      const ids = [...covered.keys(), outside];
      const written: { id: string; kind: RegisterEventKind }[] = [];
      const values: unknown[] = [];
      const tuples: string[] = [];
      for (let i = 0; i < 60; i++) {
        const id = randomUUID();
        // One in six corrects an earlier event of this round (a later correction of a correction makes a chain).
        const corrected = written.length && random() < 1 / 6 ? pick(written) : null;
        const kind: RegisterEventKind = corrected && random() < 0.4 ? "voided" : pick(kinds);
        const at = values.length;
        // A quarter of the days fall on the edges of the period (the day before, the first, the last, the day after).
        const on = random() < 0.25 ? pick(EDGES) : day(Math.floor(random() * 900));
        values.push(id, pick(ids), organizationId, kind, on, 1 + Math.floor(random() * 5));
        values.push(corrected?.id ?? null, new Date(Date.UTC(2026, 0, 1, 0, 0, i)).toISOString());
        tuples.push(
          `($${at + 1}::uuid, $${at + 2}::uuid, $${at + 3}::uuid, $${at + 4}, $${at + 5}::date, $${at + 6}::int, $${at + 7}::uuid, 'Seeded ledger', $${at + 8}::timestamptz)`,
        );
        written.push({ id, kind });
      }
      await t.ctx.pool.query(
        `INSERT INTO register_event (id, entry_id, organization_id, kind, "on", count, corrects_event_id, recorded_by_name, created_at)
         VALUES ${tuples.join(", ")}`,
        values,
      );

      const { rows } = await t.ctx.pool.query<LedgerEvent>(
        `SELECT id, entry_id AS "entryId", kind, "on"::text AS "on", count, corrects_event_id AS "correctsEventId"
           FROM register_event WHERE organization_id = $1`,
        [organizationId],
      );
      const expected = buildReport(covered, rows, FROM, TO);
      const res = await client.get(`/api/register/report?permitId=${permitId}&from=${FROM}&to=${TO}`);
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      const got = res.body.species as {
        scientificName: string;
        events: { on: string; kind: string; count: number }[];
      }[];
      expect(
        got.map((species) => species.scientificName),
        `seed ${seed}`,
      ).toEqual(expected.map((species) => species.scientificName));
      for (const [index, species] of expected.entries()) {
        const { events, ...totals } = species;
        const { events: gotEvents, ...gotTotals } = got[index]!;
        expect(gotTotals, `seed ${seed}, ${species.scientificName}`).toEqual(totals);
        expect(
          totals.start +
            totals.acquired +
            totals.hatched -
            totals.died -
            totals.transferredOut -
            totals.escapedOrReleased,
        ).toBe(totals.end);
        const key = (event: { on: string; kind: string; count: number }) => `${event.on} ${event.kind} ${event.count}`;
        expect(gotEvents.map(key).sort(), `seed ${seed}, ${species.scientificName}`).toEqual(events.map(key).sort());
        expect(gotEvents.map((event) => event.on)).toEqual(events.map((event) => event.on));
      }
      expect(got.some((species) => species.scientificName === "Pogona vitticeps")).toBe(false);
    }
  });
});
