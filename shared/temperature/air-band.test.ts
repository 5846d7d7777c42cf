import { describe, expect, it } from "vitest";
import { AIR_BAND_MARGIN_F, airBand, airBandBounds } from "./air-band";
import { DEFAULT_PROFILES } from "./profiles";

// The temperate snake's safe range in transit is the profile's (REPTILES magazine guideline, profiles.ts) [published, secondary].
const safeF = DEFAULT_PROFILES.temperate_snake.safeTransitF;

describe("airBand", () => {
  it("puts the ends of the safe range inside it and steps out by the map's margin", () => {
    expect(airBand(safeF.min, safeF)).toBe("within");
    expect(airBand(safeF.max, safeF)).toBe("within");
    expect(airBand(safeF.min - 0.1, safeF)).toBe("below");
    expect(airBand(safeF.min - AIR_BAND_MARGIN_F, safeF)).toBe("below");
    expect(airBand(safeF.min - AIR_BAND_MARGIN_F - 0.1, safeF)).toBe("well_below");
    expect(airBand(safeF.max + 0.1, safeF)).toBe("above");
    expect(airBand(safeF.max + AIR_BAND_MARGIN_F, safeF)).toBe("above");
    expect(airBand(safeF.max + AIR_BAND_MARGIN_F + 0.1, safeF)).toBe("well_above");
  });

  it("never guesses a band without a value", () => {
    expect(airBand(null, safeF)).toBe("unknown");
    expect(airBand(undefined, safeF)).toBe("unknown");
    expect(airBand(Number.NaN, safeF)).toBe("unknown");
  });

  it("gives legend bounds that agree with the bands", () => {
    const bounds = airBandBounds({ min: 60, max: 85 });
    expect(bounds).toEqual({
      well_below: { fromF: null, toF: 50 },
      below: { fromF: 50, toF: 60 },
      within: { fromF: 60, toF: 85 },
      above: { fromF: 85, toF: 95 },
      well_above: { fromF: 95, toF: null },
    });
    for (const [band, { fromF, toF }] of Object.entries(bounds)) {
      const inside = fromF === null ? toF! - 1 : toF === null ? fromF + 1 : (fromF + toF) / 2;
      expect(airBand(inside, { min: 60, max: 85 })).toBe(band);
    }
  });
});
