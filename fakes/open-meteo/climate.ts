import { clearSkyHourMeanWm2 } from "../../shared/temperature/solar";

/**
 * Deterministic, plausible air temperatures for the Open-Meteo fake: a seasonal mean by
 * latitude, a daily cycle by local solar time and a slow "weather" wobble, all in °C.
 * Fitted by eye to US climate normals (Miami, Nashville, Chicago, Minneapolis; NOAA 1991–2020
 * normals [memory]); not a forecast of anything.
 */

/** How far a heat wave raises and a cold snap lowers the normal values, °C. */
export const SCENARIO_SHIFT_C = { heat_wave: 8, cold_snap: -12 } as const;

const DAY_S = 86_400;
/** Warmest day of the northern year (about 19 July) [memory]. */
const PEAK_DAY_OF_YEAR = 200;
/** Half the usual day-night range, °C [memory]. */
const DAILY_HALF_RANGE_C = 6;
/** Warmest hour of the day, local solar time [memory]. */
const PEAK_SOLAR_HOUR = 15;

/** Annual mean and half the July–January difference at a latitude, °C. */
function seasonalBase(latDeg: number): { meanC: number; halfRangeC: number } {
  const lat = Math.abs(latDeg);
  return {
    meanC: Math.min(27, 25.2 - 0.92 * (lat - 25.8)),
    halfRangeC: Math.max(1.5, 4.45 + 0.63 * (lat - 25.8)),
  };
}

/** Temperature at 2 m in °C for a position and a Unix time (s), shifted by `shiftC`. */
export function fakeTemperatureC(latDeg: number, lonDeg: number, unixS: number, shiftC = 0): number {
  const { meanC, halfRangeC } = seasonalBase(latDeg);
  const date = new Date(unixS * 1000);
  const dayOfYear = (unixS * 1000 - Date.UTC(date.getUTCFullYear(), 0, 1)) / (DAY_S * 1000) + 1;
  const hemisphere = latDeg >= 0 ? 1 : -1;
  const season = hemisphere * halfRangeC * Math.cos((2 * Math.PI * (dayOfYear - PEAK_DAY_OF_YEAR)) / 365.25);
  const solarHour = (((unixS / 3600 + lonDeg / 15) % 24) + 24) % 24;
  const daily = DAILY_HALF_RANGE_C * Math.cos((2 * Math.PI * (solarHour - PEAK_SOLAR_HOUR)) / 24);
  const days = unixS / DAY_S;
  const phase = latDeg * 0.37 + lonDeg * 0.11;
  const wobble =
    2.5 * Math.sin((2 * Math.PI * days) / 5.3 + phase) + 1.2 * Math.sin((2 * Math.PI * days) / 2.9 + 2 * phase);
  return meanC + season + daily + wobble + shiftC;
}

/**
 * Shortwave radiation (global horizontal, W/m²) as the mean of the hour that ends at `hourEndS`
 * (Unix s), the way Open-Meteo reports `shortwave_radiation`: the clear-sky value for the sun's
 * position at that place and season (Haurwitz; see shared/temperature/solar.ts), dimmed by a
 * slow, deterministic cloudiness between 45 % and 100 % of clear sky. Zero at night. Fake data.
 * `clearSkies` (a heat wave's high pressure) keeps the cloudiness at its thinnest.
 */
export function fakeShortwaveRadiationWm2(
  latDeg: number,
  lonDeg: number,
  hourEndS: number,
  clearSkies = false,
): number {
  const clear = clearSkyHourMeanWm2(latDeg, lonDeg, hourEndS * 1000);
  if (clear === 0) return 0;
  const days = hourEndS / DAY_S;
  const phase = latDeg * 0.53 + lonDeg * 0.17;
  const cloudiness = clearSkies ? 0 : 0.5 + 0.5 * Math.sin((2 * Math.PI * days) / 3.7 + phase);
  return Math.round(clear * (1 - 0.55 * cloudiness) * 10) / 10;
}
