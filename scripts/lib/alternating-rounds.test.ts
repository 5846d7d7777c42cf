import { describe, expect, it } from "vitest";
import { median, summariseRounds } from "./alternating-rounds";

describe("median", () => {
  // [published] NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.5.1 "Measures of Location":
  // the median is the middle value of the sorted data, or the mean of the two middle values when
  // the count is even.
  it("takes the middle of an odd count and the mean of the two middles of an even count", () => {
    expect(median([9, 1, 5])).toBe(5);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([7])).toBe(7);
  });

  it("refuses no values", () => {
    expect(() => median([])).toThrow(RangeError);
  });
});

describe("summariseRounds", () => {
  const run = (rps: number, p99Ms = 10) => ({ rps, p99Ms, errors: 0 });

  it("compares each route run with the baseline run of its own round", () => {
    // The machine slows by half in round 2: both sides of that pair slow, and the ratio holds.
    const summary = summariseRounds([
      { baseline: run(6000, 20), route: run(3000, 40) },
      { baseline: run(3000, 40), route: run(1500, 80) },
      { baseline: run(6000, 20), route: run(3000, 40) },
    ]);
    expect(summary.ratio).toBe(0.5);
    expect(summary.ratioMin).toBe(0.5);
    expect(summary.ratioMax).toBe(0.5);
    expect(summary.p99Ratio).toBe(2);
    expect(summary.rps).toBe(3000);
    expect(summary.baselineRps).toBe(6000);
  });

  it("lets the median drop one spoiled round", () => {
    // [practice] A run of the route hit by a burst of other work (round 3) would move a mean; the median ignores it.
    const summary = summariseRounds([
      { baseline: run(6000), route: run(3000) },
      { baseline: run(6000), route: run(3100) },
      { baseline: run(6000), route: run(600) },
      { baseline: run(6000), route: run(2900) },
      { baseline: run(6000), route: run(3000) },
    ]);
    expect(summary.ratio).toBe(0.5);
    expect(summary.ratioMin).toBe(0.1);
    expect(summary.rounds).toBe(5);
  });

  it("adds up the errors of both sides", () => {
    const summary = summariseRounds([
      { baseline: { rps: 1, p99Ms: 1, errors: 2 }, route: { rps: 1, p99Ms: 1, errors: 3 } },
    ]);
    expect(summary.errors).toBe(5);
  });
});
