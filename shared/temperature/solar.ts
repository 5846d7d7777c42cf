import { getPosition } from "suncalc";

/**
 * Where the sun stands and how much of it reaches the ground on a clear day. The sun's position
 * comes from `suncalc` (Meeus, Astronomical Algorithms, the formulas NOAA's solar calculator
 * uses); the clear-sky radiation from Haurwitz's model. Used by the weather fake to serve
 * plausible `shortwave_radiation`, and by the exposure model where no radiation is forecast.
 */

/** Height of the sun above the horizon at a place and instant, degrees (refraction included); negative at night. */
export function solarElevationDeg(lat: number, lon: number, atMs: number): number {
  return getPosition(new Date(atMs), lat, lon).altitude;
}

/**
 * Global horizontal irradiance under a clear sky, W/m², from the sun's zenith angle:
 * GHI = 1098 · cos z · exp(−0.059 / cos z), zero with the sun below the horizon.
 * Haurwitz, J. Meteorology 2 (1945) 154–166, as implemented in Sandia's PV_LIB
 * (Reno, Hansen and Stein, SAND2012-2389) [published].
 */
export function clearSkyGhiWm2(elevationDeg: number): number {
  const cosZenith = Math.sin((elevationDeg * Math.PI) / 180);
  if (!(cosZenith > 0)) return 0;
  return 1098 * cosZenith * Math.exp(-0.059 / cosZenith);
}

/** Clear-sky global horizontal irradiance at a place and instant, W/m². */
export function clearSkyRadiationWm2(lat: number, lon: number, atMs: number): number {
  return clearSkyGhiWm2(solarElevationDeg(lat, lon, atMs));
}

/**
 * Mean clear-sky irradiance over the hour that ends at `hourEndMs`, W/m²: Open-Meteo reports
 * `shortwave_radiation` as the mean of the preceding hour (API documentation) [published].
 * Four samples at the quarter-hours' middles.
 */
export function clearSkyHourMeanWm2(lat: number, lon: number, hourEndMs: number): number {
  let sum = 0;
  for (let i = 0; i < 4; i++) sum += clearSkyRadiationWm2(lat, lon, hourEndMs - (7.5 + 15 * i) * 60_000);
  return sum / 4;
}
