/**
 * The manifest and labels say what the transfer page says (issue 12 §3): the current compliance
 * and temperature verdicts, computed when printed, "DO NOT SHIP" or "UNVERIFIED" in words and
 * colour, and the time of the check in the origin's time zone.
 */
import { readFileSync } from "node:fs";
import { PNG } from "pngjs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { buildTransfer, buildUser, type TransferCast } from "../factories";
import { extractPageTexts, renderPagePng } from "../../server/pdf/pdf-test-support";

let t: TestApp;
let cast: TransferCast;
let sender: Client;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
  cast = await buildTransfer(em(), { status: "awaiting_receiver", mode: "ground_courier" });
  sender = await signIn(t.app, cast.sender.email);
});
afterAll(() => t.close());

async function pdf(file: "manifest.pdf" | "labels.pdf"): Promise<Uint8Array> {
  const res = await sender
    .get(`/api/transfers/${cast.transfer.id}/${file}`)
    .buffer(true)
    .parse((response, done) => {
      const chunks: Buffer[] = [];
      response.on("data", (c: Buffer) => chunks.push(c));
      response.on("end", () => done(null, Buffer.concat(chunks)));
    });
  expect(res.status).toBe(200);
  return new Uint8Array(res.body as Buffer);
}

/** Pixels of one colour (within a small tolerance) in the top part of page 1. */
function pixelsLike(pngPath: string, hex: string, topFraction: number): number {
  const png = PNG.sync.read(readFileSync(pngPath));
  const [r, g, b] = [1, 3, 5].map((i) => Number.parseInt(hex.slice(i, i + 2), 16)) as [number, number, number];
  let n = 0;
  for (let y = 0; y < Math.floor(png.height * topFraction); y++) {
    for (let x = 0; x < png.width; x++) {
      const i = (y * png.width + x) * 4;
      if (Math.abs(png.data[i]! - r) < 24 && Math.abs(png.data[i + 1]! - g) < 24 && Math.abs(png.data[i + 2]! - b) < 24)
        n++;
    }
  }
  return n;
}

// The palette of server/pdf/layout.ts: amber for cautions, brick red for blocks (PRODUCT.md, "Look").
const AMBER = "#a86a12";
const BRICK = "#a3392b";

describe("the manifest printed for a transfer whose states have no reviewed rules", () => {
  it("says UNVERIFIED in amber, names the states and agencies, and the time of the check in the origin's zone", async () => {
    const bytes = await pdf("manifest.pdf");
    const [page1 = ""] = await extractPageTexts(bytes);
    expect(page1).toContain("RULES AND PERMITS UNVERIFIED");
    expect(page1).toContain("Tennessee");
    expect(page1).toContain("Oregon Department of Fish and Wildlife");
    // Knoxville is in the Eastern zone [published: tz database, America/New_York]
    expect(page1).toMatch(/Checked \w{3}, \w{3} \d{1,2}, \d{4}, \d{2}:\d{2} E[SD]T/);
    // The tests' weather service does not answer: the temperature is said to be unchecked, in brick red.
    expect(page1).toContain("TEMPERATURE ON THE WAY NOT CHECKED: forecast unavailable");
    // The verdicts come before the shipper's block, at the top of page 1.
    expect(page1.indexOf("UNVERIFIED")).toBeLessThan(page1.indexOf("SHIPPER (SENDER)"));
    const png = renderPagePng(bytes, "api-manifest-unverified");
    expect(pixelsLike(png, AMBER, 0.35)).toBeGreaterThan(200);
    expect(pixelsLike(png, BRICK, 0.35)).toBeGreaterThan(200);
  });

  it("puts both verdicts on every box label", async () => {
    const pages = await extractPageTexts(await pdf("labels.pdf"));
    for (const page of pages) {
      expect(page).toContain("Rules: UNVERIFIED");
      expect(page).toContain("Temperature: NOT CHECKED");
      expect(page).toMatch(/Checked \w{3}, \w{3} \d{1,2}, \d{4}, \d{2}:\d{2} E[SD]T/);
    }
  });
});

describe("the manifest printed while a rule forbids the move", () => {
  it("says DO NOT SHIP in brick red, with the rule that stops it", async () => {
    // A test rule of our own, clearly marked as demo: no corn snake into Oregon.
    const admin = await signIn(t.app, (await buildUser(em(), { role: "admin" })).email);
    const created = await admin.post("/api/compliance/rules", {
      retired: false,
      rule: {
        id: "demo-test-or-no-corn-snakes",
        version: 1,
        jurisdiction: "OR",
        governs: "import",
        selector: { taxa: ["Pantherophis guttatus"] },
        conditions: {},
        effect: { kind: "prohibited" },
        summary: "Test rule: no corn snake may come into Oregon.",
        citation: { text: "Test rule: demo rule, not a statement of that state's law", url: null },
        effectiveFrom: null,
        effectiveTo: null,
        reviewedOn: "2026-12-01",
        reviewedBy: "Test",
        demo: true,
      },
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    try {
      const page = await sender.get(`/api/transfers/${cast.transfer.id}/compliance`).expect(200);
      expect(page.body.verdict).toBe("blocked");
      const bytes = await pdf("manifest.pdf");
      const [page1 = ""] = await extractPageTexts(bytes);
      expect(page1).toContain("RULES AND PERMITS DO NOT SHIP");
      expect(page1).toContain("no corn snake may come into Oregon");
      const png = renderPagePng(bytes, "api-manifest-blocked");
      expect(pixelsLike(png, BRICK, 0.35)).toBeGreaterThan(400);
      const labels = await extractPageTexts(await pdf("labels.pdf"));
      expect(labels[0]).toContain("Rules: DO NOT SHIP");
    } finally {
      const current = (await admin.get("/api/compliance/rules/demo-test-or-no-corn-snakes")).body.versions[0];
      await admin.post("/api/compliance/rules/demo-test-or-no-corn-snakes/versions", {
        retired: true,
        rule: { ...current.rule, version: current.rule.version + 1 },
      });
    }
  });
});
