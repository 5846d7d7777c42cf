/**
 * Denials come before state checks: a role that may never take an action on a transfer is told
 * 403 (or 404 when it may not see the transfer at all), whatever state the transfer is in, so a
 * refusal never reveals the state through a 409. OWASP ASVS 5.0 V8 (authorization before
 * business logic) [memory]; SECURITY.md, "Access".
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

type Cast = TransferCast & { as: Record<"sender" | "receiver" | "courier" | "secondCourier" | "admin", Client> };

async function cast(status: Parameters<typeof buildTransfer>[1] extends infer O ? O : never): Promise<Cast> {
  const built = await buildTransfer(t.orm.em.fork(), { legs: 2, ...status });
  return {
    ...built,
    as: {
      sender: await signIn(t.app, built.sender.email),
      receiver: await signIn(t.app, built.receiver.email),
      courier: await signIn(t.app, built.couriers[0]!.email),
      secondCourier: await signIn(t.app, built.couriers[1]!.email),
      admin,
    },
  };
}

function handoff(c: TransferCast, index: number) {
  return {
    handoffIndex: index,
    boxesCounted: 1,
    seals: [],
    boxTempF: 70,
    place: { text: "Dock 2" },
    releasedByName: "A",
    receivedByName: "B",
    acknowledged: true,
  };
}

const key = () => `k-${Math.random().toString(36).slice(2)}`;

describe("a role that may not act is refused before the state is looked at", () => {
  it("transitions: couriers and admins may move nothing, the receiver cannot send or cancel, the sender cannot confirm", async () => {
    const closed = await cast({ status: "closed" });
    const path = `/api/transfers/${closed.transfer.id}/transition`;
    // Each of these would be a 409 for the right role (a closed transfer moves nowhere).
    for (const [who, body] of [
      ["courier", { to: "cancelled", reason: "x" }],
      ["admin", { to: "cancelled", reason: "x" }],
      ["receiver", { to: "cancelled", reason: "x" }],
      ["sender", { to: "ready" }],
      ["courier", { to: "closed" }],
      ["admin", { to: "closed" }],
    ] as const) {
      const res = await closed.as[who].post(path, body);
      expect([res.status, res.body.error?.code], `${who} → ${body.to}`).toEqual([403, "forbidden"]);
    }
    // The sender asking to cancel it is a party asking for an impossible step: that is the 409.
    expect((await closed.as.sender.post(path, { to: "cancelled", reason: "x" })).status).toBe(409);
    const ready = await cast({ status: "ready" });
    // "Already ready" is a state answer, for the receiver only.
    expect((await ready.as.sender.post(`/api/transfers/${ready.transfer.id}/transition`, { to: "ready" })).status).toBe(
      403,
    );
    expect(
      (await ready.as.receiver.post(`/api/transfers/${ready.transfer.id}/transition`, { to: "ready" })).status,
    ).toBe(409);
  });

  it("handoffs: an admin, or a party who takes no part in that handoff, is refused whatever was recorded", async () => {
    const draft = await cast({ status: "draft" });
    const draftPath = `/api/transfers/${draft.transfer.id}/handoffs`;
    // A draft cannot be handed off (409 for the sender), but the admin never releases the first box,
    // and the receiver does not see a draft never sent at all (issue 14, §4).
    const byAdmin = await draft.as.admin.post(draftPath, handoff(draft, 0)).set("Idempotency-Key", key());
    expect([byAdmin.status, byAdmin.body.error?.code]).toEqual([403, "forbidden"]);
    const byReceiver = await draft.as.receiver.post(draftPath, handoff(draft, 0)).set("Idempotency-Key", key());
    expect([byReceiver.status, byReceiver.body.error?.code]).toEqual([404, "not_found"]);
    expect((await draft.as.sender.post(draftPath, handoff(draft, 0)).set("Idempotency-Key", key())).status).toBe(409);

    const onTheRoad = await cast({ status: "in_transit" });
    const path = `/api/transfers/${onTheRoad.transfer.id}/handoffs`;
    // Handoff 0 is recorded already (409 for those who took part), but the second courier never took part in it.
    const late = await onTheRoad.as.secondCourier.post(path, handoff(onTheRoad, 0)).set("Idempotency-Key", key());
    expect(late.status).toBe(403);
    expect((await onTheRoad.as.courier.post(path, handoff(onTheRoad, 0)).set("Idempotency-Key", key())).status).toBe(
      409,
    );
  });

  it("check-in: only the receiver, before and after delivery", async () => {
    const ready = await cast({ status: "ready" });
    const body = { items: [], extras: [], signedName: "Someone", notes: null };
    for (const who of ["sender", "courier", "admin"] as const) {
      const res = await ready.as[who]
        .post(`/api/transfers/${ready.transfer.id}/check-in`, body)
        .set("Idempotency-Key", key());
      expect([res.status, res.body.error?.code], who).toEqual([403, "forbidden"]);
    }
  });

  it("documents: couriers and admins never attach or take off, whatever the state", async () => {
    const closed = await cast({ status: "closed" });
    const someDocument = "01a23704-abf9-7675-ab93-e52c942c1436";
    for (const who of ["courier", "admin"] as const) {
      const attach = await closed.as[who].post(`/api/transfers/${closed.transfer.id}/documents`, {
        documentId: someDocument,
      });
      expect(attach.status, who).toBe(403);
      const detach = await closed.as[who].del(`/api/transfers/${closed.transfer.id}/documents/${someDocument}`);
      expect(detach.status, who).toBe(403);
    }
  });

  it("overrides, legs, edits and messages: the roles that may not are refused in any state", async () => {
    const closed = await cast({ status: "closed" });
    const id = closed.transfer.id;
    for (const who of ["sender", "receiver", "courier"] as const)
      expect(
        (await closed.as[who].post(`/api/transfers/${id}/compliance/override`, { reason: "Checked by phone." })).status,
        who,
      ).toBe(403);
    for (const who of ["receiver", "courier", "admin"] as const) {
      expect((await closed.as[who].patch(`/api/transfers/${id}`, { handlingNotes: "x" })).status, who).toBe(403);
      expect(
        (
          await closed.as[who].agent
            .put(`/api/transfers/${id}/legs`)
            .set("X-CSRF-Token", closed.as[who].csrf)
            .send({ legs: [{ courierId: closed.couriers[0]!.id }] })
        ).status,
        who,
      ).toBe(403);
    }
    for (const who of ["courier", "admin"] as const)
      expect((await closed.as[who].post(`/api/transfers/${id}/messages`, { body: "Hello" })).status, who).toBe(403);
  });
});
