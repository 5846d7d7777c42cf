/**
 * Issue 14, §3: a sender asks a courier service to carry a transfer; the service's manager
 * assigns its own couriers to the legs; each courier is e-mailed when a leg is assigned or
 * taken away. Chain of custody: the custody log records who assigned whom [practice].
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { OutboxMessageSchema } from "../../server/db/entities/outbox-message.entity";
import { buildOrganization, buildTransfer, buildUser } from "../factories";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const put = (client: Client, path: string, body: unknown) =>
  client.agent
    .put(path)
    .set("X-CSRF-Token", client.csrf)
    .send(body as object);

describe("a courier service carries a transfer", () => {
  it("is chosen by the sender; its manager assigns its couriers, who are told by e-mail", async () => {
    const service = await buildOrganization(em(), {
      kind: "courier_service",
      name: "Nightjar Test Couriers",
      listed: true,
    });
    const manager = await buildUser(em(), { role: "manager", organization: service });
    const first = await buildUser(em(), { role: "courier", organization: service });
    const second = await buildUser(em(), { role: "courier", organization: service });
    const outsider = await buildUser(em(), { role: "courier" });
    const cast = await buildTransfer(em(), { status: "awaiting_receiver", couriers: [] });
    const base = `/api/transfers/${cast.transfer.id}`;
    const sender = await signIn(t.app, cast.sender.email);
    const boss = await signIn(t.app, manager.email);

    // Before it is chosen the service's manager does not see the transfer.
    expect((await boss.get(base)).status).toBe(404);
    const receiver = await signIn(t.app, cast.receiver.email);
    expect((await put(receiver, `${base}/courier-service`, { organizationId: service.id })).status).toBe(403);
    const chosen = await put(sender, `${base}/courier-service`, { organizationId: service.id });
    expect(chosen.status, JSON.stringify(chosen.body)).toBe(200);
    expect((await boss.get(base)).status).toBe(200);
    const list = await boss.get("/api/transfers");
    expect(list.body.transfers.map((x: { id: string }) => x.id)).toContain(cast.transfer.id);

    // The directory gives the manager its own couriers only.
    const directory = await boss.get("/api/directory/couriers");
    expect(directory.status).toBe(200);
    expect(directory.body.couriers.map((c: { id: string }) => c.id).sort()).toEqual([first.id, second.id].sort());
    // Only its own couriers.
    const foreign = await put(boss, `${base}/legs`, { legs: [{ courierId: outsider.id }] });
    expect(foreign.status).toBe(400);
    const assigned = await put(boss, `${base}/legs`, { legs: [{ courierId: first.id }, { courierId: second.id }] });
    expect(assigned.status, JSON.stringify(assigned.body)).toBe(200);
    for (const courier of [first, second]) {
      const mails = await em().find(OutboxMessageSchema, { toAddress: courier.email, topic: "courier.leg_assigned" });
      expect(mails).toHaveLength(1);
      expect(mails[0]!.textBody).toContain(cast.transfer.number);
    }
    // Taking the second courier off tells them.
    expect((await put(boss, `${base}/legs`, { legs: [{ courierId: first.id }] })).status).toBe(200);
    expect(await em().count(OutboxMessageSchema, { toAddress: second.email, topic: "courier.leg_removed" })).toBe(1);
    expect(await em().count(OutboxMessageSchema, { toAddress: first.email, topic: "courier.leg_assigned" })).toBe(1);
    // The assigned courier sees the transfer; the removed one no longer does.
    expect((await (await signIn(t.app, first.email)).get(base)).status).toBe(200);
    expect((await (await signIn(t.app, second.email)).get(base)).status).toBe(404);
  });

  it("refuses a courier service that is neither listed nor invited by the sender, and a keeper organisation", async () => {
    const hidden = await buildOrganization(em(), { kind: "courier_service" });
    const keeper = await buildOrganization(em(), { kind: "zoo", listed: true });
    const cast = await buildTransfer(em(), { status: "draft", couriers: [] });
    const sender = await signIn(t.app, cast.sender.email);
    for (const organizationId of [hidden.id, keeper.id]) {
      const res = await put(sender, `/api/transfers/${cast.transfer.id}/courier-service`, { organizationId });
      expect([res.status, res.body.error.field]).toEqual([400, "organizationId"]);
    }
  });

  it("shows the sender the services it may ask, and the chosen one on the transfer, without every courier on Hatchway", async () => {
    const listed = await buildOrganization(em(), {
      kind: "courier_service",
      name: "Listed Lane Couriers",
      listed: true,
    });
    const hidden = await buildOrganization(em(), { kind: "courier_service", name: "Hidden Hollow Couriers" });
    const listedDriver = await buildUser(em(), { role: "courier", organization: listed });
    const hiddenDriver = await buildUser(em(), { role: "courier", organization: hidden });
    const cast = await buildTransfer(em(), { status: "draft", couriers: [] });
    const sender = await signIn(t.app, cast.sender.email);

    const services = await sender.get("/api/directory/courier-services");
    expect(services.status).toBe(200);
    const names = services.body.courierServices.map((s: { name: string }) => s.name);
    expect(names).toContain("Listed Lane Couriers");
    expect(names).not.toContain("Hidden Hollow Couriers");
    // Name, city and state only: no address, phone or e-mail of a service merely listed.
    expect(Object.keys(services.body.courierServices[0]).sort()).toEqual(
      ["city", "id", "listed", "name", "pending", "state"].sort(),
    );
    const couriers = (await sender.get("/api/directory/couriers")).body.couriers.map((c: { id: string }) => c.id);
    expect(couriers).toContain(listedDriver.id);
    expect(couriers).not.toContain(hiddenDriver.id);

    // Invited by the sender: it appears for the sender as pending, and can be chosen at once.
    const invited = await sender.agent.post("/api/organizations/invitations").set("X-CSRF-Token", sender.csrf).send({
      organizationName: "Invited Ridge Couriers",
      kind: "courier_service",
      email: "ridge@example.test",
      state: "KY",
    });
    expect(invited.status, JSON.stringify(invited.body)).toBe(201);
    const after = (await sender.get("/api/directory/courier-services")).body.courierServices;
    expect(after.find((s: { id: string }) => s.id === invited.body.organization.id)).toMatchObject({ pending: true });
    const chosen = await put(sender, `/api/transfers/${cast.transfer.id}/courier-service`, {
      organizationId: invited.body.organization.id,
    });
    expect(chosen.status).toBe(200);
    expect(chosen.body.transfer.courierService).toMatchObject({
      id: invited.body.organization.id,
      name: "Invited Ridge Couriers",
      pending: true,
    });
    // Another keeper does not see the services this sender invited.
    const stranger = await buildUser(em(), { role: "manager" });
    const theirs = (await (await signIn(t.app, stranger.email)).get("/api/directory/courier-services")).body;
    expect(theirs.courierServices.map((s: { id: string }) => s.id)).not.toContain(invited.body.organization.id);
    // Taking the request back.
    const none = await put(sender, `/api/transfers/${cast.transfer.id}/courier-service`, { organizationId: null });
    expect(none.body.transfer.courierService).toBeNull();
  });
});
