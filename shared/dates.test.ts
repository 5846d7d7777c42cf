import { describe, expect, it } from "vitest";
import { formatAxisHour, formatDate, formatDateRange, formatInstant, formatInstantDate } from "./dates";

// Intl may put a narrow no-break space before the zone name in some ICU versions.
const spaced = (s: string) => s.replace(/\u202f/g, " ");

describe("an instant, with its zone named", () => {
  it("shows an instant in the zone given, with its abbreviation", () => {
    // US daylight time runs from the 2nd Sunday of March (15 U.S.C. 260a) [published]: CDT = UTC−5 on 2026-04-14
    expect(spaced(formatInstant("2026-04-14T21:30:00Z", "America/Chicago"))).toBe("Tue, Apr 14, 2026, 16:30 CDT");
    // after the 1st Sunday of November standard time applies: EST = UTC−5 on 2026-11-10 [published, same statute]
    expect(spaced(formatInstant("2026-11-10T14:00:00Z", "America/New_York"))).toBe("Tue, Nov 10, 2026, 09:00 EST");
    // IANA tz database [published]: Chicago is UTC−6 (CST) before 2027-03-14; 2027-03-09 is a Tuesday.
    expect(spaced(formatInstant("2027-03-09T21:00:00Z", "America/Chicago"))).toBe("Tue, Mar 9, 2027, 15:00 CST");
    expect(spaced(formatInstant("2027-07-14T16:00:00Z", "America/Los_Angeles"))).toBe("Wed, Jul 14, 2027, 09:00 PDT");
  });

  it("takes a Date or epoch milliseconds as well as ISO text", () => {
    // IANA tz database [published]: 2026-12-05 is in EST (UTC−5), a Saturday.
    const at = Date.parse("2026-12-05T11:35:00Z");
    expect(spaced(formatInstant(at, "America/New_York"))).toBe("Sat, Dec 5, 2026, 06:35 EST");
    expect(spaced(formatInstant(new Date(at), "America/New_York"))).toBe("Sat, Dec 5, 2026, 06:35 EST");
  });

  it("names a zone even where it has no US abbreviation", () => {
    // IANA tz database [published]: UTC has the abbreviation UTC.
    expect(spaced(formatInstant("2026-12-05T11:35:00Z", "UTC"))).toBe("Sat, Dec 5, 2026, 11:35 UTC");
  });

  it("never shows a broken value as a time, and survives an unknown zone", () => {
    expect(formatInstant("not a time", "America/Chicago")).toBe("—");
    expect(formatInstant("2026-12-05T11:35:00Z", "Mars/Olympus_Mons")).toMatch(/Dec 5, 2026|Dec 6, 2026/);
  });

  it("gives the calendar day an instant falls on in a zone", () => {
    // IANA tz database [published]: 03:00 UTC on 2026-12-06 is still 2026-12-05 in Los Angeles (UTC−8).
    expect(formatInstantDate("2026-12-06T03:00:00Z", "America/Los_Angeles")).toBe("Sat, Dec 5, 2026");
  });

  it("has a short axis tick on the same 24-hour clock", () => {
    // IANA tz database [published]: 21:00 UTC on 2026-04-14 is 16:00 CDT.
    expect(formatAxisHour("2026-04-14T21:00:00Z", "America/Chicago")).toBe("Tue 16:00");
  });
});

describe("a calendar date", () => {
  it("shows a calendar date without moving it across a zone boundary", () => {
    // a permit's validity date is a calendar day, not an instant: it reads the same in every US zone [practice];
    // weekdays from the Gregorian calendar [published]: 2026-01-01 and 2026-12-31 are Thursdays, 2026-07-14 a Tuesday.
    expect(formatDate("2026-01-01")).toBe("Thu, Jan 1, 2026");
    expect(formatDate("2026-12-31")).toBe("Thu, Dec 31, 2026");
    expect(formatDate("2026-07-14")).toBe("Tue, Jul 14, 2026");
    expect(formatDate("2026-07-14T23:30:00-07:00")).toBe("Tue, Jul 14, 2026");
    expect(formatDate("14/07/2026")).toBe("—");
  });

  it("shows a span of days, open at either end", () => {
    expect(formatDateRange("2026-01-01", "2026-12-31")).toBe("Thu, Jan 1, 2026 – Thu, Dec 31, 2026");
    expect(formatDateRange("2026-01-01", null)).toBe("from Thu, Jan 1, 2026");
    expect(formatDateRange(null, "2026-12-31")).toBe("until Thu, Dec 31, 2026");
  });
});
