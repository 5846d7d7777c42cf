import { describe, expect, it } from "vitest";
import { sniffScanType } from "./scan-type";

const bytes = (...values: number[]) => new Uint8Array(values);
const ascii = (text: string) => new TextEncoder().encode(text);

describe("sniffScanType", () => {
  it("knows PDF, JPEG and PNG by their signatures", () => {
    // [published] ISO 32000-1 §7.5.2: a PDF file begins with "%PDF-" and the version
    expect(sniffScanType(ascii("%PDF-1.7\n%âãÏÓ"))).toBe("application/pdf");
    // [published] JPEG (ITU T.81) starts with the SOI marker FF D8, followed by another marker (FF E0 for JFIF, FF E1 for Exif)
    expect(sniffScanType(bytes(0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10))).toBe("image/jpeg");
    expect(sniffScanType(bytes(0xff, 0xd8, 0xff, 0xe1))).toBe("image/jpeg");
    // [published] PNG (ISO/IEC 15948 §5.2): the signature is 137 80 78 71 13 10 26 10
    expect(sniffScanType(bytes(137, 80, 78, 71, 13, 10, 26, 10, 0, 0, 0, 13))).toBe("image/png");
  });

  it("refuses near misses, other formats and short files", () => {
    // [published] a GIF starts "GIF89a"; a ZIP (and so a DOCX) starts "PK\x03\x04"; HTML is text
    for (const candidate of [
      ascii("GIF89a"),
      bytes(0x50, 0x4b, 0x03, 0x04),
      ascii("<html><script>"),
      ascii("%PDF"),
      ascii(" %PDF-1.4"),
    ]) {
      expect(sniffScanType(candidate)).toBeNull();
    }
    // [published] PNG signature: byte 5 is CR (13); a file with LF there was mangled by a text-mode transfer
    expect(sniffScanType(bytes(137, 80, 78, 71, 10, 10, 26, 10))).toBeNull();
    expect(sniffScanType(bytes(0xff, 0xd8))).toBeNull();
    expect(sniffScanType(new Uint8Array())).toBeNull();
  });
});
