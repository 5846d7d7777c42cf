import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addDays } from "@shared/temperature/zoned-time";
import { createTestApp, anonymousClient, signIn, type Client, type TestApp } from "../../../tests/support/app";
import { buildOrganization, buildTransfer, buildUser, markReviewed } from "../../../tests/factories";

let t: TestApp;
let member: Client;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
  member = await signIn(t.app, (await buildUser(em())).email);
});
afterAll(() => t.close());

type Finding = {
  ruleId: string;
  ruleVersion: number;
  jurisdiction: string;
  citation: { text: string; url: string | null };
  severity: string;
  message: string;
  satisfiedBy: { kind: string; id?: string; number?: string } | null;
  missing?: string;
};
type Result = {
  verdict: string;
  shipmentFindings: Finding[];
  animals: { scientificName: string; findings: Finding[] }[];
  rulesUsed: { ruleId: string; version: number }[];
};

/** A what-if body: one captive-bred animal from Tennessee to Ohio, private keeping, no sale. */
function whatIf(animal: Record<string, unknown>, over: Record<string, unknown> = {}) {
  return {
    originState: "TN",
    destinationState: "OH",
    transitStates: [],
    shipDate: "2026-05-12",
    purpose: "private_keeping",
    sale: false,
    animals: [{ count: 1, lengthMm: null, origin: "captive_bred", sex: "unknown", ...animal }],
    documents: [],
    ...over,
  };
}

async function evaluate(body: unknown, client = member): Promise<Result> {
  const res = await client.post("/api/compliance/evaluate", body);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as Result;
}

/** A finding on one line, or said once for the whole shipment. */
const finding = (result: Result, ruleId: string, animal = 0) =>
  [...result.shipmentFindings, ...(result.animals[animal]?.findings ?? [])].find((f) => f.ruleId === ruleId);

// source: issue 12 §1 (product requirement): no rule stops these moves, but the seed library
// reviews no jurisdiction (and Ohio's rules are demo rules), so the verdict is "unverified", never "clear".
const NOTHING_STOPS_IT = "unverified";

const SMALL_TURTLES = "us-21cfr1240.62-small-turtles";
const LAND_TORTOISES = "us-9cfr74.1-land-tortoises";
const INJURIOUS = "us-18usc42-injurious-reptiles";
const HAWAII = "hi-hrs150a-6-live-snakes";
const OHIO_VENOMOUS = "demo-oh-import-venomous-snakes";

describe("POST /api/compliance/evaluate against published rules", () => {
  it("21 CFR 1240.62: a turtle of 100.0 mm may not be sold; one of 101.6 mm (4 in) may", async () => {
    // [published] 21 CFR 1240.62(b): carapace length less than 4 inches; 4 in = 101.6 mm (1 in = 25.4 mm, exact)
    const slider = (lengthMm: number) =>
      whatIf({ scientificName: "Trachemys scripta elegans", lengthMm }, { sale: true });
    const small = await evaluate(slider(100.0));
    expect(small.verdict).toBe("blocked");
    expect(finding(small, SMALL_TURTLES)).toMatchObject({ severity: "blocks", jurisdiction: "US", satisfiedBy: null });
    expect(finding(small, SMALL_TURTLES)?.citation.text).toContain("21 CFR 1240.62");
    const legal = await evaluate(slider(101.6));
    expect(finding(legal, SMALL_TURTLES)).toBeUndefined();
    expect(legal.verdict).toBe(NOTHING_STOPS_IT);
    // [published, secondary] 21 CFR 1240.62(d): bona fide educational or exhibition use is exempt
    expect(
      finding(await evaluate({ ...slider(100.0), purpose: "education_exhibition" }), SMALL_TURTLES),
    ).toBeUndefined();
    // [published] 21 CFR 1240.62(a): the sea-turtle families are not "turtles" under the rule
    expect(
      finding(
        await evaluate(whatIf({ scientificName: "Chelonia mydas", lengthMm: 60 }, { sale: true })),
        SMALL_TURTLES,
      ),
    ).toBeUndefined();
  });

  it("9 CFR 74.1: a leopard tortoise needs a tick-free CVI from an accredited vet within 30 days, found through the old genus Geochelone", async () => {
    // [published] 9 CFR 74.1: certificate issued within 30 days before the interstate movement, "examined and found free of ticks";
    // [published] Gregorian calendar: 2026-04-12 is 30 days before 2026-05-12, 2026-04-11 is 31
    const cvi = (issuedOn: string) => ({
      kind: "cvi",
      jurisdiction: "TN",
      speciesCovered: ["Geochelone"],
      validFrom: null,
      validTo: null,
      issuedOn,
      statements: ["Examined and found free of ticks."],
      number: "DEMO-CVI-TN-0412",
      veterinarianAccredited: true,
    });
    const tortoise = (issuedOn: string) =>
      whatIf({ scientificName: "Geochelone pardalis", count: 2 }, { documents: [cvi(issuedOn)] });
    const day30 = await evaluate(tortoise("2026-04-12"));
    // The synonym is resolved through the species list and echoed as sent.
    expect(day30.animals[0]?.scientificName).toBe("Geochelone pardalis");
    expect(finding(day30, LAND_TORTOISES)?.satisfiedBy).toMatchObject({ kind: "cvi", number: "DEMO-CVI-TN-0412" });
    expect(day30.verdict).toBe(NOTHING_STOPS_IT);
    const day31 = await evaluate(tortoise("2026-04-11"));
    expect(day31.verdict).toBe("needs_documents");
    expect(finding(day31, LAND_TORTOISES)?.message).toContain("issued 31 days before the ship date");
    // [published] 9 CFR 74.1: the certificate is signed by an accredited veterinarian
    const unaccredited = await evaluate(
      whatIf(
        { scientificName: "Stigmochelys pardalis" },
        { documents: [{ ...cvi("2026-05-01"), veterinarianAccredited: false }] },
      ),
    );
    expect(finding(unaccredited, LAND_TORTOISES)?.satisfiedBy).toBeNull();
    // [published] 9 CFR 74.1 covers interstate movement only: a move within Tennessee needs no certificate
    expect(
      finding(
        await evaluate(whatIf({ scientificName: "Stigmochelys pardalis" }, { destinationState: "TN" })),
        LAND_TORTOISES,
      ),
    ).toBeUndefined();
  });

  it("18 U.S.C. 42: a Burmese python may go between two continental states but not to Hawaii", async () => {
    // [published] USARK v. Zinke, 852 F.3d 1131 (D.C. Cir. 2017): the shipment clause does not reach moves between the continental states;
    // 50 CFR 16.15 lists Python molurus including P. bivittatus
    const continental = await evaluate(whatIf({ scientificName: "Python bivittatus" }));
    expect(finding(continental, INJURIOUS)).toBeUndefined();
    expect(continental.verdict).toBe(NOTHING_STOPS_IT);
    const toHawaii = await evaluate(
      whatIf({ scientificName: "Python molurus bivittatus" }, { originState: "CA", destinationState: "HI" }),
    );
    expect(finding(toHawaii, INJURIOUS)).toMatchObject({ severity: "blocks", satisfiedBy: null });
    expect(finding(toHawaii, INJURIOUS)?.citation.text).toContain("18 U.S.C. 42");
    expect(toHawaii.verdict).toBe("blocked");
  });

  it("HRS 150A-6: no live snake of any kind into Hawaii, but a lizard is not caught", async () => {
    // [published] HRS 150A-6(3): any live snake; the corn snake is harmless and captive-bred, the king snake a colubrid too
    for (const scientificName of [
      "Pantherophis guttatus",
      "Lampropeltis californiae",
      "Crotalus atrox",
      "Boa imperator",
    ]) {
      const result = await evaluate(whatIf({ scientificName }, { originState: "OR", destinationState: "HI" }));
      expect([scientificName, finding(result, HAWAII)?.severity, result.verdict]).toEqual([
        scientificName,
        "blocks",
        "blocked",
      ]);
    }
    expect(
      finding(
        await evaluate(whatIf({ scientificName: "Pogona vitticeps" }, { originState: "OR", destinationState: "HI" })),
        HAWAII,
      ),
    ).toBeUndefined();
    // [published] HRS 150A-6 is about bringing snakes into the state: leaving Hawaii is not caught
    expect(
      finding(
        await evaluate(
          whatIf({ scientificName: "Pantherophis guttatus" }, { originState: "HI", destinationState: "OR" }),
        ),
        HAWAII,
      ),
    ).toBeUndefined();
  });

  it("Ohio Rev. Code 1533.31: a shipment only passing through Ohio is outside Ohio's import rule; one to Ohio is not", async () => {
    // [published] Ohio Rev. Code 1533.31 (transit by carrier is not an import); the Ohio permit rule itself is demo data
    const through = await evaluate(
      whatIf(
        { scientificName: "Crotalus atrox" },
        { originState: "IN", destinationState: "PA", transitStates: ["OH"] },
      ),
    );
    expect(finding(through, OHIO_VENOMOUS)).toBeUndefined();
    const into = await evaluate(
      whatIf({ scientificName: "Crotalus atrox" }, { originState: "IN", destinationState: "OH" }),
    );
    expect(finding(into, OHIO_VENOMOUS)?.missing).toBe(
      "an import permit from Ohio naming Crotalus atrox, held by the receiver",
    );
    expect(finding(into, OHIO_VENOMOUS)?.citation.text).toContain("demo rule, not a statement of that state's law");
    expect(into.verdict).toBe("needs_documents");
  });

  it("answers the contract's fields for every finding and stores nothing", async () => {
    // source: the HTTP contract of the issue (not an outside value)
    const before = await em().getConnection().execute("SELECT count(*)::int AS n FROM compliance_evaluation");
    const result = await evaluate(whatIf({ scientificName: "Stigmochelys pardalis" }));
    for (const f of result.animals[0]!.findings) {
      expect(Object.keys(f)).toEqual(
        expect.arrayContaining(["ruleId", "jurisdiction", "citation", "severity", "message", "satisfiedBy"]),
      );
    }
    expect(result.rulesUsed).toEqual(expect.arrayContaining([{ ruleId: LAND_TORTOISES, version: 1 }]));
    expect(await em().getConnection().execute("SELECT count(*)::int AS n FROM compliance_evaluation")).toEqual(before);
  });
});

describe("POST /api/compliance/evaluate refuses", () => {
  it("an unknown species with a 400 that suggests close matches", async () => {
    // [practice] a one-letter typo of the leopard tortoise's name should still find it
    const res = await member.post("/api/compliance/evaluate", whatIf({ scientificName: "Stigmochelys pardallis" }));
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: "unknown_species", field: "animals.0.scientificName" });
    expect(res.body.error.suggestions.map((s: { scientificName: string }) => s.scientificName)).toContain(
      "Stigmochelys pardalis",
    );
    expect(res.body.error.message).toContain("Stigmochelys pardalis");
  });

  it("unknown keys, bad dates, and callers who are not signed in", async () => {
    expect(
      (
        await member.post("/api/compliance/evaluate", {
          ...whatIf({ scientificName: "Pogona vitticeps" }),
          debug: true,
        })
      ).status,
    ).toBe(400);
    const badDate = await member.post(
      "/api/compliance/evaluate",
      whatIf({ scientificName: "Pogona vitticeps" }, { shipDate: "2026-02-30" }),
    );
    expect([badDate.status, badDate.body.error.field]).toEqual([400, "shipDate"]);
    const anonymous = await anonymousClient(t.app);
    expect(
      (await anonymous.post("/api/compliance/evaluate", whatIf({ scientificName: "Pogona vitticeps" }))).status,
    ).toBe(401);
  });
});

describe("a stored transfer's compliance, the gate and the override", () => {
  /** A leopard tortoise from Tennessee to Oregon: 9 CFR 74.1 wants a CVI. */
  const tortoiseTransfer = () =>
    buildTransfer(em(), {
      status: "awaiting_receiver",
      animals: [{ taxon: "Stigmochelys pardalis", count: 1, box: "A", lengthMm: 180 }],
    });

  it("needs a CVI until the sender has one on file, then names it as satisfying the rule", async () => {
    // [published] 9 CFR 74.1 (certificate within 30 days, free of ticks, accredited veterinarian)
    const cast = await tortoiseTransfer();
    const sender = await signIn(t.app, cast.sender.email);
    const receiver = await signIn(t.app, cast.receiver.email);
    const before = await receiver.get(`/api/transfers/${cast.transfer.id}/compliance`);
    expect(before.status).toBe(200);
    expect(before.body.verdict).toBe("needs_documents");
    expect(finding(before.body, LAND_TORTOISES)?.satisfiedBy).toBeNull();
    expect(before.body.abilities).toEqual({ override: false, attachDocuments: true, readDocuments: true });

    const today = new Date().toISOString().slice(0, 10);
    const created = await sender.post("/api/documents", {
      kind: "cvi",
      jurisdiction: "TN",
      number: "DEMO-CVI-7781",
      holderName: "Test Keepers",
      speciesCovered: ["Stigmochelys pardalis"],
      validFrom: null,
      validTo: addDays(today, 30),
      issuedOn: today,
      veterinarianName: "Dr. Demo Vet",
      veterinarianAccredited: true,
      inspectionDate: today,
      statements: ["Examined and found free of ticks"],
      animalsCovered: [{ scientificName: "Stigmochelys pardalis", count: 1, identifier: null }],
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const after = await receiver.get(`/api/transfers/${cast.transfer.id}/compliance`);
    expect(after.body.verdict).toBe(NOTHING_STOPS_IT);
    expect(finding(after.body, LAND_TORTOISES)?.satisfiedBy).toMatchObject({
      kind: "cvi",
      id: created.body.document.id,
      number: "DEMO-CVI-7781",
    });
    // The receiver now sees the sender's certificate, because this transfer uses it.
    const listed = await receiver.get(`/api/documents?transferId=${cast.transfer.id}`);
    expect(listed.body.documents).toHaveLength(1);
    expect(listed.body.documents[0]).toMatchObject({
      id: created.body.document.id,
      holderSide: "sender",
      attached: false,
      satisfies: [{ ruleId: LAND_TORTOISES, scientificName: "Stigmochelys pardalis" }],
    });
    expect(listed.body.documents[0].details.notes).toBeNull();
  });

  // The temperature gate (another "ready to ship" gate) lets a confirmation through on an override
  // with a reason; these confirmations carry one so that only the compliance gate is under test.
  const confirm = { to: "ready", override: true, reason: "Temperature plan agreed with the courier (test)." };

  it("blocks the receiver's confirmation while documents are missing, until an admin overrides with a reason (logged in custody)", async () => {
    // source: the requirement (not an outside value): no "ready to ship" on a blocked or documents-needed verdict without an admin override
    const cast = await tortoiseTransfer();
    const receiver = await signIn(t.app, cast.receiver.email);
    const sender = await signIn(t.app, cast.sender.email);
    const admin = await signIn(t.app, (await buildUser(em(), { role: "admin" })).email);
    const path = `/api/transfers/${cast.transfer.id}`;

    const refused = await receiver.post(`${path}/transition`, confirm);
    expect(refused.status).toBe(409);
    expect(refused.body.error.compliance.verdict).toBe("needs_documents");
    expect(refused.body.error.message).toMatch(/certificate of veterinary inspection/);

    expect((await sender.post(`${path}/compliance/override`, { reason: "I know best" })).status).toBe(403);
    const noReason = await admin.post(`${path}/compliance/override`, { reason: "  " });
    expect([noReason.status, noReason.body.error.field]).toEqual([400, "reason"]);
    const adminView = await admin.get(`${path}/compliance`);
    expect(adminView.body.abilities.override).toBe(true);

    const reason = "CVI seen on paper by phone with the state veterinarian; scan follows (demo).";
    const overridden = await admin.post(`${path}/compliance/override`, { reason });
    expect(overridden.status).toBe(201);
    expect(overridden.body.override).toMatchObject({ reason, transferVersion: expect.any(Number) });
    expect(overridden.body.abilities.override).toBe(false);
    expect((await admin.post(`${path}/compliance/override`, { reason })).status).toBe(409);

    const custody = (await receiver.get(`${path}/custody`)).body;
    const entry = custody.entries.find(
      (e: { kind: string; payload: { gate?: string } }) => e.kind === "override" && e.payload.gate === "compliance",
    );
    expect(entry.payload).toMatchObject({ verdict: "needs_documents", reason });
    expect(custody.intact).toBe(true);

    const confirmed = await receiver.post(`${path}/transition`, confirm);
    expect(confirmed.status, JSON.stringify(confirmed.body)).toBe(200);
    expect(confirmed.body.transfer.status).toBe("ready");
    const stored = await em()
      .getConnection()
      .execute<{ verdict: string; transfer_version: number; rules_used: unknown }[]>(
        "SELECT verdict, transfer_version, rules_used FROM compliance_evaluation WHERE transfer_id = ? ORDER BY evaluated_at",
        [cast.transfer.id],
      );
    // One evaluation answered by the override, one recorded with the confirmation, both with the rule versions used.
    expect(stored.map((r) => r.verdict)).toEqual(["needs_documents", "needs_documents"]);
    expect(stored[1]?.rules_used).toEqual(expect.arrayContaining([{ ruleId: LAND_TORTOISES, version: 1 }]));
  });

  it("lets a transfer with nothing to fix become ready and records the clear evaluation, once every state on the route is reviewed", async () => {
    // [practice] a captive-bred corn snake between two continental states meets no prohibition or permit rule in the seed library
    const cast = await buildTransfer(em(), { status: "awaiting_receiver" });
    const receiver = await signIn(t.app, cast.receiver.email);
    // source: issue 12 §1: "clear" only where every jurisdiction on the route (here by air: federal, TN, OR) was reviewed
    await markReviewed(em(), ["US", "TN", "OR"]);
    try {
      expect((await receiver.get(`/api/transfers/${cast.transfer.id}/compliance`)).body.verdict).toBe("clear");
      expect((await receiver.post(`/api/transfers/${cast.transfer.id}/transition`, confirm)).status).toBe(200);
    } finally {
      await markReviewed(em(), ["US", "TN", "OR"], null);
    }
    const rows = await em()
      .getConnection()
      .execute("SELECT verdict FROM compliance_evaluation WHERE transfer_id = ?", [cast.transfer.id]);
    expect(rows).toEqual([{ verdict: "clear" }]);
  });

  it("is hidden from strangers, and an override is only for a transfer waiting for the receiver", async () => {
    const cast = await buildTransfer(em(), {
      status: "draft",
      animals: [{ taxon: "Stigmochelys pardalis", count: 1, box: "A" }],
    });
    const stranger = await signIn(
      t.app,
      (await buildUser(em(), { organization: await buildOrganization(em()) })).email,
    );
    expect((await stranger.get(`/api/transfers/${cast.transfer.id}/compliance`)).status).toBe(404);
    const admin = await signIn(t.app, (await buildUser(em(), { role: "admin" })).email);
    const early = await admin.post(`/api/transfers/${cast.transfer.id}/compliance/override`, { reason: "too early" });
    expect([early.status, early.body.error.message]).toEqual([
      409,
      "An override applies to a transfer waiting for the receiver's confirmation.",
    ]);
  });
});

describe("the rule library", () => {
  let admin: Client;
  beforeAll(async () => {
    admin = await signIn(t.app, (await buildUser(em(), { role: "admin" })).email);
  });

  it("lists the current rules by state and by a taxon at any rank, for admins only", async () => {
    // [published] HRS 150A-6 covers the corn snake (a snake); [published] 9 CFR 74.1 names the leopard tortoise
    const hawaii = await admin.get("/api/compliance/rules?jurisdiction=HI&taxon=Pantherophis%20guttatus");
    expect(hawaii.status).toBe(200);
    expect(hawaii.body.rules.map((r: { ruleKey: string }) => r.ruleKey)).toEqual([HAWAII]);
    const tortoise = (
      await admin.get("/api/compliance/rules?jurisdiction=US&taxon=Geochelone%20pardalis")
    ).body.rules.map((r: { ruleKey: string }) => r.ruleKey);
    expect(tortoise).toContain(LAND_TORTOISES);
    expect(tortoise).not.toContain(INJURIOUS);
    expect((await member.get("/api/compliance/rules")).status).toBe(403);
  });

  it("saves an edit as a new version, keeps the old one, refuses a stale edit, and the what-if uses the new version", async () => {
    // source: the requirement (not an outside value): editing makes a new version; an evaluation records the versions it used
    const history = (await admin.get(`/api/compliance/rules/${OHIO_VENOMOUS}`)).body;
    const v1 = history.versions[0].rule;
    const edited = {
      ...v1,
      version: 2,
      summary: "Demo rule: a venomous snake coming into Ohio needs an Ohio import permit (edited).",
      reviewedOn: "2026-12-02",
      reviewedBy: "Test admin",
    };
    const saved = await admin.post(`/api/compliance/rules/${OHIO_VENOMOUS}/versions`, { rule: edited, retired: false });
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    expect(saved.body.version.createdBy.displayName).toBeTruthy();
    const stale = await admin.post(`/api/compliance/rules/${OHIO_VENOMOUS}/versions`, { rule: edited, retired: false });
    expect(stale.status).toBe(409);
    const versions = (await admin.get(`/api/compliance/rules/${OHIO_VENOMOUS}`)).body.versions;
    expect(versions.map((v: { rule: { version: number } }) => v.rule.version)).toEqual([2, 1]);
    expect(versions[1].rule.summary).toBe(v1.summary);

    const result = await evaluate(whatIf({ scientificName: "Crotalus atrox" }));
    expect(finding(result, OHIO_VENOMOUS)).toMatchObject({ ruleVersion: 2 });
    expect(result.rulesUsed).toEqual(expect.arrayContaining([{ ruleId: OHIO_VENOMOUS, version: 2 }]));

    const retired = await admin.post(`/api/compliance/rules/${OHIO_VENOMOUS}/versions`, {
      rule: { ...edited, version: 3 },
      retired: true,
    });
    expect(retired.status).toBe(201);
    expect(finding(await evaluate(whatIf({ scientificName: "Crotalus atrox" })), OHIO_VENOMOUS)).toBeUndefined();
  });

  it("refuses a demo rule without its notice and an id change", async () => {
    // [practice] house rule: a demo rule says it is not a statement of the state's law
    const v = (await admin.get(`/api/compliance/rules/demo-tx-possession-large-constrictors`)).body.versions[0].rule;
    const noNotice = await admin.post(`/api/compliance/rules/${v.id}/versions`, {
      rule: { ...v, version: 2, citation: { text: "Texas Parks and Wildlife Code", url: null } },
      retired: false,
    });
    expect([noNotice.status, noNotice.body.error.field]).toEqual([400, "rule.citation.text"]);
    const renamed = await admin.post(`/api/compliance/rules/${v.id}/versions`, {
      rule: { ...v, id: "demo-tx-other", version: 2 },
      retired: false,
    });
    expect([renamed.status, renamed.body.error.field]).toEqual([400, "rule.id"]);
  });
});
