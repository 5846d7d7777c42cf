import type { RangeF } from "./exposure";

/** Where the air around the box stands against the animals' safe range in transit. */
export const AIR_BANDS = ["well_below", "below", "within", "above", "well_above", "unknown"] as const;
export type AirBand = (typeof AIR_BANDS)[number];

/**
 * How far past the safe range a map's "well below" and "well above" begin, °F. A reading aid
 * for the map's colours [practice], not a threshold of the model: the verdict does not use it.
 */
export const AIR_BAND_MARGIN_F = 10;

/** The band of the air around the box (°F) against the safe range; unknown without a value. */
export function airBand(aroundF: number | null | undefined, safeF: RangeF): AirBand {
  if (aroundF == null || !Number.isFinite(aroundF)) return "unknown";
  if (aroundF < safeF.min - AIR_BAND_MARGIN_F) return "well_below";
  if (aroundF < safeF.min) return "below";
  if (aroundF <= safeF.max) return "within";
  if (aroundF <= safeF.max + AIR_BAND_MARGIN_F) return "above";
  return "well_above";
}

/** Each band's bounds, °F (null: open), for a legend: [min, max) below the range, [min, max] within it, (min, max] above. */
export function airBandBounds(
  safeF: RangeF,
): Record<Exclude<AirBand, "unknown">, { fromF: number | null; toF: number | null }> {
  return {
    well_below: { fromF: null, toF: safeF.min - AIR_BAND_MARGIN_F },
    below: { fromF: safeF.min - AIR_BAND_MARGIN_F, toF: safeF.min },
    within: { fromF: safeF.min, toF: safeF.max },
    above: { fromF: safeF.max, toF: safeF.max + AIR_BAND_MARGIN_F },
    well_above: { fromF: safeF.max + AIR_BAND_MARGIN_F, toF: null },
  };
}
