import { describe, expect, it } from "vitest";
import { describeCustodyEntry } from "./custody";

describe("the custody log's words for an acknowledged unverified verdict", () => {
  it("says which check was accepted, for which states, and the reason", () => {
    // source: issue 12 §1 (product requirement): the acknowledgement is logged in the custody log
    const described = describeCustodyEntry(
      {
        kind: "override",
        payload: {
          gate: "compliance",
          verdict: "unverified",
          acknowledgement: true,
          unverified: [
            { jurisdiction: "TN", name: "Tennessee", agency: { name: "x", url: "https://example.test" } },
            { jurisdiction: "OR", name: "Oregon", agency: { name: "y", url: "https://example.test" } },
          ],
          reason: "Both agencies confirmed by phone.",
        },
      },
      "imperial",
    );
    expect(described.lines).toEqual([
      "Accepted the rules and permits check as “Unverified”: the rules of Tennessee and Oregon are not reviewed in Hatchway's library.",
      "Reason: Both agencies confirmed by phone.",
    ]);
    expect(JSON.stringify(described)).not.toMatch(/unverified"|acknowledgement|TN\b/);
  });
});
