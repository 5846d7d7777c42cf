import { describe, expect, it } from "vitest";
import { federalHolidayOn } from "./holidays";

describe("federalHolidayOn", () => {
  it("finds Labor Day 2016 on 5 September", () => {
    // @18f/us-federal-holidays README: Labor Day 2016 is 2016-09-05 [published]
    expect(federalHolidayOn("2016-09-05")).toBe("Labor Day");
    expect(federalHolidayOn("2016-09-06")).toBeUndefined();
  });

  it("observes a Saturday holiday on the Friday before", () => {
    // 5 U.S.C. 6103(b)(1) via OPM: 4 July 2026 is a Saturday, observed Friday 3 July [published]
    expect(federalHolidayOn("2026-07-03")).toBe("Independence Day");
    expect(federalHolidayOn("2026-07-04")).toBeUndefined();
  });

  it("observes a Sunday holiday on the Monday after", () => {
    // 5 U.S.C. 6103(b)(2) via OPM: Christmas 2022 fell on Sunday, observed Monday 26 December [published]
    expect(federalHolidayOn("2022-12-26")).toBe("Christmas Day");
  });

  it("carries New Year's Day on a Saturday back into the old year", () => {
    // OPM: 1 January 2022 (Saturday) was observed on Friday 31 December 2021 [published]
    expect(federalHolidayOn("2021-12-31")).toBe("New Year's Day");
  });

  it("lists the 11 holidays of 5 U.S.C. 6103 for 2026", () => {
    // 5 U.S.C. 6103(a): 11 holidays since Juneteenth was added in 2021 [published]
    const days = Array.from({ length: 365 }, (_, i) => new Date(Date.UTC(2026, 0, 1 + i)).toISOString().slice(0, 10));
    const found = days.filter((d) => federalHolidayOn(d) !== undefined);
    expect(found).toHaveLength(11);
    // Thanksgiving is the fourth Thursday of November: 26 November 2026 [published]
    expect(federalHolidayOn("2026-11-26")).toBe("Thanksgiving Day");
  });
});
