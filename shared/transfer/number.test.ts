import { describe, expect, it } from "vitest";
import { formatTransferNumber, TRANSFER_NUMBER_PATTERN } from "./number";

describe("transfer numbers", () => {
  it("use Crockford's base32 alphabet, which has no I, L, O or U (crockford.com/base32) [published]", () => {
    for (let b = 0; b < 256; b++) {
      const n = formatTransferNumber(2027, new Uint8Array([b, b, b, b, b]));
      expect(n).toMatch(TRANSFER_NUMBER_PATTERN);
      expect(n.slice(6)).not.toMatch(/[ILOU]/);
    }
  });
  it("carry the two-digit year", () => {
    expect(formatTransferNumber(2027, new Uint8Array([0, 1, 2, 3, 31]))).toBe("HW-27-0123Z");
  });
});
