import { describe, expect, it } from "vitest";
import { PROFILE_GROUPS } from "../constants";
import { DEFAULT_PROFILES, GUIDELINE_BANDS_F } from "./profiles";

describe("DEFAULT_PROFILES", () => {
  it("has one labelled guideline profile per group", () => {
    expect(Object.keys(DEFAULT_PROFILES).sort()).toEqual([...PROFILE_GROUPS].sort());
    for (const profile of Object.values(DEFAULT_PROFILES)) {
      expect(profile.source).toMatch(/guideline/);
      expect(profile.safeTransitF.min).toBeLessThan(profile.safeTransitF.max);
    }
  });

  it("keeps each safe range inside the guideline's shippable band", () => {
    // SOURCES.md: below 38 °F and above 95 °F nothing ships (REPTILES magazine) [practice]
    for (const profile of Object.values(DEFAULT_PROFILES)) {
      expect(profile.safeTransitF.min).toBeGreaterThanOrEqual(profile.bandsF.doNotShipBelow);
      expect(profile.safeTransitF.max).toBeLessThanOrEqual(profile.bandsF.doNotShipAbove);
    }
  });

  it("uses the amphibian column for frogs and salamanders", () => {
    // SOURCES.md table: amphibians need no pack from 60 °F and a cold pack from 80 °F;
    // reptiles need a heat pack up to 69 °F and no cold pack [practice]
    expect(DEFAULT_PROFILES.tropical_frog.bandsF).toEqual(GUIDELINE_BANDS_F.amphibian);
    expect(GUIDELINE_BANDS_F.amphibian).toMatchObject({ heatPackBelow: 60, coldPackFrom: 80 });
    expect(DEFAULT_PROFILES.tropical_snake.bandsF).toMatchObject({ heatPackBelow: 70, coldPackFrom: null });
  });
});
