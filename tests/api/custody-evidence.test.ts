/**
 * Custody evidence that cannot be glossed over (issue 12 §2): every seal, count, time, place and
 * person at a handoff that is not what the record expects raises an alert, e-mailed to both parties
 * at once, in words; a failed plausibility check needs a reason. The chain-of-custody elements —
 * who released, who received, when, where, and the receiver's acknowledgement — are those of NIST
 * CNSSI 4009 and ASTM D4840 [published]; the limits are issue 12's (24 h, 80 mph by road) and
 * DEVELOPERS.md D20 (600 mph by air).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { buildTransfer } from "../factories";
import { OutboxMessageSchema } from "../../server/db/entities/outbox-message.entity";
import { describeCustodyEntry } from "@shared/words";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

type View = {
  id: string;
  status: string;
  containers: { id: string; label: string; sealNumber: string | null }[];
  sender: { organization: { name: string } };
  receiver: { organization: { name: string } };
  legs: { courier: { displayName: string } }[];
  origin: { lat: number | null; lon: number | null };
  alerts: { kind: string; message: string }[];
  handoffs: { seals: { matches: boolean; intact: boolean }[] }[];
};

/** A handoff as planned: the people assigned, every seal as on record, no position (the addresses stand in). */
function planned(view: View, index: number, over: Record<string, unknown> = {}) {
  const names = [
    view.sender.organization.name,
    ...view.legs.map((l) => l.courier.displayName),
    view.receiver.organization.name,
  ];
  return {
    handoffIndex: index,
    boxesCounted: view.containers.length,
    seals: view.containers.map((c) => ({ containerId: c.id, sealNumber: c.sealNumber, intact: true })),
    boxTempF: 70,
    place: { text: "Loading bay" },
    releasedByName: names[index],
    receivedByName: names[index + 1],
    acknowledged: true,
    ...over,
  };
}

const transferNumber = (res: { body: { transfer: { number: string } } }) => res.body.transfer.number;

const post = (client: Client, view: View, body: unknown) =>
  client.post(`/api/transfers/${view.id}/handoffs`, body).set("Idempotency-Key", randomUUID());

async function mailsFor(transferNumber: string, topic: string) {
  return em().find(OutboxMessageSchema, { topic, subject: { $like: `%${transferNumber}%` } });
}

/** A transfer cleared to travel, with two boxes "D" (seal SEAL-0004) and "E" (seal SEAL-0005). */
async function readyTransfer(options: Parameters<typeof buildTransfer>[1] = {}) {
  const cast = await buildTransfer(em(), {
    status: "ready",
    animals: [
      { taxon: "Terrapene carolina", box: "D" },
      { taxon: "Chrysemys picta", box: "E" },
    ],
    ...options,
  });
  await t.ctx.pool.query(
    "UPDATE container SET label = key, seal_number = 'SEAL-000' || CASE key WHEN 'D' THEN '4' ELSE '5' END WHERE transfer_id = $1",
    [cast.transfer.id],
  );
  const courier = await signIn(t.app, cast.couriers[0]!.email);
  const view = (await courier.get(`/api/transfers/${cast.transfer.id}`)).body.transfer as View;
  return { cast, courier, view };
}

describe("seals and box counts", () => {
  it("a wrong seal number is an alert in words, e-mailed to both parties at once, never 'intact'", async () => {
    const { cast, courier, view } = await readyTransfer();
    const box = view.containers.find((c) => c.label === "D")!;
    const body = planned(view, 0, {
      seals: view.containers.map((c) => ({
        containerId: c.id,
        sealNumber: c.id === box.id ? "SEAL-0044" : c.sealNumber,
        intact: true,
      })),
    });
    const res = await post(courier, view, body);
    expect(res.status).toBe(201);
    const transfer = res.body.transfer as View;
    expect(transfer.status).toBe("in_transit");
    // Issue 12's own example: "Box D: expected seal SEAL-0004, courier read SEAL-0044".
    expect(transfer.alerts).toEqual([
      expect.objectContaining({
        kind: "seal_mismatch",
        message: "Box D: expected seal SEAL-0004, courier read SEAL-0044 at the pickup.",
      }),
    ]);
    expect(transfer.handoffs[0]!.seals.map((s) => s.matches).sort()).toEqual([false, true]);

    const alertMails = await mailsFor(transferNumber(res), "transfer.alert");
    expect(alertMails.map((m) => m.toAddress).sort()).toEqual([cast.sender.email, cast.receiver.email].sort());
    for (const m of alertMails) expect(m.textBody).toContain("Box D: expected seal SEAL-0004, courier read SEAL-0044");
    const pickedUp = await mailsFor(transferNumber(res), "transfer.picked_up");
    expect(pickedUp).toHaveLength(2);
    for (const m of pickedUp) {
      expect(m.textBody).not.toMatch(/all intact/i);
      expect(m.textBody).toContain("1 with a number other than the one on record");
    }
  });

  it("a broken seal and a short count are two alerts in one e-mail per party", async () => {
    const { cast, courier, view } = await readyTransfer();
    const res = await post(
      courier,
      view,
      planned(view, 0, {
        boxesCounted: 1,
        seals: view.containers.map((c) => ({ containerId: c.id, sealNumber: c.sealNumber, intact: c.label !== "E" })),
      }),
    );
    expect(res.status).toBe(201);
    expect((res.body.transfer as View).alerts.map((a) => [a.kind, a.message])).toEqual([
      ["seal_broken", "Box E: seal SEAL-0005 broken or missing at the pickup."],
      ["count_mismatch", "Courier counted 1 box at the pickup; the manifest lists 2."],
    ]);
    const mails = await mailsFor(transferNumber(res), "transfer.alert");
    expect(mails.map((m) => m.toAddress).sort()).toEqual([cast.sender.email, cast.receiver.email].sort());
    expect(mails[0]!.subject).toContain("2 alerts");
  });

  it("a seal on record left unread while called unbroken is refused, naming the field; nothing is recorded", async () => {
    const { courier, view } = await readyTransfer();
    const res = await post(
      courier,
      view,
      planned(view, 0, { seals: view.containers.map((c) => ({ containerId: c.id, sealNumber: "", intact: true })) }),
    );
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe("seals.0.sealNumber");
    expect(res.body.error.message).toMatch(/type the seal number you read on D/);
    const after = (await courier.get(`/api/transfers/${view.id}`)).body.transfer;
    expect(after.status).toBe("ready");
    expect(after.handoffs).toEqual([]);
  });
});

describe("a handoff kept on the phone without signal (issue 16, §3)", () => {
  it("keeps the server's time as the entry's time and the phone's confirmation beside it, in words", async () => {
    const { courier, view } = await readyTransfer();
    const confirmedAt = new Date(Date.now() - 90 * 60_000).toISOString();
    await post(courier, view, planned(view, 0, { confirmedAt })).expect(201);
    const log = (await courier.get(`/api/transfers/${view.id}/custody`)).body;
    const entry = log.entries.find((e: { kind: string }) => e.kind === "handoff");
    expect(entry.payload.confirmedOnPhoneAt).toBe(confirmedAt);
    // 90 minutes on the phone, give or take the request's own time.
    expect(entry.payload.waitedOnPhoneMin).toBeGreaterThanOrEqual(89);
    expect(entry.payload.waitedOnPhoneMin).toBeLessThanOrEqual(91);
    expect(Date.parse(entry.at) - Date.parse(confirmedAt)).toBeGreaterThan(89 * 60_000);
    const words = describeCustodyEntry({ kind: "handoff", payload: entry.payload }, "imperial").lines.join(" ");
    expect(words).toMatch(
      /Confirmed on the phone at .* kept there without signal; it reached Hatchway 1 h 3\d min later\./,
    );
  });

  it("refuses a phone clock far ahead of the server's, naming the field; nothing is recorded", async () => {
    const { courier, view } = await readyTransfer();
    const ahead = new Date(Date.now() + 60 * 60_000).toISOString();
    const res = await post(courier, view, planned(view, 0, { confirmedAt: ahead }));
    expect([res.status, res.body.error.field]).toEqual([400, "confirmedAt"]);
    expect(res.body.error.message).toMatch(/clock is more than 10 minutes ahead/);
    expect((await courier.get(`/api/transfers/${view.id}`)).body.transfer.handoffs).toEqual([]);
  });
});

describe("plausibility: a reason, or no record", () => {
  it("a pickup 12 days before the planned departure is refused without a reason, then raised with it", async () => {
    const { cast, courier, view } = await readyTransfer({ daysAhead: 12.5 });
    const refused = await post(courier, view, planned(view, 0));
    expect(refused.status).toBe(400);
    expect(refused.body.error.field).toBe("reasons.earlyPickup");
    expect(refused.body.error.message).toMatch(/^Reason for the early pickup: say why/);
    expect(refused.body.error.message).toMatch(/Pickup recorded 12 days \d+ h before the planned departure/);
    // Nothing changed: no handoff, no alert, no e-mail.
    const unchanged = (await courier.get(`/api/transfers/${view.id}`)).body.transfer;
    expect(unchanged).toMatchObject({ status: "ready", handoffs: [], alerts: [] });
    expect(await mailsFor(unchanged.number, "transfer.alert")).toEqual([]);

    const res = await post(
      courier,
      view,
      planned(view, 0, { reasons: { earlyPickup: "Held at our heated depot until the flight" } }),
    );
    expect(res.status).toBe(201);
    const alert = (res.body.transfer as View).alerts.find((a) => a.kind === "early_pickup")!;
    expect(alert.message).toContain("Reason given: Held at our heated depot until the flight");
    const mails = await mailsFor(transferNumber(res), "transfer.alert");
    expect(mails.map((m) => m.toAddress).sort()).toEqual([cast.sender.email, cast.receiver.email].sort());
  });

  it("a delivery 3,400 km from the pickup in the same minute needs a reason and raises an alert", async () => {
    const cast = await buildTransfer(em(), { status: "in_transit" });
    const receiver = await signIn(t.app, cast.receiver.email);
    const view = (await receiver.get(`/api/transfers/${cast.transfer.id}`)).body.transfer as View;
    // The pickup was at Knoxville's position; no position at the delivery: the Eugene address stands in.
    const refused = await post(receiver, view, planned(view, 1));
    expect(refused.status).toBe(400);
    expect(refused.body.error.field).toBe("reasons.implausibleSpeed");
    expect(refused.body.error.message).toContain("the limit for “Overnight air carrier” is 600 mph");
    expect((await receiver.get(`/api/transfers/${view.id}`)).body.transfer.status).toBe("in_transit");

    const res = await post(
      receiver,
      view,
      planned(view, 1, { reasons: { implausibleSpeed: "Recorded late from the office" } }),
    );
    expect(res.status).toBe(201);
    const alert = (res.body.transfer as View).alerts.find((a) => a.kind === "implausible_speed")!;
    expect(alert.message).toMatch(/^The delivery was recorded [\d,]+ mi \([\d,]+ km\) from the pickup/);
    expect(alert.message).toContain("Reason given: Recorded late from the office");
  });

  it("a delivery at the pickup's own position a minute later is plausible: no reason, no alert", async () => {
    const cast = await buildTransfer(em(), { status: "in_transit", mode: "hand_delivery" });
    const receiver = await signIn(t.app, cast.receiver.email);
    const view = (await receiver.get(`/api/transfers/${cast.transfer.id}`)).body.transfer as View;
    const res = await post(
      receiver,
      view,
      planned(view, 1, {
        place: { text: "Met at the depot", lat: view.origin.lat, lon: view.origin.lon, accuracyM: 15 },
      }),
    );
    expect(res.status).toBe(201);
    expect((res.body.transfer as View).alerts).toEqual([]);
  });

  it("custody to someone other than the assigned courier needs a reason and raises an alert", async () => {
    const { courier, view } = await readyTransfer();
    const refused = await post(courier, view, planned(view, 0, { receivedByName: "Sam Doe" }));
    expect(refused.status).toBe(400);
    expect(refused.body.error.field).toBe("reasons.unexpectedParty");
    expect(refused.body.error.reasonsNeeded).toEqual(["unexpectedParty"]);
    const res = await post(
      courier,
      view,
      planned(view, 0, { receivedByName: "Sam Doe", reasons: { unexpectedParty: "Juno's colleague took the van" } }),
    );
    expect(res.status).toBe(201);
    const alert = (res.body.transfer as View).alerts.find((a) => a.kind === "unexpected_party")!;
    expect(alert.message).toBe(
      `At the pickup the boxes went to “Sam Doe”, not the assigned courier (${view.legs[0]!.courier.displayName}). Reason given: Juno's colleague took the van`,
    );
  });

  it("the custody log keeps the reasons and the alerts in order, and stays intact", async () => {
    const { courier, view } = await readyTransfer({ daysAhead: 3 });
    await post(courier, view, planned(view, 0, { reasons: { earlyPickup: "Collected the day before" } })).expect(201);
    const log = (await courier.get(`/api/transfers/${view.id}/custody`)).body;
    expect(log.intact).toBe(true);
    const kinds = log.entries.map((e: { kind: string }) => e.kind);
    expect(kinds.slice(-3)).toEqual(["handoff", "alert_raised", "status_change"]);
    const handoff = log.entries.find((e: { kind: string }) => e.kind === "handoff");
    expect(handoff.payload.reasons).toEqual({ earlyPickup: "Collected the day before" });
    expect(kinds.indexOf("alert_raised")).toBe(kinds.indexOf("handoff") + 1);
  });
});
