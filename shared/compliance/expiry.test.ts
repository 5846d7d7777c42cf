import { describe, expect, it } from "vitest";
import { daysFromTo, EXPIRY_WARNING_DAYS, expiryOf, todayUtc } from "./expiry";

describe("expiryOf", () => {
  it("warns from 30 days before the last valid day, and counts that day itself as valid", () => {
    // [published] Gregorian calendar: 2026-05-12 + 30 days = 2026-06-11 (May has 31 days); + 31 = 2026-06-12
    expect(EXPIRY_WARNING_DAYS).toBe(30);
    expect(expiryOf("2026-06-11", "2026-05-12")).toEqual({ status: "expiring", daysLeft: 30 });
    expect(expiryOf("2026-06-12", "2026-05-12")).toEqual({ status: "valid", daysLeft: 31 });
    // [practice] a permit "valid to" a date is still good on that date
    expect(expiryOf("2026-05-12", "2026-05-12")).toEqual({ status: "expiring", daysLeft: 0 });
    expect(expiryOf("2026-05-11", "2026-05-12")).toEqual({ status: "expired", daysLeft: -1 });
    expect(expiryOf(null, "2026-05-12")).toEqual({ status: "open", daysLeft: null });
  });

  it("counts whole days across a leap day and a clock change", () => {
    // [published] Gregorian calendar: 2028 is a leap year, so 2028-02-15 to 2028-03-15 is 29 days; 2027-02-15 to 2027-03-15 is 28.
    // US clocks change on 2026-03-08 (15 U.S.C. 260a): 2026-03-01 to 2026-03-15 is still 14 days.
    expect(daysFromTo("2028-02-15", "2028-03-15")).toBe(29);
    expect(daysFromTo("2027-02-15", "2027-03-15")).toBe(28);
    expect(daysFromTo("2026-03-01", "2026-03-15")).toBe(14);
  });

  it("takes today in UTC", () => {
    // [published] ISO 8601 / UTC: 2026-05-12T23:30-05:00 is 2026-05-13T04:30Z
    expect(todayUtc(new Date("2026-05-12T23:30:00-05:00"))).toBe("2026-05-13");
  });
});
