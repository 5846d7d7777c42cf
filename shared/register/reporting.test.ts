import { describe, expect, it } from "vitest";
import { lastEndedPeriod, nextDueReport, periodStartingIn } from "./reporting";

describe("a permit's reporting year", () => {
  // Illinois herptile special-use permit: annual report for the calendar year due 31 January
  // (17 Ill. Adm. Code 885.140) [published, SOURCES.md].
  const illinois = { startMonth: 1, dueMonth: 1, dueDay: 31 };
  // Texas nongame dealer: report for 1 August–31 July due 15 August (31 TAC 65.330) [published, SOURCES.md].
  const texas = { startMonth: 8, dueMonth: 8, dueDay: 15 };

  it("gives Illinois' calendar year, due the next 31 January", () => {
    expect(periodStartingIn(illinois, 2025)).toEqual({ from: "2025-01-01", to: "2025-12-31" });
    expect(lastEndedPeriod(illinois, "2026-01-10")).toEqual({
      from: "2025-01-01",
      to: "2025-12-31",
      dueOn: "2026-01-31",
    });
    expect(nextDueReport(illinois, "2026-02-01").dueOn).toBe("2027-01-31");
    expect(nextDueReport(illinois, "2026-01-31").dueOn).toBe("2026-01-31");
  });

  it("gives Texas' August–July year, due 15 August", () => {
    expect(lastEndedPeriod(texas, "2025-08-01")).toEqual({ from: "2024-08-01", to: "2025-07-31", dueOn: "2025-08-15" });
    expect(nextDueReport(texas, "2025-07-16")).toEqual({ from: "2024-08-01", to: "2025-07-31", dueOn: "2025-08-15" });
    expect(nextDueReport(texas, "2025-08-16").dueOn).toBe("2026-08-15");
  });

  it("shortens a due day to the month's length (29 February only in a leap year)", () => {
    const plan = { startMonth: 1, dueMonth: 2, dueDay: 30 };
    expect(lastEndedPeriod(plan, "2025-01-05").dueOn).toBe("2025-02-28");
    expect(lastEndedPeriod(plan, "2024-01-05").dueOn).toBe("2024-02-29");
  });
});
