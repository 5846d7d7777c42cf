import { PDFDocument } from "pdf-lib";
import { beforeAll, describe, expect, it } from "vitest";
import { embedFonts } from "./fonts";
import { renderManifestPdf } from "./manifest.pdf";
import type { ManifestBox, ManifestInput } from "./manifest-input";
import { buildAnimal, buildBoxes, buildManifestInput } from "./manifest-input.fixture";
import { decodeQrFromPng, drawnGlyphIds, extractPageTexts, renderPagePng } from "./pdf-test-support";

const squash = (s: string): string => s.replace(/\s+/g, "");

/** The pages' text without the running header and footer, so text broken across pages joins up. */
function bodyText(pages: string[]): string {
  return pages
    .map((p) =>
      p
        .replace(/Produced .*? by Hatchway · Transfer \S+ Page \d+ of \d+/, "")
        .replace(/^Packing manifest · Transfer \S+/, "")
        .replace(
          /Box \d+ of \d+ \(continued\) # Species \(scientific \/ common\) Count Sex Identifier Origin Size Venomous/,
          "",
        ),
    )
    .join(" ");
}

/** Boxes whose species totals are counted by hand in the totals test. */
function countedBoxes(): ManifestBox[] {
  const [a, b, c] = buildBoxes(3, 0);
  return [
    {
      ...a!,
      animals: [
        buildAnimal(0, { scientificName: "Python regius", commonName: "Ball python", count: 2 }),
        buildAnimal(1, {
          scientificName: "Crotalus atrox",
          commonName: "Western diamondback rattlesnake",
          count: 1,
          venomous: true,
        }),
      ],
    },
    {
      ...b!,
      animals: [
        buildAnimal(2, { scientificName: "Python regius", commonName: "Ball python", count: 3 }),
        buildAnimal(3, { scientificName: "Ambystoma mexicanum", commonName: "Axolotl", count: 6 }),
      ],
    },
    {
      ...c!,
      animals: [
        buildAnimal(4, {
          scientificName: "Crotalus atrox",
          commonName: "Western diamondback rattlesnake",
          count: 2,
          venomous: true,
        }),
      ],
    },
  ];
}

describe("renderManifestPdf", () => {
  let input: ManifestInput;
  let bytes: Uint8Array;
  let pages: string[];
  let all: string;

  beforeAll(async () => {
    input = buildManifestInput({ boxes: buildBoxes(4, 6) });
    bytes = await renderManifestPdf(input);
    pages = await extractPageTexts(bytes);
    all = pages.join(" ");
  });

  it("lists every animal with its names, identifier, origin, sex and size", () => {
    // 50 CFR 14.81: the accompanying list names each animal's species [published]; sizes in mm with
    // inches beside at 25.4 mm per inch [published, international inch]
    const animals = input.boxes.flatMap((b) => b.animals);
    expect(animals).toHaveLength(24);
    for (const a of animals) {
      expect(all).toContain(a.scientificName);
      expect(all).toContain(a.commonName);
      expect(all.split(a.identifier ?? "?").length - 1).toBe(1);
      expect(all).toContain(`${a.lengthMm} mm (${((a.lengthMm ?? 0) / 25.4).toFixed(1)} in)`);
    }
    expect(all).toContain("Captive-bred");
    expect(all).toContain("Long-term captive");
    expect(all).toMatch(/Female/);
    // the rattlesnake in the demo taxa is venomous [practice: Crotalus are pit vipers]
    expect(all).toMatch(/Crotalus atrox Western diamondback rattlesnake 1 \w+ PH-\d+ .*?VENOMOUS/);
  });

  it("heads every box with its number, dimensions, pack and seal", () => {
    for (const box of input.boxes) {
      expect(all).toContain(`Box ${box.index} of ${input.boxes.length}: ${box.label}`);
      expect(all).toContain(`Seal no. ${box.sealNumber ?? ""}`);
    }
    // 400 × 300 × 250 mm is 15.7 × 11.8 × 9.8 in at 25.4 mm per inch [published]
    expect(all).toContain("400 × 300 × 250 mm (15.7 × 11.8 × 9.8 in)");
    expect(all).toContain("Heat pack, 40 hours");
  });

  it("prints the shipper and consignee name-and-address blocks in full", () => {
    // 50 CFR 14.81: name and address of shipper and consignee [published]
    for (const [title, party] of [
      ["SHIPPER (SENDER)", input.sender],
      ["CONSIGNEE (RECEIVER)", input.receiver],
    ] as const) {
      const block = [
        party.organisation,
        party.contactName,
        party.street,
        `${party.city}, ${party.state} ${party.zip}`,
        `24-hour phone: ${party.phone24h}`,
        party.email,
      ];
      expect(pages[0]).toContain(title);
      for (const line of block) expect(pages[0]).toContain(line);
    }
  });

  it("shows the transfer facts in the time zones given", () => {
    expect(pages[0]).toContain("Transfer HW-2026-0042");
    expect(pages[0]).toContain("Overnight air carrier");
    // 21:30Z on 2026-04-14 is 16:30 CDT (UTC−5) and 14:30Z on 04-15 is 10:30 EDT (UTC−4): DST, 15 U.S.C. 260a [published]
    expect(pages[0]).toContain("Tue, Apr 14, 2026, 16:30 CDT");
    expect(pages[0]).toContain("Wed, Apr 15, 2026, 10:30 EDT");
    expect(pages[0]).toContain("Renata Vosk");
    expect(pages[0]).toContain("Bluegrass Ground Couriers (demo)");
  });

  it("lists the permits and certificates with number, issuer, holder and validity", () => {
    for (const d of input.documents) {
      expect(all).toContain(d.number);
      expect(all).toContain(d.issuer);
    }
    expect(all).toContain("State import permit");
    expect(all).toContain("Certificate of Veterinary Inspection (CVI)");
    // Gregorian calendar [published]: 2026-01-01 and 2026-12-31 are Thursdays.
    expect(all).toContain("Thu, Jan 1, 2026 – Thu, Dec 31, 2026");
  });

  it("carries the temperature range in °F and °C and the standard cautions", () => {
    // 65 °F = 18.3 °C, 85 °F = 29.4 °C (NIST SP 811 conversion) [published]
    expect(all).toContain("Safe transit range: 65–85 °F (18–29 °C)");
    // product cautions: not legal advice, confirm with the state agency and a licensed vet, planning aid,
    // heat packs never touch the container (SOURCES.md, REPTILES magazine shipping guide) [practice]
    expect(all).toContain("not legal advice");
    expect(all).toContain("wildlife agencies");
    expect(all).toContain("licensed veterinarian");
    expect(all).toContain("planning aid, not a guarantee");
    expect(all).toContain("never touch an animal's container");
    expect(all).toContain(input.temperature?.packingNotes ?? "?");
  });

  it("gives emergency contacts and handling instructions", () => {
    expect(all).toContain("Handling and emergencies");
    expect(all).toContain("Dr. L. Farrow (demo) Sender's veterinarian (937) 555-0188");
    expect(all).toContain(input.handlingNotes ?? "?");
  });

  it("ends with a custody table of empty rows to sign by hand", () => {
    // each custody transfer records releaser, receiver, date and time, place (NIST CNSSI 4009, ASTM D4840) [published]
    const custody = all.slice(all.indexOf("Chain of custody"));
    expect(custody).toMatch(/Released by \(print, sign\) Received by \(print, sign\) Date and time Place/);
    expect(custody).toMatch(/ 1 2 3 4 5 6 7 8 /);
  });

  it("numbers every page n of N and stamps the produced time", () => {
    expect(pages.length).toBeGreaterThan(1);
    pages.forEach((text, i) => {
      expect(text).toContain(`Page ${i + 1} of ${pages.length}`);
      // 19:05Z on 2026-04-13 is 14:05 CDT [published, 15 U.S.C. 260a]
      expect(text).toContain("Produced Mon, Apr 13, 2026, 14:05 CDT");
    });
  });

  it("draws no missing-glyph boxes", async () => {
    const ids = await drawnGlyphIds(bytes);
    expect(ids.length).toBeGreaterThan(1000);
    expect(ids.filter((id) => id === 0)).toHaveLength(0);
  });

  it("puts a QR code on page 1 that opens the handoff page", () => {
    const png = renderPagePng(bytes, "manifest-page1");
    expect(decodeQrFromPng(png)).toBe(input.handoffUrl);
  });
});

describe("renderManifestPdf totals", () => {
  it("sums each species over all boxes with venomous flags", async () => {
    // 50 CFR 14.81: scientific name, number of each species, whether venomous [published];
    // the numbers are counted by hand from countedBoxes(): 2 + 3 pythons, 1 + 2 rattlesnakes, 6 axolotls
    const text = (await extractPageTexts(await renderManifestPdf(buildManifestInput({ boxes: countedBoxes() })))).join(
      " ",
    );
    const totals = text.slice(text.indexOf("Totals by species (50 CFR 14.81)"));
    // Columns in the order the issue names them: species, number of animals, boxes by label (then venomous).
    expect(totals).toContain("Species (scientific / common) Number of animals Boxes (by label) Venomous");
    expect(totals).toContain("Ambystoma mexicanum Axolotl 6 Shipping box B (box 2) No");
    expect(totals).toContain(
      "Crotalus atrox Western diamondback rattlesnake 3 Shipping box A (box 1) Shipping box C (box 3) VENOMOUS",
    );
    expect(totals).toContain("Python regius Ball python 5 Shipping box A (box 1) Shipping box B (box 2) No");
    expect(totals).toContain("All species (3) 14 3 boxes");
    expect(text).toContain("ANIMALS 14 (3 species)");
  });
});

describe("renderManifestPdf pagination", () => {
  it("repeats the table header on every page a box table continues onto", async () => {
    const input = buildManifestInput({ boxes: buildBoxes(10, 10) });
    const pages = await extractPageTexts(await renderManifestPdf(input));
    const continued = pages.filter((p) => /Box \d+ of 10 \(continued\)/.test(p));
    expect(continued.length).toBeGreaterThan(0);
    for (const page of continued)
      expect(page).toMatch(
        /\(continued\) # Species \(scientific \/ common\) Count Sex Identifier Origin Size Venomous/,
      );
    // all 100 identifiers survive the page breaks, each exactly once
    const all = pages.join(" ");
    for (const a of input.boxes.flatMap((b) => b.animals)) expect(all.split(a.identifier ?? "?").length - 1).toBe(1);
  });
});

describe("renderManifestPdf with hostile text", () => {
  const longNote = Array.from({ length: 400 }, (_, i) => `note${String(i).padStart(4, "0")}`)
    .join(" ")
    .slice(0, 2000);
  const longWord = Array.from({ length: 2000 }, (_, i) => String.fromCharCode(65 + (i % 26))).join("");
  let input: ManifestInput;
  let bytes: Uint8Array;

  beforeAll(async () => {
    const base = buildManifestInput();
    const [first, ...rest] = base.boxes;
    input = buildManifestInput({
      sender: { ...base.sender, organisation: '<script>alert("pwned")</script> Herps (demo)' },
      receiver: { ...base.receiver, contactName: "\u202Eevil\u202C Marcus" },
      handlingNotes: longWord,
      temperature: { advice: "nul\u0000here \u0007bell", safeRangeF: { minF: 65, maxF: 85 }, packingNotes: null },
      boxes: [
        {
          ...first!,
          label: "Box\nA\tB",
          animals: [
            buildAnimal(0, { notes: longNote }),
            buildAnimal(1, { notes: "calm 🐍 snake 👨‍👩‍👧 ok", identifier: "(\\) %%EOF endobj" }),
          ],
        },
        ...rest,
      ],
    });
    bytes = await renderManifestPdf(input);
  });

  it("stays a valid PDF that pdf-lib and pdf.js both load", async () => {
    const reloaded = await PDFDocument.load(bytes);
    expect(reloaded.getPageCount()).toBeGreaterThan(1);
    expect((await extractPageTexts(bytes)).length).toBe(reloaded.getPageCount());
    // poppler renders it too; the PNGs are left for a person to look at
    renderPagePng(bytes, "manifest-hostile-page1", 1);
    renderPagePng(bytes, "manifest-hostile-page2", 2);
  });

  it("shows markup and PDF syntax as literal text", async () => {
    const all = (await extractPageTexts(bytes)).join(" ");
    expect(all).toContain('<script>alert("pwned")</script> Herps (demo)');
    expect(all).toContain("(\\) %%EOF endobj");
    expect(all).toContain("Box 1 of 3: Box A B");
    expect(all).toContain("nulhere bell");
  });

  it("drops the right-to-left override instead of reordering the text", async () => {
    const all = (await extractPageTexts(bytes)).join(" ");
    expect(all).not.toMatch(/[\u202A-\u202E\u2066-\u2069]/);
    expect(all).toContain("evil Marcus");
  });

  it("writes emoji as readable words, never “�”, and draws no missing-glyph boxes", async () => {
    const all = (await extractPageTexts(bytes)).join(" ");
    // the names are Unicode's CLDR short names as the any-ascii library spells them [published]
    expect(all).toContain("calm [snake] snake [man][woman][girl] ok");
    expect(all).not.toContain("\uFFFD");
    const ids = await drawnGlyphIds(bytes);
    expect(ids.length).toBeGreaterThan(0);
    expect(ids).not.toContain(0);
  });

  it("prints 2,000-character notes in full, wrapped", async () => {
    const all = squash(bodyText(await extractPageTexts(bytes)));
    expect(longNote).toHaveLength(2000);
    expect(all).toContain(squash(longNote));
    expect(all).toContain(longWord);
  });

  it("the missing-glyph check does catch a glyph drawn without safeText", async () => {
    // control: drawing an emoji straight through pdf-lib yields glyph 0 (.notdef) [practice: pdf-lib behaviour]
    const doc = await PDFDocument.create();
    const { regular } = await embedFonts(doc);
    doc.addPage().drawText("snake 🐍", { font: regular, size: 12, x: 20, y: 20 });
    expect(await drawnGlyphIds(await doc.save())).toContain(0);
  });
});
