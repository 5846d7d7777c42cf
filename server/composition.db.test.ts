import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, signIn, type TestApp } from "../tests/support/app";
import { buildTransfer, buildUser } from "../tests/factories";
import type { Storage } from "./adapters/storage";
import { READY_GATE_ORDER } from "./composition";
import { pdfWithPages } from "../tests/support/scan-files";
import type { ReadyGate } from "./services/transfers/transition";

// Two apps in one process, built one after the other with different public URLs, gates and
// storage. Before the composition root, building the second app overwrote the first one's link
// base and weather source, and both used one process-wide list of gates filled by the routers.
const URL_A = "http://hatchway-a.example.test";
const URL_B = "https://hatchway-b.example.test/app";

/** A gate that lets everything through and remembers which transfers it saw. */
function recordingGate(name: string, seen: string[]): ReadyGate {
  return {
    name,
    async check({ transfer }) {
      seen.push(`${name}:${transfer.id}`);
    },
  };
}

/** Storage in memory: what app B stores never leaves the test. */
function memoryStorage(objects: Map<string, Buffer>): Storage {
  return {
    async putObject(key, body) {
      objects.set(key, body);
    },
    async getObjectStream() {
      throw new Error("not read in this test");
    },
    async deleteObject(key) {
      objects.delete(key);
    },
  };
}

let a: TestApp;
let b: TestApp;
const seenByB: string[] = [];
const storedByB = new Map<string, Buffer>();

beforeAll(async () => {
  a = await createTestApp({ PUBLIC_URL: URL_A });
  b = await createTestApp(
    { PUBLIC_URL: URL_B },
    {
      readyGates: [recordingGate("first", seenByB), recordingGate("second", seenByB)],
      adapters: { storage: memoryStorage(storedByB) },
    },
  );
});
afterAll(async () => {
  await a.close();
  await b.close();
});

/** Confirms a transfer waiting for its receiver through one app's HTTP API. */
async function confirmThrough(app: TestApp) {
  const cast = await buildTransfer(app.orm.em.fork(), { status: "awaiting_receiver", app: app.ctx });
  const receiver = await signIn(app.app, cast.receiver.email);
  const res = await receiver.post(`/api/transfers/${cast.transfer.id}/transition`, {
    to: "ready",
    override: true,
    reason: "Two-app test: no weather service here.",
  });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return cast;
}

const outboxFor = async (app: TestApp, number: string) =>
  (
    await app.ctx.pool.query<{ text_body: string }>(
      "SELECT text_body FROM outbox_message WHERE subject LIKE '%' || $1 || '%' ORDER BY created_at",
      [number],
    )
  ).rows.map((row) => row.text_body);

const countRows = async (app: TestApp, table: string, transferId: string) =>
  Number(
    (await app.ctx.pool.query(`SELECT count(*) AS n FROM ${table} WHERE transfer_id = $1`, [transferId])).rows[0].n,
  );

describe("two apps built in one process", () => {
  it("each holds its own context: links, gates, adapters, tasks and outbox", () => {
    expect(a.ctx.links.base).toBe(URL_A);
    expect(b.ctx.links.base).toBe(URL_B);
    expect(a.ctx.readyGates.map((gate) => gate.name)).toEqual([...READY_GATE_ORDER]);
    expect(a.ctx.readyGates.map((gate) => gate.name)).toEqual(["compliance", "temperature"]);
    expect(b.ctx.readyGates.map((gate) => gate.name)).toEqual(["first", "second"]);
    for (const part of ["adapters", "outbox", "forecastSource", "scheduledTasks", "manifestExtras"] as const)
      expect(a.ctx[part]).not.toBe(b.ctx[part]);
    expect(a.ctx.adapters.mailer).not.toBe(b.ctx.adapters.mailer);
    expect(a.ctx.adapters.weather).not.toBe(b.ctx.adapters.weather);
    expect(Object.isFrozen(a.ctx)).toBe(true);
    expect(Object.isFrozen(a.ctx.readyGates)).toBe(true);
    // What the two contexts do hold in common (the compliance gate, the task definitions) cannot be changed.
    for (const shared of [...a.ctx.readyGates, ...a.ctx.scheduledTasks, a.ctx.links, a.ctx.adapters])
      expect(Object.isFrozen(shared)).toBe(true);
  });

  it("app A, built first, still runs its own gates in order and links to its own URL", async () => {
    const cast = await confirmThrough(a);
    // The compliance gate kept its evaluation; the temperature gate its check and the logged override.
    expect(await countRows(a, "compliance_evaluation", cast.transfer.id)).toBe(1);
    expect(await countRows(a, "temperature_check", cast.transfer.id)).toBe(1);
    const custody = (await (await signIn(a.app, cast.receiver.email)).get(`/api/transfers/${cast.transfer.id}/custody`))
      .body.entries as { kind: string; payload: Record<string, unknown> }[];
    // In gate order: the acknowledged "unverified" rules check (no state on the route is reviewed), then the temperature.
    expect(custody.filter((e) => e.kind === "override").map((e) => e.payload.gate)).toEqual([
      "compliance",
      "temperature",
    ]);
    expect(custody.some((e) => e.kind === "checks_skipped")).toBe(false);
    // B's gates never saw A's transfer.
    expect(seenByB.filter((s) => s.endsWith(cast.transfer.id))).toEqual([]);

    const mails = await outboxFor(a, cast.transfer.number);
    expect(mails.length).toBeGreaterThan(0);
    for (const text of mails) {
      expect(text).toContain(`${URL_A}/transfers/${cast.transfer.id}`);
      expect(text).not.toContain(URL_B);
    }
  });

  it("app B runs only its gates, in its order, and links to its own URL", async () => {
    const cast = await confirmThrough(b);
    expect(seenByB.filter((s) => s.endsWith(cast.transfer.id))).toEqual([
      `first:${cast.transfer.id}`,
      `second:${cast.transfer.id}`,
    ]);
    // Neither of A's gates ran: no evaluation, no temperature check.
    expect(await countRows(b, "compliance_evaluation", cast.transfer.id)).toBe(0);
    expect(await countRows(b, "temperature_check", cast.transfer.id)).toBe(0);

    const mails = await outboxFor(b, cast.transfer.number);
    expect(mails.length).toBeGreaterThan(0);
    for (const text of mails) {
      expect(text).toContain(`${URL_B}/transfers/${cast.transfer.id}`);
      expect(text).not.toContain(URL_A);
    }
  });

  it("each app stores files through its own storage adapter", async () => {
    // A real one-page PDF: the server opens every scan (D21).
    const pdf = await pdfWithPages(1);
    const user = await buildUser(a.orm.em.fork());
    const permit = {
      kind: "state_import_permit",
      jurisdiction: "OR",
      number: "DEMO-OR-TWOAPP",
      holderName: "Demo Keepers",
      speciesCovered: ["Pantherophis guttatus"],
      validFrom: "2026-01-01",
      validTo: "2027-12-31",
      issuedOn: "2026-01-01",
      veterinarianName: null,
      veterinarianAccredited: null,
      inspectionDate: null,
      statements: [],
      animalsCovered: [],
    };
    const upload = async (app: TestApp) => {
      const client = await signIn(app.app, user.email);
      const doc = await client.post("/api/documents", permit).expect(201);
      return client.agent
        .post(`/api/documents/${doc.body.document.id}/scans`)
        .set("X-CSRF-Token", client.csrf)
        .set("Content-Type", "application/pdf")
        .send(pdf);
    };
    const viaB = await upload(b);
    expect(viaB.status, JSON.stringify(viaB.body)).toBe(201);
    expect([...storedByB.values()]).toEqual([pdf]);
    // A's storage is the S3 endpoint of its environment (nothing listens there): a 503, and B's memory is untouched.
    const viaA = await upload(a);
    expect(viaA.status).toBe(503);
    expect(storedByB.size).toBe(1);
  });
});
