/**
 * A scan is a real document (D21). The files are made by general-purpose libraries (pdf-lib,
 * pngjs, jpeg-js) and damaged the way uploads get damaged: cut short, or with a header that
 * states other dimensions than the data holds. PDF structure: ISO 32000-1 §7.5 (header, body,
 * cross-reference table, trailer) and §7.7.3 (the page tree) [published]; PNG: ISO/IEC 15948 §5
 * and §11.2.2 (IHDR width and height) [published]; JPEG: ITU T.81 Annex B (SOF0 holds the number
 * of lines and samples per line; EOI ends the image) [published].
 */
import { describe, expect, it } from "vitest";
import { jpeg, jpegClaiming, pdfWithPages, png, pngClaiming } from "../../../tests/support/scan-files";
import { SCAN_PIXELS_MAX, scanContentProblem } from "./scan-content";

const ascii = (text: string) => Buffer.from(text, "latin1");

describe("scanContentProblem", () => {
  it("takes a PDF with pages, a PNG and a JPEG that decode to the size they state", async () => {
    expect(await scanContentProblem(await pdfWithPages(1), "application/pdf")).toBeNull();
    expect(await scanContentProblem(await pdfWithPages(3), "application/pdf")).toBeNull();
    expect(await scanContentProblem(png(24, 16), "image/png")).toBeNull();
    expect(await scanContentProblem(jpeg(64, 48), "image/jpeg")).toBeNull();
  });

  it("refuses the five bytes %PDF-, a PDF cut short, a PDF with no page and a catalogue alone", async () => {
    expect(await scanContentProblem(ascii("%PDF-"), "application/pdf")).toMatch(/cannot be opened/);
    const whole = await pdfWithPages(1);
    expect(await scanContentProblem(whole.subarray(0, whole.length >> 1), "application/pdf")).toMatch(
      /cannot be opened/,
    );
    expect(await scanContentProblem(await pdfWithPages(0), "application/pdf")).toMatch(/^That PDF has no pages/);
    const catalogueOnly = ascii("%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\n%%EOF\n");
    expect(await scanContentProblem(catalogueOnly, "application/pdf")).not.toBeNull();
  });

  it("refuses an image cut short, or one whose header states other dimensions than its data", async () => {
    const picture = png(24, 16);
    expect(await scanContentProblem(picture.subarray(0, picture.length - 20), "image/png")).toMatch(
      /cannot be decoded/,
    );
    expect(await scanContentProblem(pngClaiming(picture, 48, 16), "image/png")).not.toBeNull();
    expect(await scanContentProblem(picture.subarray(0, 16), "image/png")).not.toBeNull();
    const photo = jpeg(64, 48);
    expect(await scanContentProblem(photo.subarray(0, photo.length >> 1), "image/jpeg")).toMatch(/cannot be decoded/);
    expect(await scanContentProblem(jpegClaiming(photo, 640, 480), "image/jpeg")).not.toBeNull();
    expect(
      await scanContentProblem(
        Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 0xff, 0xd9]),
        "image/jpeg",
      ),
    ).not.toBeNull();
  });

  it("refuses, before decoding, an image whose header states more pixels than a scan has", async () => {
    // 20,000 × 20,000 = 400 million pixels: 1.6 GB once decoded, from a header of a few bytes.
    const bomb = pngClaiming(png(24, 16), 20_000, 20_000);
    expect(20_000 * 20_000).toBeGreaterThan(SCAN_PIXELS_MAX);
    expect(await scanContentProblem(bomb, "image/png")).toMatch(/20,000 × 20,000 pixels, more than the 50 million/);
  });
});
