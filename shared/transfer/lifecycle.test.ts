import { describe, expect, it } from "vitest";
import { TRANSFER_STATUSES } from "../constants";
import { CANCELLABLE, canTransition, handoffKind, handoffsPlanned, statusAfterEdit, TRANSITIONS } from "./lifecycle";

// The life cycle written in issue 3 of this project (draft → awaiting receiver → ready →
// in transit → delivered → checked in → closed; cancel before in transit) and the chain of
// custody definition of NIST CNSSI 4009 / ASTM D4840 (one leg's receiver is the next leg's releaser).
describe("life cycle", () => {
  it("walks the happy path in order and never backwards once in transit", () => {
    const path = ["draft", "awaiting_receiver", "ready", "in_transit", "delivered", "checked_in", "closed"] as const;
    for (let i = 0; i < path.length - 1; i++) expect(canTransition(path[i]!, path[i + 1]!)).toBe(true);
    for (let i = 3; i < path.length; i++)
      for (let j = 0; j < i; j++) expect(canTransition(path[i]!, path[j]!)).toBe(false);
  });

  it("cancels from every step before in transit and from none after", () => {
    for (const s of TRANSFER_STATUSES) expect(canTransition(s, "cancelled")).toBe(CANCELLABLE.includes(s));
    expect(CANCELLABLE).toEqual(["draft", "awaiting_receiver", "ready"]);
  });

  it("closed and cancelled are final", () => {
    expect(TRANSITIONS.closed).toEqual([]);
    expect(TRANSITIONS.cancelled).toEqual([]);
  });

  it("skipping a step is not allowed", () => {
    expect(canTransition("draft", "ready")).toBe(false);
    expect(canTransition("ready", "delivered")).toBe(false);
    expect(canTransition("in_transit", "checked_in")).toBe(false);
  });

  it("a material edit after confirmation sends the transfer back; a note does not", () => {
    expect(statusAfterEdit("ready", ["animals"])).toBe("awaiting_receiver");
    expect(statusAfterEdit("ready", ["plannedDepartureAt"])).toBe("awaiting_receiver");
    expect(statusAfterEdit("ready", ["destination.zip"])).toBe("awaiting_receiver");
    expect(statusAfterEdit("ready", ["handlingNotes", "privateNotes"])).toBe("ready");
    expect(statusAfterEdit("awaiting_receiver", ["animals"])).toBe("awaiting_receiver");
    expect(statusAfterEdit("draft", ["animals"])).toBe("draft");
  });

  it("counts handoffs as pickup + one between each pair of legs + delivery", () => {
    expect(handoffsPlanned(1)).toBe(2);
    expect(handoffsPlanned(3)).toBe(4);
    expect([0, 1, 2, 3].map((i) => handoffKind(i, 3))).toEqual(["pickup", "handoff", "handoff", "delivery"]);
  });
});
