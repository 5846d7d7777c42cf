import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, signIn, type TestApp } from "../support/app";
import { buildTransfer, buildUser, type TransferCast } from "../factories";
import {
  decodeQrFromPng,
  drawnGlyphIds,
  extractPageTexts,
  pageSizesPt,
  renderPagePng,
} from "../../server/pdf/pdf-test-support";

let t: TestApp;
let cast: TransferCast;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
  cast = await buildTransfer(em(), {
    status: "ready",
    animals: [
      { taxon: "Pantherophis guttatus", count: 3, sex: "female", box: "A" },
      { taxon: "Pantherophis guttatus", count: 1, sex: "male", box: "A" },
      { taxon: "Crotalus atrox", count: 1, sex: "male", box: "B" },
      { taxon: "Ambystoma mexicanum", count: 2, box: "C" },
    ],
  });
  // Hostile user text travels to the paper as text.
  await t.ctx.pool.query("UPDATE transfer SET handling_notes = $2 WHERE id = $1", [
    cast.transfer.id,
    `<script>alert(1)</script> \u202Eevil\u202C 🐍 ${"x".repeat(2000)}`,
  ]);
});
afterAll(() => t.close());

const fetchPdf = async (email: string, file: string) => {
  const client = await signIn(t.app, email);
  return client
    .get(`/api/transfers/${cast.transfer.id}/${file}`)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => done(null, Buffer.concat(chunks)));
    });
};

describe("GET /api/transfers/:id/manifest.pdf", () => {
  it("lists every animal, the totals per species (50 CFR 14.81), shipper and consignee [published]", async () => {
    const res = await fetchPdf(cast.sender.email, "manifest.pdf");
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    // Paper of ours, but not a page of ours: the same sandbox as a stored scan (SECURITY.md, Files).
    expect(res.headers["content-security-policy"]).toBe("default-src 'none'; sandbox");
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
    const bytes = new Uint8Array(res.body as Buffer);
    const text = (await extractPageTexts(bytes)).join("\n");
    for (const name of ["Pantherophis guttatus", "Crotalus atrox", "Ambystoma mexicanum"]) expect(text).toContain(name);
    expect(text).toContain(cast.transfer.number);
    expect(text).toContain("418 Quarry Hollow Road");
    expect(text).toContain("92 Boardwalk Lane");
    // Totals row: species (scientific, common), number of animals, boxes by label, venomous.
    expect(text).toMatch(/Pantherophis guttatus corn snake 4 Box A \(box 1\) No/);
    expect(text).toMatch(/All species \(3\) 7 3 boxes/);
    expect(text).toContain("<script>alert(1)</script>");
    expect(await drawnGlyphIds(bytes)).not.toContain(0);
    const png = renderPagePng(bytes, "api-manifest");
    expect(decodeQrFromPng(png)).toBe(`${t.env.PUBLIC_URL}/legs/${cast.transfer.id}`);
  });

  it("is readable by the assigned courier and no one else outside the parties", async () => {
    expect((await fetchPdf(cast.couriers[0]!.email, "manifest.pdf")).status).toBe(200);
    expect((await fetchPdf((await buildUser(em(), { role: "courier" })).email, "manifest.pdf")).status).toBe(404);
    expect((await fetchPdf((await buildUser(em())).email, "manifest.pdf")).status).toBe(404);
  });
});

describe("temperature on the paper", () => {
  // Bands are the profile defaults of shared/temperature/profiles.ts [memory]: temperate snakes
  // 55–85 °F, salamanders 45–70 °F; the whole shipment must stay in their overlap, 55–70 °F.
  // °C by the conversion C = (F − 32) × 5/9 (NIST SP 811, B.8) [published].
  it("the manifest carries the last stored check and the band every box shares", async () => {
    const text = (
      await extractPageTexts(new Uint8Array((await fetchPdf(cast.sender.email, "manifest.pdf")).body as Buffer))
    ).join("\n");
    expect(text).toContain("Safe transit range: 55–70 °F (13–21 °C)");
    // The fixture was cleared to ship past the temperature gate with no weather service: the stored check says so.
    // The time is given in the origin's zone (Knoxville: Eastern), like the departure on the same page.
    expect(text).toMatch(
      /Forecast unavailable \(forecast checked \w{3}, \w{3} \d{1,2}, \d{4}, \d{2}:\d{2} E[SD]T, when the transfer was cleared to ship\)/,
    );
    expect(text).toMatch(/Box A: Temperate snakes, 55–85 °F \(13–29 °C\)/);
    expect(text).toMatch(/Box C: Salamanders and newts, 45–70 °F \(7–21 °C\)/);
  });

  it("each box label carries its own animals' band", async () => {
    const pages = await extractPageTexts(
      new Uint8Array((await fetchPdf(cast.sender.email, "labels.pdf")).body as Buffer),
    );
    expect(pages[0]).toMatch(/55–85 °F/);
    expect(pages[2]).toMatch(/45–70 °F/);
    expect(pages[2]).not.toMatch(/55–85 °F/);
  });

  it("after an edit the stored check no longer speaks for the record", async () => {
    const sender = await signIn(t.app, cast.sender.email);
    const current = (await sender.get(`/api/transfers/${cast.transfer.id}`)).body.transfer as { version: number };
    expect(
      (
        await sender.patch(`/api/transfers/${cast.transfer.id}`, {
          version: current.version,
          handlingNotes: "Mist box C lightly before sealing.",
        })
      ).status,
    ).toBe(200);
    const text = (
      await extractPageTexts(new Uint8Array((await fetchPdf(cast.sender.email, "manifest.pdf")).body as Buffer))
    ).join("\n");
    // source: issue 12 §3: the verdict is computed when printed; the tests' weather service does not answer,
    // so the check made at printing says the forecast is unavailable (never a kind of "fine").
    expect(text).toContain("NOT CHECKED: forecast unavailable");
    expect(text).toMatch(/forecast checked \w{3}, \w{3} \d{1,2}, \d{4}, \d{2}:\d{2} E[SD]T, when this was printed/);
    expect(text).not.toMatch(/when the transfer was cleared to ship/);
    expect(text).toContain("Safe transit range: 55–70 °F (13–21 °C)");
  });
});

describe("GET /api/transfers/:id/labels.pdf", () => {
  it("gives one 4 × 6 in label per box, the venomous one marked", async () => {
    const res = await fetchPdf(cast.receiver.email, "labels.pdf");
    expect(res.status).toBe(200);
    expect(res.headers["content-security-policy"]).toBe("default-src 'none'; sandbox");
    const bytes = new Uint8Array(res.body as Buffer);
    const sizes = await pageSizesPt(bytes);
    expect(sizes).toEqual([
      { width: 288, height: 432 },
      { width: 288, height: 432 },
      { width: 288, height: 432 },
    ]);
    const pages = await extractPageTexts(bytes);
    expect(pages[0]).toContain("LIVE ANIMALS");
    expect(pages[0]).toMatch(/1\s*of\s*3/);
    expect(pages[1]).toMatch(/VENOMOUS/);
    expect(pages[1]).not.toMatch(/NON-VENOMOUS/);
    expect(pages[0]).toMatch(/NON-VENOMOUS/);
  });
});
