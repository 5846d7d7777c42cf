import { PDFDocument } from "pdf-lib";
import { beforeAll, describe, expect, it } from "vitest";
import { renderLabelsPdf } from "./labels.pdf";
import type { ManifestBox, ManifestInput } from "./manifest-input";
import { buildAnimal, buildBoxes, buildManifestInput } from "./manifest-input.fixture";
import { decodeQrFromPng, drawnGlyphIds, extractPageTexts, pageSizesPt, renderPagePng } from "./pdf-test-support";

/** Three boxes with different species in each, so a label showing another box's animals fails. */
function distinctBoxes(): ManifestBox[] {
  const [a, b, c] = buildBoxes(3, 0);
  return [
    {
      ...a!,
      animals: [
        buildAnimal(0, { scientificName: "Python regius", count: 2 }),
        buildAnimal(1, { scientificName: "Pantherophis guttatus", count: 1 }),
      ],
    },
    {
      ...b!,
      animals: [
        buildAnimal(2, { scientificName: "Crotalus atrox", count: 1, venomous: true }),
        buildAnimal(3, { scientificName: "Ambystoma mexicanum", count: 4 }),
      ],
    },
    { ...c!, animals: [buildAnimal(4, { scientificName: "Correlophus ciliatus", count: 3 })] },
  ];
}

const NOT_NON = /(?<!NON-)VENOMOUS/;

describe("renderLabelsPdf", () => {
  let input: ManifestInput;
  let bytes: Uint8Array;
  let pages: string[];

  beforeAll(async () => {
    input = buildManifestInput({ boxes: distinctBoxes() });
    bytes = await renderLabelsPdf(input);
    pages = await extractPageTexts(bytes);
  });

  it("makes one 4 × 6 inch page per box", async () => {
    // PDF user space is 1/72 in (ISO 32000-1 §8.3.2.3) [published]: 4 × 6 in = 288 × 432 pt
    expect(pages).toHaveLength(3);
    for (const size of await pageSizesPt(bytes)) expect(size).toEqual({ width: 288, height: 432 });
  });

  it("marks each box LIVE ANIMALS, THIS SIDE UP and box n of N", () => {
    pages.forEach((text, i) => {
      expect(text).toContain("LIVE ANIMALS");
      expect(text).toContain("THIS SIDE UP");
      expect(text).toContain(`BOX ${i + 1} of 3`);
      expect(text).toContain("Transfer HW-2026-0042");
    });
  });

  it("carries the shipper's and consignee's name and address on every box", () => {
    // 50 CFR 14.81: each container marked with the name and address of shipper and consignee [published]
    for (const text of pages) {
      for (const party of [input.sender, input.receiver]) {
        expect(text).toContain(party.organisation);
        expect(text).toContain(party.street);
        expect(text).toContain(`${party.city}, ${party.state} ${party.zip}`);
        expect(text).toContain(`24-hour phone: ${party.phone24h}`);
      }
      expect(text.indexOf("FROM (SHIPPER)")).toBeLessThan(text.indexOf("TO (CONSIGNEE)"));
    }
  });

  it("lists the box's own contents by scientific name and number, and only those", () => {
    // 50 CFR 14.81: contents by scientific name and number of each species [published]; counts set in distinctBoxes()
    expect(pages[0]).toMatch(/Pantherophis guttatus 1 Python regius 2/);
    expect(pages[1]).toMatch(/Ambystoma mexicanum 4 Crotalus atrox VENOMOUS 1/);
    expect(pages[2]).toMatch(/Correlophus ciliatus 3/);
    expect(pages[0]).not.toContain("Crotalus atrox");
    expect(pages[2]).not.toContain("Python regius");
  });

  it("says VENOMOUS when any animal in the box is, NON-VENOMOUS otherwise", () => {
    // 50 CFR 14.81: whether venomous [published]; only box 2 holds a rattlesnake
    expect(pages[1]).toMatch(NOT_NON);
    expect(pages[1]).not.toContain("NON-VENOMOUS");
    for (const text of [pages[0], pages[2]]) {
      expect(text).toContain("NON-VENOMOUS");
      expect(text).not.toMatch(NOT_NON);
    }
  });

  it("gives the safe range in °F with °C", () => {
    // 65 °F = 18.3 °C, 85 °F = 29.4 °C (NIST SP 811 conversion) [published]
    for (const text of pages) expect(text).toMatch(/KEEP BETWEEN 65–85 °F \(18–29 °C\)/);
  });

  it("prints a QR code that opens the handoff page", () => {
    const png = renderPagePng(bytes, "labels-page2", 2);
    expect(decodeQrFromPng(png)).toBe(input.handoffUrl);
  });

  it("keeps a box of many species on one label and points to the manifest for the rest", async () => {
    // 40 lines of different (placeholder) species in the genus Anolis, one animal each
    const crowded = buildManifestInput({
      boxes: buildBoxes(1, 40).map((b) => ({
        ...b,
        animals: b.animals.map((a, i) => ({ ...a, scientificName: `Anolis sp${i}`, count: 1 })),
      })),
    });
    const labelBytes = await renderLabelsPdf(crowded);
    const [text = ""] = await extractPageTexts(labelBytes);
    expect(await pageSizesPt(labelBytes)).toHaveLength(1);
    const shown = Array.from({ length: 40 }, (_, i) => text.includes(`Anolis sp${i} 1`)).filter(Boolean).length;
    const rest = /\+ (\d+) more species \((\d+)\): see manifest/.exec(text);
    expect(shown).toBeGreaterThan(5);
    // every one of the 40 single-animal lines is either printed or counted in the remainder
    expect(shown + Number(rest?.[1] ?? 0)).toBe(40);
    expect(Number(rest?.[2])).toBe(40 - shown);
    renderPagePng(labelBytes, "labels-crowded");
  });
});

describe("renderLabelsPdf with hostile text", () => {
  it("draws markup, overrides and emoji as plain, visible text", async () => {
    const base = buildManifestInput();
    const input = buildManifestInput({
      sender: { ...base.sender, organisation: "<script>alert(1)</script> Herps 🐍 (demo)", street: "x".repeat(2000) },
      receiver: { ...base.receiver, contactName: "\u202Eevil\u202C Marcus" },
      boxes: base.boxes.map((b) => ({ ...b, label: "a\u0000b\nc" })),
    });
    const bytes = await renderLabelsPdf(input);
    const reloaded = await PDFDocument.load(bytes);
    expect(reloaded.getPageCount()).toBe(3);
    const text = (await extractPageTexts(bytes)).join(" ");
    expect(text).toContain("<script>alert(1)</script> Herps [snake] (demo)");
    expect(text).not.toContain("\uFFFD");
    expect(text).toContain("evil Marcus");
    expect(text).not.toMatch(/[\u202A-\u202E]/);
    expect(text).toContain("ab c");
    const ids = await drawnGlyphIds(bytes);
    expect(ids.length).toBeGreaterThan(0);
    expect(ids).not.toContain(0);
    renderPagePng(bytes, "labels-hostile");
  });
});
