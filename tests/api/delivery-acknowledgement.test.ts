/**
 * A delivery is never recorded on one party's word alone (issue 12 §2): in a chain of custody the
 * receiver acknowledges each transfer of custody (NIST CNSSI 4009; ASTM D4840) [published]. The
 * receiver says "I have the boxes" from their own account, or shows a one-time code there that the
 * courier types on the phone. One-time codes follow the usual rules for out-of-band secrets: short
 * lived, single use, stored hashed, attempts limited (OWASP ASVS 5.0, V6 authentication) [practice].
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createHash, randomUUID } from "node:crypto";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { buildTransfer, type TransferCast } from "../factories";
import { OutboxMessageSchema } from "../../server/db/entities/outbox-message.entity";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

type View = {
  id: string;
  number: string;
  status: string;
  containers: { id: string; sealNumber: string | null }[];
  receiver: { organization: { name: string } };
  legs: { courier: { displayName: string } }[];
  origin: { lat: number | null; lon: number | null };
  handoffs: unknown[];
  delivery: null | { state: string; way: string | null; acknowledgedBy: { displayName: string } | null };
  abilities: Record<string, unknown>;
};

/** The delivery as planned, at the pickup's position (a minute after it: no speed alert). */
function delivery(view: View, over: Record<string, unknown> = {}) {
  return {
    handoffIndex: view.legs.length,
    boxesCounted: view.containers.length,
    seals: view.containers.map((c) => ({ containerId: c.id, sealNumber: c.sealNumber, intact: true })),
    boxTempF: 70,
    place: { text: "Front desk", lat: view.origin.lat, lon: view.origin.lon, accuracyM: 10 },
    releasedByName: view.legs.at(-1)!.courier.displayName,
    receivedByName: view.receiver.organization.name,
    acknowledged: true,
    ...over,
  };
}

async function onTheRoad(): Promise<{ cast: TransferCast; courier: Client; receiver: Client; view: View }> {
  const cast = await buildTransfer(em(), { status: "in_transit", mode: "hand_delivery" });
  const courier = await signIn(t.app, cast.couriers[0]!.email);
  const receiver = await signIn(t.app, cast.receiver.email);
  const view = (await courier.get(`/api/transfers/${cast.transfer.id}`)).body.transfer as View;
  return { cast, courier, receiver, view };
}

const record = (client: Client, view: View, body: unknown) =>
  client.post(`/api/transfers/${view.id}/handoffs`, body).set("Idempotency-Key", randomUUID());
const get = async (client: Client, view: View) => (await client.get(`/api/transfers/${view.id}`)).body.transfer as View;
const showCode = (receiver: Client, view: View) => receiver.post(`/api/transfers/${view.id}/delivery-code`, {});

describe("the receiver's acknowledgement from their own account", () => {
  it("a delivery the courier records alone waits for the receiver, who is e-mailed; then the receiver acknowledges", async () => {
    const { cast, courier, receiver, view } = await onTheRoad();
    const res = await record(courier, view, delivery(view));
    expect(res.status).toBe(201);
    expect(res.body.transfer.status).toBe("in_transit");
    expect(res.body.transfer.delivery).toMatchObject({ state: "awaiting_receiver", acknowledgedAt: null, way: null });

    const mine = await get(receiver, view);
    expect(mine.abilities).toMatchObject({ acknowledgeDelivery: true, checkIn: false });
    const asked = await em().find(OutboxMessageSchema, { topic: "transfer.delivery_awaiting_acknowledgement" });
    expect(asked.filter((m) => m.subject.includes(view.number)).map((m) => m.toAddress)).toEqual([cast.receiver.email]);
    // Check-in is for a delivery on the record; the courier's word alone is not enough.
    const early = await receiver
      .post(`/api/transfers/${view.id}/check-in`, { items: [], extras: [], signedName: "R", acknowledged: true })
      .set("Idempotency-Key", randomUUID());
    expect(early.status).toBe(409);

    // Neither the sender nor the courier (without the receiver's code) can acknowledge for the receiver.
    const sender = await signIn(t.app, cast.sender.email);
    expect((await sender.post(`/api/transfers/${view.id}/delivery/acknowledge`, {})).status).toBe(403);
    const noCode = await courier.post(`/api/transfers/${view.id}/delivery/acknowledge`, {});
    expect(noCode.status).toBe(400);
    expect(noCode.body.error.field).toBe("code");

    const ack = await receiver.post(`/api/transfers/${view.id}/delivery/acknowledge`, {});
    expect(ack.status).toBe(200);
    expect(ack.body.transfer.status).toBe("delivered");
    expect(ack.body.transfer.delivery).toMatchObject({
      state: "acknowledged",
      way: "receiver_account",
      acknowledgedBy: { id: cast.receiver.id, displayName: cast.receiver.displayName },
    });
    const log = (await receiver.get(`/api/transfers/${view.id}/custody`)).body;
    expect(log.intact).toBe(true);
    expect(log.entries.map((e: { kind: string }) => e.kind).slice(-3)).toEqual([
      "handoff",
      "delivery_acknowledged",
      "status_change",
    ]);
    const told = await em().find(OutboxMessageSchema, { topic: "transfer.delivered" });
    expect(told.filter((m) => m.subject.includes(view.number)).map((m) => m.toAddress)).toEqual([cast.sender.email]);
    // Acknowledging twice changes nothing.
    expect((await receiver.post(`/api/transfers/${view.id}/delivery/acknowledge`, {})).status).toBe(409);
  });

  it("a delivery the receiver records is acknowledged by that recording", async () => {
    const { receiver, view } = await onTheRoad();
    const res = await record(receiver, view, delivery(view));
    expect(res.status).toBe(201);
    expect(res.body.transfer.status).toBe("delivered");
    expect(res.body.transfer.delivery).toMatchObject({ state: "acknowledged", way: "recorded_by_receiver" });
  });
});

describe("the one-time code on the courier's phone", () => {
  it("is six digits, lasts minutes, is kept only as a hash, and records the receiver's acknowledgement", async () => {
    const { cast, courier, receiver, view } = await onTheRoad();
    expect((await showCode(courier, view)).status).toBe(403);
    const shown = await showCode(receiver, view);
    expect(shown.status).toBe(201);
    expect(shown.body.code).toMatch(/^\d{6}$/);
    const lifetime = Date.parse(shown.body.expiresAt) - Date.now();
    expect(lifetime).toBeGreaterThan(5 * 60_000);
    expect(lifetime).toBeLessThanOrEqual(10 * 60_000);
    const rows = await t.ctx.pool.query(
      "SELECT row_to_json(d)::text AS row FROM delivery_code d WHERE transfer_id = $1",
      [view.id],
    );
    expect(rows.rows).toHaveLength(1);
    expect(rows.rows[0].row).not.toContain(`"${shown.body.code}"`);
    expect(rows.rows[0].row).toContain(createHash("sha256").update(`${view.id}:${shown.body.code}`).digest("hex"));

    const res = await record(courier, view, delivery(view, { receiverCode: shown.body.code }));
    expect(res.status).toBe(201);
    expect(res.body.transfer.status).toBe("delivered");
    expect(res.body.transfer.delivery).toMatchObject({
      state: "acknowledged",
      way: "one_time_code",
      acknowledgedBy: { displayName: cast.receiver.displayName },
    });
  });

  it("a wrong code refuses the whole delivery (400 naming the field): nothing is recorded", async () => {
    const { courier, receiver, view } = await onTheRoad();
    const shown = (await showCode(receiver, view)).body.code as string;
    const wrong = String((Number(shown) + 1) % 1_000_000).padStart(6, "0");
    const res = await record(courier, view, delivery(view, { receiverCode: wrong }));
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ field: "receiverCode", code: "code_wrong" });
    expect(res.body.error.message).toMatch(/does not match/);
    const after = await get(courier, view);
    expect(after.status).toBe("in_transit");
    expect(after.handoffs).toHaveLength(1);
    expect(after.delivery).toBeNull();
    // Letters are not a code at all.
    const letters = await record(courier, view, delivery(view, { receiverCode: "abcdef" }));
    expect(letters.status).toBe(400);
    expect(letters.body.error.field).toBe("receiverCode");
  });

  it("an expired code is refused, and so is one replaced by a newer code", async () => {
    const { courier, receiver, view } = await onTheRoad();
    const first = (await showCode(receiver, view)).body.code as string;
    await t.ctx.pool.query("UPDATE delivery_code SET expires_at = now() - interval '1 minute' WHERE transfer_id = $1", [
      view.id,
    ]);
    const expired = await record(courier, view, delivery(view, { receiverCode: first }));
    expect(expired.status).toBe(400);
    expect(expired.body.error).toMatchObject({ field: "receiverCode", code: "code_expired" });

    const second = (await showCode(receiver, view)).body.code as string;
    const third = (await showCode(receiver, view)).body.code as string;
    if (second !== third) {
      const replaced = await record(courier, view, delivery(view, { receiverCode: second }));
      expect(replaced.status).toBe(400);
      expect(replaced.body.error.code).toBe("code_revoked");
    }
    expect((await get(courier, view)).status).toBe("in_transit");
    expect((await record(courier, view, delivery(view, { receiverCode: third }))).status).toBe(201);
  });

  it("five wrong tries block the code; a used code cannot acknowledge again", async () => {
    const { courier, receiver, view } = await onTheRoad();
    await record(courier, view, delivery(view)).expect(201);
    const shown = (await showCode(receiver, view)).body.code as string;
    const wrong = String((Number(shown) + 7) % 1_000_000).padStart(6, "0");
    for (let i = 0; i < 5; i++) {
      const res = await courier.post(`/api/transfers/${view.id}/delivery/acknowledge`, { code: wrong });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("code_wrong");
    }
    const blocked = await courier.post(`/api/transfers/${view.id}/delivery/acknowledge`, { code: shown });
    expect(blocked.status).toBe(400);
    expect(blocked.body.error.code).toBe("code_revoked");
    expect((await get(courier, view)).delivery).toMatchObject({ state: "awaiting_receiver" });

    const fresh = (await showCode(receiver, view)).body.code as string;
    const ok = await courier.post(`/api/transfers/${view.id}/delivery/acknowledge`, { code: fresh });
    expect(ok.status).toBe(200);
    expect(ok.body.transfer.delivery).toMatchObject({ state: "acknowledged", way: "one_time_code" });
    const reused = await courier.post(`/api/transfers/${view.id}/delivery/acknowledge`, { code: fresh });
    expect(reused.status).toBe(409);
    expect((await get(courier, view)).status).toBe("delivered");
  });
});
