import { describe, expect, it } from "vitest";
import { neutraliseCell } from "./register.router";

// OWASP "CSV Injection": cells beginning with =, +, -, @, tab or carriage return are
// interpreted as formulas by spreadsheet software; prefix them with a single quote [published].
describe("neutraliseCell", () => {
  it.each(['=HYPERLINK("http://x")', "+1+1", "-2", "@SUM(A1)", "\tx", "\rx"])("neutralises %j", (v) => {
    expect(neutraliseCell(v)).toBe(`'${v}`);
  });
  it("leaves ordinary text alone", () => {
    expect(neutraliseCell("Pantherophis guttatus")).toBe("Pantherophis guttatus");
    expect(neutraliseCell("a=b")).toBe("a=b");
  });
});
