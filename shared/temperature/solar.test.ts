import { describe, expect, it } from "vitest";
import { clearSkyGhiWm2, clearSkyHourMeanWm2, clearSkyRadiationWm2, solarElevationDeg } from "./solar";

describe("the sun's position", () => {
  it("stands overhead at the Tropic of Cancer at the June solstice's solar noon", () => {
    // declination +23.44° at the June solstice, 2026-06-21 08:24 UTC (Meeus; USNO) [published, secondary];
    // solar noon at 0° E is near 12:02 UTC that day (equation of time ≈ −1.7 min) [memory]
    expect(solarElevationDeg(23.44, 0, Date.parse("2026-06-21T12:02:00Z"))).toBeGreaterThan(89.5);
  });

  it("gives noon heights of 90° − |latitude − declination|", () => {
    // December solstice declination −23.44° (Meeus, Astronomical Algorithms) [published]: at 45° N
    // the noon sun stands 21.56° high; at 90° W solar noon is near 17:59 UTC on 21 December [memory]
    expect(solarElevationDeg(45, -90, Date.parse("2026-12-21T17:59:00Z"))).toBeCloseTo(21.6, 0);
  });

  it("is below the horizon at local midnight", () => {
    expect(solarElevationDeg(38, -90, Date.parse("2026-07-15T06:00:00Z"))).toBeLessThan(-20);
  });
});

describe("clear-sky radiation (Haurwitz)", () => {
  it("follows GHI = 1098 cos z exp(−0.059 / cos z)", () => {
    // Haurwitz 1945 as implemented in Sandia PV_LIB pvl_clearsky_haurwitz (SAND2012-2389) [published]:
    // sun overhead 1098 · e^−0.059 = 1035.1 W/m²; at 30° elevation (cos z = 0.5) 549 · e^−0.118 = 487.9
    expect(clearSkyGhiWm2(90)).toBeCloseTo(1035.1, 0);
    expect(clearSkyGhiWm2(30)).toBeCloseTo(487.9, 0);
    expect(clearSkyGhiWm2(-5)).toBe(0);
  });

  it("is zero at night and an hour's mean by day", () => {
    expect(clearSkyRadiationWm2(38, -90, Date.parse("2026-07-15T06:00:00Z"))).toBe(0);
    const noon = Date.parse("2026-07-15T18:00:00Z");
    const mean = clearSkyHourMeanWm2(38, -90, noon);
    const samples = [-45, -15].map((m) => clearSkyRadiationWm2(38, -90, noon + m * 60_000));
    expect(mean).toBeGreaterThan(Math.min(...samples) - 1);
    expect(mean).toBeLessThan(1035.1);
  });
});
