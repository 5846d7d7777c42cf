import { describe, expect, it } from "vitest";
import {
  fToC,
  formatDimensionsMm,
  formatIsoDate,
  formatLengthMm,
  formatTempRangeF,
  formatWeightG,
  formatZonedTime,
  gToOz,
  mmToIn,
} from "./format";

describe("unit conversions", () => {
  it("converts Fahrenheit to Celsius", () => {
    // NIST SP 811 B.9: t/°C = (t/°F − 32)/1.8; water boils at 212 °F = 100 °C, freezes at 32 °F = 0 °C [published]
    expect(fToC(212)).toBeCloseTo(100, 10);
    expect(fToC(32)).toBeCloseTo(0, 10);
    // −40 is the same on both scales [published, NIST SP 811 formula]
    expect(fToC(-40)).toBeCloseTo(-40, 10);
  });

  it("converts millimetres to inches", () => {
    // 1 in = 25.4 mm exactly (1959 international yard and pound) [published]; 21 CFR 1240.62: 4 in = 101.6 mm [published]
    expect(mmToIn(101.6)).toBeCloseTo(4, 10);
    expect(mmToIn(25.4)).toBeCloseTo(1, 10);
  });

  it("converts grams to ounces", () => {
    // 1 oz (avoirdupois) = 28.349523125 g exactly, NIST Handbook 44 App. C [published]; 1 lb = 453.59237 g
    expect(gToOz(453.59237)).toBeCloseTo(16, 9);
  });
});

describe("printed values", () => {
  it("shows °F with °C beside, whole degrees", () => {
    // 85 °F = 29.44 °C, 65 °F = 18.33 °C by the NIST SP 811 formula [published]
    expect(formatTempRangeF(85, 85)).toBe("85–85 °F (29–29 °C)");
    expect(formatTempRangeF(65, 85)).toBe("65–85 °F (18–29 °C)");
  });

  it("shows mm with inches beside", () => {
    // 21 CFR 1240.62: 4 inches = 101.6 mm [published]
    expect(formatLengthMm(101.6)).toBe("102 mm (4.0 in)");
    // 400 mm = 15.748 in, 300 mm = 11.811 in, 250 mm = 9.843 in at 25.4 mm/in [published]
    expect(formatDimensionsMm(400, 300, 250)).toBe("400 × 300 × 250 mm (15.7 × 11.8 × 9.8 in)");
  });

  it("shows grams with ounces beside", () => {
    // 1 lb = 453.59237 g = 16 oz [published, NIST Handbook 44]
    expect(formatWeightG(453.59237)).toBe("454 g (16.0 oz)");
  });

  it("shows an instant in the zone given, with its abbreviation", () => {
    // US daylight time runs from the 2nd Sunday of March (15 U.S.C. 260a) [published]: CDT = UTC−5 on 2026-04-14
    expect(formatZonedTime("2026-04-14T21:30:00Z", "America/Chicago")).toBe("Tue, Apr 14, 2026, 16:30 CDT");
    // after the 1st Sunday of November standard time applies: EST = UTC−5 on 2026-11-10 [published, same statute]
    expect(formatZonedTime("2026-11-10T14:00:00Z", "America/New_York")).toBe("Tue, Nov 10, 2026, 09:00 EST");
  });

  it("shows a calendar date without moving it across a zone boundary", () => {
    // a permit's validity date is a calendar day, not an instant: it reads the same in every US zone [practice]
    expect(formatIsoDate("2026-01-01")).toBe("Jan 1, 2026");
    expect(formatIsoDate("2026-12-31")).toBe("Dec 31, 2026");
  });
});
