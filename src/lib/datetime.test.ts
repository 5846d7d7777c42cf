import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { instantSchema } from "@shared/schemas/transfer";
import { formatDate, formatDateTime, instantToLocalInput, localInputToInstant } from "./datetime";

// Node re-reads TZ when it is assigned, so the browser's zone can be pinned for these checks.
beforeAll(() => {
  vi.stubEnv("TZ", "America/New_York");
});
afterAll(() => {
  vi.unstubAllEnvs();
});

const spaced = (s: string) => s.replace(/\u202f/g, " ");

describe("datetime-local to an instant with its offset", () => {
  it("uses the offset in force on that date", () => {
    // 15 U.S.C. 260a (Energy Policy Act 2005) [published]: daylight time starts the second Sunday of March
    // (2027-03-14) and ends the first Sunday of November; New York is UTC−5 in winter, UTC−4 in summer.
    expect(localInputToInstant("2027-03-09T16:00")).toBe("2027-03-09T16:00:00-05:00");
    expect(localInputToInstant("2027-07-14T09:30")).toBe("2027-07-14T09:30:00-04:00");
  });

  it("gives an instant the transfer schema accepts, and the same wall time back", () => {
    // RFC 3339 section 5.6 [published]: date-time with a numeric offset.
    const instant = localInputToInstant("2027-11-02T07:15");
    expect(instantSchema.safeParse(instant).success).toBe(true);
    expect(instantToLocalInput(instant)).toBe("2027-11-02T07:15");
    expect(instantToLocalInput("2027-03-09T21:00:00Z")).toBe("2027-03-09T16:00");
  });

  it("leaves an empty or broken value empty", () => {
    // WHATWG HTML "valid normalized local date and time string" [published]: YYYY-MM-DDTHH:MM.
    expect(localInputToInstant("")).toBe("");
    expect(localInputToInstant("9 March")).toBe("");
  });
});

describe("formatting", () => {
  it("shows the time at a place in that place's zone", () => {
    // IANA tz database [published]: Chicago is UTC−6 (CST) before 2027-03-14; 2027-03-09 is a Tuesday.
    expect(spaced(formatDateTime("2027-03-09T21:00:00Z", "America/Chicago"))).toBe("Tue, Mar 9, 2027, 3:00 PM CST");
    expect(spaced(formatDateTime("2027-07-14T16:00:00Z", "America/Los_Angeles"))).toBe(
      "Wed, Jul 14, 2027, 9:00 AM PDT",
    );
  });

  it("never shifts a calendar date", () => {
    // [practice] a hatch date or acquisition date is a day, not an instant.
    expect(formatDate("2026-07-14")).toBe("Jul 14, 2026");
    expect(formatDate("2026-01-01")).toBe("Jan 1, 2026");
  });
});
