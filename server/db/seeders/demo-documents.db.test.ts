import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { documentInputSchema } from "@shared/schemas/compliance";
import { createTestApp, signIn, type TestApp } from "../../../tests/support/app";
import { buildOrganization, buildUser } from "../../../tests/factories";
import { seedDemoDocuments } from "./demo-documents";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("seedDemoDocuments", () => {
  it("gives each demo organisation invented records that pass the form's schema and show every expiry badge", async () => {
    const [breeder, centre, rescue] = [
      await buildOrganization(em()),
      await buildOrganization(em(), { state: "OR" }),
      await buildOrganization(em(), { state: "OH" }),
    ];
    const members = [
      await buildUser(em(), { organization: breeder }),
      await buildUser(em(), { organization: centre }),
      await buildUser(em(), { organization: rescue }),
    ];
    expect(await seedDemoDocuments(em(), { breeder: breeder!, centre: centre!, rescue: rescue! })).toBe(6);
    const statuses = new Set<string>();
    for (const member of members) {
      const { documents } = (await (await signIn(t.app, member.email)).get("/api/documents")).body;
      expect(documents.length).toBeGreaterThan(0);
      for (const doc of documents) {
        // [practice] house rule: demo data says it is invented
        expect(doc.number).toMatch(/^DEMO-/);
        expect(doc.details.notes).toContain("Invented for the Hatchway demo");
        const {
          id: _id,
          organization: _org,
          expiry,
          details,
          scans: _scans,
          abilities: _abilities,
          createdAt: _c,
          updatedAt: _u,
          ...record
        } = doc;
        expect(documentInputSchema.safeParse({ ...record, ...details }).error).toBeUndefined();
        statuses.add(expiry.status);
      }
    }
    expect([...statuses].sort()).toEqual(["expired", "expiring", "valid"]);
  });
});
