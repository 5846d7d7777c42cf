/**
 * Only well-formed text gets in (D20). What "well-formed" means: UTF-8 as RFC 3629 §3-4 defines it
 * (no bytes outside its table, no encoded surrogates D800-DFFF, no overlong forms) [published];
 * JSON text exchanged between systems "MUST be encoded using UTF-8" and implementations "MUST NOT
 * add a byte order mark", RFC 8259 §8.1 [published]; a string with an unpaired surrogate
 * escape such as "\ud800" is valid JSON grammar but not well-formed Unicode, RFC 8259 §8.2
 * [published]. Each refusal names the problem and stores nothing.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { buildUser } from "../factories";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";

let t: TestApp;
let admin: Client;
beforeAll(async () => {
  t = await createTestApp();
  const a = await buildUser(t.orm.em.fork(), { role: "admin", organization: null });
  admin = await signIn(t.app, a.email);
});
afterAll(() => t.close());

const organization = (name: string) =>
  JSON.stringify({
    name,
    kind: "zoo",
    address: { street: "1 A St", city: "Salem", state: "OR", zip: "97301" },
    phone: "+1 503 555 0100",
    email: "w@example.test",
  });

/** Posts raw bytes as a new organisation, with the given Content-Type. */
function postBytes(body: Buffer | string, contentType = "application/json") {
  return (
    admin.agent
      .post("/api/organizations")
      .set("X-CSRF-Token", admin.csrf)
      .set("Content-Type", contentType)
      // As bytes: superagent would otherwise serialise a Buffer given with a JSON type as JSON.
      .serialize((bytes: Buffer) => bytes as unknown as string)
      .send(Buffer.isBuffer(body) ? body : Buffer.from(body, "utf8"))
  );
}

const organizations = async () => Number((await t.ctx.pool.query("SELECT count(*) FROM organization")).rows[0].count);

/** The bytes of the JSON for a name, with `raw` spliced into the name as bytes. */
function withBytesInName(raw: number[]): Buffer {
  const [before, after] = organization("Heron @@ Hollow").split("@@");
  return Buffer.concat([Buffer.from(before!, "utf8"), Buffer.from(raw), Buffer.from(after!, "utf8")]);
}

describe("request bodies", () => {
  it("well-formed UTF-8, with or without charset=utf-8, is taken", async () => {
    expect((await postBytes(organization("Heron Hollow 🐢"))).status).toBe(201);
    expect((await postBytes(organization("Heron Hollow Two"), "application/json; charset=UTF-8")).status).toBe(201);
  });

  it("bytes that are not UTF-8 are a 400 that says so, and nothing is stored", async () => {
    const before = await organizations();
    for (const raw of [
      [0xff], // never in UTF-8
      [0xc3], // a lead byte with nothing after it
      [0xc0, 0xaf], // an overlong "/"
      [0xed, 0xa0, 0x80], // U+D800 encoded as if it were a character (CESU-8)
      [0xe9], // "é" in Latin-1
    ]) {
      const res = await postBytes(withBytesInName(raw));
      expect(res.status, raw.join(" ")).toBe(400);
      expect(res.body.error).toMatchObject({ code: "invalid_encoding", field: "body" });
      expect(res.body.error.message).toMatch(/not valid UTF-8/);
    }
    expect(await organizations()).toBe(before);
  });

  it('a lone surrogate written as a JSON escape ("\\ud800") is a 400 naming the field, and nothing is stored', async () => {
    const before = await organizations();
    for (const escape of ["\\ud800", "\\udc00", "\\udc22\\ud83d"]) {
      const res = await postBytes(organization("Heron @@ Hollow").replace("@@", escape));
      expect(res.status, escape).toBe(400);
      expect(res.body.error).toMatchObject({ code: "invalid_encoding", field: "name" });
      expect(res.body.error.message).toMatch(/^Name: .*broken character/);
    }
    const inKey = await postBytes(organization("Heron Hollow").replace('"phone"', '"ph\\ud800one"'));
    expect(inKey.status).toBe(400);
    expect(inKey.body.error.message).toMatch(/broken character.*name of a field/);
    expect(await organizations()).toBe(before);
    // A pair written as escapes is one character and fine.
    expect((await postBytes(organization("Heron @@ Hollow").replace("@@", "\\ud83d\\udc22"))).status).toBe(201);
  });

  it("a byte-order mark in front is a 400 that names it", async () => {
    const before = await organizations();
    const res = await postBytes(Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(organization("BOM Zoo"))]));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid_encoding");
    expect(res.body.error.message).toMatch(/byte-order mark/);
    expect(await organizations()).toBe(before);
  });

  it("a charset other than UTF-8 is a 415 that names it, even when the bytes would decode", async () => {
    const before = await organizations();
    for (const [charset, bytes] of [
      ["utf-16le", Buffer.from(organization("Sixteen Zoo"), "utf16le")],
      ["UTF-16", Buffer.from(organization("Sixteen Zoo"), "utf16le")],
      ["iso-8859-1", Buffer.from(organization("Latin Zoo"), "latin1")],
      ["utf-32", Buffer.from(organization("Latin Zoo"), "utf8")],
    ] as const) {
      const res = await postBytes(bytes, `application/json; charset=${charset}`);
      expect(res.status, charset).toBe(415);
      expect(res.body.error.code).toBe("unsupported_charset");
      expect(res.body.error.message).toContain(`“${charset.toLowerCase()}”`);
    }
    expect(await organizations()).toBe(before);
  });

  it("the message repeats at most a short excerpt of what was sent", async () => {
    const res = await postBytes(organization("Long Zoo"), `application/json; charset=${"x".repeat(5000)}`);
    expect(res.status).toBe(415);
    expect(res.body.error.message.length).toBeLessThan(140);
  });
});

describe("the address", () => {
  it("a query parameter that is not UTF-8 text, or holds a byte-order mark, is a 400 naming it", async () => {
    expect((await admin.get("/api/taxa?q=turtle")).status).toBe(200);
    for (const bad of ["%FF", "%C3", "%ED%A0%80", "%EF%BB%BFturtle", "tur%E9tle"]) {
      const res = await admin.get(`/api/taxa?q=${bad}`);
      expect(res.status, bad).toBe(400);
      expect(res.body.error).toMatchObject({ code: "invalid_encoding", field: "q" });
      expect(res.body.error.message).toMatch(/query parameter “q”/);
    }
  });

  it("a path parameter that is not UTF-8 text is a 400 that says so", async () => {
    for (const bad of ["%FF", "%ED%A0%80", "%EF%BB%BF"]) {
      const res = await admin.get(`/api/transfers/${bad}`);
      expect(res.status, bad).toBe(400);
      expect(res.body.error).toMatchObject({ code: "invalid_encoding", field: "path" });
    }
    const broken = await admin.get("/api/transfers/%zz");
    expect(broken.status).toBe(400);
    expect(broken.body.error.message).toMatch(/% that is not followed by two hexadecimal digits/);
  });

  it("an anonymous request is refused the same way, before anything else reads it", async () => {
    const res = await request(t.app).get("/api/health?probe=%FF");
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe("probe");
  });
});
