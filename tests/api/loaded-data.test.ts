import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, databaseUrlAs, signIn, type TestApp } from "../support/app";
import { buildTransfer } from "../factories";
import { prepareDatabase } from "../../scripts/lib/prepare-db";
import { seedBenchData } from "../../scripts/lib/bench-data";

// The demo scenario and the benchmark's data are loaded through the real services but past the
// ready-to-ship gates (gatesForLoadedData in server/composition.ts). The data must say so.
const DEMO_URL = "http://demo.hatchway.example.test:3101";

let t: TestApp;
let benchDetailId: string;

beforeAll(async () => {
  t = await createTestApp();
  // Loaded as the owner role, like `npm start` and the benchmark do (D18).
  const { seeded } = await prepareDatabase(databaseUrlAs("owner"), { seed: true, publicUrl: DEMO_URL });
  expect(seeded).toBe(true);
  ({ detailId: benchDetailId } = await seedBenchData(databaseUrlAs("owner"), DEMO_URL, 3));
}, 120_000);
afterAll(() => t.close());

type Row = { transfer_id: string; number: string; skipped: { seq: number; payload: Record<string, unknown> }[] };

/** Every transfer that reached "ready" by a status change, with its checks-skipped entries. */
async function clearedTransfers(): Promise<(Row & { ready_seq: number })[]> {
  const { rows } = await t.ctx.pool.query<Row & { ready_seq: number }>(
    `SELECT t.id AS transfer_id, t.number, r.seq AS ready_seq,
            coalesce((SELECT json_agg(json_build_object('seq', s.seq, 'payload', s.payload) ORDER BY s.seq)
                        FROM custody_entry s WHERE s.transfer_id = t.id AND s.kind = 'checks_skipped'), '[]') AS skipped
       FROM transfer t
       JOIN custody_entry r ON r.transfer_id = t.id AND r.kind = 'status_change' AND r.payload->>'to' = 'ready'
      WHERE t.number NOT LIKE 'HW-BENCH-%'`,
  );
  return rows;
}

describe("demo and bench data written past the gates", () => {
  it("say so in each custody log, right before the step to ready, naming the checks not run", async () => {
    const cleared = await clearedTransfers();
    // The demo has transfers at every stage from "ready" on, and the bench its detail transfer.
    expect(cleared.length).toBeGreaterThanOrEqual(4);
    expect(cleared.map((c) => c.transfer_id)).toContain(benchDetailId);
    for (const row of cleared) {
      expect(row.skipped, row.number).toHaveLength(1);
      const [entry] = row.skipped;
      expect(entry!.seq).toBe(row.ready_seq - 1);
      expect(entry!.payload.loadedAs).toBe(row.transfer_id === benchDetailId ? "bench" : "demo");
      expect(entry!.payload.checksNotRun).toEqual(["compliance", "temperature"]);
      expect(String(entry!.payload.reason)).toMatch(/without the compliance and temperature checks/);
    }
    // Nothing pretends the checks ran: no stored evaluation and no gate check for those transfers.
    const ids = cleared.map((c) => c.transfer_id);
    const evaluations = await t.ctx.pool.query("SELECT 1 FROM compliance_evaluation WHERE transfer_id = ANY($1)", [
      ids,
    ]);
    const gateChecks = await t.ctx.pool.query(
      "SELECT 1 FROM temperature_check WHERE mark = 'gate' AND transfer_id = ANY($1)",
      [ids],
    );
    expect(evaluations.rowCount).toBe(0);
    expect(gateChecks.rowCount).toBe(0);
  });

  it("the transfer API shows it, and the custody chain stays intact", async () => {
    const sender = await signIn(t.app, "sender@demo.hatchway.test");
    const { transfers } = (await sender.get("/api/transfers?limit=50").expect(200)).body as {
      transfers: { id: string; status: string; number: string }[];
    };
    const demo = transfers.filter((x) => !x.number.startsWith("HW-BENCH-"));
    const cleared = new Set((await clearedTransfers()).map((c) => c.transfer_id));
    let shown = 0;
    for (const summary of demo) {
      const { transfer } = (await sender.get(`/api/transfers/${summary.id}`).expect(200)).body;
      if (cleared.has(summary.id)) {
        shown++;
        expect(transfer.loadedWithoutChecks).toMatchObject({
          loadedAs: summary.id === benchDetailId ? "bench" : "demo",
          checksNotRun: ["compliance", "temperature"],
        });
        expect(Date.parse(transfer.loadedWithoutChecks.at)).not.toBeNaN();
        const custody = (await sender.get(`/api/transfers/${summary.id}/custody`).expect(200)).body;
        expect(custody.intact).toBe(true);
      } else {
        // Drafts and transfers still waiting for the receiver never passed a gate.
        expect(transfer.loadedWithoutChecks).toBeNull();
      }
    }
    expect(shown).toBeGreaterThan(0);
  });

  it("a transfer cleared through an app's gates is not marked", async () => {
    const cast = await buildTransfer(t.orm.em.fork(), { status: "ready", app: t.ctx });
    const receiver = await signIn(t.app, cast.receiver.email);
    const { transfer } = (await receiver.get(`/api/transfers/${cast.transfer.id}`).expect(200)).body;
    expect(transfer.loadedWithoutChecks).toBeNull();
  });

  it("the demo's e-mails link to the public URL it was seeded for", async () => {
    const { rows } = await t.ctx.pool.query<{ text_body: string }>(
      "SELECT text_body FROM outbox_message WHERE to_address LIKE '%@demo.hatchway.test' AND text_body LIKE '%/transfers/%'",
    );
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) expect(row.text_body).toContain(`${DEMO_URL}/transfers/`);
  });
});

describe("the demo's run (issue 16)", () => {
  it("puts the breeder's road transfer on an invented run of Nightjar's, which its dispatcher and courier read", async () => {
    const { rows } = await t.ctx.pool.query<{ run_id: string; transfer_id: string; kind: string }>(
      `SELECT rs.run_id, rs.transfer_id, rs.kind FROM run_stop rs JOIN run r ON r.id = rs.run_id
         JOIN organization o ON o.id = r.courier_organization_id WHERE o.name = 'Nightjar Ground Couriers' ORDER BY rs.position`,
    );
    expect(rows.map((r) => r.kind)).toEqual(["pickup", "dropoff"]);
    for (const email of ["dispatch@demo.hatchway.test", "courier@demo.hatchway.test"]) {
      const client = await signIn(t.app, email);
      const run = await client.get(`/api/runs/${rows[0]!.run_id}`);
      expect(run.status).toBe(200);
      expect(run.body.stops[0].place.city).toBe("Knoxville");
      expect(run.body.drivers.map((d: { displayName: string }) => d.displayName)).toEqual(["Juno Park"]);
    }
  });
});
