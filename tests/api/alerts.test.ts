/**
 * Alerts on a transfer: raised by the server, shown to the parties, e-mailed to both, and kept
 * after acknowledgement. "Changes shall not obscure previously recorded information" —
 * 21 CFR 11.10(e) [published], used as the model for an evidence record.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { LockMode } from "@mikro-orm/core";
import { createTestApp, signIn, withDatabaseAs, type TestApp } from "../support/app";
import { buildTransfer, buildUser, type TransferCast } from "../factories";
import { TransferSchema } from "../../server/db/entities/transfer.entity";
import { OutboxMessageSchema } from "../../server/db/entities/outbox-message.entity";
import { raiseAlerts } from "../../server/services/transfers/alerts";

let t: TestApp;
let cast: TransferCast;
const em = () => t.orm.em.fork();
const MESSAGE = "Box A: expected seal SEAL-0004, courier read SEAL-0044.";

beforeAll(async () => {
  t = await createTestApp();
  cast = await buildTransfer(em(), { status: "ready" });
  await em().transactional(async (tx) => {
    const transfer = await tx.findOneOrFail(
      TransferSchema,
      { id: cast.transfer.id },
      { lockMode: LockMode.PESSIMISTIC_WRITE },
    );
    await raiseAlerts(tx, t.ctx.links, transfer, null, [
      { kind: "seal_mismatch", message: MESSAGE, data: { expected: "SEAL-0004", read: "SEAL-0044" } },
    ]);
  });
});
afterAll(() => t.close());

const path = () => `/api/transfers/${cast.transfer.id}`;

describe("alerts on the transfer", () => {
  it("each party sees the alert in words, unacknowledged", async () => {
    for (const user of [cast.sender, cast.receiver, cast.couriers[0]!]) {
      const res = await (await signIn(t.app, user.email)).get(path()).expect(200);
      expect(res.body.transfer.alerts).toHaveLength(1);
      expect(res.body.transfer.alerts[0]).toMatchObject({
        kind: "seal_mismatch",
        message: MESSAGE,
        acknowledgedAt: null,
      });
      expect(Date.parse(res.body.transfer.alerts[0].at)).not.toBeNaN();
    }
  });

  it("is e-mailed to both parties at once, naming what went wrong", async () => {
    const mails = await em().find(OutboxMessageSchema, { topic: "transfer.alert" });
    const to = mails.map((m) => m.toAddress).sort();
    expect(to).toEqual([cast.sender.email, cast.receiver.email].sort());
    for (const m of mails) {
      expect(m.subject).toBe(`Alert on transfer ${cast.transfer.number}: Seal number does not match`);
      expect(m.textBody).toContain(MESSAGE);
    }
  });

  it("strangers get 404, admins may read but not acknowledge, a blank note is refused", async () => {
    const alertId = (await (await signIn(t.app, cast.sender.email)).get(path())).body.transfer.alerts[0].id;
    const stranger = await signIn(t.app, (await buildUser(em(), { role: "member" })).email);
    await stranger.post(`${path()}/alerts/${alertId}/acknowledge`, { note: "seen" }).expect(404);
    const admin = await signIn(t.app, (await buildUser(em(), { role: "admin" })).email);
    await admin.post(`${path()}/alerts/${alertId}/acknowledge`, { note: "seen" }).expect(403);
    const sender = await signIn(t.app, cast.sender.email);
    const blank = await sender.post(`${path()}/alerts/${alertId}/acknowledge`, { note: "" }).expect(400);
    expect(blank.body.error.message).toMatch(/note/i);
    await sender.post(`${path()}/alerts/not-an-id/acknowledge`, { note: "seen" }).expect(400);
    const after = await sender.get(path());
    expect(after.body.transfer.alerts[0].acknowledgedAt).toBeNull();
  });

  it("a party acknowledges with a note; the alert stays, once, and the custody log records both", async () => {
    const receiver = await signIn(t.app, cast.receiver.email);
    const alertId = (await receiver.get(path())).body.transfer.alerts[0].id;
    const res = await receiver
      .post(`${path()}/alerts/${alertId}/acknowledge`, { note: "Called the courier; the seal was re-read at the hub." })
      .expect(200);
    expect(res.body.alert).toMatchObject({
      id: alertId,
      kind: "seal_mismatch",
      message: MESSAGE,
      acknowledgementNote: "Called the courier; the seal was re-read at the hub.",
      acknowledgedBy: { id: cast.receiver.id, displayName: cast.receiver.displayName },
    });
    expect(res.body.transfer.alerts).toHaveLength(1);
    const again = await (
      await signIn(t.app, cast.sender.email)
    )
      .post(`${path()}/alerts/${alertId}/acknowledge`, { note: "Me too" })
      .expect(409);
    expect(again.body.error.message).toContain(cast.receiver.displayName);

    const log = (await receiver.get(`${path()}/custody`).expect(200)).body;
    expect(log.intact).toBe(true);
    const kinds = log.entries.map((e: { kind: string }) => e.kind);
    expect(kinds).toContain("alert_raised");
    expect(kinds.indexOf("alert_acknowledged")).toBeGreaterThan(kinds.indexOf("alert_raised"));
  });

  it("the database keeps alerts: no delete, no truncate, no rewrite, one acknowledgement", async () => {
    const { rows } = await t.ctx.pool.query("SELECT id FROM transfer_alert WHERE transfer_id = $1", [cast.transfer.id]);
    const id = rows[0].id as string;
    // The app's login may not remove or rewrite an alert at all (D18) …
    await expect(t.ctx.pool.query("DELETE FROM transfer_alert WHERE id = $1", [id])).rejects.toThrow(
      /permission denied/,
    );
    await expect(t.ctx.pool.query("TRUNCATE transfer_alert")).rejects.toThrow(/permission denied/);
    await expect(
      t.ctx.pool.query("UPDATE transfer_alert SET message = 'all fine' WHERE id = $1", [id]),
    ).rejects.toThrow(/permission denied/);
    // … and the table's owner is stopped by the triggers.
    await withDatabaseAs("owner", async (owner) => {
      await expect(owner.query("DELETE FROM transfer_alert WHERE id = $1", [id])).rejects.toThrow(/append-only/);
      await expect(owner.query("TRUNCATE transfer_alert")).rejects.toThrow(/append-only/);
      await expect(owner.query("UPDATE transfer_alert SET message = 'all fine' WHERE id = $1", [id])).rejects.toThrow(
        /append-only/,
      );
    });
    await expect(
      t.ctx.pool.query(
        "UPDATE transfer_alert SET acknowledged_at = now(), acknowledgement_note = 'rewritten' WHERE id = $1",
        [id],
      ),
    ).rejects.toThrow(/append-only|permission denied/);
    const kept = await t.ctx.pool.query("SELECT message, acknowledgement_note FROM transfer_alert WHERE id = $1", [id]);
    expect(kept.rows[0]).toEqual({
      message: MESSAGE,
      acknowledgement_note: "Called the courier; the seal was re-read at the hub.",
    });
  });
});
