import { describe, expect, it } from "vitest";
import { renderRunSheetPdf } from "./run-sheet.pdf";
import { buildRunSheetInput } from "./run-sheet-input.fixture";
import { drawnGlyphIds, extractPageTexts } from "./pdf-test-support";

const text = async (bytes: Uint8Array) => (await extractPageTexts(bytes)).join(" ");

describe("the run sheet", () => {
  it("lists the stops in order with times, addresses, phones, and the boxes by label and seal", async () => {
    const input = buildRunSheetInput(4, 4);
    const all = await text(await renderRunSheetPdf(input));
    expect(all).toContain("RUN SHEET");
    expect(all).toContain("Nightjar Test Couriers");
    let last = -1;
    for (const stop of input.stops) {
      const at = all.indexOf(stop.address);
      expect(at, stop.address).toBeGreaterThan(last);
      last = at;
      expect(all).toContain(stop.phone);
    }
    expect(all).toContain("Load Box 1, seal SEAL-1-1");
    expect(all).toContain("Unload Box 1, seal SEAL-1-1");
    // Planned arrival in the stop's own zone (America/New_York: 13:00 UTC is 08:00 EST).
    expect(all).toContain("Mon, Dec 14, 2026, 08:00 EST");
  });

  it("says each box's contents by scientific name and count, and whether venomous (50 CFR 14.81 [published])", async () => {
    const all = await text(await renderRunSheetPdf(buildRunSheetInput(4, 4)));
    expect(all).toMatch(/Crotalus atrox × \d \(VENOMOUS\)/);
    expect(all).toMatch(/Pantherophis guttatus × \d \(not venomous\)/);
    // Where the catalogue does not say, the sheet says unknown, never "no".
    expect(all).toMatch(/Eublepharis macularius × \d \(venomous: unknown\)/);
  });

  it("names the paperwork by state, says NOT REVIEWED where nobody reviewed a state, and ends with an empty temperature log", async () => {
    const pages = await extractPageTexts(await renderRunSheetPdf(buildRunSheetInput(4, 4)));
    const all = pages.join(" ");
    expect(all).toContain("Paperwork by state on the way");
    expect(all).toMatch(/Arkansas \(AR\) • NOT REVIEWED: Its rules have not been reviewed/);
    expect(all).toContain("Mark each box. (50 CFR 14.81)");
    expect(all).toContain("The reviewed rules ask nothing of these boxes here.");
    expect(all).toContain("planning guidance");
    expect(pages.at(-1)).toContain("Van temperature log");
    expect(pages.at(-1)).toContain("Van °F");
  });

  it("draws every character with a real glyph, over many pages for 40 stops and 120 boxes", async () => {
    const bytes = await renderRunSheetPdf(buildRunSheetInput(40, 120));
    expect((await drawnGlyphIds(bytes)).filter((id) => id === 0)).toEqual([]);
    const pages = await extractPageTexts(bytes);
    expect(pages.length).toBeGreaterThan(3);
    expect(pages.join(" ")).toContain("Page 1 of");
    expect(pages.join(" ").match(/Load Box/g)).toHaveLength(120);
  });
});
