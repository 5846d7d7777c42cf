import { describe, expect, it } from "vitest";
import type { LegDto, TransferDto } from "@shared/schemas/transfer";
import { handoffParties } from "./handoff-parties";

// Invented demo parties; the rule under test is outside the project.
const org = (name: string) => ({
  id: name,
  name,
  kind: "breeder" as const,
  phone: "555-0100",
  email: "x@example.org",
  address: { street: "1 Main St", city: "Town", state: "TN" as const, zip: "37201" },
});
const leg = (sequence: number, displayName: string): LegDto => ({
  id: `leg-${sequence}`,
  sequence,
  courier: { id: displayName, displayName, organizationName: null, phone: null },
  fromLabel: null,
  toLabel: null,
});
const transfer = (legs: LegDto[]): Pick<TransferDto, "sender" | "receiver" | "legs"> => ({
  sender: {
    organization: org("Cinder Ridge Herps"),
    contact: { id: "s", displayName: "Ruth Calder", email: "r@example.org" },
  },
  receiver: { organization: org("Willow Marsh Nature Centre"), contact: null },
  legs,
});

// NIST CNSSI 4009 "chain of custody" and ASTM D4840 [published]: each transfer of custody names who released and
// who received, and one leg's receiver is the next leg's releaser.
describe("handoffParties", () => {
  it("runs sender → courier 1 → courier 2 → receiver, the legs taken in sequence order", () => {
    const t = transfer([leg(2, "Ana Ortiz"), leg(1, "Juno Park")]);
    expect(handoffParties(t, 0)).toEqual({ releasedBy: "Ruth Calder", receivedBy: "Juno Park" });
    expect(handoffParties(t, 1)).toEqual({ releasedBy: "Juno Park", receivedBy: "Ana Ortiz" });
    expect(handoffParties(t, 2)).toEqual({ releasedBy: "Ana Ortiz", receivedBy: "Willow Marsh Nature Centre" });
  });

  it("chains every handoff: who receives at one releases at the next", () => {
    const t = transfer([leg(1, "A"), leg(2, "B"), leg(3, "C")]);
    for (let i = 0; i < 3; i++) expect(handoffParties(t, i)!.receivedBy).toBe(handoffParties(t, i + 1)!.releasedBy);
  });

  it("has no handoff without a leg, nor past the delivery", () => {
    expect(handoffParties(transfer([]), 0)).toBeNull();
    expect(handoffParties(transfer([leg(1, "Juno Park")]), 2)).toBeNull();
  });
});
