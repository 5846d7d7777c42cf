import { describe, expect, it } from "vitest";
import { noticesForMove } from "./state-notices";

describe("state notices after a move", () => {
  const arrivedAt = "2026-07-14T15:00:00.000Z";
  it("asks a Maryland receiver for the import report within 72 h of arrival", () => {
    // COMAR 15.11.01.09: imported wild animals reported within 72 h of arrival [published, SOURCES.md].
    const [notice, ...rest] = noticesForMove({ fromState: "PA", toState: "MD", departedAt: null, arrivedAt });
    expect(rest).toEqual([]);
    expect(notice).toMatchObject({
      side: "receiver",
      citation: "COMAR 15.11.01.09",
      dueAt: "2026-07-17T15:00:00.000Z",
    });
  });
  it("asks a Texas sender for the notice within 24 h of the out-of-state shipment", () => {
    // 31 TAC 65.327: notice within 24 h of each out-of-state receipt or shipment [published, SOURCES.md].
    const departedAt = "2026-07-13T22:00:00.000Z";
    const notices = noticesForMove({ fromState: "TX", toState: "OK", departedAt, arrivedAt });
    expect(notices.map((n) => [n.side, n.citation, n.dueAt])).toEqual([
      ["sender", "31 TAC 65.327", "2026-07-14T22:00:00.000Z"],
    ]);
  });
  it("asks nothing of a move within one state", () => {
    expect(noticesForMove({ fromState: "TX", toState: "TX", departedAt: null, arrivedAt })).toEqual([]);
  });
});
