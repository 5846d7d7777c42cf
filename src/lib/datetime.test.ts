import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { instantSchema } from "@shared/schemas/transfer";
import { instantToLocalInput, localInputToInstant } from "./datetime";

// Node re-reads TZ when it is assigned, so the browser's zone can be pinned for these checks.
beforeAll(() => {
  vi.stubEnv("TZ", "America/New_York");
});
afterAll(() => {
  vi.unstubAllEnvs();
});

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
