import { describe, expect, it } from "vitest";
import {
  formatDimensions,
  formatLength,
  formatTemp,
  inToMm,
  lengthInputText,
  mmToIn,
  parseLengthMm,
  parseTempF,
  tempInputText,
} from "./units";

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
