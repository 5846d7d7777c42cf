/**
 * Issue 14, §2: the account page. The name, a password change that asks for the current one and
 * ends the other sessions (OWASP Session Management Cheat Sheet, "renew … after a password
 * change" [published]), and e-mail choices that never turn off a safety alert.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { OutboxMessageSchema } from "../../server/db/entities/outbox-message.entity";
import { buildTransfer, buildUser } from "../factories";
import { anonymousClient, createTestApp, signIn, type TestApp } from "../support/app";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("the account page", () => {
  it("changes the name and the password (asking for the current one), ending other sessions", async () => {
    const user = await buildUser(em());
    const here = await signIn(t.app, user.email);
    const there = await signIn(t.app, user.email);
    const renamed = await here.patch("/api/account", { displayName: "Marguerite Oake" });
    expect([renamed.status, renamed.body.account.displayName]).toEqual([200, "Marguerite Oake"]);

    const wrong = await here.post("/api/account/password", {
      currentPassword: "not it",
      newPassword: "a new long secret",
    });
    expect([wrong.status, wrong.body.error.field]).toEqual([400, "currentPassword"]);
    const short = await here.post("/api/account/password", { currentPassword: "hatchway-demo", newPassword: "short" });
    expect([short.status, short.body.error.field]).toEqual([400, "newPassword"]);
    const ok = await here.post("/api/account/password", {
      currentPassword: "hatchway-demo",
      newPassword: "a new long secret",
    });
    expect(ok.status).toBe(204);
    expect((await here.get("/api/auth/me")).status).toBe(200);
    expect((await there.get("/api/auth/me")).status).toBe(401);
    const old = await (
      await anonymousClient(t.app)
    ).post("/api/auth/login", { email: user.email, password: "hatchway-demo" });
    expect(old.status).toBe(401);
  });

  it("turns off the steps of transfers, but never an alert", async () => {
    const cast = await buildTransfer(em(), { status: "draft" });
    const receiver = await signIn(t.app, cast.receiver.email);
    const off = await receiver.patch("/api/account", { mail: { transfer_steps: false } });
    expect(off.body.account.mail).toEqual({ transfer_steps: false, document_expiry: true, leg_assignments: true });
    const refused = await receiver.patch("/api/account", { mail: { alerts: false } });
    expect(refused.status).toBe(400);

    const sender = await signIn(t.app, cast.sender.email);
    expect(
      (await sender.post(`/api/transfers/${cast.transfer.id}/transition`, { to: "awaiting_receiver" })).status,
    ).toBe(200);
    const steps = await em().count(OutboxMessageSchema, {
      toAddress: cast.receiver.email,
      topic: "transfer.awaiting_confirmation",
    });
    expect(steps).toBe(0);
    // Turned back on, the next step is mailed again.
    await receiver.patch("/api/account", { mail: { transfer_steps: true } });
    await sender.post(`/api/transfers/${cast.transfer.id}/transition`, { to: "draft" });
    await sender.post(`/api/transfers/${cast.transfer.id}/transition`, { to: "awaiting_receiver" });
    expect(
      await em().count(OutboxMessageSchema, {
        toAddress: cast.receiver.email,
        topic: "transfer.awaiting_confirmation",
      }),
    ).toBe(1);
  });
});
