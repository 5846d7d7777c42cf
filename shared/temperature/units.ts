/** Degrees Fahrenheit to degrees Celsius (exact definition of the scale). */
export function fToC(tempF: number): number {
  return ((tempF - 32) * 5) / 9;
}

/** Degrees Celsius to degrees Fahrenheit (exact definition of the scale). */
export function cToF(tempC: number): number {
  return (tempC * 9) / 5 + 32;
}

/** Rounds to one decimal, the precision the API shows temperatures and hours in. */
export function round1(value: number): number {
  return Math.round(value * 10) / 10;
}
