import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createHash } from "node:crypto";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { startS3Fake, type S3Fake } from "../../../fakes/s3/s3-fake";
import { createTestApp, signIn, type Client, type TestApp } from "../../../tests/support/app";
import { actorOf, buildOrganization, buildTransfer, buildUser, type TransferCast } from "../../../tests/factories";
import type { Storage } from "../../adapters/storage";
import { uploadScan } from "../../services/compliance/documents";
import { assignLegs } from "../../services/transfers/legs";
import { jpeg, pdfWithPages, png, pngClaiming } from "../../../tests/support/scan-files";

const BUCKET = "hatchway-documents-test";
const directory = mkdtempSync(path.join(tmpdir(), "hatchway-s3-"));
let s3: S3Fake;
let t: TestApp;
const em = () => t.orm.em.fork();

beforeAll(async () => {
  PDF = await pdfWithPages(1);
  s3 = await startS3Fake({ directory, bucket: BUCKET });
  t = await createTestApp({ S3_ENDPOINT: s3.endpoint, S3_BUCKET: BUCKET });
});
afterAll(async () => {
  await t.close();
  await s3.close();
});

const ascii = (text: string) => Buffer.from(text, "latin1");
/** Real files (tests/support/scan-files.ts): a one-page PDF, a JPEG and a PNG that decode fully. */
let PDF: Buffer;
const JPEG = jpeg(32, 24);
const PNG = png(24, 16);
const HTML = ascii("<html><body><script>alert(1)</script></body></html>");
const sha256 = (bytes: Buffer) => createHash("sha256").update(bytes).digest("hex");

function permitBody(over: Record<string, unknown> = {}) {
  return {
    kind: "state_import_permit",
    jurisdiction: "OR",
    number: `DEMO-OR-${Math.random().toString(36).slice(2, 8)}`,
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
    ...over,
  };
}

const upload = (client: Client, documentId: string, body: Buffer, contentType: string, fileName?: string) => {
  const req = client.agent
    .post(`/api/documents/${documentId}/scans`)
    .set("X-CSRF-Token", client.csrf)
    .set("Content-Type", contentType);
  return (fileName ? req.set("X-File-Name", encodeURIComponent(fileName)) : req).send(body);
};

/** Every object in the fake bucket, read through the real SDK. */
async function storedKeys(): Promise<string[]> {
  const client = new S3Client({
    endpoint: s3.endpoint,
    region: "us-east-1",
    forcePathStyle: true,
    credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" },
  });
  const listed = await client.send(new ListObjectsV2Command({ Bucket: BUCKET }));
  client.destroy();
  return (listed.Contents ?? []).map((o) => o.Key ?? "").sort();
}

const scanRows = async (documentId: string) =>
  (
    await em()
      .getConnection()
      .execute<{ n: number }[]>("SELECT count(*)::int AS n FROM document_scan WHERE document_id = ?", [documentId])
  )[0]!.n;

describe("permits and certificates", () => {
  let holder: Client;
  beforeAll(async () => {
    holder = await signIn(t.app, (await buildUser(em())).email);
  });

  it("a member records one for the organisation; the shared schema's checks answer 400 with the field", async () => {
    const created = await holder.post("/api/documents", permitBody());
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.document).toMatchObject({
      kind: "state_import_permit",
      jurisdiction: "OR",
      abilities: { edit: true, upload: true, readScans: true },
      scans: [],
    });
    // [practice] a CVI without its issue date and veterinarian is no certificate
    const cvi = await holder.post("/api/documents", permitBody({ kind: "cvi", issuedOn: null }));
    expect([cvi.status, cvi.body.error.field]).toEqual([400, "issuedOn"]);
    const backwards = await holder.post(
      "/api/documents",
      permitBody({ validFrom: "2027-01-01", validTo: "2026-01-01" }),
    );
    expect([backwards.status, backwards.body.error.field]).toEqual([400, "validTo"]);
    const list = await holder.get("/api/documents");
    expect(list.body.documents.map((d: { id: string }) => d.id)).toContain(created.body.document.id);
  });

  it("shows the expiry: amber within 30 days of the last valid day, and an edit of the end date is checked as a whole", async () => {
    // [published] Gregorian calendar; the 30-day warning is the requirement
    const today = new Date().toISOString().slice(0, 10);
    const soon = new Date(Date.now() + 10 * 86_400_000).toISOString().slice(0, 10);
    const created = await holder.post("/api/documents", permitBody({ validFrom: today, validTo: soon }));
    expect(created.body.document.expiry).toEqual({ status: "expiring", daysLeft: 10 });
    const edited = await holder.patch(`/api/documents/${created.body.document.id}`, { validTo: "2030-01-01" });
    expect(edited.body.document.expiry.status).toBe("valid");
    const bad = await holder.patch(`/api/documents/${created.body.document.id}`, { validTo: "2000-01-01" });
    expect([bad.status, bad.body.error.field]).toEqual([400, "validTo"]);
  });
});

describe("scans in S3", () => {
  let holder: Client;
  let documentId: string;
  beforeAll(async () => {
    holder = await signIn(t.app, (await buildUser(em())).email);
    documentId = (await holder.post("/api/documents", permitBody())).body.document.id;
  });

  it("accepts a PDF, keeps its SHA-256 under a key of ours, and streams it back as a sandboxed attachment", async () => {
    // [published] FIPS 180-4 SHA-256, as computed by Node's crypto
    const res = await upload(holder, documentId, PDF, "application/octet-stream", "../../etc/permit scan.pdf");
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.scan).toMatchObject({
      contentType: "application/pdf",
      sizeBytes: PDF.length,
      sha256: sha256(PDF),
      originalName: "permit scan.pdf",
    });
    const keys = await storedKeys();
    expect(keys.filter((k) => k.startsWith(`documents/${documentId}/`))).toHaveLength(1);
    expect(keys.join(" ")).not.toContain("permit scan");

    const download = await holder.agent
      .get(res.body.scan.downloadUrl)
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on("data", (c: Buffer) => chunks.push(c));
        r.on("end", () => done(null, Buffer.concat(chunks)));
      });
    expect(download.status).toBe(200);
    expect(Buffer.compare(download.body as Buffer, PDF)).toBe(0);
    expect(download.headers["content-type"]).toBe("application/pdf");
    expect(download.headers["content-disposition"]).toBe('attachment; filename="permit scan.pdf"');
    expect(download.headers["x-content-type-options"]).toBe("nosniff");
    expect(download.headers["content-security-policy"]).toBe("default-src 'none'; sandbox");
    expect(download.headers["cache-control"]).toBe("no-store");
  });

  it("decides the type by the bytes: a PNG declared as PDF is a PNG, a JPEG is a JPEG", async () => {
    // [published] PNG and JPEG signatures (ISO/IEC 15948 §5.2; ITU T.81 SOI marker)
    expect((await upload(holder, documentId, PNG, "application/pdf")).body.scan).toMatchObject({
      contentType: "image/png",
      originalName: "scan.png",
    });
    expect((await upload(holder, documentId, JPEG, "image/jpeg")).body.scan.contentType).toBe("image/jpeg");
  });

  it("refuses wrong magic bytes, other declared types and files over 10 MB, storing nothing", async () => {
    const rows = await scanRows(documentId);
    const keys = await storedKeys();
    const html = await upload(holder, documentId, HTML, "image/png");
    expect([html.status, html.body.error.code]).toEqual([415, "unsupported_file"]);
    expect((await upload(holder, documentId, PDF, "text/html")).status).toBe(415);
    // [practice] the product's limit: 10 MB (10 × 1024 × 1024 bytes, LIMITS.uploadBytesMax)
    const big = Buffer.concat([ascii("%PDF-1.4\n"), Buffer.alloc(10 * 1024 * 1024)]);
    const tooBig = await upload(holder, documentId, big, "application/pdf");
    expect([tooBig.status, tooBig.body.error.code]).toEqual([413, "too_large"]);
    expect((await upload(holder, documentId, Buffer.alloc(0), "application/pdf")).status).toBe(400);
    expect(await scanRows(documentId)).toBe(rows);
    expect(await storedKeys()).toEqual(keys);
  });

  it("refuses a file that only starts like a PDF or an image: it must open, with a page or at its stated size", async () => {
    const rows = await scanRows(documentId);
    const keys = await storedKeys();
    for (const [name, bytes, type] of [
      ["the five bytes %PDF-", ascii("%PDF-"), "PDF"],
      ["a PDF catalogue with no page tree", ascii("%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\n%%EOF\n"), "PDF"],
      ["a PDF with no pages", await pdfWithPages(0), "PDF"],
      ["a PDF cut in half", PDF.subarray(0, PDF.length >> 1), "PDF"],
      ["a PNG signature and nothing more", PNG.subarray(0, 16), "PNG"],
      ["a PNG cut short", PNG.subarray(0, PNG.length - 20), "PNG"],
      ["a PNG whose header says twice its width", pngClaiming(PNG, 48, 16), "PNG"],
      ["a JPEG cut short", JPEG.subarray(0, JPEG.length >> 1), "JPEG"],
    ] as const) {
      const res = await upload(holder, documentId, bytes, "application/octet-stream");
      expect([res.status, res.body.error?.code], name).toEqual([415, "unsupported_file"]);
      expect(res.body.error.message, name).toContain(type);
      expect(res.body.error.message, name).toMatch(/again|lower resolution/);
    }
    expect(await scanRows(documentId)).toBe(rows);
    expect(await storedKeys()).toEqual(keys);
  });

  it("answers 503 when storage is down and leaves no row and no object", async () => {
    const rows = await scanRows(documentId);
    const keys = await storedKeys();
    const port = s3.port;
    await s3.close();
    try {
      const res = await upload(holder, documentId, PDF, "application/pdf");
      expect(res.status).toBe(503);
      expect(res.body.error.message).toBe(
        "File storage is not answering right now; nothing was saved. Try again in a minute.",
      );
      expect(await scanRows(documentId)).toBe(rows);
    } finally {
      s3 = await startS3Fake({ port, directory, bucket: BUCKET });
    }
    expect(await storedKeys()).toEqual(keys);
  });

  it("deletes the object again when the row cannot be written", async () => {
    const user = await buildUser(em());
    const actor = await actorOf(em(), user);
    const doc = await (await signIn(t.app, user.email)).post("/api/documents", permitBody());
    const calls: string[] = [];
    const real = t.ctx.adapters.storage;
    const recording: Storage = {
      putObject: async (key, body, type) => (calls.push(`put ${key}`), real.putObject(key, body, type)),
      getObjectStream: (key) => real.getObjectStream(key),
      deleteObject: async (key) => (calls.push(`delete ${key}`), real.deleteObject(key)),
    };
    const failing = em();
    failing.flush = async () => {
      throw new Error("the database went away");
    };
    await expect(
      uploadScan({
        em: failing,
        storage: recording,
        actor,
        documentId: doc.body.document.id,
        body: PDF,
        fileName: undefined,
      }),
    ).rejects.toThrow("the database went away");
    expect(calls).toHaveLength(2);
    expect(calls[1]).toBe(calls[0]!.replace("put", "delete"));
    expect((await storedKeys()).filter((k) => k.startsWith(`documents/${doc.body.document.id}/`))).toEqual([]);
    expect(await scanRows(doc.body.document.id)).toBe(0);
  });
});

describe("who sees a document", () => {
  let cast: TransferCast;
  let sender: Client;
  let receiver: Client;
  let courier: Client;
  let stranger: Client;
  let documentId: string;
  let scanUrl: string;
  beforeAll(async () => {
    // Couriers assigned while the transfer waits for the receiver: no "ready to ship" gate is involved.
    cast = await buildTransfer(em(), { status: "awaiting_receiver" });
    await assignLegs({
      em: em(),
      actor: await actorOf(em(), cast.sender),
      transferId: cast.transfer.id,
      input: { legs: [{ courierId: cast.couriers[0]!.id }] },
      links: t.ctx.links,
    });
    sender = await signIn(t.app, cast.sender.email);
    receiver = await signIn(t.app, cast.receiver.email);
    courier = await signIn(t.app, cast.couriers[0]!.email);
    stranger = await signIn(t.app, (await buildUser(em(), { organization: await buildOrganization(em()) })).email);
    documentId = (
      await sender.post(
        "/api/documents",
        permitBody({ kind: "export_permit", jurisdiction: "TN", speciesCovered: ["Pantherophis guttatus"] }),
      )
    ).body.document.id;
    scanUrl = (await upload(sender, documentId, PDF, "application/pdf")).body.scan.downloadUrl;
  });

  it("the other party and the courier do not see it until a transfer they share uses it; strangers never", async () => {
    for (const client of [receiver, courier, stranger])
      expect((await client.get(`/api/documents/${documentId}`)).status).toBe(404);
    expect((await receiver.get(scanUrl)).status).toBe(404);
    // Only the holding organisation attaches its own documents.
    expect((await receiver.post(`/api/transfers/${cast.transfer.id}/documents`, { documentId })).status).toBe(404);
    const attached = await sender.post(`/api/transfers/${cast.transfer.id}/documents`, { documentId });
    expect(attached.status).toBe(201);
    expect(attached.body.documents).toEqual([
      expect.objectContaining({ id: documentId, attached: true, holderSide: "sender" }),
    ]);

    const seen = await receiver.get(`/api/documents/${documentId}`);
    expect(seen.status).toBe(200);
    expect(seen.body.document.abilities).toEqual({ edit: false, upload: false, readScans: true });
    expect((await receiver.get(scanUrl)).status).toBe(200);
    expect((await receiver.patch(`/api/documents/${documentId}`, { number: "X" })).status).toBe(404);
    expect((await upload(receiver, documentId, PDF, "application/pdf")).status).toBe(404);

    // The courier reads the manifest entry, not the record's details or the scans.
    const carried = await courier.get(`/api/documents?transferId=${cast.transfer.id}`);
    expect(carried.status).toBe(200);
    expect(carried.body.documents[0]).toMatchObject({
      id: documentId,
      kind: "export_permit",
      details: null,
      scans: null,
    });
    expect((await courier.get(scanUrl)).status).toBe(403);

    expect((await stranger.get(`/api/documents/${documentId}`)).status).toBe(404);
    expect((await stranger.get(`/api/documents?transferId=${cast.transfer.id}`)).status).toBe(404);
  });

  it("taking it off the transfer hides it again", async () => {
    expect((await sender.del(`/api/transfers/${cast.transfer.id}/documents/${documentId}`)).status).toBe(204);
    expect((await receiver.get(`/api/documents/${documentId}`)).status).toBe(404);
    expect((await receiver.get(`/api/documents?transferId=${cast.transfer.id}`)).body.documents).toEqual([]);
  });
});
