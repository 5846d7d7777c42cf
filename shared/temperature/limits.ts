/**
 * Limits of the temperature-safety domain. They are not in shared/constants.ts because
 * only this domain uses them; schemas, the adapter and the assessment import them from here.
 */

/**
 * Surface air temperatures outside this range are treated as corrupt data, not weather:
 * the recorded extremes are −128.6 °F (Vostok, 1983) and 134 °F (Death Valley, 1913)
 * (WMO archive of weather extremes [memory]); US shipping lanes stay far inside it.
 */
export const PLAUSIBLE_AMBIENT_F = { min: -80, max: 140 } as const;

/**
 * Global horizontal radiation at the ground cannot exceed the solar constant, about 1361 W/m²
 * (Kopp and Lean 2011 [memory]); 1400 leaves room for rounding and cloud-edge bursts.
 */
export const PLAUSIBLE_RADIATION_WM2 = { min: 0, max: 1400 } as const;

/** Open-Meteo forecasts reach 16 days ahead (API documentation, forecast_days max 16 [memory]). */
export const FORECAST_HORIZON_DAYS = 16;

/** The search for a safer departure looks this many days ahead (issue 5, section 4). */
export const SAFER_DEPARTURE_SEARCH_DAYS = 7;

/** Most override samples a what-if may carry: one an hour over the forecast horizon. */
export const AMBIENT_OVERRIDE_MAX = 24 * FORECAST_HORIZON_DAYS;

/** Most forecast points one weather request may ask for (a coast-to-coast ground trip has ~30). */
export const FORECAST_POINTS_MAX = 50;

/** Lightest box contents the model accepts; below this the box is empty air, not animals. */
export const CONTENTS_G_MIN = 1;

/** A climate-controlled vehicle's set range must lie within this, °F: colder or warmer is not a climate the animals travel in. */
export const VEHICLE_RANGE_F = { min: 32, max: 100 } as const;

/** Most planned stops one trip may carry (a 4-day drive with meals, fuel and nights). */
export const PLANNED_STOPS_MAX = 50;

/** Longest planned stop, minutes: a day. */
export const STOP_DURATION_MIN_MAX = 24 * 60;
