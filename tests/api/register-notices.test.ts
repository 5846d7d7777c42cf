import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { createTestApp, signIn, withDatabaseAs, type Client, type TestApp } from "../support/app";
import { buildTransfer, buildUser } from "../factories";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function checkIn(receiver: Client, transferId: string) {
  const view = (await receiver.get(`/api/transfers/${transferId}`)).body.transfer;
  const res = await receiver
    .post(`/api/transfers/${transferId}/check-in`, {
      items: view.animals.map((a: { id: string; count: number }) => ({
        animalId: a.id,
        arrivedWell: a.count,
        arrivedProblem: 0,
        deadOnArrival: 0,
        missing: 0,
      })),
      extras: [],
      signedName: "R",
      acknowledged: true,
    })
    .set("Idempotency-Key", randomUUID());
  expect(res.status, JSON.stringify(res.body)).toBe(201);
}

// A move from Texas into Maryland: the Texas sender's notice of an out-of-state shipment within
// 24 h (31 TAC 65.327) and the Maryland receiver's import report within 72 h (COMAR 15.11.01.09)
// [published, SOURCES.md "Records and reports"].
describe("state notices marked done", () => {
  it("lets the side that owes a notice mark it done once, with who, when and the agency's reference", async () => {
    const cast = await buildTransfer(em(), {
      status: "delivered",
      animals: [{ taxon: "Python regius", count: 1, box: "A" }],
    });
    await withDatabaseAs("admin", (db) =>
      db.query("UPDATE transfer SET origin_state = 'TX', destination_state = 'MD' WHERE id = $1", [cast.transfer.id]),
    );
    const sender = await signIn(t.app, cast.sender.email);
    const receiver = await signIn(t.app, cast.receiver.email);
    const base = `/api/register/transfers/${cast.transfer.id}/notices`;

    // Before the animals arrive nothing is owed, and nothing can be marked.
    const early = await receiver.post(`${base}/md-import-report/done`, {});
    expect(early.status, JSON.stringify(early.body)).toBe(409);
    await checkIn(receiver, cast.transfer.id);

    const theirs = (await receiver.get(base)).body;
    expect(theirs.notices).toEqual([
      expect.objectContaining({ key: "md-import-report", citation: "COMAR 15.11.01.09", withinHours: 72, done: null }),
    ]);
    const ours = (await sender.get(base)).body;
    expect(ours.notices).toEqual([
      expect.objectContaining({
        key: "tx-out-of-state-shipment",
        citation: "31 TAC 65.327",
        withinHours: 24,
        done: null,
      }),
    ]);

    // Denials first: the other side's notice, an unknown one, a stranger; then a rule this move does not call for.
    expect((await sender.post(`${base}/md-import-report/done`, {})).status).toBe(403);
    expect((await receiver.post(`${base}/no-such-notice/done`, {})).status).toBe(404);
    const stranger = await signIn(t.app, (await buildUser(em(), { role: "member" })).email);
    expect((await stranger.post(`${base}/md-import-report/done`, {})).status).toBe(404);
    expect((await stranger.get(base)).status).toBe(404);
    expect((await receiver.post(`${base}/tx-out-of-state-receipt/done`, {})).status).toBe(409);
    // Bad input is refused in plain words and stores nothing.
    const bad = await receiver.post(`${base}/md-import-report/done`, { reference: 42, extra: true });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBeTruthy();
    expect((await receiver.get(base)).body.notices[0].done).toBeNull();

    const marked = await receiver.post(`${base}/md-import-report/done`, {
      note: "Sent by e-mail to the regional office",
      reference: "MD-DNR-2026-0042",
    });
    expect(marked.status, JSON.stringify(marked.body)).toBe(201);
    expect(marked.body.notice.done).toMatchObject({
      byName: cast.receiver.displayName,
      note: "Sent by e-mail to the regional office",
      reference: "MD-DNR-2026-0042",
    });
    expect(Math.abs(Date.parse(marked.body.notice.done.at) - Date.now())).toBeLessThan(60_000);
    expect((await receiver.get(base)).body.notices[0].done).toEqual(marked.body.notice.done);
    // Marked once: a second mark is refused, and the sender's own notice is still to do.
    expect((await receiver.post(`${base}/md-import-report/done`, {})).status).toBe(409);
    expect((await sender.get(base)).body.notices[0].done).toBeNull();
    const senderMark = await sender.post(`${base}/tx-out-of-state-shipment/done`, {});
    expect(senderMark.status).toBe(201);
    expect(senderMark.body.notice.done).toMatchObject({ byName: cast.sender.displayName, note: null, reference: null });

    // Append-only: the app's own login can neither change nor remove a mark (D18).
    await expect(
      t.ctx.pool.query("UPDATE state_notice_done SET reference = 'X' WHERE transfer_id = $1", [cast.transfer.id]),
    ).rejects.toThrow(/permission denied/);
    await expect(
      t.ctx.pool.query("DELETE FROM state_notice_done WHERE transfer_id = $1", [cast.transfer.id]),
    ).rejects.toThrow(/permission denied/);
  });
});
