/**
 * Photos at the handoffs and the check-in (issue 12 §2), stored like permit scans: the type read from
 * the bytes (JPEG: ITU T.81; PNG: ISO/IEC 15948 §5.2) [published], a size cap, a SHA-256 (FIPS 180-4)
 * [published], a key of ours, and access only for the parties and the assigned couriers (OWASP
 * File Upload Cheat Sheet) [published].
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createHash, randomUUID } from "node:crypto";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { startS3Fake, type S3Fake } from "../../fakes/s3/s3-fake";
import { createTestApp, signIn, withDatabaseAs, type Client, type TestApp } from "../support/app";
import { TINY_JPEG, TINY_PNG } from "../support/images";
import { buildTransfer, buildUser, type TransferCast } from "../factories";
import { LIMITS } from "@shared/constants";

const BUCKET = "hatchway-photos-test";
const directory = mkdtempSync(path.join(tmpdir(), "hatchway-s3-photos-"));
let s3: S3Fake;
let t: TestApp;
const em = () => t.orm.em.fork();
const sha256 = (bytes: Buffer) => createHash("sha256").update(bytes).digest("hex");

beforeAll(async () => {
  s3 = await startS3Fake({ directory, bucket: BUCKET });
  t = await createTestApp({ S3_ENDPOINT: s3.endpoint, S3_BUCKET: BUCKET });
});
afterAll(async () => {
  await t.close();
  await s3.close();
});

async function storedKeys(prefix: string): Promise<string[]> {
  const client = new S3Client({
    endpoint: s3.endpoint,
    region: "us-east-1",
    forcePathStyle: true,
    credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" },
  });
  const listed = await client.send(new ListObjectsV2Command({ Bucket: BUCKET, Prefix: prefix }));
  client.destroy();
  return (listed.Contents ?? []).map((o) => o.Key ?? "");
}

const upload = (client: Client, transferId: string, query: string, body: Buffer, type = "image/jpeg") =>
  client.agent
    .post(`/api/transfers/${transferId}/photos?${query}`)
    .set("X-CSRF-Token", client.csrf)
    .set("Content-Type", type)
    .send(body);

describe("photos of the custody", () => {
  let cast: TransferCast;
  let courier: Client;
  let boxId: string;
  beforeAll(async () => {
    cast = await buildTransfer(em(), { status: "in_transit" });
    courier = await signIn(t.app, cast.couriers[0]!.email);
    boxId = (await courier.get(`/api/transfers/${cast.transfer.id}`)).body.transfer.containers[0].id;
  });

  it("stores a pickup photo under a key of ours with its SHA-256, on the record and in the custody log", async () => {
    const res = await upload(
      courier,
      cast.transfer.id,
      `moment=handoff&handoffIndex=0&subject=seal&containerId=${boxId}`,
      TINY_JPEG,
    );
    expect(res.status).toBe(201);
    const photos = res.body.transfer.photos;
    expect(photos).toHaveLength(1);
    expect(photos[0]).toMatchObject({
      moment: "handoff",
      handoffIndex: 0,
      subject: "seal",
      containerId: boxId,
      contentType: "image/jpeg",
      sizeBytes: TINY_JPEG.length,
      sha256: sha256(TINY_JPEG),
      uploadedBy: { id: cast.couriers[0]!.id },
    });
    expect(await storedKeys(`photos/${cast.transfer.id}/`)).toHaveLength(1);
    const log = (await courier.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    expect(log.intact).toBe(true);
    const entry = log.entries.at(-1);
    expect(entry).toMatchObject({ kind: "photo_added", payload: { photoId: photos[0].id, sha256: sha256(TINY_JPEG) } });
  });

  it("reads the type from the bytes: a PNG sent as octet-stream is a PNG, a page called a JPEG is refused", async () => {
    const png = await upload(
      courier,
      cast.transfer.id,
      "moment=handoff&handoffIndex=0&subject=box_outside",
      TINY_PNG,
      "application/octet-stream",
    );
    expect(png.status).toBe(201);
    expect(png.body.transfer.photos.at(-1)).toMatchObject({ contentType: "image/png", sha256: sha256(TINY_PNG) });
    const before = await storedKeys(`photos/${cast.transfer.id}/`);
    const html = Buffer.from("<html><body><script>alert(1)</script></body></html>");
    const page = await upload(courier, cast.transfer.id, "moment=handoff&handoffIndex=0&subject=seal", html);
    expect(page.status).toBe(415);
    expect(page.body.error.message).toMatch(/not a JPEG or PNG photo/);
    const pdf = Buffer.from("%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\n%%EOF\n", "latin1");
    expect((await upload(courier, cast.transfer.id, "moment=handoff&handoffIndex=0&subject=seal", pdf)).status).toBe(
      415,
    );
    expect(
      (await upload(courier, cast.transfer.id, "moment=handoff&handoffIndex=0&subject=seal", Buffer.alloc(0))).status,
    ).toBe(400);
    expect(await storedKeys(`photos/${cast.transfer.id}/`)).toEqual(before);
  });

  it("refuses a photo over the size cap with the limit in words", async () => {
    const big = Buffer.concat([TINY_JPEG, Buffer.alloc(LIMITS.photoBytesMax)]);
    const res = await upload(courier, cast.transfer.id, "moment=handoff&handoffIndex=0&subject=seal", big);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toContain("10 MB");
  });

  it("belongs to a moment that happened and a box of this transfer", async () => {
    const later = await upload(courier, cast.transfer.id, "moment=handoff&handoffIndex=1&subject=seal", TINY_JPEG);
    expect(later.status).toBe(409);
    expect(later.body.error.message).toMatch(/Handoff 2 is not recorded yet/);
    const checkIn = await upload(courier, cast.transfer.id, "moment=check_in&subject=animal", TINY_JPEG);
    expect(checkIn.status).toBe(409);
    const noIndex = await upload(courier, cast.transfer.id, "moment=handoff&subject=seal", TINY_JPEG);
    expect(noIndex.status).toBe(400);
    expect(noIndex.body.error.field).toBe("handoffIndex");
    const other = await buildTransfer(em(), { status: "ready" });
    const foreign = (await (await signIn(t.app, other.sender.email)).get(`/api/transfers/${other.transfer.id}`)).body
      .transfer.containers[0].id;
    const wrongBox = await upload(
      courier,
      cast.transfer.id,
      `moment=handoff&handoffIndex=0&subject=seal&containerId=${foreign}`,
      TINY_JPEG,
    );
    expect(wrongBox.status).toBe(400);
    expect(wrongBox.body.error.field).toBe("containerId");
  });

  it("is served to the parties and the assigned courier only, as an image that cannot run", async () => {
    const photo = (await courier.get(`/api/transfers/${cast.transfer.id}`)).body.transfer.photos[0];
    for (const user of [cast.sender, cast.receiver, cast.couriers[0]!]) {
      const client = await signIn(t.app, user.email);
      const res = await client
        .get(photo.url)
        .buffer(true)
        .parse((r, done) => {
          const chunks: Buffer[] = [];
          r.on("data", (c: Buffer) => chunks.push(c));
          r.on("end", () => done(null, Buffer.concat(chunks)));
        });
      expect(res.status).toBe(200);
      expect(res.headers["content-type"]).toBe("image/jpeg");
      expect(res.headers["x-content-type-options"]).toBe("nosniff");
      expect(res.headers["content-security-policy"]).toMatch(/sandbox/);
      expect(sha256(res.body as Buffer)).toBe(photo.sha256);
    }
    const admin = await signIn(t.app, (await buildUser(em(), { role: "admin" })).email);
    expect((await admin.get(photo.url)).status).toBe(403);
    expect((await admin.get(`/api/transfers/${cast.transfer.id}`)).body.transfer.photos).toEqual([]);
    expect(
      (await upload(admin, cast.transfer.id, "moment=handoff&handoffIndex=0&subject=seal", TINY_JPEG)).status,
    ).toBe(403);
    for (const stranger of [await buildUser(em(), { role: "member" }), await buildUser(em(), { role: "courier" })]) {
      const client = await signIn(t.app, stranger.email);
      expect((await client.get(photo.url)).status).toBe(404);
      expect(
        (await upload(client, cast.transfer.id, "moment=handoff&handoffIndex=0&subject=seal", TINY_JPEG)).status,
      ).toBe(404);
    }
    // A photo id under another transfer's address is not found there.
    const other = await buildTransfer(em(), { status: "in_transit", couriers: [cast.couriers[0]!] });
    expect((await courier.get(`/api/transfers/${other.transfer.id}/photos/${photo.id}`)).status).toBe(404);
    expect((await courier.get(`/api/transfers/${cast.transfer.id}/photos/${randomUUID()}`)).status).toBe(404);
  });

  it("is kept for good: the database refuses to change or remove a photo's row", async () => {
    const { rows } = await t.ctx.pool.query("SELECT id FROM transfer_photo WHERE transfer_id = $1 LIMIT 1", [
      cast.transfer.id,
    ]);
    const id = rows[0].id as string;
    // The app's login may neither rewrite nor remove a photo's row (D18) …
    await expect(t.ctx.pool.query("UPDATE transfer_photo SET sha256 = 'x' WHERE id = $1", [id])).rejects.toThrow(
      /permission denied/,
    );
    await expect(t.ctx.pool.query("DELETE FROM transfer_photo WHERE id = $1", [id])).rejects.toThrow(
      /permission denied/,
    );
    // … and the table's owner is stopped by the triggers.
    await withDatabaseAs("owner", async (owner) => {
      await expect(owner.query("UPDATE transfer_photo SET sha256 = 'x' WHERE id = $1", [id])).rejects.toThrow(
        /append-only/,
      );
      await expect(owner.query("DELETE FROM transfer_photo WHERE id = $1", [id])).rejects.toThrow(/append-only/);
    });
  });
});
