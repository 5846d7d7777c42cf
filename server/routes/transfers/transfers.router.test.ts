import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { createTestApp, signIn, withDatabaseAs, type Client, type TestApp } from "../../../tests/support/app";
import {
  buildOrganization,
  buildTransfer,
  buildUser,
  transferInput,
  type TransferCast,
} from "../../../tests/factories";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

type TransferView = {
  containers: { id: string; sealNumber: string | null }[];
  sender: { organization: { name: string } };
  receiver: { organization: { name: string } };
  legs: { courier: { displayName: string } }[];
  origin: { lat: number | null; lon: number | null };
};

/** A handoff as planned: the people assigned, at the origin's position (the test's handoffs come seconds apart). */
function handoffBody(transfer: TransferView, index: number, over: Record<string, unknown> = {}) {
  const names = [
    transfer.sender.organization.name,
    ...transfer.legs.map((l) => l.courier.displayName),
    transfer.receiver.organization.name,
  ];
  return {
    handoffIndex: index,
    boxesCounted: transfer.containers.length,
    seals: transfer.containers.map((c) => ({ containerId: c.id, sealNumber: c.sealNumber, intact: true })),
    boxTempF: 71.5,
    place: { text: "Depot dock 3", lat: transfer.origin.lat, lon: transfer.origin.lon },
    releasedByName: names[index],
    receivedByName: names[index + 1],
    acknowledged: true,
    ...over,
  };
}

describe("drafting", () => {
  it("the sender drafts a transfer with boxes and animals; geography is filled from the ZIP", async () => {
    const sender = await buildUser(em());
    const receiverOrg = await buildOrganization(em(), { kind: "zoo", state: "OR", zip: "97401" });
    const client = await signIn(t.app, sender.email);
    const input = await transferInput(em(), receiverOrg.id, {
      animals: [
        { taxon: "Pantherophis guttatus", count: 3, sex: "female", box: "A" },
        { taxon: "Terrapene carolina", count: 1, box: "B", lengthMm: 120 },
      ],
    });
    const res = await client.post("/api/transfers", input);
    expect(res.status).toBe(201);
    const tr = res.body.transfer;
    expect(tr.number).toMatch(/^HW-\d{2}-[0-9A-Z]{5}$/);
    expect(tr.status).toBe("draft");
    expect(tr.viewerRole).toBe("sender");
    expect(tr.containers).toHaveLength(2);
    expect(tr.animals.map((a: { taxon: { scientificName: string } }) => a.taxon.scientificName)).toEqual([
      "Pantherophis guttatus",
      "Terrapene carolina",
    ]);
    expect(tr.animals[0].containerId).toBe(tr.containers[0].id);
    // zipcodes package: 37917 is Knoxville, TN; tz-lookup puts it in America/New_York [published data].
    expect(tr.origin).toMatchObject({ city: "Knoxville", state: "TN", timeZone: "America/New_York" });
    expect(tr.origin.lat).toBeCloseTo(36.0, 0);
    expect(tr.destination.timeZone).toBe("America/Los_Angeles");
    expect(tr.packingFindings).toEqual([]);
    expect(tr.abilities).toMatchObject({ edit: true, submit: true, confirm: false });
  });

  it("a ZIP in another state than the one given is refused", async () => {
    const sender = await buildUser(em());
    const receiverOrg = await buildOrganization(em());
    const client = await signIn(t.app, sender.email);
    const input = await transferInput(em(), receiverOrg.id);
    const res = await client.post("/api/transfers", { ...input, destination: { ...input.destination, state: "WA" } });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe("destination.zip");
  });

  it("two species in one box is a finding that blocks sending it for confirmation", async () => {
    const cast = await buildTransfer(em(), {
      animals: [
        { taxon: "Pantherophis guttatus", box: "A" },
        { taxon: "Lampropeltis triangulum", box: "A" },
      ],
    });
    const client = await signIn(t.app, cast.sender.email);
    const view = await client.get(`/api/transfers/${cast.transfer.id}`);
    expect(view.body.transfer.packingFindings[0]).toMatchObject({ code: "mixed_species" });
    const submit = await client.post(`/api/transfers/${cast.transfer.id}/transition`, { to: "awaiting_receiver" });
    expect(submit.status).toBe(409);
    expect(submit.body.error.message).toMatch(/Rp\/3 1\.41/);
  });
});

describe("bad input is a 400 that changes nothing", () => {
  let client: Client;
  let base: Awaited<ReturnType<typeof transferInput>>;
  beforeAll(async () => {
    const sender = await buildUser(em());
    const receiverOrg = await buildOrganization(em());
    client = await signIn(t.app, sender.email);
    base = await transferInput(em(), receiverOrg.id);
  });
  const withAnimal = (patch: Record<string, unknown>) => ({ ...base, animals: [{ ...base.animals[0]!, ...patch }] });

  it.each([0, -1, 1.5, "1e309", "3", null])("count %s", async (count) => {
    const before = (await client.get("/api/transfers")).body.transfers.length;
    // 1e309 overflows to Infinity when parsed: send it as raw JSON text.
    const res =
      count === "1e309"
        ? await client.agent
            .post("/api/transfers")
            .set("X-CSRF-Token", client.csrf)
            .set("Content-Type", "application/json")
            .send(JSON.stringify(withAnimal({ count: 7 })).replace('"count":7', '"count":1e309'))
        : await client.post("/api/transfers", withAnimal({ count }));
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe("animals.0.count");
    expect((await client.get("/api/transfers")).body.transfers.length).toBe(before);
  });

  it("a NUL in a note", async () => {
    const res = await client.post("/api/transfers", { ...base, handlingNotes: "keep\u0000warm" });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe("handlingNotes");
  });

  it.each([
    ["arrival before departure", { expectedArrivalAt: "2020-01-01T00:00:00Z" }, "expectedArrivalAt"],
    [
      "a departure in the past",
      { plannedDepartureAt: "2021-03-01T09:00:00-05:00", expectedArrivalAt: "2021-03-02T09:00:00-05:00" },
      "plannedDepartureAt",
    ],
    ["an impossible date", { plannedDepartureAt: "2027-02-30T09:00:00Z" }, "plannedDepartureAt"],
    ["a date without an offset", { plannedDepartureAt: "2027-03-01T09:00:00" }, "plannedDepartureAt"],
  ])("%s", async (_name, patch, field) => {
    const res = await client.post("/api/transfers", { ...base, ...patch });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe(field);
  });

  it.each([
    ["a negative length", { lengthMm: -5 }, "animals.0.lengthMm"],
    ["an absurd weight", { weightG: 5_000_000 }, "animals.0.weightG"],
    ["an impossible hatch date", { hatchDate: "2026-13-01" }, "animals.0.hatchDate"],
    ["a box that does not exist", { containerKey: "Z" }, "animals.0.containerKey"],
  ])("%s", async (_name, patch, field) => {
    const res = await client.post("/api/transfers", withAnimal(patch));
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe(field);
  });
});

describe("life cycle through the API", () => {
  it("draft → awaiting → ready → (pickup) in transit → (delivery) delivered → checked in → closed", async () => {
    const cast = await buildTransfer(em(), { status: "draft", daysAhead: 0.5 });
    const s = await signIn(t.app, cast.sender.email);
    const r = await signIn(t.app, cast.receiver.email);
    const id = cast.transfer.id;
    // The receiver does not see a draft never sent at all (issue 14, §4).
    expect((await r.post(`/api/transfers/${id}/transition`, { to: "ready" })).status).toBe(404);
    // The sender never confirms: refused before the state is looked at, in this state as in the next.
    expect((await s.post(`/api/transfers/${id}/transition`, { to: "ready" })).status).toBe(403);
    expect((await s.post(`/api/transfers/${id}/transition`, { to: "awaiting_receiver" })).body.transfer.status).toBe(
      "awaiting_receiver",
    );
    expect((await s.post(`/api/transfers/${id}/transition`, { to: "ready" })).status).toBe(403); // the sender cannot confirm
    // No weather service in this test: the receiver confirms past "forecast unavailable" with a reason.
    expect((await r.post(`/api/transfers/${id}/transition`, { to: "ready" })).status).toBe(409);
    expect(
      (
        await r.post(`/api/transfers/${id}/transition`, {
          to: "ready",
          override: true,
          reason: "Checked the forecast by phone",
        })
      ).body.transfer.status,
    ).toBe("ready");
    expect((await r.post(`/api/transfers/${id}/transition`, { to: "in_transit" })).status).toBe(409); // only a pickup does that
    const legs = await s.agent
      .put(`/api/transfers/${id}/legs`)
      .set("X-CSRF-Token", s.csrf)
      .send({ legs: [{ courierId: cast.couriers[0]!.id }] });
    expect(legs.status).toBe(200);
    const c = await signIn(t.app, cast.couriers[0]!.email);
    const tr = legs.body.transfer;
    const pickup = await c
      .post(`/api/transfers/${id}/handoffs`, handoffBody(tr, 0))
      .set("Idempotency-Key", randomUUID());
    expect(pickup.status).toBe(201);
    expect(pickup.body.transfer.status).toBe("in_transit");
    const delivery = await r
      .post(`/api/transfers/${id}/handoffs`, handoffBody(tr, 1))
      .set("Idempotency-Key", randomUUID());
    expect(delivery.body.transfer.status).toBe("delivered");
    const animals = delivery.body.transfer.animals;
    const checkIn = await r
      .post(`/api/transfers/${id}/check-in`, {
        items: animals.map((a: { id: string; count: number }) => ({
          animalId: a.id,
          arrivedWell: a.count,
          arrivedProblem: 0,
          deadOnArrival: 0,
          missing: 0,
        })),
        extras: [],
        signedName: "Receiver",
        acknowledged: true,
      })
      .set("Idempotency-Key", randomUUID());
    expect(checkIn.status).toBe(201);
    expect(checkIn.body.transfer.status).toBe("checked_in");
    expect(checkIn.body.transfer.checkIn.allAccountedFor).toBe(true);
    expect((await r.post(`/api/transfers/${id}/transition`, { to: "closed" })).body.transfer.status).toBe("closed");
    const log = await r.get(`/api/transfers/${id}/custody`);
    expect(log.body.intact).toBe(true);
    // The other party hears of each step that needs them, through the outbox.
    const mail = await t.ctx.pool.query<{ topic: string; to_address: string }>(
      "SELECT topic, to_address FROM outbox_message WHERE subject LIKE $1 ORDER BY created_at",
      [`%${cast.transfer.number}%`],
    );
    expect(mail.rows.map((m) => m.topic)).toEqual([
      "transfer.awaiting_confirmation",
      "transfer.confirmed",
      // The courier given the leg is told (issue 14, §3).
      "courier.leg_assigned",
      "transfer.picked_up",
      "transfer.picked_up",
      "transfer.delivered",
      "transfer.checked_in",
    ]);
    expect(mail.rows[0]!.to_address).toBe(cast.receiver.email);
    expect(mail.rows[1]!.to_address).toBe(cast.sender.email);
    // Two overrides with the one reason: the unverified rules check (no state on the route reviewed, D27), then the temperature.
    expect(log.body.entries.map((e: { kind: string }) => e.kind)).toEqual([
      "created",
      "status_change",
      "override",
      "override",
      "status_change",
      "couriers_assigned",
      "handoff",
      "status_change",
      "handoff",
      "status_change",
      "check_in",
      "status_change",
      "status_change",
    ]);
  });

  it("cancelling needs a reason and is refused once the animals left", async () => {
    const draft = await buildTransfer(em(), { status: "awaiting_receiver" });
    const s = await signIn(t.app, draft.sender.email);
    expect((await s.post(`/api/transfers/${draft.transfer.id}/transition`, { to: "cancelled" })).status).toBe(400);
    expect(
      (await s.post(`/api/transfers/${draft.transfer.id}/transition`, { to: "cancelled", reason: "Weather" })).body
        .transfer.status,
    ).toBe("cancelled");
    const moving = await buildTransfer(em(), { status: "in_transit" });
    const s2 = await signIn(t.app, moving.sender.email);
    expect(
      (await s2.post(`/api/transfers/${moving.transfer.id}/transition`, { to: "cancelled", reason: "Too late" }))
        .status,
    ).toBe(409);
  });

  it("an edit of the animals after confirmation sends it back to the receiver, and the edit is kept", async () => {
    const cast = await buildTransfer(em(), { status: "ready" });
    const s = await signIn(t.app, cast.sender.email);
    const before = (await s.get(`/api/transfers/${cast.transfer.id}`)).body.transfer;
    const animals = before.animals.map((a: Record<string, unknown> & { taxon: { id: string } }) => ({
      id: a.id,
      taxonId: a.taxon.id,
      count: 1,
      sex: a.sex,
      origin: a.origin,
      containerKey: a.containerKey,
    }));
    const containers = before.containers.map((c: Record<string, unknown>) => ({
      id: c.id,
      key: c.key,
      label: c.label,
      lengthMm: c.lengthMm,
      widthMm: c.widthMm,
      heightMm: c.heightMm,
      wallMaterial: c.wallMaterial,
      wallThicknessMm: c.wallThicknessMm,
      pack: c.pack,
      sealNumber: c.sealNumber,
    }));
    const res = await s.patch(`/api/transfers/${cast.transfer.id}`, { version: before.version, animals, containers });
    expect(res.status).toBe(200);
    expect(res.body.transfer.status).toBe("awaiting_receiver");
    // Named in words (shared/words/fields.ts), never by the field's key.
    expect(res.body.transfer.reconfirmationReason).toMatch(
      /^Changed after confirmation: (.+, )?animal lines(, .+)?\.$/,
    );
    const stale = await s.patch(`/api/transfers/${cast.transfer.id}`, { version: before.version, handlingNotes: "x" });
    expect(stale.status).toBe(409);
    const changes = (await s.get(`/api/transfers/${cast.transfer.id}/changes`)).body.changes;
    expect(changes).toContainEqual(
      expect.objectContaining({ field: "animals[Pantherophis guttatus].count", oldValue: 2, newValue: 1 }),
    );
  });
});

describe("who sees and does what", () => {
  let cast: TransferCast;
  let clients: Record<string, Client>;
  beforeAll(async () => {
    cast = await buildTransfer(em(), { status: "ready" });
    const other = await buildUser(em());
    const strayCourier = await buildUser(em(), { role: "courier" });
    const admin = await buildUser(em(), { role: "admin", organization: null });
    clients = {
      sender: await signIn(t.app, cast.sender.email),
      receiver: await signIn(t.app, cast.receiver.email),
      courier: await signIn(t.app, cast.couriers[0]!.email),
      unassignedCourier: await signIn(t.app, strayCourier.email),
      otherOrganization: await signIn(t.app, other.email),
      admin: await signIn(t.app, admin.email),
    };
  });

  const READ = { sender: 200, receiver: 200, courier: 200, unassignedCourier: 404, otherOrganization: 404, admin: 200 };
  it.each(Object.entries(READ))("read: %s → %i", async (who, status) => {
    const res = await clients[who]!.get(`/api/transfers/${cast.transfer.id}`);
    expect(res.status).toBe(status);
    expect((await clients[who]!.get(`/api/transfers/${cast.transfer.id}/custody`)).status).toBe(status);
  });

  it("the courier's view has no price and no private notes", async () => {
    const res = await clients.courier!.get(`/api/transfers/${cast.transfer.id}`);
    expect(res.body.transfer.salePriceUsd).toBeNull();
    expect(res.body.transfer.privateNotes).toBeNull();
    expect(res.body.transfer.viewerRole).toBe("courier");
    expect((await clients.courier!.get(`/api/transfers/${cast.transfer.id}/messages`)).status).toBe(403);
  });

  const EDIT = { sender: 200, receiver: 403, courier: 403, unassignedCourier: 404, otherOrganization: 404, admin: 403 };
  it.each(Object.entries(EDIT))("edit: %s → %i", async (who, status) => {
    const current = (await clients.sender!.get(`/api/transfers/${cast.transfer.id}`)).body.transfer;
    const res = await clients[who]!.patch(`/api/transfers/${cast.transfer.id}`, {
      version: current.version,
      handlingNotes: `note by ${who}`,
    });
    expect(res.status).toBe(status);
  });

  const HANDOFF = {
    sender: 201,
    receiver: 403,
    courier: 201,
    unassignedCourier: 404,
    otherOrganization: 404,
    admin: 403,
  };
  it.each(Object.entries(HANDOFF))("hand off (pickup): %s → %i", async (who, status) => {
    const fresh = await buildTransfer(em(), {
      status: "ready",
      sender: cast.sender,
      receiver: cast.receiver,
      couriers: cast.couriers,
    });
    const view = (await clients.sender!.get(`/api/transfers/${fresh.transfer.id}`)).body.transfer;
    const res = await clients[who]!.post(`/api/transfers/${fresh.transfer.id}/handoffs`, handoffBody(view, 0)).set(
      "Idempotency-Key",
      randomUUID(),
    );
    expect(res.status).toBe(status);
  });

  const CHECK_IN = {
    sender: 403,
    receiver: 201,
    courier: 403,
    unassignedCourier: 404,
    otherOrganization: 404,
    admin: 403,
  };
  it.each(Object.entries(CHECK_IN))("check in: %s → %i", async (who, status) => {
    const fresh = await buildTransfer(em(), {
      status: "delivered",
      sender: cast.sender,
      receiver: cast.receiver,
      couriers: cast.couriers,
    });
    const view = (await clients.sender!.get(`/api/transfers/${fresh.transfer.id}`)).body.transfer;
    const body = {
      items: view.animals.map((a: { id: string; count: number }) => ({
        animalId: a.id,
        arrivedWell: a.count,
        arrivedProblem: 0,
        deadOnArrival: 0,
        missing: 0,
      })),
      extras: [],
      signedName: "X",
      acknowledged: true,
    };
    const res = await clients[who]!.post(`/api/transfers/${fresh.transfer.id}/check-in`, body).set(
      "Idempotency-Key",
      randomUUID(),
    );
    expect(res.status).toBe(status);
  });

  it("a courier taken off the transfer loses access on the next request", async () => {
    const fresh = await buildTransfer(em(), {
      status: "ready",
      sender: cast.sender,
      receiver: cast.receiver,
      couriers: cast.couriers,
    });
    expect((await clients.courier!.get(`/api/transfers/${fresh.transfer.id}`)).status).toBe(200);
    const other = await buildUser(em(), { role: "courier" });
    const res = await clients
      .sender!.agent.put(`/api/transfers/${fresh.transfer.id}/legs`)
      .set("X-CSRF-Token", clients.sender!.csrf)
      .send({ legs: [{ courierId: other.id }] });
    expect(res.status).toBe(200);
    expect((await clients.courier!.get(`/api/transfers/${fresh.transfer.id}`)).status).toBe(404);
  });

  it("lists show each caller only their own transfers", async () => {
    const mine = (await clients.otherOrganization!.get("/api/transfers")).body.transfers.map(
      (x: { id: string }) => x.id,
    );
    expect(mine).not.toContain(cast.transfer.id);
    const carried = (await clients.courier!.get("/api/transfers")).body.transfers.map((x: { id: string }) => x.id);
    expect(carried).toContain(cast.transfer.id);
    const stray = (await clients.unassignedCourier!.get("/api/transfers")).body.transfers;
    expect(stray).toEqual([]);
  });
});

describe("handoffs under pressure", () => {
  it("twenty simultaneous confirmations of one handoff: one success, one log entry", async () => {
    const cast = await buildTransfer(em(), { status: "ready" });
    const courier = await signIn(t.app, cast.couriers[0]!.email);
    const view = (await courier.get(`/api/transfers/${cast.transfer.id}`)).body.transfer;
    const answers = await Promise.all(
      Array.from({ length: 20 }, () =>
        courier
          .post(`/api/transfers/${cast.transfer.id}/handoffs`, handoffBody(view, 0))
          .set("Idempotency-Key", randomUUID()),
      ),
    );
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    const log = (await courier.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    expect(log.entries.filter((e: { kind: string }) => e.kind === "handoff")).toHaveLength(1);
    expect(log.intact).toBe(true);
  });

  it("the same key retried returns the stored answer; another body with that key is 422", async () => {
    const cast = await buildTransfer(em(), { status: "ready" });
    const courier = await signIn(t.app, cast.couriers[0]!.email);
    const view = (await courier.get(`/api/transfers/${cast.transfer.id}`)).body.transfer;
    const key = randomUUID();
    const answers = await Promise.all(
      Array.from({ length: 20 }, () =>
        courier.post(`/api/transfers/${cast.transfer.id}/handoffs`, handoffBody(view, 0)).set("Idempotency-Key", key),
      ),
    );
    expect(answers.filter((a) => a.status === 201).length).toBeGreaterThanOrEqual(1);
    expect(answers.every((a) => a.status === 201 || a.status === 409)).toBe(true);
    const replay = await courier
      .post(`/api/transfers/${cast.transfer.id}/handoffs`, handoffBody(view, 0))
      .set("Idempotency-Key", key);
    expect(replay.status).toBe(201);
    expect(replay.headers["idempotent-replayed"]).toBe("true");
    const other = await courier
      .post(`/api/transfers/${cast.transfer.id}/handoffs`, handoffBody(view, 0, { boxTempF: 60 }))
      .set("Idempotency-Key", key);
    expect(other.status).toBe(422);
    const log = (await courier.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    expect(log.entries.filter((e: { kind: string }) => e.kind === "handoff")).toHaveLength(1);
  });

  it("a handoff without an Idempotency-Key is 400", async () => {
    const cast = await buildTransfer(em(), { status: "ready" });
    const courier = await signIn(t.app, cast.couriers[0]!.email);
    const view = (await courier.get(`/api/transfers/${cast.transfer.id}`)).body.transfer;
    const res = await courier.post(`/api/transfers/${cast.transfer.id}/handoffs`, handoffBody(view, 0));
    expect(res.status).toBe(400);
  });

  it("a short box count and a broken seal are recorded as found", async () => {
    const cast = await buildTransfer(em(), {
      status: "ready",
      animals: [
        { taxon: "Pogona vitticeps", box: "A" },
        { taxon: "Pogona vitticeps", box: "B" },
      ],
    });
    const courier = await signIn(t.app, cast.couriers[0]!.email);
    const view = (await courier.get(`/api/transfers/${cast.transfer.id}`)).body.transfer;
    const body = handoffBody(view, 0, {
      boxesCounted: 1,
      seals: [{ containerId: view.containers[0].id, sealNumber: "WRONG-9", intact: false }],
    });
    const res = await courier
      .post(`/api/transfers/${cast.transfer.id}/handoffs`, body)
      .set("Idempotency-Key", randomUUID());
    expect(res.status).toBe(201);
    const h = res.body.transfer.handoffs[0];
    expect(h).toMatchObject({ boxesExpected: 2, boxesCounted: 1, kind: "pickup" });
    expect(h.seals[0]).toMatchObject({ sealNumber: "WRONG-9", expected: "SEAL-1", intact: false });
    const entry = (await courier.get(`/api/transfers/${cast.transfer.id}/custody`)).body.entries.find(
      (e: { kind: string }) => e.kind === "handoff",
    );
    expect(entry.payload).toMatchObject({ boxCountMatches: false, sealsUnchecked: [view.containers[1].id] });
    expect(entry.actor.id).toBe(cast.couriers[0]!.id);
  });
});

describe("the custody log in the database", () => {
  it("refuses UPDATE, DELETE and TRUNCATE, and a transfer with entries cannot be deleted", async () => {
    const cast = await buildTransfer(em(), { status: "awaiting_receiver" });
    // The app's role is refused by its privileges (D18); the table's owner by the triggers (D6).
    for (const [pool, refusal] of [
      [t.ctx.pool, /permission denied/],
      [null, /append-only/],
    ] as const) {
      const run = (sql: string, values: unknown[] = []) =>
        pool ? pool.query(sql, values) : withDatabaseAs("owner", (client) => client.query(sql, values));
      await expect(
        run("UPDATE custody_entry SET actor_name = 'x' WHERE transfer_id = $1", [cast.transfer.id]),
      ).rejects.toThrow(refusal);
      await expect(run("DELETE FROM custody_entry WHERE transfer_id = $1", [cast.transfer.id])).rejects.toThrow(
        refusal,
      );
      await expect(run("TRUNCATE custody_entry CASCADE")).rejects.toThrow(refusal);
    }
    await expect(t.ctx.pool.query("DELETE FROM transfer WHERE id = $1", [cast.transfer.id])).rejects.toThrow(
      /foreign key|violates/,
    );
  });

  it("tampering that slips past the triggers is detected by the chain", async () => {
    const cast = await buildTransfer(em(), { status: "ready" });
    const s = await signIn(t.app, cast.sender.email);
    // A superuser can disable triggers (the app's role cannot: tests/api/database-roles.test.ts):
    // the hash chain still shows the edit.
    await withDatabaseAs("admin", async (client) => {
      await client.query("BEGIN");
      await client.query("ALTER TABLE custody_entry DISABLE TRIGGER custody_entry_no_update_delete");
      await client.query(
        "UPDATE custody_entry SET payload = jsonb_set(payload, '{to}', '\"closed\"') WHERE transfer_id = $1 AND seq = 2",
        [cast.transfer.id],
      );
      await client.query("ALTER TABLE custody_entry ENABLE TRIGGER custody_entry_no_update_delete");
      await client.query("COMMIT");
    });
    const log = (await s.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    expect(log).toMatchObject({ intact: false, brokenAt: 2 });
  });
});
