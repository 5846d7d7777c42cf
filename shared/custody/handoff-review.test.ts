import { describe, expect, it } from "vitest";
import { reviewHandoff, type HandoffContext, type HandoffDraft } from "./handoff-review";

const H = 3_600_000;
const departure = Date.UTC(2026, 11, 10, 14);
// Knoxville TN and Eugene OR, near their ZIP centres (37917, 97401) [published data of the zipcodes package].
const KNOXVILLE = { lat: 36.0, lon: -83.91 };
const EUGENE = { lat: 44.05, lon: -123.09 };

const context = (over: Partial<HandoffContext> = {}): HandoffContext => ({
  mode: "overnight_air",
  plannedDepartureAt: new Date(departure).toISOString(),
  originTimeZone: "America/New_York",
  origin: KNOXVILLE,
  destination: EUGENE,
  legCourierNames: ["Juno Park"],
  receiverNames: ["Milo Faraday", "Willow Marsh Nature Centre"],
  containers: [
    { id: "c1", label: "A", sealNumber: "SEAL-0001" },
    { id: "c4", label: "D", sealNumber: "SEAL-0004" },
  ],
  previous: [],
  ...over,
});

const draft = (over: Partial<HandoffDraft> = {}): HandoffDraft => ({
  handoffIndex: 0,
  boxesCounted: 2,
  seals: [
    { containerId: "c1", sealNumber: "SEAL-0001", intact: true },
    { containerId: "c4", sealNumber: "SEAL-0004", intact: true },
  ],
  place: { lat: null, lon: null },
  receivedByName: "Juno Park",
  at: departure - 2 * H,
  recorder: "courier",
  ...over,
});

describe("reviewing a handoff before it is recorded", () => {
  it("finds nothing when seals, count, time, place and person are as planned", () => {
    const review = reviewHandoff(context(), draft());
    expect(review.kind).toBe("pickup");
    expect(review.findings).toEqual([]);
    expect(review.missingReasons).toEqual([]);
  });

  it("says a wrong seal in words with the box's label (issue 12's example)", () => {
    const review = reviewHandoff(
      context(),
      draft({ seals: [{ containerId: "c4", sealNumber: "SEAL-0044", intact: true }] }),
    );
    expect(review.findings.map((f) => f.kind)).toEqual(["seal_mismatch"]);
    expect(review.findings[0]!.message).toBe("Box D: expected seal SEAL-0004, courier read SEAL-0044 at the pickup.");
    expect(review.findings[0]!.reasonKey).toBeNull();
    expect(review.notChecked.join(" ")).toContain("Seals not checked on Box A");
  });

  it("says a broken seal and a short count", () => {
    const review = reviewHandoff(
      context(),
      draft({ boxesCounted: 1, seals: [{ containerId: "c4", sealNumber: "SEAL-0004", intact: false }] }),
    );
    expect(review.findings.map((f) => f.message)).toEqual([
      "Box D: seal SEAL-0004 broken or missing at the pickup.",
      "Courier counted 1 box at the pickup; the manifest lists 2.",
    ]);
  });

  it("asks a reason for a pickup 12 days before the departure, and keeps it in the message", () => {
    const early = draft({ at: departure - 12 * 24 * H });
    const without = reviewHandoff(context(), early);
    expect(without.findings.map((f) => f.kind)).toEqual(["early_pickup"]);
    expect(without.missingReasons).toEqual(["earlyPickup"]);
    expect(without.findings[0]!.message).toMatch(/^Pickup recorded 12 days before the planned departure \(/);
    const withReason = reviewHandoff(context(), { ...early, reasons: { earlyPickup: "Held at our heated depot" } });
    expect(withReason.missingReasons).toEqual([]);
    expect(withReason.findings[0]!.message).toContain("Reason given: Held at our heated depot");
  });

  it("asks a reason for a delivery 3,500 km from the pickup in the same minute (addresses stand in)", () => {
    const pickupAt = departure - H;
    const review = reviewHandoff(
      context({ previous: [{ handoffIndex: 0, at: new Date(pickupAt).toISOString(), place: {} }] }),
      draft({ handoffIndex: 1, at: pickupAt + 60_000, receivedByName: "milo faraday" }),
    );
    expect(review.kind).toBe("delivery");
    expect(review.findings.map((f) => f.kind)).toEqual(["implausible_speed"]);
    expect(review.missingReasons).toEqual(["implausibleSpeed"]);
    const message = review.findings[0]!.message;
    expect(message).toMatch(/^The delivery was recorded [\d,]+ mi \([\d,]+ km\) from the pickup 1 min after it:/);
    expect(message).toContain("the limit for “Overnight air carrier” is 600 mph");
    expect(message).toContain("the pickup at the origin address and the delivery at the destination address");
    // Knoxville–Eugene is about 3,400 km great-circle [memory]: the review measured it, not a constant.
    expect(review.speed!.distanceKm).toBeGreaterThan(3300);
    expect(review.speed!.distanceKm).toBeLessThan(3600);
  });

  it("says the speed was not checked when no position stands for either end", () => {
    const review = reviewHandoff(
      context({
        legCourierNames: ["Juno Park", "Ada Relay"],
        previous: [{ handoffIndex: 0, at: new Date(departure).toISOString(), place: {} }],
        origin: null,
      }),
      draft({ handoffIndex: 1, receivedByName: "Ada Relay", at: departure + H }),
    );
    expect(review.findings).toEqual([]);
    expect(review.notChecked.join(" ")).toContain("Speed since the last handoff not checked");
  });

  it("asks a reason when the boxes go to someone other than the assigned courier or the receiver", () => {
    const pickup = reviewHandoff(context(), draft({ receivedByName: "Sam Doe" }));
    expect(pickup.findings[0]!.message).toBe(
      "At the pickup the boxes went to “Sam Doe”, not the assigned courier (Juno Park).",
    );
    expect(pickup.missingReasons).toEqual(["unexpectedParty"]);
    const delivery = reviewHandoff(
      context({ previous: [{ handoffIndex: 0, at: new Date(departure - 20 * H).toISOString(), place: {} }] }),
      draft({ handoffIndex: 1, receivedByName: "Front desk", reasons: { unexpectedParty: "Milo was out" } }),
    );
    expect(delivery.findings.map((f) => f.kind)).toEqual(["unexpected_party"]);
    expect(delivery.findings[0]!.message).toContain("not the receiver (Milo Faraday, Willow Marsh Nature Centre)");
    expect(delivery.missingReasons).toEqual([]);
  });

  it("loaded demo data skips time, place and person, says so, and still checks seals", () => {
    const review = reviewHandoff(
      context(),
      draft({
        at: departure - 30 * 24 * H,
        receivedByName: "B",
        seals: [{ containerId: "c1", sealNumber: "X", intact: true }],
      }),
      { plausibility: false },
    );
    expect(review.findings.map((f) => f.kind)).toEqual(["seal_mismatch"]);
    expect(review.notChecked.join(" ")).toContain("Time and place not checked");
  });
});
