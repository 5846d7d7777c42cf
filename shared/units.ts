/**
 * Every unit conversion and every measurement shown to a person, in one place. Stored values are
 * millimetres, grams, kilometres and degrees Fahrenheit; a person sees °F and inches (or °C and
 * millimetres, one tap away), and paper shows both.
 *
 * The factors are exact by definition:
 * - inch = 25.4 mm (international yard and pound agreement, 1959; NIST SP 811, B.8);
 * - pound = 0.453 592 37 kg, ounce = 1/16 pound = 28.349 523 125 g (same agreement; NIST SP 811, B.8);
 * - mile = 5280 ft × 0.3048 m = 1.609 344 km (international mile; NIST SP 811, B.8);
 * - t/°C = (t/°F − 32)/1.8 (NIST SP 811, 4.2.1.1 and B.9).
 */

/** Millimetres in one international inch, exactly. */
export const MM_PER_INCH = 25.4;
/** Grams in one avoirdupois pound, exactly. */
export const G_PER_POUND = 453.59237;
/** Grams in one avoirdupois ounce (1/16 pound), exactly. */
export const G_PER_OUNCE = G_PER_POUND / 16;
/** Kilometres in one international mile, exactly. */
export const KM_PER_MILE = 1.609344;

// ---------------------------------------------------------------- conversions

/** Degrees Fahrenheit to degrees Celsius. */
export function fToC(tempF: number): number {
  return ((tempF - 32) * 5) / 9;
}

/** Degrees Celsius to degrees Fahrenheit. */
export function cToF(tempC: number): number {
  return (tempC * 9) / 5 + 32;
}

/** Millimetres to inches. */
export function mmToIn(lengthMm: number): number {
  return lengthMm / MM_PER_INCH;
}

/** Inches to millimetres. */
export function inToMm(lengthIn: number): number {
  return lengthIn * MM_PER_INCH;
}

/** Grams to avoirdupois ounces. */
export function gToOz(weightG: number): number {
  return weightG / G_PER_OUNCE;
}

/** Avoirdupois ounces to grams. */
export function ozToG(weightOz: number): number {
  return weightOz * G_PER_OUNCE;
}

/** Grams to avoirdupois pounds. */
export function gToLb(weightG: number): number {
  return weightG / G_PER_POUND;
}

/** Avoirdupois pounds to grams. */
export function lbToG(weightLb: number): number {
  return weightLb * G_PER_POUND;
}

/** Kilometres to international miles. */
export function kmToMiles(distanceKm: number): number {
  return distanceKm / KM_PER_MILE;
}

/** International miles to kilometres. */
export function milesToKm(distanceMi: number): number {
  return distanceMi * KM_PER_MILE;
}

/** Rounds to one decimal, the precision the API shows temperatures and hours in. */
export function round1(value: number): number {
  return Math.round(value * 10) / 10;
}

// ---------------------------------------------------------------- the person's choice

/** The two ways of showing measurements: °F and inches, or °C and millimetres. */
export type UnitSystem = "imperial" | "metric";
export const UNIT_SYSTEMS = ["imperial", "metric"] as const satisfies readonly UnitSystem[];
/** What a person sees before choosing: US keepers read °F and inches. */
export const DEFAULT_UNIT_SYSTEM: UnitSystem = "imperial";

/** What a stored measurement measures; the stored unit is mm, °F or g. */
export type Quantity = "length" | "temperature" | "weight";

export function lengthUnit(system: UnitSystem): "in" | "mm" {
  return system === "imperial" ? "in" : "mm";
}

export function tempUnit(system: UnitSystem): "°F" | "°C" {
  return system === "imperial" ? "°F" : "°C";
}

// Inches need two decimals to stay within a quarter of a millimetre; mm and degrees one.
const digits = { in: 2, mm: 1, "°F": 1, "°C": 1 } as const;

// Building an Intl formatter costs far more than using one (a trip's labels format dozens of
// distances per assessment): one per setting, kept.
const numberFormats = new Map<string, Intl.NumberFormat>();

function numberText(value: number, maxDigits: number, grouping: boolean): string {
  // "-0" reads as a mistake; a value that rounds to zero is zero.
  const shown = Object.is(Math.round(value * 10 ** maxDigits), -0) ? 0 : value;
  const key = `${maxDigits}:${grouping}`;
  let format = numberFormats.get(key);
  if (!format) {
    format = new Intl.NumberFormat("en-US", { maximumFractionDigits: maxDigits, useGrouping: grouping });
    numberFormats.set(key, format);
  }
  return format.format(shown);
}

/** A stored length (mm) as the number shown in the chosen system, rounded for display. */
export function lengthInUnit(lengthMm: number, system: UnitSystem): number {
  const value = system === "imperial" ? mmToIn(lengthMm) : lengthMm;
  const factor = 10 ** digits[lengthUnit(system)];
  return Math.round(value * factor) / factor;
}

/** A stored temperature (°F) as the number shown in the chosen system, to 0.1°. */
export function tempInUnit(tempF: number, system: UnitSystem): number {
  const value = system === "imperial" ? tempF : fToC(tempF);
  return Math.round(value * 10) / 10;
}

/** "4 in" or "101.6 mm"; an em dash when there is no value. */
export function formatLength(lengthMm: number | null | undefined, system: UnitSystem): string {
  if (lengthMm == null) return "—";
  const unit = lengthUnit(system);
  return `${numberText(lengthInUnit(lengthMm, system), digits[unit], true)} ${unit}`;
}

/** Box dimensions, length × width × height, in one unit: "12 × 8 × 6 in". */
export function formatDimensions(lengthMm: number, widthMm: number, heightMm: number, system: UnitSystem): string {
  const unit = lengthUnit(system);
  const part = (mm: number) => numberText(lengthInUnit(mm, system), digits[unit], true);
  return `${part(lengthMm)} × ${part(widthMm)} × ${part(heightMm)} ${unit}`;
}

/** "72 °F" or "22.2 °C"; an em dash when there is no value. */
export function formatTemp(tempF: number | null | undefined, system: UnitSystem): string {
  if (tempF == null) return "—";
  const unit = tempUnit(system);
  return `${numberText(tempInUnit(tempF, system), digits[unit], true)} ${unit}`;
}

/**
 * A weight in grams, the unit keepers weigh animals in [practice]; in the imperial system the
 * ounces (under a pound) or pounds follow: "85 g (3 oz)", "1,200 g (2.65 lb)". Em dash for none.
 */
export function formatWeight(weightG: number | null | undefined, system: UnitSystem): string {
  if (weightG == null) return "—";
  const grams = `${numberText(weightG, 1, true)} g`;
  return system === "imperial" ? `${grams} (${imperialWeightText(weightG)})` : grams;
}

function imperialWeightText(weightG: number): string {
  return weightG < G_PER_POUND
    ? `${numberText(gToOz(weightG), 1, true)} oz`
    : `${numberText(gToLb(weightG), 2, true)} lb`;
}

/** "311 mi" or "500 km" for a distance in km, whole units. */
export function formatDistance(distanceKm: number, system: UnitSystem): string {
  return system === "imperial"
    ? `${numberText(kmToMiles(distanceKm), 0, true)} mi`
    : `${numberText(distanceKm, 0, true)} km`;
}

/**
 * A stored measurement (mm, °F or g) as a validation message says it in the chosen system: "7.9 in"
 * for 200 mm in imperial, one decimal. Temperatures and lengths follow the system; weights stay in
 * grams, the unit the fields take.
 */
export function formatLimit(quantity: Quantity, stored: number, system: UnitSystem): string {
  const shown = limitInUnit(quantity, stored, system);
  const unit = quantity === "length" ? lengthUnit(system) : quantity === "temperature" ? tempUnit(system) : "g";
  return `${numberText(shown, 1, true)} ${unit}`;
}

/** The number formatLimit shows, in the system's unit, to one decimal. */
function limitInUnit(quantity: Quantity, stored: number, system: UnitSystem): number {
  if (quantity === "length") return round1(system === "imperial" ? mmToIn(stored) : stored);
  if (quantity === "temperature") return round1(system === "imperial" ? stored : fToC(stored));
  return round1(stored);
}

/**
 * The stored values a limit reads as in each system, with the limit itself: a form that says
 * "at most 7.9 in" for 200 mm must accept 7.9 in (200.66 mm). Checks accept up to the widest.
 */
export function limitsAsShown(quantity: Quantity, stored: number): number[] {
  const back = (system: UnitSystem): number => {
    const shown = limitInUnit(quantity, stored, system);
    if (quantity === "length") return system === "imperial" ? inToMm(shown) : shown;
    if (quantity === "temperature") return system === "imperial" ? shown : cToF(shown);
    return shown;
  };
  return [stored, ...UNIT_SYSTEMS.map(back)];
}

// ---------------------------------------------------------------- paper: both systems at once

/** A range given in °F as { f: "65–85 °F", c: "18–29 °C" }, whole degrees. */
export function tempRangeParts(minF: number, maxF: number): { f: string; c: string } {
  return {
    f: `${Math.round(minF)}–${Math.round(maxF)} °F`,
    c: `${Math.round(fToC(minF))}–${Math.round(fToC(maxF))} °C`,
  };
}

/** "65–85 °F (18–29 °C)" for a range given in °F: Fahrenheit first, as US keepers read it. */
export function formatTempRangeBoth(minF: number, maxF: number): string {
  const { f, c } = tempRangeParts(minF, maxF);
  return `${f} (${c})`;
}

/** "72 °F (22.2 °C)"; an em dash when there is no value. */
export function formatTempBoth(tempF: number | null | undefined): string {
  if (tempF == null) return "—";
  return `${formatTemp(tempF, "imperial")} (${formatTemp(tempF, "metric")})`;
}

/** "250 mm (9.8 in)". */
export function formatLengthBoth(lengthMm: number): string {
  return `${Math.round(lengthMm)} mm (${mmToIn(lengthMm).toFixed(1)} in)`;
}

/** "400 × 300 × 250 mm (15.7 × 11.8 × 9.8 in)", length × width × height. */
export function formatDimensionsBoth(lengthMm: number, widthMm: number, heightMm: number): string {
  const mm = [lengthMm, widthMm, heightMm].map((v) => Math.round(v)).join(" × ");
  const inches = [lengthMm, widthMm, heightMm].map((v) => mmToIn(v).toFixed(1)).join(" × ");
  return `${mm} mm (${inches} in)`;
}

/** "350 g (12.3 oz)". */
export function formatWeightBoth(weightG: number): string {
  return `${Math.round(weightG)} g (${gToOz(weightG).toFixed(1)} oz)`;
}

/** "2,162 mi (3,480 km)": a distance where the reader's units are not known (alerts, e-mail), miles first. */
export function formatDistanceBoth(distanceKm: number): string {
  return `${formatDistance(distanceKm, "imperial")} (${formatDistance(distanceKm, "metric")})`;
}

/** "80 mph (129 km/h)" for an average speed given in mph, whole units. */
export function formatSpeedBoth(speedMph: number): string {
  return `${numberText(speedMph, 0, true)} mph (${numberText(milesToKm(speedMph), 0, true)} km/h)`;
}

// ---------------------------------------------------------------- inputs

/** The text an input shows for a stored length (mm) in the chosen system; empty for none. */
export function lengthInputText(lengthMm: number | null | undefined, system: UnitSystem): string {
  if (lengthMm == null || !Number.isFinite(lengthMm)) return "";
  return numberText(lengthInUnit(lengthMm, system), digits[lengthUnit(system)], false);
}

/** The text an input shows for a stored temperature (°F) in the chosen system; empty for none. */
export function tempInputText(tempF: number | null | undefined, system: UnitSystem): string {
  if (tempF == null || !Number.isFinite(tempF)) return "";
  return numberText(tempInUnit(tempF, system), 1, false);
}

/** A plain decimal such as "4", "-3.5" or ".75"; null when empty, NaN when not a number. */
export function parseDecimal(text: string): number | null {
  const trimmed = text.trim();
  if (trimmed === "") return null;
  return /^[-+]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

// Stored values keep two decimals: enough for 4 in = 101.6 mm to stay exactly 101.6.
const round2 = (n: number) => Math.round(n * 100) / 100;

/** What the user typed in the chosen unit, as mm to 0.01; null when empty, NaN when not a number. */
export function parseLengthMm(text: string, system: UnitSystem): number | null {
  const value = parseDecimal(text);
  if (value === null || Number.isNaN(value)) return value;
  return round2(system === "imperial" ? inToMm(value) : value);
}

/** What the user typed in the chosen unit, as °F to 0.01; null when empty, NaN when not a number. */
export function parseTempF(text: string, system: UnitSystem): number | null {
  const value = parseDecimal(text);
  if (value === null || Number.isNaN(value)) return value;
  return round2(system === "imperial" ? value : cToF(value));
}
