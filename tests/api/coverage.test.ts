/**
 * Rule coverage (issue 12 §1): a verdict is "clear" only when every jurisdiction on the route had
 * its rules reviewed; otherwise it is "unverified", names the states and the agencies to ask, and
 * "cleared to travel" needs the confirming party's acknowledgement with a reason, logged in the
 * custody log, never an administrator's override.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { buildTransfer, buildUser, markReviewed, type TransferCast } from "../factories";
import { COVERAGE_SEED } from "../../server/db/seeders/jurisdiction-coverage.data";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

type CoverageEntry = {
  jurisdiction: string;
  covered: boolean;
  reviewedOn: string | null;
  agency: { name: string; url: string };
  role: string;
};

const seeded = (jurisdiction: string) => COVERAGE_SEED.find((entry) => entry.jurisdiction === jurisdiction)!;

describe("a ground transfer from Tennessee to Oregon with no reviewed rules", () => {
  let cast: TransferCast;
  let receiver: Client;
  beforeAll(async () => {
    cast = await buildTransfer(em(), { status: "awaiting_receiver", mode: "ground_courier" });
    receiver = await signIn(t.app, cast.receiver.email);
  });
  const path = () => `/api/transfers/${cast.transfer.id}`;

  it("is unverified, never clear, and lists TN, the states on the way and OR with their agencies", async () => {
    // source: issue 12 §1 (product requirement): coverage for origin, transit and destination, and federal; "never clear while … not covered"
    const res = await receiver.get(`${path()}/compliance`).expect(200);
    expect(res.body.verdict).toBe("unverified");
    const coverage = res.body.coverage as CoverageEntry[];
    const order = coverage.map((entry) => entry.jurisdiction);
    expect(order[0]).toBe("US");
    expect(order[1]).toBe("TN");
    expect(order.at(-1)).toBe("OR");
    // [memory] the straight line from Knoxville (35.96 N, 83.92 W) to Eugene (44.05 N, 123.09 W)
    // crosses Kentucky and Missouri, and enters Oregon from Idaho
    const transit = coverage.filter((entry) => entry.role === "transit").map((entry) => entry.jurisdiction);
    expect(transit).toEqual(expect.arrayContaining(["KY", "MO", "ID"]));
    expect(transit.indexOf("KY")).toBeLessThan(transit.indexOf("MO"));
    expect(transit.indexOf("MO")).toBeLessThan(transit.indexOf("ID"));
    for (const entry of coverage) {
      expect(entry).toMatchObject({ covered: false, reviewedOn: null });
      // The agency named is the one of the coverage record (names and sources in jurisdiction-coverage.data.ts).
      expect(entry.agency).toEqual(seeded(entry.jurisdiction).wildlifeAgency);
      expect(entry.agency.url).toMatch(/^https:\/\//);
    }
    // [published] the Oregon Department of Fish and Wildlife's own site is myodfw.com
    expect(coverage.at(-1)?.agency).toEqual({
      name: "Oregon Department of Fish and Wildlife",
      url: "https://myodfw.com/",
    });
  });

  it("refuses the receiver's plain confirmation with the states and agencies to ask", async () => {
    const res = await receiver.post(`${path()}/transition`, { to: "ready" }).expect(409);
    expect(res.body.error.message).toContain("unverified");
    expect(res.body.error.message).toContain("Tennessee");
    expect(res.body.error.message).toContain("Oregon Department of Fish and Wildlife");
    expect(res.body.error.details?.acknowledgeUnverified ?? res.body.error.acknowledgeUnverified).toBe(true);
    // A confirmation that says nothing is no acknowledgement.
    const silent = await receiver.post(`${path()}/transition`, { to: "ready", override: true });
    expect(silent.status).toBe(400);
  });

  it("is not the administrator's to override", async () => {
    const admin = await signIn(t.app, (await buildUser(em(), { role: "admin" })).email);
    const res = await admin.post(`${path()}/compliance/override`, { reason: "Looks fine." });
    expect(res.status).toBe(409);
    expect((await admin.get(`${path()}/compliance`).expect(200)).body.abilities.override).toBe(false);
  });

  it("becomes ready on the receiver's acknowledgement with a reason, logged in the custody log", async () => {
    const reason = "Called both wildlife agencies on 1 Dec: no permit needed for captive-bred corn snakes.";
    const res = await receiver.post(`${path()}/transition`, { to: "ready", override: true, reason });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.transfer.status).toBe("ready");
    const log = await receiver.get(`${path()}/custody`).expect(200);
    const entries = (log.body.entries ?? log.body.custody ?? log.body) as {
      kind: string;
      payload: Record<string, unknown>;
    }[];
    const acknowledgement = entries.find((e) => e.kind === "override" && e.payload.gate === "compliance");
    expect(acknowledgement?.payload).toMatchObject({ verdict: "unverified", acknowledgement: true, reason });
    const named = (acknowledgement?.payload.unverified as { jurisdiction: string }[]).map((j) => j.jurisdiction);
    expect(named).toEqual(expect.arrayContaining(["US", "TN", "KY", "OR"]));
    const rows = await em()
      .getConnection()
      .execute("SELECT verdict FROM compliance_evaluation WHERE transfer_id = ?", [cast.transfer.id]);
    expect(rows).toEqual([{ verdict: "unverified" }]);
  });
});

describe("the what-if", () => {
  it("reports coverage and says the Lacey Act and box marking once for the shipment", async () => {
    const member = await signIn(t.app, (await buildUser(em())).email);
    const res = await member
      .post("/api/compliance/evaluate", {
        originState: "TN",
        destinationState: "OR",
        transitStates: ["KY", "MO"],
        shipDate: "2026-05-12",
        purpose: "private_keeping",
        sale: false,
        animals: [
          { scientificName: "Pantherophis guttatus", count: 2, origin: "captive_bred", sex: "unknown" },
          { scientificName: "Pogona vitticeps", count: 1, origin: "captive_bred", sex: "female" },
        ],
        documents: [],
      })
      .expect(200);
    expect(res.body.verdict).toBe("unverified");
    expect(res.body.coverage.map((c: CoverageEntry) => c.jurisdiction)).toEqual(["US", "TN", "KY", "MO", "OR"]);
    // [published] 16 U.S.C. 3372 and 50 CFR 14.81 concern every animal moved across a state line: said once
    const shipment = (res.body.shipmentFindings as { ruleId: string }[]).map((f) => f.ruleId);
    expect(shipment).toEqual(expect.arrayContaining(["us-16usc3372-lacey-act", "us-50cfr14.81-container-marking"]));
    for (const line of res.body.animals as { findings: { ruleId: string }[] }[])
      expect(line.findings.map((f) => f.ruleId)).not.toContain("us-16usc3372-lacey-act");
  });
});

describe("the coverage records", () => {
  it("hold every jurisdiction with its wildlife agency and state veterinarian, for any signed-in user", async () => {
    const member = await signIn(t.app, (await buildUser(em())).email);
    const res = await member.get("/api/compliance/coverage").expect(200);
    // [published] USPS Publication 28: 50 states, DC, and the inhabited territories PR, GU, VI, AS, MP; plus federal law
    expect(res.body.coverage).toHaveLength(57);
    for (const entry of res.body.coverage) {
      expect(entry.wildlifeAgency.url).toMatch(/^https:\/\//);
      expect(entry.stateVeterinarian.url).toMatch(/^https:\/\//);
      expect(entry.source).toMatch(/\[(published|memory)\]/);
    }
    expect(res.body.coverage[0].jurisdiction).toBe("US");
    expect(res.body.coverage.find((c: { jurisdiction: string }) => c.jurisdiction === "HI").rules).toEqual({
      published: 2,
      demo: 0,
    });
  });

  it("take an administrator's review, refuse one over demo rules or for a day to come, and refuse members", async () => {
    const admin = await signIn(t.app, (await buildUser(em(), { role: "admin" })).email);
    const member = await signIn(t.app, (await buildUser(em())).email);
    const review = { reviewedOn: "2026-11-30", reviewedBy: "Test Reviewer", notes: "Read the state's rules." };
    expect((await member.patch("/api/compliance/coverage/TN", review)).status).toBe(403);
    const done = await admin.patch("/api/compliance/coverage/TN", review).expect(200);
    expect(done.body.coverage).toMatchObject({ jurisdiction: "TN", covered: true, reviewedOn: "2026-11-30" });
    // source: issue 12 §1: demo rules never count as coverage (Ohio's rules in the seed are demo rules)
    const ohio = await admin.patch("/api/compliance/coverage/OH", review);
    expect([ohio.status, ohio.body.error.message]).toEqual([409, expect.stringContaining("demo rule")]);
    expect((await admin.patch("/api/compliance/coverage/TN", { ...review, reviewedOn: "2999-01-01" })).status).toBe(
      400,
    );
    expect((await admin.patch("/api/compliance/coverage/TN", { ...review, reviewedBy: null })).status).toBe(400);
    expect((await admin.patch("/api/compliance/coverage/XX", review)).status).toBe(400);
    await admin.patch("/api/compliance/coverage/TN", { reviewedOn: null, reviewedBy: null }).expect(200);
  });

  it("make a route clear once every jurisdiction on it is reviewed", async () => {
    const cast = await buildTransfer(em(), { status: "awaiting_receiver" });
    const receiver = await signIn(t.app, cast.receiver.email);
    const path = `/api/transfers/${cast.transfer.id}/compliance`;
    await markReviewed(em(), ["US", "TN"]);
    const partly = await receiver.get(path).expect(200);
    expect(partly.body.verdict).toBe("unverified");
    expect(partly.body.coverage.map((c: CoverageEntry) => [c.jurisdiction, c.covered])).toEqual([
      ["US", true],
      ["TN", true],
      ["OR", false],
    ]);
    await markReviewed(em(), ["OR"]);
    expect((await receiver.get(path).expect(200)).body.verdict).toBe("clear");
    await markReviewed(em(), "all", null);
  });
});
