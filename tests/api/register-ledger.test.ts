import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { todayUtc } from "@shared/compliance/expiry";
import { addDays } from "@shared/temperature/zoned-time";
import { createTestApp, signIn, withDatabaseAs, type Client, type TestApp } from "../support/app";
import { buildTransfer, buildUser } from "../factories";
import { sendReportReminders } from "../../server/services/register/report-reminders";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const today = todayUtc();
const daysAgo = (n: number) => addDays(today, -n);

async function keeper(): Promise<Client> {
  const user = await buildUser(em(), { role: "member" });
  return signIn(t.app, user.email);
}

const clutch = (overrides: Record<string, unknown> = {}) => ({
  scientificName: "Pantherophis guttatus",
  count: 6,
  sex: "unknown",
  identifier: null,
  origin: "captive_bred",
  hatchDate: daysAgo(400),
  acquiredOn: daysAgo(300),
  source: { name: "Cedar Bluff Herp Club (demo)", permitNumber: "DEMO-IL-0042" },
  ...overrides,
});

async function permit(client: Client, overrides: Record<string, unknown> = {}) {
  const res = await client.post("/api/documents", {
    kind: "possession_permit",
    jurisdiction: "IL",
    number: `DEMO-${randomUUID().slice(0, 6)}`,
    holderName: "Demo keeper",
    speciesCovered: [],
    validFrom: null,
    validTo: null,
    issuedOn: null,
    veterinarianName: null,
    veterinarianAccredited: null,
    inspectionDate: null,
    statements: [],
    animalsCovered: [],
    ...overrides,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return (res.body.document ?? res.body).id as string;
}

// Florida 68A-6.008 and Illinois 885.140 ask for every acquisition, sale or transfer, birth and death
// with date, quantity, species, supplier and the supplier's permit [published, SOURCES.md].
describe("register entries and their events", () => {
  let client: Client;
  let entryId: string;
  beforeAll(async () => {
    client = await keeper();
  });

  it("adds a group already in care and records where it came from", async () => {
    const res = await client.post("/api/register/entries", clutch());
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    entryId = res.body.entry.id;
    expect(res.body.entry).toMatchObject({
      kind: "group",
      count: 6,
      countInCare: 6,
      status: "in_care",
      sourceOrganization: "Cedar Bluff Herp Club (demo)",
      sourcePermitNumber: "DEMO-IL-0042",
      origin: "captive_bred",
    });
    expect(res.body.events.map((e: { kind: string; count: number }) => [e.kind, e.count])).toEqual([["acquired", 6]]);
  });

  it("refuses bad input in plain words and stores nothing", async () => {
    const before = (await client.get("/api/register")).body.entries.length;
    const unknown = await client.post("/api/register/entries", clutch({ scientificName: "Pantherophis imaginarius" }));
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.message).toMatch(/not in the species list/);
    const chipGroup = await client.post("/api/register/entries", clutch({ identifier: "985112000000001" }));
    expect(chipGroup.status).toBe(400);
    expect(chipGroup.body.error.message).toMatch(/identifier names one animal/);
    const future = await client.post(
      "/api/register/entries",
      clutch({ acquiredOn: addDays(today, 3), hatchDate: null }),
    );
    expect(future.status).toBe(400);
    const missing = await client.post("/api/register/entries", { count: 1 });
    expect(missing.status).toBe(400);
    expect(missing.body.error.message).not.toMatch(/expected|invalid_type/i);
    expect((await client.get("/api/register")).body.entries.length).toBe(before);
  });

  it("sells 2 of 6 hatchlings, naming the buyer, and refuses to sell more than are held", async () => {
    const sold = await client.post(`/api/register/entries/${entryId}/events`, {
      kind: "sold",
      on: daysAgo(100),
      count: 2,
      note: null,
      counterparty: { name: "Demo Reptile Rescue", permitNumber: "DEMO-TX-7" },
    });
    expect(sold.status, JSON.stringify(sold.body)).toBe(201);
    expect(sold.body.entry.countInCare).toBe(4);
    expect(sold.body.event).toMatchObject({
      kind: "sold",
      count: 2,
      counterparty: { name: "Demo Reptile Rescue", permitNumber: "DEMO-TX-7" },
    });
    const oversold = await client.post(`/api/register/entries/${entryId}/events`, {
      kind: "died",
      on: daysAgo(50),
      count: 5,
    });
    expect(oversold.status).toBe(400);
    expect(oversold.body.error.message).toMatch(/fewer than none/);
    const noBuyer = await client.post(`/api/register/entries/${entryId}/events`, {
      kind: "sold",
      on: daysAgo(5),
      count: 1,
    });
    expect(noBuyer.status).toBe(400);
    const badKind = await client.post(`/api/register/entries/${entryId}/events`, {
      kind: "vanished",
      on: daysAgo(5),
      count: 1,
    });
    expect(badKind.status).toBe(400);
  });

  it("corrects an event with a new one that points at it, keeping both", async () => {
    const died = await client.post(`/api/register/entries/${entryId}/events`, {
      kind: "died",
      on: daysAgo(40),
      count: 2,
      cause: "Respiratory infection",
    });
    expect(died.status).toBe(201);
    const correction = await client.post(`/api/register/entries/${entryId}/events`, {
      kind: "died",
      on: daysAgo(40),
      count: 1,
      cause: "Respiratory infection",
      corrects: died.body.event.id,
    });
    expect(correction.status).toBe(201);
    expect(correction.body.entry.countInCare).toBe(3);
    const view = (await client.get(`/api/register/entries/${entryId}`)).body;
    const original = view.events.find((e: { id: string }) => e.id === died.body.event.id);
    expect(original.replacedById).toBe(correction.body.event.id);
    const again = await client.post(`/api/register/entries/${entryId}/events`, {
      kind: "voided",
      on: daysAgo(40),
      corrects: died.body.event.id,
    });
    expect(again.status).toBe(409);
    // The ledger itself refuses changes, even to the app's own login (D18).
    await expect(
      t.ctx.pool.query("UPDATE register_event SET count = 9 WHERE id = $1", [original.id]),
    ).rejects.toThrow();
  });

  it("splits a group, and the new entry starts with the animals split off", async () => {
    const split = await client.post(`/api/register/entries/${entryId}/split`, {
      count: 1,
      on: daysAgo(10),
      identifier: "985112000000777",
    });
    expect(split.status, JSON.stringify(split.body)).toBe(201);
    expect(split.body.entry).toMatchObject({
      kind: "individual",
      countInCare: 1,
      parentEntryId: entryId,
      identifier: "985112000000777",
    });
    const parent = (await client.get(`/api/register/entries/${entryId}`)).body.entry;
    expect(parent.countInCare).toBe(2);
  });

  it("answers 404 for another organisation's entry and 400 for a malformed id", async () => {
    const other = await keeper();
    expect((await other.get(`/api/register/entries/${entryId}`)).status).toBe(404);
    expect(
      (await other.post(`/api/register/entries/${entryId}/events`, { kind: "note", on: today, note: "x" })).status,
    ).toBe(404);
    expect((await client.get("/api/register/entries/not-an-id")).status).toBe(400);
  });
});

describe("the CSV import", () => {
  it("imports nothing while any row is wrong, naming each bad row, then imports every row", async () => {
    const client = await keeper();
    const bad = [
      "scientificName,count,sex,identifier,origin,hatchDate,acquiredOn,source.name,source.permitNumber",
      `Python regius,1,Female,985112000001234,Captive bred,${daysAgo(900)},${daysAgo(800)},Demo Exotics,DEMO-FL-3`,
      `Python imaginarius,2,unknown,,,,${daysAgo(20)},,`,
      `Pogona vitticeps,three,male,,,,${daysAgo(20)},,`,
      `Pogona vitticeps,1,male,,,,not a date,,`,
    ].join("\n");
    const refused = await client.post("/api/register/import", undefined).set("Content-Type", "text/csv").send(bad);
    expect(refused.status).toBe(400);
    expect(refused.body.rows.map((r: { row: number }) => r.row)).toEqual([4, 5]);
    // Species are checked once the shapes are right: the unknown name comes back on its own.
    const fixedShapes = bad.split("\n").slice(0, 3).join("\n");
    const unknown = await client
      .post("/api/register/import", undefined)
      .set("Content-Type", "text/csv")
      .send(fixedShapes);
    expect(unknown.status).toBe(400);
    expect(unknown.body.rows).toEqual([
      expect.objectContaining({ row: 3, message: expect.stringMatching(/not in the species list/) }),
    ]);
    expect((await client.get("/api/register")).body.entries).toEqual([]);
    const good = [bad.split("\n")[0], bad.split("\n")[1], `Pogona vitticeps,3,unknown,,,,${daysAgo(20)},,`].join("\n");
    const imported = await client.post("/api/register/import", undefined).set("Content-Type", "text/csv").send(good);
    expect(imported.status, JSON.stringify(imported.body)).toBe(200);
    expect(imported.body).toEqual({ imported: 2 });
    const entries = (await client.get("/api/register")).body.entries;
    expect(
      entries
        .map((e: { taxon: { scientificName: string }; countInCare: number }) => [e.taxon.scientificName, e.countInCare])
        .sort(),
    ).toEqual([
      ["Pogona vitticeps", 3],
      ["Python regius", 1],
    ]);
    expect(
      entries.find((e: { sex: string; identifier: string | null }) => e.identifier === "985112000001234").sex,
    ).toBe("female");
  });

  it("neutralises formula-looking cells on export (OWASP CSV injection) [published]", async () => {
    const client = await keeper();
    await client.post(
      "/api/register/entries",
      clutch({ source: { name: '=HYPERLINK("http://evil.example")', permitNumber: null } }),
    );
    const csv = (await client.get("/api/register.csv")).text;
    expect(csv).toContain(`"'=HYPERLINK(""http://evil.example"")"`);
    expect(csv).not.toMatch(/(^|,)"?=HYPERLINK/m);
  });
});

describe("the yearly report", () => {
  it("counts per species with start + in − out = end, lists each event, and downloads as CSV and PDF", async () => {
    const client = await keeper();
    const permitId = await permit(client);
    const year = Number(today.slice(0, 4)) - 1;
    const from = `${year}-01-01`;
    const to = `${year}-12-31`;
    const before = await client.post(
      "/api/register/entries",
      clutch({ acquiredOn: `${year - 1}-06-01`, hatchDate: `${year - 1}-05-01`, permitIds: [permitId] }),
    );
    const id = before.body.entry.id;
    const post = (body: Record<string, unknown>) => client.post(`/api/register/entries/${id}/events`, body);
    expect(
      (
        await post({
          kind: "sold",
          on: `${year}-03-01`,
          count: 2,
          counterparty: { name: "Demo Buyer", address: "1 Demo Road, Springfield, IL 62701", permitNumber: "DEMO-9" },
        })
      ).status,
    ).toBe(201);
    expect((await post({ kind: "died", on: `${year}-04-01`, count: 1 })).status).toBe(201);
    expect((await post({ kind: "escaped", on: `${year}-05-01`, count: 1 })).status).toBe(201);
    expect(
      (await post({ kind: "acquired", on: `${year}-06-01`, count: 3, counterparty: { name: "Demo Breeder" } })).status,
    ).toBe(201);
    // A death recorded in error and withdrawn counts for nothing; a wrong count corrected counts as corrected.
    const mistaken = await post({ kind: "died", on: `${year}-08-01`, count: 1 });
    expect((await post({ kind: "voided", on: `${year}-08-01`, corrects: mistaken.body.event.id })).status).toBe(201);
    const hatch = await client.post(
      "/api/register/entries",
      clutch({
        acquiredOn: `${year}-07-01`,
        hatchDate: `${year}-07-01`,
        source: null,
        count: 4,
        permitIds: [permitId],
      }),
    );
    expect(hatch.status).toBe(201);
    const report = await client.get(`/api/register/report?permitId=${permitId}&from=${from}&to=${to}`);
    expect(report.status, JSON.stringify(report.body)).toBe(200);
    const [corn] = report.body.species;
    // SOURCES.md "Records and reports": start + acquired + hatched − died − transferred out − escaped or released = end [practice].
    expect(corn).toMatchObject({
      scientificName: "Pantherophis guttatus",
      start: 6,
      acquired: 3,
      hatched: 4,
      died: 1,
      transferredOut: 2,
      escapedOrReleased: 1,
      end: 9,
    });
    expect(corn.start + corn.acquired + corn.hatched - corn.died - corn.transferredOut - corn.escapedOrReleased).toBe(
      corn.end,
    );
    expect(corn.events[0]).toMatchObject({
      on: `${year}-03-01`,
      kind: "sold",
      count: 2,
      counterparty: { name: "Demo Buyer", address: "1 Demo Road, Springfield, IL 62701", permitNumber: "DEMO-9" },
    });
    const csv = await client.get(`/api/register/report?permitId=${permitId}&from=${from}&to=${to}&format=csv`);
    expect(csv.headers["content-type"]).toMatch(/text\/csv/);
    expect(csv.text).toContain("Pantherophis guttatus,6,3,4,1,2,1,9");
    const pdf = await client
      .get(`/api/register/report?permitId=${permitId}&from=${from}&to=${to}&format=pdf`)
      .buffer(true);
    expect(pdf.headers["content-type"]).toBe("application/pdf");
    expect(Buffer.from(pdf.body).subarray(0, 5).toString()).toBe("%PDF-");
    const other = await keeper();
    expect((await other.get(`/api/register/report?permitId=${permitId}&from=${from}&to=${to}`)).status).toBe(404);
    expect((await client.get(`/api/register/report?permitId=${permitId}&from=${to}&to=${from}`)).status).toBe(400);
  });

  it("keeps a permit's reporting year and e-mails 30 and 7 days before the due date, once each", async () => {
    const client = await keeper();
    const permitId = await permit(client);
    // Texas nongame dealer: 1 August–31 July, due 15 August (31 TAC 65.330) [published, SOURCES.md].
    const set = await client.put(`/api/register/permits/${permitId}/reporting`, {
      reportStartMonth: 8,
      reportDueMonth: 8,
      reportDueDay: 15,
    });
    expect(set.status).toBe(200);
    const listed = (await client.get("/api/register/permits")).body.permits.find(
      (p: { id: string }) => p.id === permitId,
    );
    expect(listed.nextReport.dueOn).toMatch(/-08-15$/);
    const sent = async (day: string) => {
      await sendReportReminders(t.ctx, day);
      const { rows } = await t.ctx.pool.query(
        `SELECT subject FROM outbox_message WHERE topic = 'register.report-due' AND subject LIKE '%' || (SELECT number FROM permit_document WHERE id = $1) || '%'`,
        [permitId],
      );
      return rows.length;
    };
    expect(await sent("2031-07-01")).toBe(0);
    expect(await sent("2031-07-16")).toBe(1);
    expect(await sent("2031-07-17")).toBe(1);
    expect(await sent("2031-08-08")).toBe(2);
    expect(await sent("2031-08-09")).toBe(2);
    expect(
      (
        await client.put(`/api/register/permits/${permitId}/reporting`, {
          reportStartMonth: 13,
          reportDueMonth: 8,
          reportDueDay: 15,
        })
      ).status,
    ).toBe(400);
  });
});

describe("from keeper to keeper", () => {
  it("starts a transfer from the register; check-in moves the animal's life to the receiver, with quarantine", async () => {
    const cast = await buildTransfer(em(), {
      status: "delivered",
      animals: [{ taxon: "Python regius", count: 1, box: "A", identifier: "985112000009999" }],
    });
    const sender = await signIn(t.app, cast.sender.email);
    const receiver = await signIn(t.app, cast.receiver.email);
    const mine = await sender.post("/api/register/entries", {
      scientificName: "Python regius",
      count: 1,
      sex: "female",
      identifier: "985112000009999",
      origin: "captive_bred",
      hatchDate: daysAgo(700),
      acquiredOn: daysAgo(600),
      source: null,
    });
    expect(mine.status).toBe(201);
    const lines = await sender.get(`/api/register/transfer-lines?ids=${mine.body.entry.id}`);
    expect(lines.status).toBe(200);
    expect(lines.body.animals[0]).toMatchObject({
      registerEntryId: mine.body.entry.id,
      count: 1,
      sex: "female",
      identifier: "985112000009999",
      hatchDate: daysAgo(700),
    });
    // The line is linked as the new-transfer form would send it.
    await withDatabaseAs("admin", (db) =>
      db.query("UPDATE animal SET register_entry_id = $1, sex = 'female' WHERE transfer_id = $2", [
        mine.body.entry.id,
        cast.transfer.id,
      ]),
    );
    // A move from Pennsylvania into Maryland: the import report within 72 h (COMAR 15.11.01.09) [published].
    await withDatabaseAs("admin", (db) =>
      db.query("UPDATE transfer SET origin_state = 'PA', destination_state = 'MD' WHERE id = $1", [cast.transfer.id]),
    );
    expect((await receiver.get(`/api/register/transfers/${cast.transfer.id}/notices`)).body).toEqual({
      arrived: false,
      notices: [],
    });
    const view = (await receiver.get(`/api/transfers/${cast.transfer.id}`)).body.transfer;
    const checkIn = await receiver
      .post(`/api/transfers/${cast.transfer.id}/check-in`, {
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
    expect(checkIn.status, JSON.stringify(checkIn.body)).toBe(201);
    const senderEntry = (await sender.get(`/api/register/entries/${mine.body.entry.id}`)).body;
    expect(senderEntry.entry).toMatchObject({ countInCare: 0, status: "transferred_out" });
    const out = senderEntry.events.find((e: { kind: string }) => e.kind === "transferred_out");
    expect(out).toMatchObject({ count: 1, transferId: cast.transfer.id });
    expect(out.counterparty.name).toBe(view.receiver?.name ?? out.counterparty.name);
    const theirs = (await receiver.get("/api/register")).body.entries.find(
      (e: { transferId: string }) => e.transferId === cast.transfer.id,
    );
    expect(theirs).toMatchObject({
      identifier: "985112000009999",
      hatchDate: daysAgo(700),
      origin: "captive_bred",
      previousEntryId: mine.body.entry.id,
    });
    // Default quarantine: 60 days from check-in [practice: SOURCES.md, 30–90 days common].
    expect(theirs.quarantine).toMatchObject({ startedOn: today, until: addDays(today, 60), daysLeft: 60 });
    const history = (await receiver.get(`/api/register/entries/${theirs.id}`)).body;
    expect(history.earlier[0].entry.id).toBe(mine.body.entry.id);
    expect(history.earlier[0].events.map((e: { kind: string }) => e.kind)).toEqual(["acquired", "transferred_out"]);
    const inQuarantine = (await receiver.get("/api/register?quarantine=yes")).body.entries.map(
      (e: { id: string }) => e.id,
    );
    expect(inQuarantine).toContain(theirs.id);
    const notices = (await receiver.get(`/api/register/transfers/${cast.transfer.id}/notices`)).body;
    expect(notices.notices).toEqual([expect.objectContaining({ citation: "COMAR 15.11.01.09", withinHours: 72 })]);
    expect(Date.parse(notices.notices[0].dueAt) - Date.parse(notices.notices[0].startedAt)).toBe(72 * 3_600_000);
  });

  it("keeps a longer quarantine for a genus or a species, checked against the catalogue", async () => {
    const client = await keeper();
    // Longer for boas [practice: SOURCES.md, "Records and reports"]; 120 days is this keeper's own choice.
    const saved = await client.put("/api/register/settings", {
      quarantineDays: 60,
      overrides: [{ name: "boa", days: 120 }],
    });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    expect(saved.body).toEqual({ quarantineDays: 60, overrides: [{ name: "Boa", days: 120 }] });
    const boa = await client.post(
      "/api/register/entries",
      clutch({
        scientificName: "Boa constrictor",
        acquiredOn: daysAgo(0),
        hatchDate: null,
        startQuarantine: true,
        source: null,
      }),
    );
    expect(boa.status, JSON.stringify(boa.body)).toBe(201);
    expect(boa.body.entry.quarantine).toMatchObject({ until: addDays(daysAgo(0), 120) });
    const other = await client.post(
      "/api/register/entries",
      clutch({ acquiredOn: daysAgo(0), hatchDate: null, startQuarantine: true, source: null }),
    );
    expect(other.body.entry.quarantine).toMatchObject({ until: addDays(daysAgo(0), 60) });

    // A name the catalogue does not know is refused on its row, and nothing changes.
    const bad = await client.put("/api/register/settings", {
      quarantineDays: 30,
      overrides: [
        { name: "Python regius", days: 90 },
        { name: "Notagenus fakeus", days: 90 },
      ],
    });
    expect([bad.status, bad.body.error.field]).toEqual([400, "overrides.1.name"]);
    expect((await client.get("/api/register/settings")).body).toEqual({
      quarantineDays: 60,
      overrides: [{ name: "Boa", days: 120 }],
    });
  });

  it("restarts a quarantine group's clock when animals are added, with the organisation's length", async () => {
    const client = await keeper();
    expect((await client.put("/api/register/settings", { quarantineDays: 90 })).status).toBe(200);
    const group = await client.post(
      "/api/register/entries",
      clutch({ acquiredOn: daysAgo(30), hatchDate: null, startQuarantine: true, source: null }),
    );
    expect(group.body.entry.quarantine).toMatchObject({ until: addDays(daysAgo(30), 90), daysLeft: 60 });
    const added = await client.post(`/api/register/entries/${group.body.entry.id}/events`, {
      kind: "acquired",
      on: daysAgo(2),
      count: 2,
      counterparty: { name: "Demo Breeder" },
    });
    expect(added.status).toBe(201);
    expect(added.body.entry.quarantine).toMatchObject({ startedOn: daysAgo(2), daysLeft: 88 });
  });

  it("pages the register by keyset and filters by status", async () => {
    const client = await keeper();
    for (let i = 0; i < 5; i++)
      await client.post(
        "/api/register/entries",
        clutch({ acquiredOn: daysAgo(10 + i), hatchDate: null, count: 1 + i }),
      );
    const first = (await client.get("/api/register?limit=2")).body;
    expect(first.entries).toHaveLength(2);
    const second = (await client.get(`/api/register?limit=2&cursor=${first.nextCursor}`)).body;
    const third = (await client.get(`/api/register?limit=2&cursor=${second.nextCursor}`)).body;
    expect(
      [...first.entries, ...second.entries, ...third.entries].map((e: { dateAcquired: string }) => e.dateAcquired),
    ).toEqual([10, 11, 12, 13, 14].map(daysAgo));
    expect(third.nextCursor).toBeNull();
    expect((await client.get("/api/register?cursor=garbage")).status).toBe(400);
    expect((await client.get("/api/register?status=died")).body.entries).toEqual([]);
    expect((await client.get("/api/register?status=gone")).status).toBe(400);
  });
});
