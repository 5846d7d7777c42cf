import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { buildTransfer, taxonId, type TransferCast } from "../factories";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

type Animal = { id: string; count: number; taxon: { scientificName: string } };

// CITES transport guideline Rp/3 1.72 and 1.82: sick, injured or dead animals found on arrival
// are recorded [published]. The register entry fields follow common practice for permit holders'
// collection records (species, sex, identifier, date acquired, source) [practice].
describe("check-in", () => {
  let cast: TransferCast;
  let receiver: Client;
  let animals: Animal[];
  beforeAll(async () => {
    cast = await buildTransfer(em(), {
      status: "delivered",
      animals: [
        { taxon: "Agalychnis callidryas", count: 5, box: "A" },
        { taxon: "Ambystoma mexicanum", count: 4, box: "B" },
      ],
    });
    receiver = await signIn(t.app, cast.receiver.email);
    animals = (await receiver.get(`/api/transfers/${cast.transfer.id}`)).body.transfer.animals;
  });

  const outcome = (
    a: Animal,
    o: Partial<Record<"arrivedWell" | "arrivedProblem" | "deadOnArrival" | "missing", number>>,
  ) => ({
    animalId: a.id,
    arrivedWell: 0,
    arrivedProblem: 0,
    deadOnArrival: 0,
    missing: 0,
    ...o,
  });

  it("refuses outcomes that do not add up to the manifest count, and a missing line", async () => {
    const short = await receiver
      .post(`/api/transfers/${cast.transfer.id}/check-in`, {
        items: [outcome(animals[0]!, { arrivedWell: 3 }), outcome(animals[1]!, { arrivedWell: 4 })],
        extras: [],
        signedName: "M",
        acknowledged: true,
      })
      .set("Idempotency-Key", randomUUID());
    expect(short.status).toBe(400);
    expect(short.body.error.field).toBe("items.0");
    const missingLine = await receiver
      .post(`/api/transfers/${cast.transfer.id}/check-in`, {
        items: [outcome(animals[0]!, { arrivedWell: 5 })],
        extras: [],
        signedName: "M",
        acknowledged: true,
      })
      .set("Idempotency-Key", randomUUID());
    expect(missingLine.status).toBe(400);
    expect(missingLine.body.error.field).toBe("items");
    const unsigned = await receiver
      .post(`/api/transfers/${cast.transfer.id}/check-in`, {
        items: [],
        extras: [],
        signedName: "M",
        acknowledged: false,
      })
      .set("Idempotency-Key", randomUUID());
    expect(unsigned.status).toBe(400);
    expect(unsigned.body.error.field).toBe("acknowledged");
  });

  it("records a dead-on-arrival frog, a missing axolotl and an unlisted animal, and computes the discrepancy", async () => {
    const res = await receiver
      .post(`/api/transfers/${cast.transfer.id}/check-in`, {
        items: [
          outcome(animals[0]!, { arrivedWell: 4, deadOnArrival: 1 }),
          outcome(animals[1]!, { arrivedWell: 2, arrivedProblem: 1, missing: 1 }),
        ],
        extras: [
          {
            taxonId: await taxonId(em(), "Ambystoma mexicanum"),
            count: 1,
            sex: "unknown",
            notes: "A fifth bag under the insert",
          },
        ],
        notes: "Opened in quarantine.",
        signedName: "Milo Faraday",
        acknowledged: true,
      })
      .set("Idempotency-Key", randomUUID());
    expect(res.status).toBe(201);
    const ci = res.body.transfer.checkIn;
    expect(res.body.transfer.status).toBe("checked_in");
    expect(ci.allAccountedFor).toBe(false);
    const frog = ci.discrepancies.find((d: { scientificName: string }) => d.scientificName === "Agalychnis callidryas");
    expect(frog).toMatchObject({ expected: 5, arrivedWell: 4, deadOnArrival: 1, missing: 0, extra: 0 });
    const axolotl = ci.discrepancies.find(
      (d: { scientificName: string }) => d.scientificName === "Ambystoma mexicanum",
    );
    expect(axolotl).toMatchObject({ expected: 4, arrivedWell: 2, arrivedProblem: 1, missing: 1, extra: 1 });
    const log = (await receiver.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    expect(log.intact).toBe(true);
    expect(log.entries.find((e: { kind: string }) => e.kind === "check_in").payload.summary).toBe(
      "6 arrived well, 1 with a problem, 1 dead on arrival, 1 missing, 1 not on the manifest.",
    );
  });

  it("a second check-in is refused", async () => {
    const again = await receiver
      .post(`/api/transfers/${cast.transfer.id}/check-in`, {
        items: animals.map((a) => outcome(a, { arrivedWell: a.count })),
        extras: [],
        signedName: "M",
        acknowledged: true,
      })
      .set("Idempotency-Key", randomUUID());
    expect(again.status).toBe(409);
  });

  it("puts the accepted animals in the receiver's register, and the losses as entries that record them", async () => {
    const reg = (await receiver.get("/api/register")).body.entries.filter(
      (e: { transferId: string }) => e.transferId === cast.transfer.id,
    );
    const byKey = Object.fromEntries(
      reg.map((e: { taxon: { scientificName: string }; condition: string; count: number }) => [
        `${e.taxon.scientificName}/${e.condition}`,
        e.count,
      ]),
    );
    expect(byKey).toEqual({
      "Agalychnis callidryas/well": 4,
      "Agalychnis callidryas/dead_on_arrival": 1,
      "Ambystoma mexicanum/well": 2,
      "Ambystoma mexicanum/problem": 1,
      "Ambystoma mexicanum/missing": 1,
    });
    expect(reg[0].transferNumber).toBe(cast.transfer.number);
    const sender = await signIn(t.app, cast.sender.email);
    const theirs = (await sender.get("/api/register")).body.entries.filter(
      (e: { transferId: string }) => e.transferId === cast.transfer.id,
    );
    expect(theirs).toEqual([]);
  });

  it("filters the register and exports it as CSV with formula cells neutralised", async () => {
    const filtered = (await receiver.get(`/api/register?q=${encodeURIComponent("Agalychnis")}`)).body.entries;
    expect(
      filtered.every((e: { taxon: { scientificName: string } }) => e.taxon.scientificName === "Agalychnis callidryas"),
    ).toBe(true);
    const bad = await receiver.get("/api/register?sex=both");
    expect(bad.status).toBe(400);
    const csv = await receiver.get("/api/register.csv");
    expect(csv.status).toBe(200);
    expect(csv.headers["content-type"]).toMatch(/text\/csv/);
    expect(csv.headers["content-disposition"]).toMatch(/attachment; filename="collection-register-/);
    const lines = csv.text.trim().split("\n");
    expect(lines[0]).toBe(
      "Date acquired,Scientific name,Common name,Sex,Count,Identifier,Source organisation,Transfer,Condition on arrival,Weight at check-in (g),Notes",
    );
    expect(lines.some((l) => l.includes("Agalychnis callidryas") && l.includes(cast.transfer.number))).toBe(true);
  });
});

describe("CSV injection through user text", () => {
  it("a source organisation named like a formula is neutralised in the export", async () => {
    const cast = await buildTransfer(em(), {
      status: "delivered",
      animals: [{ taxon: "Pogona vitticeps", count: 1, box: "A" }],
    });
    await t.ctx.pool.query(
      "UPDATE organization SET name = '=HYPERLINK(\"http://evil.example\")' WHERE id = (SELECT sender_organization_id FROM transfer WHERE id = $1)",
      [cast.transfer.id],
    );
    const receiver = await signIn(t.app, cast.receiver.email);
    const view = (await receiver.get(`/api/transfers/${cast.transfer.id}`)).body.transfer;
    await receiver
      .post(`/api/transfers/${cast.transfer.id}/check-in`, {
        items: view.animals.map((a: Animal) => ({
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
    const csv = (await receiver.get("/api/register.csv")).text;
    expect(csv).toContain(`"'=HYPERLINK(""http://evil.example"")"`);
    expect(csv).not.toMatch(/(^|,)"?=HYPERLINK/m);
  });
});
