import { describe, expect, it } from "vitest";
import request from "supertest";
import pg from "pg";
import { createTestApp, signIn } from "../../../tests/support/app";
import { buildUser } from "../../../tests/factories";
import { createApp } from "../../app";

describe("GET /api/health", () => {
  it("says the database is up", async () => {
    const t = await createTestApp();
    try {
      const res = await request(t.app).get("/api/health");
      expect(res.status).toBe(200);
      expect(res.body).toEqual({ status: "ok", db: "up" });
    } finally {
      await t.close();
    }
  });

  it("answers 503 with db down when PostgreSQL is unreachable, and the process stays up", async () => {
    const t = await createTestApp();
    // Port 9 (discard) on loopback: nothing listens, connections are refused.
    const deadPool = new pg.Pool({
      connectionString: "postgres://hatchway@127.0.0.1:9/none",
      connectionTimeoutMillis: 1000,
    });
    const app = createApp({ ...t.ctx, pool: deadPool });
    try {
      const user = await buildUser(t.orm.em.fork());
      const client = await signIn(t.app, user.email);
      const cookie = ((await client.get("/api/auth/me")).request as unknown as { cookies: string }).cookies;
      const res = await request(app).get("/api/health");
      expect(res.status).toBe(503);
      expect(res.body.db).toBe("down");
      // Sessions live in the same unreachable database: a signed-in route says so plainly.
      const me = await request(app).get("/api/auth/me").set("Cookie", cookie);
      expect(me.status).toBe(503);
      expect(JSON.stringify(me.body)).not.toMatch(/ECONNREFUSED|at .*\.ts|SELECT/);
    } finally {
      await deadPool.end();
      await t.close();
    }
  });
});
