import { describe, expect, it } from "vitest";
import {
  checkSpeed,
  EARLY_PICKUP_LIMIT_H,
  hoursBeforeDeparture,
  isEarlyPickup,
  isOneOfNames,
  MAX_AVERAGE_MPH,
  nameKey,
  sealNumbersMatch,
  type CustodyPoint,
} from "./plausibility";

// Rosetta Code "Haversine formula" task [published]: BNA (36.12, −86.67) to LAX (33.94, −118.40) is
// 2886.4444 km on a sphere of R = 6371.0 km; our mean radius is 6371.0088 km (Moritz 1980) [published].
const BNA_LAX_KM = (2886.4444 * 6371.0088) / 6371.0;
// International mile = 1.609344 km exactly [published].
const KM_PER_MILE = 1.609344;
const H = 3_600_000;
const at = (hours: number, lat: number, lon: number, source: CustodyPoint["source"] = "recorded"): CustodyPoint => ({
  lat,
  lon,
  at: Date.UTC(2026, 11, 7, 12) + hours * H,
  accuracyM: null,
  source,
});

describe("implied speed between two handoffs", () => {
  it("is the great-circle distance over the time between, in mph", () => {
    const check = checkSpeed("ground_courier", at(0, 36.12, -86.67), at(40, 33.94, -118.4));
    expect(check.distanceKm).toBeCloseTo(BNA_LAX_KM, 3);
    expect(check.averageMph).toBeCloseTo(BNA_LAX_KM / KM_PER_MILE / 40, 4);
    expect(check.implausible).toBe(false); // about 45 mph: a long drive
  });

  it("road: 80 mph average is the limit (issue 12), after a kilometre of slack at each recorded position", () => {
    expect(MAX_AVERAGE_MPH.ground_courier).toBe(80);
    expect(MAX_AVERAGE_MPH.hand_delivery).toBe(80);
    // Hours needed at 80 mph for the distance less 2 km of slack: (2886.45 − 2) / (80 × 1.609344).
    const needed = (BNA_LAX_KM - 2) / (80 * KM_PER_MILE);
    expect(checkSpeed("ground_courier", at(0, 36.12, -86.67), at(needed - 0.05, 33.94, -118.4)).implausible).toBe(true);
    expect(checkSpeed("ground_courier", at(0, 36.12, -86.67), at(needed + 0.05, 33.94, -118.4)).implausible).toBe(
      false,
    );
  });

  it("air: coast to coast overnight is plausible, the same distance in an hour is not", () => {
    expect(checkSpeed("overnight_air", at(0, 36.12, -86.67), at(6, 33.94, -118.4)).implausible).toBe(false);
    expect(checkSpeed("ground_courier", at(0, 36.12, -86.67), at(6, 33.94, -118.4)).implausible).toBe(true);
    expect(checkSpeed("overnight_air", at(0, 36.12, -86.67), at(1, 33.94, -118.4)).implausible).toBe(true);
  });

  it("the same minute, 3,500 km apart, is implausible for every mode (issue 12's example)", () => {
    for (const mode of ["overnight_air", "ground_courier", "hand_delivery"] as const) {
      const check = checkSpeed(mode, at(0, 36.12, -86.67), at(1 / 60, 33.94, -118.4));
      expect(check.implausible).toBe(true);
      expect(check.averageMph).toBeGreaterThan(100_000);
    }
  });

  it("gives an address standing in for a position its ZIP's spread, and a phone its accuracy", () => {
    // 0.3° of latitude is 33.4 km (R·π/180 per degree) [memory]: inside 30 km + 1 km + 5 km of uncertainty.
    const from = at(0, 36.0, -83.9, "origin");
    const to = { ...at(0.05, 36.3, -83.9), accuracyM: 5000 };
    expect(checkSpeed("ground_courier", from, to).implausible).toBe(false);
    expect(checkSpeed("ground_courier", { ...from, source: "recorded" }, { ...to, accuracyM: 0 }).implausible).toBe(
      true,
    );
  });

  it("two taps a few seconds apart at the same place are not infinitely fast", () => {
    const check = checkSpeed("hand_delivery", at(0, 36.12, -86.67), at(0, 36.12, -86.67));
    expect(check.implausible).toBe(false);
    expect(Number.isFinite(check.averageMph)).toBe(true);
  });
});

describe("early pickup", () => {
  const departure = Date.UTC(2026, 11, 10, 14);
  it("more than 24 h before the planned departure is early (issue 12); exactly 24 h is not", () => {
    expect(EARLY_PICKUP_LIMIT_H).toBe(24);
    expect(isEarlyPickup(departure - 24 * H, departure)).toBe(false);
    expect(isEarlyPickup(departure - 24 * H - 60_000, departure)).toBe(true);
    expect(isEarlyPickup(departure - 12 * 24 * H, departure)).toBe(true);
    expect(isEarlyPickup(departure + 2 * H, departure)).toBe(false); // a late pickup is not early
    expect(hoursBeforeDeparture(departure - 12 * 24 * H, departure)).toBe(288);
  });
});

describe("names and seal numbers as compared", () => {
  it("ignores case, accents, punctuation and spacing in a name [practice: names typed by hand]", () => {
    expect(nameKey("  José  O'Neil ")).toBe("jose o neil");
    expect(isOneOfNames("juno park", ["Juno Park"])).toBe(true);
    expect(isOneOfNames("Juno Parker", ["Juno Park"])).toBe(false);
    expect(isOneOfNames("", [""])).toBe(false);
  });

  it("ignores case and spaces in a seal number, not its digits", () => {
    expect(sealNumbersMatch("SEAL-0004", "seal-0004")).toBe(true);
    expect(sealNumbersMatch("SEAL-0004", " SEAL- 0004")).toBe(true);
    expect(sealNumbersMatch("SEAL-0004", "SEAL-0044")).toBe(false);
    expect(sealNumbersMatch("SEAL-0004", null)).toBe(false);
    expect(sealNumbersMatch(null, "SEAL-1")).toBe(false);
    expect(sealNumbersMatch(null, null)).toBe(true);
  });
});
