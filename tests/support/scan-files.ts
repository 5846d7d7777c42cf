/**
 * Real scan files for tests, made by the same general-purpose libraries a keeper's software
 * would use: a one-page PDF (pdf-lib), a PNG (pngjs) and a JPEG (jpeg-js), and damaged copies.
 * Signatures and structure: ISO 32000-1 §7.5 (PDF), ISO/IEC 15948 §5 (PNG chunks and CRCs),
 * ITU T.81 Annex B (JPEG markers; SOF0 holds the height and width) [published].
 */
import { encode as encodeJpeg } from "jpeg-js";
import { PDFDocument } from "pdf-lib";
import { PNG } from "pngjs";

function pixels(width: number, height: number): Buffer {
  const data = Buffer.alloc(width * height * 4);
  for (let i = 0; i < width * height; i++) data.set([(i * 37) % 256, (i * 11) % 256, 90, 255], i * 4);
  return data;
}

export async function pdfWithPages(pages: number): Promise<Buffer> {
  const document = await PDFDocument.create();
  for (let i = 0; i < pages; i++) document.addPage([612, 792]).drawText(`Permit scan page ${i + 1}`, { x: 72, y: 700 });
  return Buffer.from(await document.save({ addDefaultPage: false }));
}

export function png(width = 24, height = 16): Buffer {
  const image = new PNG({ width, height });
  pixels(width, height).copy(image.data);
  return PNG.sync.write(image);
}

export function jpeg(width = 24, height = 16): Buffer {
  return encodeJpeg({ width, height, data: pixels(width, height) }, 85).data;
}

/** The PNG with its IHDR saying `width` × `height` (CRC recomputed), so only decoding finds the lie. */
export function pngClaiming(source: Buffer, width: number, height: number): Buffer {
  const out = Buffer.from(source);
  out.writeUInt32BE(width, 16);
  out.writeUInt32BE(height, 20);
  out.writeUInt32BE(crc32(out.subarray(12, 29)), 29);
  return out;
}

/** The JPEG with its SOF0 saying `width` × `height`. */
export function jpegClaiming(source: Buffer, width: number, height: number): Buffer {
  const out = Buffer.from(source);
  for (let i = 2; i < out.length - 9; i++) {
    if (out[i] === 0xff && out[i + 1] === 0xc0) {
      out.writeUInt16BE(height, i + 5);
      out.writeUInt16BE(width, i + 7);
      return out;
    }
  }
  throw new Error("no SOF0 marker");
}

/** CRC-32 as PNG uses it (ISO/IEC 15948 Annex D). */
function crc32(bytes: Uint8Array): number {
  let crc = 0xffffffff;
  for (const byte of bytes) {
    crc ^= byte;
    for (let k = 0; k < 8; k++) crc = crc & 1 ? 0xedb88320 ^ (crc >>> 1) : crc >>> 1;
  }
  return (crc ^ 0xffffffff) >>> 0;
}
