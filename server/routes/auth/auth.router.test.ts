import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import pg from "pg";
import { createApp } from "../../app";
import { composeApp } from "../../composition";
import { anonymousClient, createTestApp, signIn, type TestApp } from "../../../tests/support/app";
import { buildUser } from "../../../tests/factories";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ LOGIN_MAX_FAILURES_PER_ACCOUNT: "3", LOGIN_MAX_FAILURES_PER_IP: "1000" });
});
afterAll(() => t.close());

const em = () => t.orm.em.fork();

function cookieValue(res: request.Response): string | undefined {
  const raw = res.headers["set-cookie"] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith("hatchway.sid="))?.split(";")[0];
}

describe("sign-in", () => {
  it("answers with the user's public shape and a new session id", async () => {
    const user = await buildUser(em(), { email: "Kestrel@Example.test", displayName: "Kestrel Ames" });
    const client = await anonymousClient(t.app);
    const before = cookieValue(await client.get("/api/auth/csrf"));
    const res = await client.post("/api/auth/login", { email: "kestrel@example.test", password: "hatchway-demo" });
    expect(res.status).toBe(200);
    expect(Object.keys(res.body.user).sort()).toEqual(["displayName", "email", "id", "organization", "role"]);
    expect(res.body.user).toMatchObject({ id: user.id, email: "Kestrel@Example.test", role: "member" });
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|passwordHash/);
    const after = cookieValue(res);
    expect(after).toBeDefined();
    expect(after).not.toEqual(before);
    const setCookie = (res.headers["set-cookie"] as unknown as string[]).join(";");
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=Lax/i);
    expect(setCookie).not.toMatch(/connect\.sid/);
  });

  it("finds the account whatever the case and Unicode form of the e-mail", async () => {
    // "é" precomposed (NFC) at creation, decomposed (NFD) at sign-in.
    await buildUser(em(), { email: "ren\u00e9@example.test" });
    const client = await anonymousClient(t.app);
    const res = await client.post("/api/auth/login", { email: "RENE\u0301@EXAMPLE.TEST", password: "hatchway-demo" });
    expect(res.status).toBe(200);
  });

  it("gives one answer for unknown e-mail, wrong password and a disabled account", async () => {
    const active = await buildUser(em());
    const disabled = await buildUser(em(), { disabled: true });
    const client = await anonymousClient(t.app);
    const answers = await Promise.all([
      client.post("/api/auth/login", { email: "nobody-here@example.test", password: "hatchway-demo" }),
      client.post("/api/auth/login", { email: active.email, password: "not-the-password" }),
      client.post("/api/auth/login", { email: disabled.email, password: "hatchway-demo" }),
    ]);
    for (const res of answers) expect(res.status).toBe(401);
    const bodies = answers.map((r) => JSON.stringify(r.body));
    expect(new Set(bodies).size).toBe(1);
    expect(answers[0]!.body.error.code).toBe("invalid_credentials");
  });

  it("blocks an account after repeated failures, even for the right password, with Retry-After", async () => {
    const user = await buildUser(em());
    const client = await anonymousClient(t.app);
    for (let i = 0; i < 3; i++) {
      expect((await client.post("/api/auth/login", { email: user.email, password: "wrong-password" })).status).toBe(
        401,
      );
    }
    const blocked = await client.post("/api/auth/login", { email: user.email, password: "hatchway-demo" });
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers["retry-after"])).toBeGreaterThan(0);
    expect((await client.get("/api/auth/me")).status).toBe(401);
  });
});

// OWASP Authentication Cheat Sheet, "Account Lockout" and "Protect against automated attacks":
// count failures per account, limit per account and address, and slow (not lock) an address
// that fails across many accounts, so a shared network is not locked out [published].
describe("sign-in throttling by address", () => {
  /** An app behind one trusted proxy hop, so each test can sign in "from" an address of its own. */
  async function throttledApp(overrides: Record<string, string>) {
    const app = await createTestApp({ TRUST_PROXY_HOPS: "1", ...overrides });
    await app.ctx.pool.query("DELETE FROM auth_throttle");
    const from = async (address: string) => {
      const client = await anonymousClient(app.app);
      return (email: string, password: string) =>
        client.post("/api/auth/login", { email, password }).set("X-Forwarded-For", address);
    };
    return { app, from };
  }

  it("an address failing across many accounts is slowed for seconds, and a colleague there still signs in", async () => {
    const { app, from } = await throttledApp({
      LOGIN_MAX_FAILURES_PER_IP: "4",
      LOGIN_ADDRESS_DELAY_MAX_SECONDS: "2",
      LOGIN_MAX_FAILURES_PER_ACCOUNT: "100",
      LOGIN_MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS: "100",
    });
    try {
      const colleague = await buildUser(app.orm.em.fork());
      const school = await from("198.51.100.20");
      for (let i = 0; i < 5; i++) expect((await school(`spray-${i}@example.test`, "x".repeat(10))).status).toBe(401);
      // Past the free failures: the next attempt from that address waits, but seconds, not 15 minutes.
      const slowed = await school(colleague.email, "hatchway-demo");
      expect(slowed.status).toBe(429);
      expect(Number(slowed.headers["retry-after"])).toBeGreaterThan(0);
      expect(Number(slowed.headers["retry-after"])).toBeLessThanOrEqual(2);
      expect(slowed.body.error.message).toMatch(/from this network\. Try again in \d seconds?\./);
      // Someone at another address is not slowed at all.
      const elsewhere = await from("203.0.113.9");
      expect((await elsewhere(colleague.email, "wrong-password")).status).toBe(401);
      // After the wait, the colleague at the shared address signs in.
      await new Promise((resolve) => setTimeout(resolve, Number(slowed.headers["retry-after"]) * 1000 + 100));
      expect((await school(colleague.email, "hatchway-demo")).status).toBe(200);
    } finally {
      await app.close();
    }
  });

  it("an account's failures from one address stop that address, not the account's owner elsewhere", async () => {
    const { app, from } = await throttledApp({
      LOGIN_MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS: "3",
      LOGIN_MAX_FAILURES_PER_ACCOUNT: "100",
      LOGIN_MAX_FAILURES_PER_IP: "1000",
    });
    try {
      const user = await buildUser(app.orm.em.fork());
      const guesser = await from("198.51.100.66");
      for (let i = 0; i < 3; i++) expect((await guesser(user.email, `guess-${i}-password`)).status).toBe(401);
      const blocked = await guesser(user.email, "hatchway-demo");
      expect(blocked.status).toBe(429);
      expect(Number(blocked.headers["retry-after"])).toBeGreaterThan(60);
      expect(blocked.body.error.message).toMatch(/for this e-mail address/);
      // The same address may still sign in to other accounts; the owner signs in from home.
      const other = await buildUser(app.orm.em.fork());
      expect((await guesser(other.email, "hatchway-demo")).status).toBe(200);
      expect((await (await from("203.0.113.50"))(user.email, "hatchway-demo")).status).toBe(200);
    } finally {
      await app.close();
    }
  });

  it("failures on one account spread over many addresses lock the account", async () => {
    const { app, from } = await throttledApp({
      LOGIN_MAX_FAILURES_PER_ACCOUNT: "4",
      LOGIN_MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS: "100",
      LOGIN_MAX_FAILURES_PER_IP: "1000",
    });
    try {
      const user = await buildUser(app.orm.em.fork());
      for (let i = 0; i < 4; i++)
        expect((await (await from(`192.0.2.${10 + i}`))(user.email, "wrong-password")).status).toBe(401);
      expect((await (await from("192.0.2.99"))(user.email, "hatchway-demo")).status).toBe(429);
    } finally {
      await app.close();
    }
  });
});

describe("CSRF", () => {
  it("refuses sign-in without the token or with a wrong one", async () => {
    const user = await buildUser(em());
    const agent = request.agent(t.app);
    await agent.get("/api/auth/csrf");
    const missing = await agent.post("/api/auth/login").send({ email: user.email, password: "hatchway-demo" });
    expect(missing.status).toBe(403);
    const wrong = await agent
      .post("/api/auth/login")
      .set("X-CSRF-Token", "forged-token")
      .send({ email: user.email, password: "hatchway-demo" });
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.code).toBe("csrf");
  });

  it("refuses a signed-in write without the token, and a cross-site one with it", async () => {
    const admin = await buildUser(em(), { role: "admin", organization: null });
    const client = await signIn(t.app, admin.email);
    const body = {
      name: "Heron Hollow",
      kind: "zoo",
      address: { street: "1 A St", city: "Salem", state: "OR", zip: "97301" },
      phone: "+1 503 555 0100",
      email: "h@example.test",
    };
    expect((await client.agent.post("/api/organizations").send(body)).status).toBe(403);
    expect((await client.post("/api/organizations", body).set("Origin", "https://evil.example")).status).toBe(403);
    expect((await client.post("/api/organizations", body).set("Sec-Fetch-Site", "cross-site")).status).toBe(403);
    expect((await client.post("/api/organizations", body)).status).toBe(201);
  });

  it("keeps the token valid across sign-in", async () => {
    const admin = await buildUser(em(), { role: "admin", organization: null });
    const client = await signIn(t.app, admin.email);
    const res = await client.post("/api/auth/logout");
    expect(res.status).toBe(204);
  });
});

describe("session", () => {
  it("me is 401 before sign-in and 200 after, with the caller's abilities", async () => {
    const courier = await buildUser(em(), { role: "courier" });
    const anon = await anonymousClient(t.app);
    expect((await anon.get("/api/auth/me")).status).toBe(401);
    const client = await signIn(t.app, courier.email);
    const me = await client.get("/api/auth/me");
    expect(me.status).toBe(200);
    expect(me.body.user.role).toBe("courier");
    expect(me.body.abilities.manageUsers).toBe(false);
    expect(me.body.abilities.carryTransfers).toBe(true);
  });

  it("sign-out destroys the server session: the old cookie no longer works", async () => {
    const user = await buildUser(em());
    const client = await signIn(t.app, user.email);
    const cookie = cookieValue(await client.get("/api/auth/me")) ?? "";
    const sessionsBefore = Number((await t.ctx.pool.query("SELECT count(*) FROM session")).rows[0].count);
    expect((await client.post("/api/auth/logout")).status).toBe(204);
    const sessionsAfter = Number((await t.ctx.pool.query("SELECT count(*) FROM session")).rows[0].count);
    expect(sessionsAfter).toBe(sessionsBefore - 1);
    expect((await client.get("/api/auth/me")).status).toBe(401);
    if (cookie) expect((await request(t.app).get("/api/auth/me").set("Cookie", cookie)).status).toBe(401);
  });

  it("a disabled account loses access on its next request", async () => {
    const user = await buildUser(em());
    const client = await signIn(t.app, user.email);
    await t.ctx.pool.query("UPDATE app_user SET disabled = true WHERE id = $1", [user.id]);
    expect((await client.get("/api/auth/me")).status).toBe(401);
  });

  it("an idle session expires on the server", async () => {
    const user = await buildUser(em());
    const client = await signIn(t.app, user.email);
    expect((await client.get("/api/auth/me")).status).toBe(200);
    const longAgo = Date.now() - (t.env.SESSION_IDLE_MINUTES + 1) * 60_000;
    await t.ctx.pool.query(
      `UPDATE session SET sess = jsonb_set(sess::jsonb, '{lastSeenAt}', to_jsonb($1::bigint))::json WHERE sess->'passport'->>'user' = $2`,
      [longAgo, user.id],
    );
    expect((await client.get("/api/auth/me")).status).toBe(401);
  });

  it("the user read with the session is never written into the session row", async () => {
    const user = await buildUser(em());
    const client = await signIn(t.app, user.email);
    // Two minutes since the last touch: the next request writes the session (lastSeenAt) back.
    const twoMinutesAgo = Date.now() - 120_000;
    await t.ctx.pool.query(
      `UPDATE session SET sess = jsonb_set(sess::jsonb, '{lastSeenAt}', to_jsonb($1::bigint))::json WHERE sess->'passport'->>'user' = $2`,
      [twoMinutesAgo, user.id],
    );
    expect((await client.get("/api/auth/me")).status).toBe(200);
    const { rows } = await t.ctx.pool.query<{ sess: Record<string, unknown> }>(
      `SELECT sess FROM session WHERE sess->'passport'->>'user' = $1`,
      [user.id],
    );
    expect(rows).toHaveLength(1);
    expect(rows[0]!.sess.lastSeenAt as number).toBeGreaterThan(twoMinutesAgo);
    expect(Object.keys(rows[0]!.sess).sort()).toEqual(["cookie", "createdAt", "csrfToken", "lastSeenAt", "passport"]);
  });

  it("a session past its absolute lifetime expires even when active", async () => {
    const user = await buildUser(em());
    const client = await signIn(t.app, user.email);
    const created = Date.now() - (t.env.SESSION_ABSOLUTE_HOURS * 3600_000 + 60_000);
    await t.ctx.pool.query(
      `UPDATE session SET sess = jsonb_set(sess::jsonb, '{createdAt}', to_jsonb($1::bigint))::json WHERE sess->'passport'->>'user' = $2`,
      [created, user.id],
    );
    expect((await client.get("/api/auth/me")).status).toBe(401);
  });
});

describe("when sessions cannot be stored", () => {
  it("/api/auth/csrf answers 503 instead of a token that would never work", async () => {
    // The app's own clients, except that the pool sessions are written through points nowhere.
    const nowhere = new pg.Pool({ connectionString: "postgres://hatchway_app@127.0.0.1:1/nowhere", max: 1 });
    nowhere.on("error", () => undefined);
    const broken = createApp(composeApp({ env: t.env, orm: t.orm, pool: nowhere }));
    try {
      const res = await request(broken).get("/api/auth/csrf");
      expect(res.status).toBe(503);
      expect(res.body.error.message).toMatch(/session could not be stored/);
      expect(res.body.csrfToken).toBeUndefined();
    } finally {
      await nowhere.end();
    }
  });
});

describe("sign-out", () => {
  it("tells the browser to clear what the session left behind", async () => {
    const user = await buildUser(em());
    const client = await signIn(t.app, user.email);
    const res = await client.post("/api/auth/logout");
    expect(res.status).toBe(204);
    // W3C Clear Site Data §3.1: quoted, comma-separated types [published].
    expect(res.headers["clear-site-data"]).toBe('"cache", "cookies", "storage"');
  });
});
