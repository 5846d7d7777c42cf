/** Nothing a user sends makes the server answer 500 or stop; every error has the same shape. */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { whatIfInputSchema } from "@shared/temperature/schemas";
import { describeIssues, errorMapFor } from "@shared/validation/messages";
import { buildUser } from "../factories";

let t: TestApp;
let admin: Client;
beforeAll(async () => {
  t = await createTestApp();
  const a = await buildUser(t.orm.em.fork(), { role: "admin", organization: null });
  admin = await signIn(t.app, a.email);
});
afterAll(() => t.close());

const org = {
  name: "Bad Input Keepers",
  kind: "zoo",
  address: { street: "1 A St", city: "Salem", state: "OR", zip: "97301" },
  phone: "+1 503 555 0100",
  email: "b@example.test",
};

function expectErrorShape(res: request.Response) {
  expect(res.body).toEqual({
    error: expect.objectContaining({ code: expect.any(String), message: expect.any(String) }),
  });
  expect(res.headers["x-correlation-id"]).toMatch(/^[0-9a-f-]{36}$/);
  expect(JSON.stringify(res.body)).not.toMatch(/\bat \S+:\d+|node_modules|SELECT |INSERT /);
}

describe("bad input", () => {
  it("malformed JSON is 400", async () => {
    const res = await admin.agent
      .post("/api/organizations")
      .set("X-CSRF-Token", admin.csrf)
      .set("Content-Type", "application/json")
      .send('{"name": "unterminated');
    expect(res.status).toBe(400);
    expectErrorShape(res);
  });

  it("a body over 1 MB is 413", async () => {
    const res = await admin.post("/api/organizations", { ...org, name: "x".repeat(1_100_000) });
    expect(res.status).toBe(413);
    expectErrorShape(res);
  });

  it("unknown keys are 400 naming the key", async () => {
    const res = await admin.post("/api/organizations", { ...org, role: "admin" });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe("role");
    expectErrorShape(res);
  });

  it("NUL characters are 400, in values and in keys", async () => {
    const inValue = await admin.post("/api/organizations", { ...org, name: "Bad\u0000Name" });
    expect(inValue.status).toBe(400);
    expect(inValue.body.error.field).toBe("name");
    const inKey = await admin.post("/api/organizations", { ...org, ["na\u0000me"]: "x" });
    expect(inKey.status).toBe(400);
    expectErrorShape(inKey);
  });

  it("wrong types are 400 naming the field", async () => {
    const res = await admin.post("/api/organizations", { ...org, address: { ...org.address, zip: 97301 } });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe("address.zip");
    // Named in words, with what to do (shared/validation/messages.ts).
    expect(res.body.error.message).toBe("ZIP code: enter a 5-digit ZIP code, such as 97401.");
  });

  it("answers the sentence the form shows, in the units the person reads", async () => {
    // The wall of 99 in that a keeper typed: 99 in = 2514.6 mm (NIST SP 811 B.8) [published]; the limit
    // is 200 mm, which a form in inches shows as 7.9 in.
    const trip = {
      origin: { zip: "37902" },
      destination: { zip: "97401" },
      departAt: "2030-03-12T08:00:00-05:00",
      mode: "overnight_air",
      profile: "temperate_snake",
      box: {
        wall: "eps",
        wallThicknessMm: 2514.6,
        lengthMm: 400,
        widthMm: 300,
        heightMm: 250,
        contentsG: 500,
        pack: "none",
      },
    };
    const form = (units: "imperial" | "metric") => {
      const parsed = whatIfInputSchema.safeParse(trip, { error: errorMapFor(units) });
      return parsed.success ? null : describeIssues(parsed.error, units);
    };
    for (const units of ["imperial", "metric"] as const) {
      const res = await admin.post("/api/temperature/assess", trip).set("Hatchway-Units", units);
      expect(res.status).toBe(400);
      expect(res.body.error).toEqual({ code: "invalid", field: "box.wallThicknessMm", message: form(units)!.message });
    }
    const inches = await admin.post("/api/temperature/assess", trip).set("Hatchway-Units", "imperial");
    expect(inches.body.error.message).toBe("Box wall thickness: use at most 7.9 in.");
    const millimetres = await admin.post("/api/temperature/assess", trip).set("Hatchway-Units", "metric");
    expect(millimetres.body.error.message).toBe("Box wall thickness: use at most 200 mm.");
    // No header: °F and inches, what a person sees before choosing.
    expect((await admin.post("/api/temperature/assess", trip)).body.error.message).toBe(inches.body.error.message);
  });

  it("a message repeats at most a short excerpt of what was sent", async () => {
    const longKey = "k".repeat(5000);
    const res = await admin.post("/api/organizations", { ...org, [longKey]: 1, other1: 1, other2: 1, other3: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error.message.length).toBeLessThan(200);
    expect(res.body.error.message).toMatch(/1 more/);
    expect(res.body.error.field.length).toBeLessThanOrEqual(40);
    const typed = `Zz${"q".repeat(190)}`;
    const species = await admin.post("/api/compliance/evaluate", {
      originState: "TN",
      destinationState: "OH",
      transitStates: [],
      shipDate: "2026-05-12",
      purpose: "private_keeping",
      sale: false,
      animals: [{ scientificName: typed, count: 1, lengthMm: null, origin: "captive_bred", sex: "unknown" }],
      documents: [],
    });
    expect(species.body.error.code).toBe("unknown_species");
    expect(species.body.error.message).not.toContain(typed);
    expect(species.body.error.message.length).toBeLessThan(120);
  });

  it("an id in the address that is not an id is named as that path parameter, not as the body", async () => {
    const transfer = await admin.get("/api/transfers/not-an-id");
    expect(transfer.status).toBe(400);
    expect(transfer.body.error).toMatchObject({
      code: "invalid_path",
      field: "id",
      message: "The transfer id in the address is not valid.",
    });
    const document = await admin.get(`/api/documents/${"x".repeat(3000)}/scans/also-not-an-id`);
    expect(document.body.error).toMatchObject({ field: "id", message: "The document id in the address is not valid." });
    const attachment = await admin.del("/api/transfers/01a23704-abf9-7675-ab93-e52c942c1436/documents/nope");
    expect(attachment.body.error).toMatchObject({
      field: "documentId",
      message: "The document id in the address is not valid.",
    });
    expect((await admin.patch("/api/users/123", {})).body.error.field).toBe("id");
  });

  it("an operator object never reaches a query", async () => {
    const res = await admin.post("/api/auth/login", { email: { $ne: null }, password: "x" });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe("email");
  });

  it("form and text bodies are refused on JSON routes", async () => {
    const form = await admin.agent
      .post("/api/organizations")
      .set("X-CSRF-Token", admin.csrf)
      .type("form")
      .send("name=x");
    expect(form.status).toBe(415);
    const text = await admin.agent
      .post("/api/organizations")
      .set("X-CSRF-Token", admin.csrf)
      .set("Content-Type", "text/plain")
      .send("{}");
    expect(text.status).toBe(415);
  });

  it("a JSON scalar or array at the top is 400", async () => {
    const res = await admin.agent
      .post("/api/organizations")
      .set("X-CSRF-Token", admin.csrf)
      .set("Content-Type", "application/json")
      .send('"just a string"');
    expect(res.status).toBe(400);
    const arr = await admin.post("/api/organizations", [1, 2]);
    expect(arr.status).toBe(400);
  });

  it("unknown API routes are a JSON 404, and the server keeps answering", async () => {
    const res = await admin.get("/api/no-such-thing");
    expect(res.status).toBe(404);
    expectErrorShape(res);
    expect((await request(t.app).get("/api/health")).status).toBe(200);
  });

  it("records and errors are never cached, and the headers are tightened", async () => {
    const res = await admin.get("/api/auth/me");
    expect(res.headers["cache-control"]).toBe("no-store");
    expect(res.headers["x-powered-by"]).toBeUndefined();
    const csp = res.headers["content-security-policy"] as string;
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("base-uri 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
  });
});
