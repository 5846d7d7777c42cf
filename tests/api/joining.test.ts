/**
 * Issue 14, §1: organisations join by themselves. Sign-up, confirmation and password reset,
 * through the mail the outbox caught. OWASP Forgot Password Cheat Sheet [published]: the same
 * answer for known and unknown addresses, random single-use tokens with an expiry, rate limits;
 * OWASP Session Management Cheat Sheet [published]: a password change ends the other sessions.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { OrganizationSchema } from "../../server/db/entities/organization.entity";
import { PasswordTokenSchema } from "../../server/db/entities/password-token.entity";
import { UserSchema } from "../../server/db/entities/user.entity";
import { buildUser } from "../factories";
import { anonymousClient, createTestApp, signIn, type TestApp } from "../support/app";
import { lastMail as caughtMail, signupBody } from "../support/account";

const lastMail = (address: string, topic?: string) => caughtMail(t.orm, address, topic);

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp({ ACCOUNT_REQUESTS_PER_IP_PER_HOUR: "1000" });
});
afterAll(() => t.close());

describe("sign-up", () => {
  it("answers 202 check_your_email, mails a link, and opens the account only once confirmed", async () => {
    const client = await anonymousClient(t.app);
    const body = signupBody();
    const res = await client.post("/api/signup", body);
    expect([res.status, res.body]).toEqual([202, { status: "check_your_email" }]);

    const { mail, token } = await lastMail(body.user.email, "account.confirm_signup");
    expect(mail?.textBody).toContain(body.organization.name);
    expect(mail?.textBody).toContain("expires in 24 hours");
    expect(token).toBeTruthy();
    // Only the token's SHA-256 is stored (OWASP: hash tokens at rest).
    const stored = await em().find(PasswordTokenSchema, { purpose: "confirm_email" });
    expect(stored.some((row) => row.tokenHash === token)).toBe(false);

    // Not confirmed yet: signing in gives the one generic refusal.
    const early = await client.post("/api/auth/login", { email: body.user.email, password: body.user.password });
    expect(early.status).toBe(401);

    const confirmed = await client.post("/api/signup/confirm", { token });
    expect(confirmed.status, JSON.stringify(confirmed.body)).toBe(200);
    expect(confirmed.body.user.email).toBe(body.user.email);
    expect(confirmed.body.user.role).toBe("manager");
    expect(confirmed.body.user.organization.name).toBe(body.organization.name);
    expect(confirmed.body.abilities.draftTransfers).toBe(true);
    const me = await client.get("/api/auth/me");
    expect([me.status, me.body.user.email]).toEqual([200, body.user.email]);
    const org = await em().findOneOrFail(OrganizationSchema, { name: body.organization.name });
    expect([org.kind, org.city, org.state, org.zip, org.pending, org.listed]).toEqual([
      "nature_centre",
      "Bend",
      "OR",
      "97701",
      false,
      false,
    ]);

    // Single use: the same link again is refused with words, and changes nothing.
    const again = await (await anonymousClient(t.app)).post("/api/signup/confirm", { token });
    expect([again.status, again.body.error.code, again.body.error.field]).toEqual([400, "invalid_token", "token"]);
    expect(again.body.error.message).toMatch(/expired or was already used/);
    // And the person signs in with their password.
    expect((await signIn(t.app, body.user.email, body.user.password)).csrf).toBeTruthy();
  });

  it("a courier service signs up the same way; its first person manages it", async () => {
    const client = await anonymousClient(t.app);
    const body = signupBody({ kind: "courier_service", name: "Kestrel Line Couriers" });
    expect((await client.post("/api/signup", body)).status).toBe(202);
    const { token } = await lastMail(body.user.email, "account.confirm_signup");
    const confirmed = await client.post("/api/signup/confirm", { token });
    expect(confirmed.status).toBe(200);
    expect(confirmed.body.user.role).toBe("manager");
    expect(confirmed.body.user.organization.kind).toBe("courier_service");
    expect(confirmed.body.abilities.draftTransfers).toBe(false);
  });

  it("gives a taken address the same answer, makes nothing, and tells the address someone tried", async () => {
    const owner = await buildUser(em(), { email: "taken@keepers.example" });
    const before = await em().count(OrganizationSchema, {});
    const body = signupBody({ email: "Taken@Keepers.example" });
    const res = await (await anonymousClient(t.app)).post("/api/signup", body);
    expect([res.status, res.body]).toEqual([202, { status: "check_your_email" }]);
    expect(await em().count(OrganizationSchema, {})).toBe(before);
    expect(await em().count(UserSchema, { emailKey: "taken@keepers.example" })).toBe(1);
    const { mail, token } = await lastMail(owner.email, "account.signup_taken");
    expect(mail?.subject).toMatch(/tried to sign up/);
    expect(token).toBeNull();
  });

  it("refuses forged, expired and malformed input with a clear message, changing nothing", async () => {
    const client = await anonymousClient(t.app);
    const forged = await client.post("/api/signup/confirm", { token: "x".repeat(43) });
    expect([forged.status, forged.body.error.code]).toEqual([400, "invalid_token"]);

    const body = signupBody();
    await client.post("/api/signup", body);
    const { token } = await lastMail(body.user.email, "account.confirm_signup");
    // Make the link older than a day.
    await em().nativeUpdate(
      PasswordTokenSchema,
      { purpose: "confirm_email" },
      { expiresAt: new Date(Date.now() - 1000) },
    );
    const expired = await client.post("/api/signup/confirm", { token });
    expect([expired.status, expired.body.error.code]).toEqual([400, "invalid_token"]);
    const user = await em().findOneOrFail(UserSchema, { email: body.user.email });
    expect(user.awaitingConfirmation).toBe(true);

    const before = await em().count(OrganizationSchema, {});
    const bad = signupBody();
    bad.organization.state = "ZZ";
    bad.user.password = "short";
    const refused = await client.post("/api/signup", bad);
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).not.toMatch(/Too small|Invalid/);
    expect(await em().count(OrganizationSchema, {})).toBe(before);
    const extra = await client.post("/api/signup", { ...signupBody(), role: "admin" });
    expect(extra.status).toBe(400);
  });
});

describe("forgotten password", () => {
  it("answers 202 for known and unknown addresses alike, mails only the known one, and the link ends other sessions", async () => {
    const user = await buildUser(em(), { email: "forgetful@keepers.example" });
    const elsewhere = await signIn(t.app, user.email);
    expect((await elsewhere.get("/api/auth/me")).status).toBe(200);

    const client = await anonymousClient(t.app);
    const known = await client.post("/api/auth/password-reset", { email: user.email });
    const unknown = await client.post("/api/auth/password-reset", { email: "nobody@keepers.example" });
    expect([known.status, known.body]).toEqual([202, { status: "check_your_email" }]);
    expect([unknown.status, unknown.body]).toEqual([known.status, known.body]);
    expect((await lastMail("nobody@keepers.example")).count).toBe(0);

    const { mail, token } = await lastMail(user.email, "account.password_reset");
    expect(mail?.textBody).toContain("/reset-password?token=");
    const set = await client.post("/api/auth/password", { token, password: "a brand new secret" });
    expect(set.status, JSON.stringify(set.body)).toBe(204);

    // Every other session of the account is over; the old password no longer works; the new one does.
    expect((await elsewhere.get("/api/auth/me")).status).toBe(401);
    const old = await (
      await anonymousClient(t.app)
    ).post("/api/auth/login", { email: user.email, password: "hatchway-demo" });
    expect(old.status).toBe(401);
    expect((await signIn(t.app, user.email, "a brand new secret")).csrf).toBeTruthy();
    // Single use.
    const again = await client.post("/api/auth/password", { token, password: "yet another secret" });
    expect([again.status, again.body.error.code]).toEqual([400, "invalid_token"]);
  });

  it("does not let a sign-up confirmation link set a password", async () => {
    const client = await anonymousClient(t.app);
    const body = signupBody();
    await client.post("/api/signup", body);
    const { token } = await lastMail(body.user.email, "account.confirm_signup");
    const res = await client.post("/api/auth/password", { token, password: "a brand new secret" });
    expect([res.status, res.body.error.code]).toEqual([400, "invalid_token"]);
  });
});

describe("rate limits on sign-up, confirmation and reset", () => {
  it("limits per e-mail address and per network address, with Retry-After", async () => {
    const limited = await createTestApp({
      ACCOUNT_REQUESTS_PER_ADDRESS_PER_HOUR: "2",
      ACCOUNT_REQUESTS_PER_IP_PER_HOUR: "4",
    });
    try {
      // The counts of the requests above (same database, same loopback address) start over.
      await limited.ctx.pool.query("DELETE FROM auth_throttle");
      const client = await anonymousClient(limited.app);
      const body = signupBody();
      expect((await client.post("/api/signup", body)).status).toBe(202);
      expect((await client.post("/api/signup", body)).status).toBe(202);
      const third = await client.post("/api/signup", body);
      expect(third.status).toBe(429);
      expect(Number(third.headers["retry-after"])).toBeGreaterThan(0);
      expect(third.body.error.message).toMatch(/e-mail address/);

      // Every request from the address counts, the refused one too: the fourth is the last allowed.
      expect((await client.post("/api/signup", signupBody())).status).toBe(202);
      const fromNetwork = await client.post("/api/signup", signupBody());
      expect([fromNetwork.status, fromNetwork.body.error.code]).toEqual([429, "too_many_attempts"]);
      expect(fromNetwork.body.error.message).toMatch(/network/);

      for (let i = 0; i < 2; i++)
        expect((await client.post("/api/auth/password-reset", { email: "someone@keepers.example" })).status).toBe(202);
      expect((await client.post("/api/auth/password-reset", { email: "someone@keepers.example" })).status).toBe(429);
      for (let i = 0; i < 4; i++) await client.post("/api/signup/confirm", { token: "y".repeat(43) });
      expect((await client.post("/api/signup/confirm", { token: "y".repeat(43) })).status).toBe(429);
    } finally {
      await limited.close();
    }
  });
});
