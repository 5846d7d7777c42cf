import { describe, expect, it } from "vitest";
import { cToF, fToC, round1 } from "./units";

describe("temperature scales", () => {
  it("maps the fixed points of water and the crossing point", () => {
    // Freezing 32 °F = 0 °C, boiling 212 °F = 100 °C at 1 atm, and −40 is the same on both
    // scales: definition of the Fahrenheit scale (NIST SP 811, Appendix B) [published, secondary]
    expect(fToC(32)).toBeCloseTo(0, 12);
    expect(fToC(212)).toBeCloseTo(100, 12);
    expect(fToC(-40)).toBeCloseTo(-40, 12);
    expect(cToF(37)).toBeCloseTo(98.6, 12);
  });

  it("round-trips", () => {
    for (const tempF of [-80, 0, 38, 59.9, 95.1, 140]) expect(cToF(fToC(tempF))).toBeCloseTo(tempF, 10);
  });

  it("rounds to one decimal", () => {
    expect(round1(91.96)).toBe(92);
    expect(round1(-3.14159)).toBe(-3.1);
  });
});
