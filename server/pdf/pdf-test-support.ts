import { spawnSync } from "node:child_process";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import jsQR from "jsqr";
import { PDFArray, PDFDocument, PDFRawStream, decodePDFRawStream } from "pdf-lib";
import * as pdfjs from "pdfjs-dist/legacy/build/pdf.mjs";
import { PNG } from "pngjs";

/** Where the tests leave PDFs and PNGs for a person to look at. */
export const TEST_OUTPUT_DIR = fileURLToPath(new URL("../../test-output/pdf/", import.meta.url));

/** Text of each page as pdf.js extracts it, one string per page, runs of whitespace collapsed. */
export async function extractPageTexts(bytes: Uint8Array): Promise<string[]> {
  const pdf = await pdfjs.getDocument({ data: bytes.slice(), verbosity: 0, isEvalSupported: false }).promise;
  try {
    const pages: string[] = [];
    for (let n = 1; n <= pdf.numPages; n++) {
      const content = await (await pdf.getPage(n)).getTextContent();
      const text = content.items.map((item) => ("str" in item ? item.str : "")).join(" ");
      pages.push(text.replace(/\s+/g, " ").trim());
    }
    return pages;
  } finally {
    await pdf.destroy();
  }
}

/**
 * Glyph ids drawn by text-showing operators, read back from the page content streams.
 * pdf-lib writes Identity-H hex strings of 2-byte glyph ids, and a character the font lacks
 * becomes glyph 0 (.notdef), the empty box a reader would see.
 */
export async function drawnGlyphIds(bytes: Uint8Array): Promise<number[]> {
  const doc = await PDFDocument.load(bytes);
  const ids: number[] = [];
  for (const page of doc.getPages()) {
    const contents = page.node.Contents();
    const refs = contents instanceof PDFArray ? contents.asArray() : contents ? [contents] : [];
    for (const ref of refs) {
      const stream = doc.context.lookup(ref);
      if (!(stream instanceof PDFRawStream)) continue;
      const source = new TextDecoder("latin1").decode(decodePDFRawStream(stream).decode());
      for (const [, hex = ""] of source.matchAll(/<([0-9A-Fa-f]*)>\s*Tj/g)) {
        for (let i = 0; i + 4 <= hex.length; i += 4) ids.push(Number.parseInt(hex.slice(i, i + 4), 16));
      }
    }
  }
  return ids;
}

/**
 * Writes `bytes` to test-output/pdf/<name>.pdf and renders one page with poppler's pdftoppm at
 * 150 dpi to <name>.png; returns the PNG path.
 */
export function renderPagePng(bytes: Uint8Array, name: string, pageNo = 1): string {
  mkdirSync(TEST_OUTPUT_DIR, { recursive: true });
  const pdfPath = `${TEST_OUTPUT_DIR}${name}.pdf`;
  writeFileSync(pdfPath, bytes);
  const outBase = `${TEST_OUTPUT_DIR}${name}`;
  const run = spawnSync(
    "pdftoppm",
    ["-png", "-r", "150", "-f", String(pageNo), "-l", String(pageNo), "-singlefile", pdfPath, outBase],
    {
      encoding: "utf8",
    },
  );
  if (run.error && "code" in run.error && run.error.code === "ENOENT") {
    throw new Error(
      "pdftoppm was not found: install poppler-utils (apt-get install -y poppler-utils) to run the PDF tests",
    );
  }
  if (run.status !== 0) throw new Error(`pdftoppm failed (${String(run.status)}): ${run.stderr}`);
  return `${outBase}.png`;
}

/** The text of the QR code jsQR finds in a PNG, or null. */
export function decodeQrFromPng(pngPath: string): string | null {
  const png = PNG.sync.read(readFileSync(pngPath));
  const found = jsQR(
    new Uint8ClampedArray(png.data.buffer, png.data.byteOffset, png.data.length),
    png.width,
    png.height,
  );
  return found?.data ?? null;
}

/** Page sizes in PDF points, as pdf-lib reads them back. */
export async function pageSizesPt(bytes: Uint8Array): Promise<{ width: number; height: number }[]> {
  const doc = await PDFDocument.load(bytes);
  return doc.getPages().map((p) => p.getSize());
}
