import { readFile } from "node:fs/promises";
import { createRequire } from "node:module";
import fontkit from "@pdf-lib/fontkit";
import anyAscii from "any-ascii";
import type { PDFDocument, PDFFont } from "pdf-lib";
import { computedOnce } from "../computed-once";

export interface PdfFonts {
  regular: PDFFont;
  bold: PDFFont;
}

/**
 * Drawn in place of a character the font cannot show and that has no readable Latin form, so
 * nothing renders as an empty box or as "�".
 */
export const PLACEHOLDER = "[?]";

const require = createRequire(import.meta.url);
const FONT_FILES = {
  regular: "@expo-google-fonts/roboto-slab/400Regular/RobotoSlab_400Regular.ttf",
  bold: "@expo-google-fonts/roboto-slab/700Bold/RobotoSlab_700Bold.ttf",
} as const;

/** Reads the two Roboto Slab TrueType files once per process (woff2 would crash fontkit). */
export const loadFontBytes: () => Promise<{ regular: Uint8Array; bold: Uint8Array }> = computedOnce(() =>
  Promise.all([readFile(require.resolve(FONT_FILES.regular)), readFile(require.resolve(FONT_FILES.bold))]).then(
    ([regular, bold]) => ({ regular, bold }),
  ),
);

type Fontkit = Parameters<PDFDocument["registerFontkit"]>[0];
type ParsedFont = ReturnType<Fontkit["create"]>;
const parsedFonts = new WeakMap<Uint8Array, ParsedFont>();

// pdf-lib parses the font file again for every document; parsing (and the lazily decoded
// layout tables) is most of the cost of a small PDF. The parsed font is only read afterwards:
// each document keeps its own subset.
const onceParsingFontkit: Fontkit = {
  create(buffer, postscriptName) {
    let font = parsedFonts.get(buffer);
    if (!font) {
      font = fontkit.create(buffer, postscriptName);
      parsedFonts.set(buffer, font);
    }
    return font;
  },
};

// One glyph per character, no positioning: pdf-lib draws glyph ids without the kerning or mark
// offsets layout computes, and ligatures would make widths and extracted text less predictable.
const FONT_FEATURES = {
  kern: false,
  mark: false,
  mkmk: false,
  curs: false,
  liga: false,
  clig: false,
  calt: false,
  rlig: false,
  rclt: false,
};

/** Embeds Roboto Slab regular and bold into `doc`, subset to the glyphs actually drawn. */
export async function embedFonts(doc: PDFDocument): Promise<PdfFonts> {
  const bytes = await loadFontBytes();
  doc.registerFontkit(onceParsingFontkit);
  const [regular, bold] = await Promise.all([
    doc.embedFont(bytes.regular, { subset: true, features: FONT_FEATURES }),
    doc.embedFont(bytes.bold, { subset: true, features: FONT_FEATURES }),
  ]);
  return { regular, bold };
}

const widthCaches = new WeakMap<PDFFont, Map<string, number>>();

/** Width of one line of (already safe) text in points at `sizePt`, memoised per font. */
export function textWidthPt(font: PDFFont, text: string, sizePt: number): number {
  let cache = widthCaches.get(font);
  if (!cache) {
    cache = new Map();
    widthCaches.set(font, cache);
  }
  let widthAt1 = cache.get(text);
  if (widthAt1 === undefined) {
    widthAt1 = font.widthOfTextAtSize(text, 1);
    cache.set(text, widthAt1);
  }
  return widthAt1 * sizePt;
}

const charSets = new WeakMap<PDFFont, Set<number>>();

function charSetOf(font: PDFFont): Set<number> {
  let set = charSets.get(font);
  if (!set) {
    set = new Set(font.getCharacterSet());
    charSets.set(font, set);
  }
  return set;
}

const graphemes = new Intl.Segmenter("en", { granularity: "grapheme" });
// Controls and format characters (bidi overrides and isolates, zero-width joiners, soft
// hyphens, BOM) never reach the page: an override would reorder what the reader sees.
const INVISIBLE = /[\p{Cc}\p{Cf}\p{Zl}\p{Zp}]/gu;
const LINE_BREAKS = /\r\n|[\n\r\u2028\u2029\u0085\v\f]/;

/**
 * A grapheme the font has no glyph for, in a form it can draw: its Latin transliteration
 * (any-ascii: "Ł" → "L", "你" → "Ni", an emoji → "[snake]"), or PLACEHOLDER when there is none.
 */
function readableForm(grapheme: string, chars: ReadonlySet<number>): string {
  const drawable = (text: string) => text !== "" && [...text].every((ch) => chars.has(ch.codePointAt(0) ?? -1));
  // Emoji come out as ":name:" (several for a ZWJ sequence); "[name]" reads better on paper.
  const latin = anyAscii(grapheme)
    .replace(/:([a-z0-9_+-]+):/gi, (_, name: string) => `[${name.replace(/_/g, " ")}]`)
    .trim();
  return latin !== "?" && drawable(latin) ? latin : PLACEHOLDER;
}

/**
 * One line of user text made safe to draw with `font`: NFC-normalised, line breaks and tabs
 * turned into spaces, control and bidi-format characters removed, and every character (grapheme)
 * the font has no glyph for written in Latin letters, or as "[?]" when it has no Latin form
 * (unsupported spaces become plain spaces). Never "�", never an empty box.
 */
export function safeText(font: PDFFont, text: string): string {
  const chars = charSetOf(font);
  const flat = text.normalize("NFC").replace(/\t/g, " ").split(LINE_BREAKS).join(" ");
  let out = "";
  for (const { segment } of graphemes.segment(flat)) {
    const visible = segment.replace(INVISIBLE, "");
    if (visible === "") continue;
    if (visible !== "\uFFFD" && [...visible].every((ch) => chars.has(ch.codePointAt(0) ?? -1))) out += visible;
    else out += /^\s+$/u.test(visible) ? " " : readableForm(visible, chars);
  }
  return out;
}

/**
 * Splits user text into lines no wider than `maxWidthPt` at `sizePt` points: the user's own line
 * breaks are kept, words wrap at spaces and a word wider than the line is broken between
 * characters. Every line is already `safeText`.
 */
export function wrapText(font: PDFFont, text: string, sizePt: number, maxWidthPt: number): string[] {
  const lines: string[] = [];
  for (const paragraph of text.normalize("NFC").split(LINE_BREAKS)) {
    lines.push(...wrapParagraph(font, safeText(font, paragraph), sizePt, maxWidthPt));
  }
  return lines;
}

function wrapParagraph(font: PDFFont, text: string, sizePt: number, maxWidthPt: number): string[] {
  const words = text.split(" ").filter((w) => w !== "");
  if (words.length === 0) return [""];
  const spaceW = textWidthPt(font, " ", sizePt);
  const lines: string[] = [];
  let line = "";
  let lineW = 0;
  for (const word of words) {
    const wordW = textWidthPt(font, word, sizePt);
    if (line !== "" && lineW + spaceW + wordW <= maxWidthPt) {
      line += ` ${word}`;
      lineW += spaceW + wordW;
      continue;
    }
    if (line !== "") lines.push(line);
    if (wordW <= maxWidthPt) {
      line = word;
      lineW = wordW;
      continue;
    }
    const pieces = breakWord(font, word, sizePt, maxWidthPt);
    lines.push(...pieces.slice(0, -1));
    line = pieces.at(-1) ?? "";
    lineW = textWidthPt(font, line, sizePt);
  }
  lines.push(line);
  return lines;
}

// Per-character widths overestimate slightly (no kerning), which keeps pieces inside the line.
function breakWord(font: PDFFont, word: string, sizePt: number, maxWidthPt: number): string[] {
  const pieces: string[] = [];
  let piece = "";
  let pieceW = 0;
  for (const { segment } of graphemes.segment(word)) {
    const w = textWidthPt(font, segment, sizePt);
    if (piece !== "" && pieceW + w > maxWidthPt) {
      pieces.push(piece);
      piece = "";
      pieceW = 0;
    }
    piece += segment;
    pieceW += w;
  }
  pieces.push(piece);
  return pieces;
}

/** One safe line shortened with an ellipsis so it is at most `maxWidthPt` wide at `sizePt`. */
export function fitText(font: PDFFont, text: string, sizePt: number, maxWidthPt: number): string {
  const safe = safeText(font, text);
  if (textWidthPt(font, safe, sizePt) <= maxWidthPt) return safe;
  const chars = [...graphemes.segment(safe)].map((g) => g.segment);
  let lo = 0;
  let hi = chars.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    const candidate = `${chars.slice(0, mid).join("").trimEnd()}…`;
    if (textWidthPt(font, candidate, sizePt) <= maxWidthPt) lo = mid;
    else hi = mid - 1;
  }
  return `${chars.slice(0, lo).join("").trimEnd()}…`;
}

/** The largest size in whole points (between `minPt` and `maxPt`) at which one line fits. */
export function fitSize(font: PDFFont, text: string, maxPt: number, minPt: number, maxWidthPt: number): number {
  const widthAt1 = textWidthPt(font, safeText(font, text), 1);
  if (widthAt1 === 0) return maxPt;
  return Math.max(minPt, Math.min(maxPt, Math.floor(maxWidthPt / widthAt1)));
}
