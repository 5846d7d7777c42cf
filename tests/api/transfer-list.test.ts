import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { buildTransfer, buildUser } from "../factories";

let t: TestApp;
let sender: Client;
let ids: string[];
const em = () => t.orm.em.fork();

beforeAll(async () => {
  t = await createTestApp();
  const user = await buildUser(em(), { role: "member" });
  ids = [];
  for (let i = 0; i < 5; i++) ids.push((await buildTransfer(em(), { sender: user })).transfer.id);
  // Five edits inside one millisecond, a microsecond apart: PostgreSQL keeps microseconds, a
  // JavaScript Date does not, so a page link must not round the sort key.
  await t.ctx.pool.query(
    "UPDATE transfer SET updated_at = '2026-12-01 10:00:00.123+00'::timestamptz + (array_position($1::uuid[], id) * interval '1 microsecond') WHERE id = ANY($1::uuid[])",
    [ids],
  );
  sender = await signIn(t.app, user.email);
});
afterAll(() => t.close());

async function walk(query: string): Promise<{ ids: string[]; pages: number }> {
  const seen: string[] = [];
  let cursor: string | null = null;
  let pages = 0;
  do {
    const res = await sender.get(
      `/api/transfers?${query}&limit=2${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ""}`,
    );
    expect(res.status).toBe(200);
    seen.push(...(res.body.transfers as { id: string }[]).map((x) => x.id));
    cursor = res.body.nextCursor as string | null;
    pages++;
  } while (cursor && pages < 10);
  return { ids: seen, pages };
}

// Keyset pagination (common practice): every row once, in order, however many share a value.
describe("GET /api/transfers pages", () => {
  it("walks every transfer once when sorted by last change, microseconds apart", async () => {
    const { ids: seen, pages } = await walk("sort=updated&dir=desc");
    expect(pages).toBe(3);
    expect(seen).toEqual([...ids].reverse());
  });

  it("walks every transfer once in the other direction", async () => {
    const { ids: seen } = await walk("sort=updated&dir=asc");
    expect(seen).toEqual(ids);
  });

  it("walks every transfer once by departure, the default order", async () => {
    const { ids: seen } = await walk("sort=departure");
    expect(new Set(seen)).toEqual(new Set(ids));
    expect(seen).toHaveLength(ids.length);
  });

  it("gives the origin's time zone, in which the departure is shown", async () => {
    // Knoxville, TN 37917 keeps Eastern time (IANA tz database, America/New_York) [published]
    const res = await sender.get("/api/transfers?limit=1");
    expect(res.body.transfers[0].origin).toEqual({ city: "Knoxville", state: "TN", timeZone: "America/New_York" });
  });

  it("refuses a page link that was not made by the server", async () => {
    const res = await sender.get(`/api/transfers?cursor=${encodeURIComponent("not-a-cursor")}`);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/page link is not valid/);
  });
});
