import { describe, expect, it } from "vitest";
import { addDays, localClockToUtcMs, localDate, localIsoTime, timeZoneAt, weekdayOf, zonedParts } from "./zoned-time";

describe("timeZoneAt", () => {
  it("finds the zones of the tz-lookup reference points", () => {
    // tz-lookup package tests: (41.8976, −87.6205) → America/Chicago,
    // (40.7092, −74.0151) → America/New_York [published]
    expect(timeZoneAt(41.8976, -87.6205)).toBe("America/Chicago");
    expect(timeZoneAt(40.7092, -74.0151)).toBe("America/New_York");
  });

  it("puts Phoenix in the zone without daylight saving time", () => {
    // Arizona (except the Navajo Nation) does not observe DST: America/Phoenix [practice]
    expect(timeZoneAt(33.45, -112.07)).toBe("America/Phoenix");
  });

  it("rejects positions off the globe", () => {
    expect(() => timeZoneAt(91, 0)).toThrow(RangeError);
  });
});

describe("zonedParts", () => {
  it("applies standard and daylight offsets in Chicago", () => {
    // Central Time is UTC−6 (CST) and UTC−5 (CDT); US DST runs from the second Sunday of
    // March to the first Sunday of November (15 U.S.C. 260a) [published, secondary]
    expect(zonedParts(Date.parse("2026-01-15T18:00:00Z"), "America/Chicago")).toMatchObject({
      hour: 12,
      offsetMin: -360,
    });
    expect(zonedParts(Date.parse("2026-07-15T18:00:00Z"), "America/Chicago")).toMatchObject({
      hour: 13,
      offsetMin: -300,
      weekday: 3,
    });
  });

  it("switches at 2:00 local on the second Sunday of March 2026 (8 March)", () => {
    // 15 U.S.C. 260a: DST begins 2:00 a.m. local on the second Sunday in March [published, secondary]
    expect(zonedParts(Date.parse("2026-03-08T07:59:00Z"), "America/Chicago").offsetMin).toBe(-360);
    expect(zonedParts(Date.parse("2026-03-08T08:00:00Z"), "America/Chicago").offsetMin).toBe(-300);
  });
});

describe("local clock conversions", () => {
  it("turns 18:00 local into UTC on either side of a DST change", () => {
    // New York is UTC−5 in winter and UTC−4 in summer (15 U.S.C. 260a) [published, secondary]
    expect(new Date(localClockToUtcMs("2026-01-06", "18:00", "America/New_York")).toISOString()).toBe(
      "2026-01-06T23:00:00.000Z",
    );
    expect(new Date(localClockToUtcMs("2026-06-02", "18:00", "America/New_York")).toISOString()).toBe(
      "2026-06-02T22:00:00.000Z",
    );
    expect(new Date(localClockToUtcMs("2026-06-02", "10:30", "America/Phoenix")).toISOString()).toBe(
      "2026-06-02T17:30:00.000Z",
    );
  });

  it("resolves wall times just after the spring-forward change", () => {
    // 15 U.S.C. 260a: on 8 March 2026 Chicago clocks jump from 2:00 CST to 3:00 CDT, so
    // 03:30 local is 08:30Z and 02:30 does not exist (read as 03:30) [published, secondary]
    expect(new Date(localClockToUtcMs("2026-03-08", "03:30", "America/Chicago")).toISOString()).toBe(
      "2026-03-08T08:30:00.000Z",
    );
    expect(new Date(localClockToUtcMs("2026-03-08", "01:30", "America/Chicago")).toISOString()).toBe(
      "2026-03-08T07:30:00.000Z",
    );
  });

  it("writes local ISO times with the zone's offset", () => {
    const at = Date.parse("2026-06-02T23:00:00Z");
    expect(localIsoTime(at, "America/Los_Angeles")).toBe("2026-06-02T16:00-07:00");
    expect(localIsoTime(at, "America/New_York")).toBe("2026-06-02T19:00-04:00");
    expect(localDate(Date.parse("2026-06-03T03:30:00Z"), "America/Chicago")).toBe("2026-06-02");
  });

  it("counts calendar days and weekdays", () => {
    // 1 January 2026 was a Thursday (Gregorian calendar) [practice]
    expect(weekdayOf("2026-01-01")).toBe(4);
    expect(addDays("2026-02-27", 2)).toBe("2026-03-01");
    expect(addDays("2028-02-28", 1)).toBe("2028-02-29");
  });
});
