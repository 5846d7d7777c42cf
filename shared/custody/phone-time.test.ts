import { describe, expect, it } from "vitest";
import { KEPT_ON_PHONE_MAX_DAYS, PHONE_CLOCK_AHEAD_MAX_MIN, phoneConfirmation } from "./phone-time";

// Our own limits (issue 16, §3), checked on hand-worked times: the server's clock is the entry's
// time (21 CFR 11.10(e) [published]: computer-generated time stamps); the phone's is kept beside it.
const SERVER = Date.parse("2026-12-07T15:00:00Z");

describe("the phone's confirmation time", () => {
  it("counts the minutes a handoff waited on the phone", () => {
    expect(phoneConfirmation("2026-12-07T13:45:00Z", SERVER)).toEqual({
      ok: true,
      confirmedAt: "2026-12-07T13:45:00.000Z",
      waitedMin: 75,
    });
    // An offset is read as the instant it names: 08:45 at UTC−5 is 13:45Z.
    expect(phoneConfirmation("2026-12-07T08:45:00-05:00", SERVER)).toMatchObject({ ok: true, waitedMin: 75 });
  });

  it("tolerates a phone a few minutes fast, as no wait", () => {
    expect(phoneConfirmation("2026-12-07T15:04:00Z", SERVER)).toMatchObject({ ok: true, waitedMin: 0 });
  });

  it("refuses a clock far ahead, and a handoff kept too long", () => {
    const ahead = new Date(SERVER + (PHONE_CLOCK_AHEAD_MAX_MIN + 1) * 60_000).toISOString();
    const result = phoneConfirmation(ahead, SERVER);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/clock is more than 10 minutes ahead/);
    const old = new Date(SERVER - (KEPT_ON_PHONE_MAX_DAYS * 24 + 1) * 3_600_000).toISOString();
    expect(phoneConfirmation(old, SERVER).ok).toBe(false);
    expect(phoneConfirmation(new Date(SERVER - 13 * 24 * 3_600_000).toISOString(), SERVER).ok).toBe(true);
  });
});
