import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, signIn, anonymousClient, type Client, type TestApp } from "../../../tests/support/app";
import { buildUser } from "../../../tests/factories";

let t: TestApp;
let client: Client;
beforeAll(async () => {
  t = await createTestApp();
  client = await signIn(t.app, (await buildUser(t.orm.em.fork())).email);
});
afterAll(() => t.close());

const top = async (q: string) =>
  (await client.get(`/api/taxa?q=${encodeURIComponent(q)}`)).body.taxa as {
    scientificName: string;
    matched: { kind: string; name: string };
  }[];

// Names from general herpetological usage [practice]; the leopard tortoise's move from
// Geochelone to Stigmochelys is why 9 CFR 74.1 still prints "Geochelone pardalis" [published].
describe("GET /api/taxa", () => {
  it("finds by scientific name", async () => {
    expect((await top("Pantherophis guttatus"))[0]!.scientificName).toBe("Pantherophis guttatus");
  });
  it("finds by common name", async () => {
    expect((await top("corn snake"))[0]!.scientificName).toBe("Pantherophis guttatus");
  });
  it("finds an older name through the synonym and says so", async () => {
    const hit = (await top("Geochelone pardalis"))[0]!;
    expect(hit.scientificName).toBe("Stigmochelys pardalis");
    expect(hit.matched.kind).toBe("synonym");
  });
  it("tolerates typos", async () => {
    expect((await top("Pantherofis gutatus")).map((h) => h.scientificName)).toContain("Pantherophis guttatus");
    expect((await top("axolotel")).map((h) => h.scientificName)).toContain("Ambystoma mexicanum");
  });
  it("refuses a one-letter query and anonymous callers", async () => {
    expect((await client.get("/api/taxa?q=a")).status).toBe(400);
    expect((await (await anonymousClient(t.app)).get("/api/taxa?q=corn")).status).toBe(401);
  });
  it("treats LIKE wildcards as text", async () => {
    expect(await top("%%")).toEqual([]);
  });
});
