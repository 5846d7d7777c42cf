import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestApp, signIn, type TestApp } from "../../tests/support/app";
import { buildUser } from "../../tests/factories";

// The bench's statement counter instruments its own app's connections only (no prototype patch):
// an app built beside it without BENCH_ROUTES neither counts nor reports.
let counted: TestApp;
let plain: TestApp;

beforeAll(async () => {
  counted = await createTestApp({ BENCH_ROUTES: "true" });
  plain = await createTestApp();
});
afterAll(async () => {
  await counted.close();
  await plain.close();
});

const COUNT = { "X-Count-Queries": "1" };

describe("X-Query-Count", () => {
  it("counts the one statement of the bare route, and only when asked", async () => {
    const asked = await request(counted.app).get("/api/__bench/select1").set(COUNT).expect(200);
    expect(asked.headers["x-query-count"]).toBe("1");
    const unasked = await request(counted.app).get("/api/__bench/select1").expect(200);
    expect(unasked.headers["x-query-count"]).toBeUndefined();
  });

  it("counts the ORM's statements as well as the pool's", async () => {
    const user = await buildUser(counted.orm.em.fork());
    const client = await signIn(counted.app, user.email);
    // The session read (pool) plus the profiles read through the ORM.
    const res = await client.get("/api/temperature/profiles").set(COUNT).expect(200);
    expect(Number(res.headers["x-query-count"])).toBeGreaterThanOrEqual(3);
  });

  it("leaves an app built without BENCH_ROUTES alone", async () => {
    await request(plain.app).get("/api/__bench/select1").set(COUNT).expect(404);
    const res = await request(plain.app).get("/api/health").set(COUNT).expect(200);
    expect(res.headers["x-query-count"]).toBeUndefined();
  });
});
