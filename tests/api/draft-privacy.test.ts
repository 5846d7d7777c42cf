/**
 * Issue 14, §4: a transfer in draft is the sender's until it is sent. The receiver and any
 * courier get 404 — the same answer as for a transfer that does not exist — for the record, its
 * PDFs, its custody view and export, its edit history, its messages, its compliance and
 * temperature views, and do not find it in their lists. A transfer sent back for changes stays
 * visible to the receiver. SECURITY.md, "Access": "Deny is 403, or 404 where existence must not
 * leak"; OWASP ASVS 5.0 V8.2 (object-level authorization) [memory].
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { buildTransfer, buildUser, type TransferCast } from "../factories";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";

let t: TestApp;
let admin: Client;
beforeAll(async () => {
  t = await createTestApp();
  admin = await signIn(t.app, (await buildUser(t.orm.em.fork(), { role: "admin", organization: null })).email);
});
afterAll(() => t.close());

type Party = { sender: Client; receiver: Client; courier: Client };

/** A draft with a courier already on its leg (the sender may assign couriers to a draft). */
async function draftWithCourier(): Promise<TransferCast & { as: Party }> {
  const built = await buildTransfer(t.orm.em.fork(), { status: "draft", legs: 1 });
  const as: Party = {
    sender: await signIn(t.app, built.sender.email),
    receiver: await signIn(t.app, built.receiver.email),
    courier: await signIn(t.app, built.couriers[0]!.email),
  };
  const legs = await as.sender.agent
    .put(`/api/transfers/${built.transfer.id}/legs`)
    .set("X-CSRF-Token", as.sender.csrf)
    .send({ legs: [{ courierId: built.couriers[0]!.id }] });
  expect(legs.status, JSON.stringify(legs.body)).toBe(200);
  return { ...built, as };
}

const READS = [
  "",
  "/manifest.pdf",
  "/labels.pdf",
  "/custody",
  "/custody/export",
  "/changes",
  "/messages",
  "/compliance",
  "/temperature",
] as const;

async function listedIds(client: Client, query = ""): Promise<string[]> {
  const res = await client.get(`/api/transfers${query}`);
  expect(res.status).toBe(200);
  return (res.body.transfers as { id: string }[]).map((x) => x.id);
}

describe("a draft is the sender's until it is sent", () => {
  it("answers 404 to the receiver and the courier on every route of an unsent draft, and lists it for nobody else", async () => {
    const c = await draftWithCourier();
    const base = `/api/transfers/${c.transfer.id}`;
    for (const who of ["receiver", "courier"] as const) {
      for (const path of READS) {
        const res = await c.as[who].get(`${base}${path}`);
        expect([res.status, res.body?.error?.code], `${who} GET ${path || "/"}`).toEqual([404, "not_found"]);
      }
      const wrote = await c.as[who].post(`${base}/messages`, { body: "Is this coming to us?" });
      expect(wrote.status, `${who} POST messages`).toBe(404);
      const moved = await c.as[who].post(`${base}/transition`, { to: "ready" });
      expect(moved.status, `${who} transition`).toBe(404);
      expect(await listedIds(c.as[who])).not.toContain(c.transfer.id);
    }
    expect(await listedIds(c.as.receiver, "?role=receiving")).not.toContain(c.transfer.id);
    // The sender and the site admin still see it everywhere.
    for (const path of READS) {
      expect((await c.as.sender.get(`${base}${path}`)).status, `sender GET ${path || "/"}`).toBe(200);
    }
    expect((await admin.get(base)).status).toBe(200);
    expect(await listedIds(c.as.sender)).toContain(c.transfer.id);
    expect(await listedIds(admin)).toContain(c.transfer.id);
  });

  it("shows the transfer to the receiver and the courier once sent, and keeps it shown when sent back", async () => {
    const c = await draftWithCourier();
    const base = `/api/transfers/${c.transfer.id}`;
    const sent = await c.as.sender.post(`${base}/transition`, { to: "awaiting_receiver" });
    expect(sent.status, JSON.stringify(sent.body)).toBe(200);
    for (const who of ["receiver", "courier"] as const) {
      expect((await c.as[who].get(base)).status, who).toBe(200);
      expect(await listedIds(c.as[who])).toContain(c.transfer.id);
    }
    const back = await c.as.receiver.post(`${base}/transition`, { to: "draft", reason: "Please add the CVI." });
    expect(back.status, JSON.stringify(back.body)).toBe(200);
    expect(back.body.transfer.status).toBe("draft");
    for (const who of ["receiver", "courier"] as const) {
      expect((await c.as[who].get(base)).status, `${who} after sent back`).toBe(200);
      expect((await c.as[who].get(`${base}/custody`)).status).toBe(200);
      expect(await listedIds(c.as[who])).toContain(c.transfer.id);
    }
    expect((await c.as.receiver.get(`${base}/messages`)).status).toBe(200);
  });

  it("keeps a draft cancelled before it was ever sent from the receiver", async () => {
    const c = await draftWithCourier();
    const base = `/api/transfers/${c.transfer.id}`;
    const cancelled = await c.as.sender.post(`${base}/transition`, { to: "cancelled", reason: "Plans changed." });
    expect(cancelled.status).toBe(200);
    expect((await c.as.receiver.get(base)).status).toBe(404);
    expect((await c.as.courier.get(base)).status).toBe(404);
    expect(await listedIds(c.as.receiver)).not.toContain(c.transfer.id);
  });
});
