import { describe, expect, it } from "vitest";
import { jurisdictionName, leavesContinentalUs } from "./jurisdiction";

describe("leavesContinentalUs", () => {
  it("is true only for a move to or from DC, Hawaii, Puerto Rico or a territory", () => {
    // [published] 18 U.S.C. 42(a)(1): "between the continental United States, the District of Columbia, Hawaii, the Commonwealth of Puerto Rico, or any possession"
    expect(leavesContinentalUs("FL", "HI")).toBe(true);
    expect(leavesContinentalUs("HI", "FL")).toBe(true);
    expect(leavesContinentalUs("MD", "DC")).toBe(true);
    expect(leavesContinentalUs("PR", "VI")).toBe(true);
    // [published] USARK v. Zinke, 852 F.3d 1131: not between two continental states
    expect(leavesContinentalUs("FL", "GA")).toBe(false);
    // [memory] the statute's list does not name Alaska (see NON_CONTINENTAL in shared/constants.ts)
    expect(leavesContinentalUs("AK", "WA")).toBe(false);
    expect(leavesContinentalUs("HI", "HI")).toBe(false);
  });
});

describe("jurisdictionName", () => {
  it("names states as USPS codes stand for them", () => {
    // [published] USPS Publication 28, appendix B (state abbreviations)
    expect([jurisdictionName("OH"), jurisdictionName("MP"), jurisdictionName("US")]).toEqual([
      "Ohio",
      "the Northern Mariana Islands",
      "federal law",
    ]);
  });
});
