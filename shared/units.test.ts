import { describe, expect, it } from "vitest";
import {
  cToF,
  fToC,
  formatDimensions,
  formatDimensionsBoth,
  formatDistance,
  formatLength,
  formatLengthBoth,
  formatLimit,
  formatTemp,
  formatTempBoth,
  formatTempRangeBoth,
  formatWeight,
  formatWeightBoth,
  gToLb,
  gToOz,
  inToMm,
  kmToMiles,
  lbToG,
  lengthInputText,
  milesToKm,
  mmToIn,
  ozToG,
  parseLengthMm,
  parseTempF,
  round1,
  tempInputText,
} from "./units";

describe("temperature scales", () => {
  it("maps the fixed points of water and the crossing point", () => {
    // Freezing 32 °F = 0 °C, boiling 212 °F = 100 °C at 1 atm, and −40 is the same on both
    // scales: definition of the Fahrenheit scale (NIST SP 811, 4.2.1.1 and B.9) [published]
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

describe("weights and distances", () => {
  it("uses the avoirdupois pound and ounce", () => {
    // International yard and pound agreement 1959, NIST SP 811 B.8 and NIST Handbook 44 App. C [published]:
    // 1 lb = 453.59237 g exactly, 1 oz = 1/16 lb = 28.349523125 g.
    expect(lbToG(1)).toBe(453.59237);
    expect(ozToG(1)).toBeCloseTo(28.349523125, 12);
    expect(gToOz(453.59237)).toBeCloseTo(16, 9);
    expect(gToLb(907.18474)).toBeCloseTo(2, 12);
  });

  it("uses the international mile", () => {
    // International yard and pound agreement 1959: 1 mi = 5280 ft × 0.3048 m = 1.609344 km exactly [published]
    expect(milesToKm(1)).toBe(1.609344);
    expect(kmToMiles(1609.344)).toBeCloseTo(1000, 9);
    expect(formatDistance(1609.344, "imperial")).toBe("1,000 mi");
    expect(formatDistance(1609.344, "metric")).toBe("1,609 km");
  });

  it("shows grams, with ounces under a pound and pounds above in the imperial system", () => {
    // NIST Handbook 44 App. C [published]: 85 g = 2.998 oz; 1200 g = 2.6455 lb.
    expect(formatWeight(85, "imperial")).toBe("85 g (3 oz)");
    expect(formatWeight(1200, "imperial")).toBe("1,200 g (2.65 lb)");
    expect(formatWeight(1200, "metric")).toBe("1,200 g");
    expect(formatWeight(null, "metric")).toBe("—");
  });
});

describe("paper shows both systems", () => {
  it("shows °F with °C beside, whole degrees", () => {
    // 85 °F = 29.44 °C, 65 °F = 18.33 °C by the NIST SP 811 formula [published]
    expect(formatTempRangeBoth(85, 85)).toBe("85–85 °F (29–29 °C)");
    expect(formatTempRangeBoth(65, 85)).toBe("65–85 °F (18–29 °C)");
  });

  it("shows mm with inches beside", () => {
    // 21 CFR 1240.62: 4 inches = 101.6 mm [published]
    expect(formatLengthBoth(101.6)).toBe("102 mm (4.0 in)");
    // 400 mm = 15.748 in, 300 mm = 11.811 in, 250 mm = 9.843 in at 25.4 mm/in [published]
    expect(formatDimensionsBoth(400, 300, 250)).toBe("400 × 300 × 250 mm (15.7 × 11.8 × 9.8 in)");
  });

  it("shows grams with ounces beside", () => {
    // 1 lb = 453.59237 g = 16 oz [published, NIST Handbook 44]
    expect(formatWeightBoth(453.59237)).toBe("454 g (16.0 oz)");
  });
});

describe("limits in a message", () => {
  it("says a length limit in the unit the person reads", () => {
    // NIST SP 811 B.8 [published]: 200 mm = 7.874 in, shown to one decimal.
    expect(formatLimit("length", 200, "imperial")).toBe("7.9 in");
    expect(formatLimit("length", 200, "metric")).toBe("200 mm");
    expect(formatLimit("length", 2000, "metric")).toBe("2,000 mm");
  });

  it("says a temperature limit in the unit the person reads", () => {
    // NIST SP 811 4.2.1.1 [published]: 160 °F = 71.1 °C, −40 °F = −40 °C.
    expect(formatLimit("temperature", 160, "metric")).toBe("71.1 °C");
    expect(formatLimit("temperature", -40, "imperial")).toBe("-40 °F");
  });
});

describe("lengths", () => {
  it("uses the international inch", () => {
    // NIST SP 811 (B.8) [published]: 1 in = 25.4 mm exactly; 1 ft = 304.8 mm.
    expect(inToMm(1)).toBe(25.4);
    expect(mmToIn(304.8)).toBeCloseTo(12, 12);
  });

  it("keeps 4 inches exactly at 101.6 mm, the line of the turtle rule", () => {
    // 21 CFR 1240.62 [published]: carapace length under 4 inches; SOURCES.md gives 101.6 mm.
    expect(parseLengthMm("4", "imperial")).toBe(101.6);
    expect(formatLength(101.6, "imperial")).toBe("4 in");
    expect(formatLength(101.6, "metric")).toBe("101.6 mm");
  });

  it("shows a box in one unit", () => {
    // NIST SP 811 [published]: 12 in = 304.8 mm, 8 in = 203.2 mm, 6 in = 152.4 mm.
    expect(formatDimensions(304.8, 203.2, 152.4, "imperial")).toBe("12 × 8 × 6 in");
    expect(formatDimensions(304.8, 203.2, 152.4, "metric")).toBe("304.8 × 203.2 × 152.4 mm");
  });

  it("rounds inches for the input and comes back within a quarter millimetre", () => {
    // NIST SP 811 [published]: 300 mm = 11.811 in.
    expect(lengthInputText(300, "imperial")).toBe("11.81");
    const back = parseLengthMm(lengthInputText(300, "imperial"), "imperial");
    expect(Math.abs((back ?? 0) - 300)).toBeLessThan(0.25);
  });

  it("takes mm as typed in metric", () => {
    // [practice] keepers write box sizes in whole millimetres in metric.
    expect(parseLengthMm(" 250 ", "metric")).toBe(250);
    expect(parseLengthMm(".5", "metric")).toBe(0.5);
  });

  it("tells an empty field from a wrong one", () => {
    // Our own rule, checked against the HTML number grammar (WHATWG "valid floating-point number") [published]: no commas, no words.
    expect(parseLengthMm("", "imperial")).toBeNull();
    expect(parseLengthMm("12,5", "metric")).toBeNaN();
    expect(parseLengthMm("four", "imperial")).toBeNaN();
    expect(parseLengthMm("1e3", "metric")).toBeNaN();
  });
});

describe("temperatures", () => {
  it("converts the fixed points of the scales", () => {
    // NIST SP 811 (4.2.1.1) [published]: t/°C = (t/°F − 32)/1.8; water freezes at 32 °F, boils at 212 °F; −40 is the same on both.
    expect(formatTemp(32, "metric")).toBe("0 °C");
    expect(formatTemp(212, "metric")).toBe("100 °C");
    expect(formatTemp(-40, "metric")).toBe("-40 °C");
    expect(formatTemp(72, "imperial")).toBe("72 °F");
  });

  it("stores what was typed in °C as °F", () => {
    // REPTILES magazine shipping bands [practice] end at 95 °F = 35 °C (NIST SP 811 formula [published]);
    // ISTA 7E parcel envelope top 30.9 °C = 87.62 °F [published, secondary].
    expect(parseTempF("35", "metric")).toBe(95);
    expect(parseTempF("30.9", "metric")).toBe(87.62);
    expect(parseTempF("-3", "imperial")).toBe(-3);
    expect(tempInputText(38, "metric")).toBe("3.3");
  });

  it("shows nothing for a missing reading", () => {
    // [practice] an unmeasured box temperature is blank, never 0.
    expect(formatTemp(null, "metric")).toBe("—");
    expect(tempInputText(null, "imperial")).toBe("");
  });
});

describe("a reading on paper and in e-mail", () => {
  it("gives °F with °C beside", () => {
    // NIST SP 811 4.2.1.1 [published]: 72 °F = 22.22 °C.
    expect(formatTempBoth(72)).toBe("72 °F (22.2 °C)");
    expect(formatTempBoth(null)).toBe("—");
  });
});
