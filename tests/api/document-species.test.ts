/**
 * A permit's or certificate's species list takes its names from the species catalogue (issue 12
 * §1): older names become the accepted one, an unknown name is refused with close matches.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { buildUser } from "../factories";

let t: TestApp;
let member: Client;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
  member = await signIn(t.app, (await buildUser(em())).email);
});
afterAll(() => t.close());

const permit = (speciesCovered: string[], animalsCovered: { scientificName: string }[] = []) => ({
  kind: "possession_permit",
  jurisdiction: "TN",
  number: "DEMO-TN-POS-0101",
  holderName: "Test Keepers",
  speciesCovered,
  validFrom: "2026-01-01",
  validTo: "2026-12-31",
  issuedOn: null,
  veterinarianName: null,
  veterinarianAccredited: null,
  inspectionDate: null,
  statements: [],
  animalsCovered: animalsCovered.map((a) => ({ ...a, count: 1, identifier: null })),
});

describe("species named on a permit", () => {
  it("are kept under the catalogue's accepted names, older names resolved", async () => {
    // [published] the Burmese python is Python bivittatus (formerly Python molurus bivittatus), and
    // the leopard tortoise Stigmochelys pardalis (formerly Geochelone pardalis), as in 50 CFR 16.15 and 9 CFR 74.1's lists
    const res = await member.post(
      "/api/documents",
      permit(["python molurus bivittatus", "Geochelone pardalis"], [{ scientificName: "Geochelone pardalis" }]),
    );
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.document.details.speciesCovered).toEqual(["Python bivittatus", "Stigmochelys pardalis"]);
    expect(res.body.document.details.animalsCovered[0].scientificName).toBe("Stigmochelys pardalis");
  });

  it("refuse a name the catalogue does not hold, suggesting close ones, and store nothing", async () => {
    const before = await em().getConnection().execute("SELECT count(*)::int AS n FROM permit_document");
    const res = await member.post("/api/documents", permit(["Pantherophis gutatus"]));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("unknown_species");
    expect(res.body.error.field).toBe("speciesCovered.0");
    expect(res.body.error.message).toContain("“Pantherophis gutatus” is not in the species list. Did you mean");
    // [practice] one letter off: the corn snake is the close match
    expect(res.body.error.suggestions.map((s: { scientificName: string }) => s.scientificName)).toContain(
      "Pantherophis guttatus",
    );
    const after = await em().getConnection().execute("SELECT count(*)::int AS n FROM permit_document");
    expect(after).toEqual(before);
  });

  it("are checked on an edit too", async () => {
    const created = await member.post("/api/documents", permit(["Pantherophis guttatus"])).expect(201);
    const id = created.body.document.id as string;
    const bad = await member.patch(`/api/documents/${id}`, { speciesCovered: ["Not a real snake"] });
    expect([bad.status, bad.body.error.code]).toEqual([400, "unknown_species"]);
    const good = await member.patch(`/api/documents/${id}`, { speciesCovered: ["Elaphe guttata"] });
    expect(good.status, JSON.stringify(good.body)).toBe(200);
    // [published] Elaphe guttata is the older name of the corn snake, Pantherophis guttatus
    expect(good.body.document.details.speciesCovered).toEqual(["Pantherophis guttatus"]);
  });
});
