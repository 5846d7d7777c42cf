import { cToF, fToC } from "@shared/temperature/units";

/** The two ways of showing measurements: °F and inches, or °C and millimetres. */
export type UnitSystem = "imperial" | "metric";

/** The international inch, exactly (1959 agreement; NIST SP 811). */
export const MM_PER_INCH = 25.4;

/** Millimetres to inches. */
export function mmToIn(lengthMm: number): number {
  return lengthMm / MM_PER_INCH;
}

/** Inches to millimetres. */
export function inToMm(lengthIn: number): number {
  return lengthIn * MM_PER_INCH;
}

export function lengthUnit(system: UnitSystem): "in" | "mm" {
  return system === "imperial" ? "in" : "mm";
}

export function tempUnit(system: UnitSystem): "°F" | "°C" {
  return system === "imperial" ? "°F" : "°C";
}

// Inches need two decimals to stay within a quarter of a millimetre; mm and degrees one.
const digits = { in: 2, mm: 1, "°F": 1, "°C": 1 } as const;

function numberText(value: number, maxDigits: number, grouping: boolean): string {
  return new Intl.NumberFormat("en-US", { maximumFractionDigits: maxDigits, useGrouping: grouping }).format(value);
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
function parseDecimal(text: string): number | null {
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
