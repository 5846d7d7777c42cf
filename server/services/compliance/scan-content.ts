import { imageSize } from "image-size";
import { decode as decodeJpeg } from "jpeg-js";
import { PDFDocument } from "pdf-lib";
import { PNG } from "pngjs";
import type { ScanContentType } from "@shared/compliance/scan-type";

/**
 * Most pixels a scan image may have: a US legal page scanned at 600 dpi is 5,100 × 8,400 =
 * 42.8 million [practice]. A larger one is refused before it is decoded, so a small file
 * that unpacks into gigabytes (a "decompression bomb") never does.
 */
export const SCAN_PIXELS_MAX = 50_000_000;

const TYPE_WORDS: Record<ScanContentType, string> = {
  "application/pdf": "PDF",
  "image/jpeg": "JPEG image",
  "image/png": "PNG image",
};

const SAVE_AGAIN = "Save or scan the document again and upload the new file.";

/**
 * Why a file whose first bytes say PDF, JPEG or PNG is still not a document we keep, or null
 * when it is one (D21): a PDF must open with pdf-lib and have at least one page; an image
 * must decode completely to the width and height its header states.
 */
export async function scanContentProblem(bytes: Uint8Array, type: ScanContentType): Promise<string | null> {
  const what = TYPE_WORDS[type];
  if (type === "application/pdf") {
    let pages: number;
    try {
      const document = await PDFDocument.load(bytes, { ignoreEncryption: true, updateMetadata: false });
      pages = document.getPageCount();
    } catch {
      return `That file starts like a PDF but cannot be opened as one: it is damaged or incomplete. ${SAVE_AGAIN}`;
    }
    return pages >= 1 ? null : `That PDF has no pages. ${SAVE_AGAIN}`;
  }

  let stated: { width: number; height: number };
  try {
    const header = imageSize(bytes);
    stated = { width: header.width, height: header.height };
  } catch {
    return `That file starts like a ${what} but its header cannot be read. ${SAVE_AGAIN}`;
  }
  if (!(stated.width > 0 && stated.height > 0)) return `That ${what} states no width or height. ${SAVE_AGAIN}`;
  if (stated.width * stated.height > SCAN_PIXELS_MAX)
    return `That ${what} is ${stated.width.toLocaleString("en-US")} × ${stated.height.toLocaleString("en-US")} pixels, more than the ${(SCAN_PIXELS_MAX / 1e6).toLocaleString("en-US")} million Hatchway keeps. Scan it at a lower resolution.`;

  let decoded: { width: number; height: number; pixels: number };
  try {
    if (type === "image/png") {
      const image = PNG.sync.read(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
      decoded = { width: image.width, height: image.height, pixels: image.data.length / 4 };
    } else {
      const image = decodeJpeg(bytes, {
        useTArray: true,
        formatAsRGBA: true,
        tolerantDecoding: false,
        maxResolutionInMP: SCAN_PIXELS_MAX / 1e6,
        maxMemoryUsageInMB: 1024,
      });
      decoded = { width: image.width, height: image.height, pixels: image.data.length / 4 };
    }
  } catch {
    return `That ${what} cannot be decoded: it is damaged or cut short. ${SAVE_AGAIN}`;
  }
  if (
    decoded.width !== stated.width ||
    decoded.height !== stated.height ||
    decoded.pixels !== stated.width * stated.height
  )
    return `That ${what} does not hold the ${stated.width} × ${stated.height} pixels its header states. ${SAVE_AGAIN}`;
  return null;
}
