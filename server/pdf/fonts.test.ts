import { PDFDocument } from "pdf-lib";
import { beforeAll, describe, expect, it } from "vitest";
import { PLACEHOLDER, embedFonts, fitSize, fitText, safeText, wrapText, type PdfFonts } from "./fonts";

let fonts: PdfFonts;

beforeAll(async () => {
  fonts = await embedFonts(await PDFDocument.create());
});

describe("safeText", () => {
  it("composes to NFC", () => {
    // Unicode UAX #15: e + U+0301 COMBINING ACUTE ACCENT composes to U+00E9 under NFC [published]
    expect(safeText(fonts.regular, "Cafe\u0301")).toBe("Caf\u00e9");
  });

  it("removes bidi overrides, isolates and marks", () => {
    // Unicode UAX #9: U+202A–U+202E embeddings/overrides, U+2066–U+2069 isolates, U+200E/U+200F marks [published]
    const text = "\u202Eevil\u202C \u2067name\u2069 \u200Fx\u200E";
    expect(safeText(fonts.regular, text)).toBe("evil name x");
  });

  it("turns control characters and line breaks into nothing or spaces", () => {
    // C0 controls U+0000–U+001F are not graphic characters (Unicode ch. 23) [published]
    expect(safeText(fonts.regular, "a\u0000b\u0007c\td\ne\r\nf")).toBe("abc d e f");
  });

  it("writes each emoji grapheme, including ZWJ sequences and flags, as readable words, never “�”", () => {
    // Roboto Slab has no emoji glyphs [practice: the font covers Latin, Greek and Cyrillic];
    // UAX #29: a ZWJ sequence and a regional-indicator pair are single grapheme clusters [published];
    // the names are Unicode's CLDR short names as the any-ascii library spells them [published]
    const out = safeText(fonts.regular, "snake 🐍 family 👨‍👩‍👧 flag 🇺🇸 ok");
    expect(out).toBe("snake [snake] family [man][woman][girl] flag US ok");
    expect(out).not.toContain("\uFFFD");
  });

  it("transliterates letters the font lacks, and marks what has no Latin form with [?]", () => {
    // [published] Hanyu Pinyin of 你好 is "nǐ hǎo"; the any-ascii transliteration drops the tones
    expect(safeText(fonts.regular, "Keeper 你好")).toBe("Keeper NiHao");
    // A replacement character typed by the user is no readable text either.
    expect(safeText(fonts.regular, "a \uFFFD b")).toBe(`a ${PLACEHOLDER} b`);
  });

  it("keeps the unit and typographic characters the documents use", () => {
    // Roboto Slab covers Latin-1 and General Punctuation [practice]
    expect(safeText(fonts.bold, "65–85 °F × 4″ · “ok” …")).toBe("65–85 °F × 4″ · “ok” …");
  });

  it("leaves markup and PDF syntax as plain characters", () => {
    // PDF text strings are data, not operators (ISO 32000-1 §7.3.4) [published]
    const hostile = '<script>alert("x")</script> (unbalanced \\ ) endobj %%EOF';
    expect(safeText(fonts.regular, hostile)).toBe(hostile);
  });

  it("returns only characters the font has glyphs for", () => {
    const charSet = new Set(fonts.regular.getCharacterSet());
    const out = safeText(fonts.regular, "ok ☃ ✓ → 中文 𝔄 \uE000 \uD800 ß");
    for (const ch of out) expect(charSet.has(ch.codePointAt(0) ?? -1)).toBe(true);
    expect(out.endsWith("ß")).toBe(true);
  });
});

describe("wrapText", () => {
  const words = Array.from({ length: 300 }, (_, i) => `word${i}`).join(" ");

  it("keeps every line within the width and loses no word", () => {
    const maxW = 180;
    const lines = wrapText(fonts.regular, words, 9, maxW);
    expect(lines.length).toBeGreaterThan(10);
    for (const line of lines) expect(fonts.regular.widthOfTextAtSize(line, 9)).toBeLessThanOrEqual(maxW);
    expect(lines.join(" ")).toBe(words);
  });

  it("breaks a word wider than the line between characters", () => {
    const long = "x".repeat(2000);
    const lines = wrapText(fonts.bold, long, 8, 100);
    for (const line of lines) expect(fonts.bold.widthOfTextAtSize(line, 8)).toBeLessThanOrEqual(100);
    expect(lines.join("")).toBe(long);
  });

  it("keeps the user's own line breaks", () => {
    expect(wrapText(fonts.regular, "one\ntwo\r\nthree", 9, 500)).toEqual(["one", "two", "three"]);
  });
});

describe("fitText / fitSize", () => {
  it("shortens with an ellipsis to the width", () => {
    const out = fitText(fonts.regular, "Lampropeltis californiae californiae", 9, 80);
    expect(out.endsWith("…")).toBe(true);
    expect(fonts.regular.widthOfTextAtSize(out, 9)).toBeLessThanOrEqual(80);
    expect(fitText(fonts.regular, "short", 9, 80)).toBe("short");
  });

  it("finds the largest whole size that fits", () => {
    const size = fitSize(fonts.bold, "LIVE ANIMALS", 60, 8, 200);
    expect(fonts.bold.widthOfTextAtSize("LIVE ANIMALS", size)).toBeLessThanOrEqual(200);
    expect(fonts.bold.widthOfTextAtSize("LIVE ANIMALS", size + 1)).toBeGreaterThan(200);
  });
});
