import { describe, expect, it } from "vitest";
import { chartRows, safeBand } from "./chart-rows";

const hours = [
  { at: "2027-03-09T15:00:00.000Z", place: "Knoxville, TN", ambientF: 212, insideF: 32 },
  { at: "2027-03-09T16:00:00.000Z", place: "Knoxville, TN", ambientF: null, insideF: null },
];

describe("chartRows", () => {
  it("keeps °F, or converts to °C, and leaves missing hours as gaps", () => {
    // [published] the Fahrenheit scale's definition: 212 °F = 100 °C, 32 °F = 0 °C
    expect(chartRows(hours, "metric")).toEqual([
      { atMs: Date.parse("2027-03-09T15:00:00Z"), place: "Knoxville, TN", outside: 100, inside: 0 },
      { atMs: Date.parse("2027-03-09T16:00:00Z"), place: "Knoxville, TN", outside: null, inside: null },
    ]);
    expect(chartRows(hours, "imperial")[0]).toMatchObject({ outside: 212, inside: 32 });
  });

  it("shades the safe band in the same unit", () => {
    // [published] 50 °F = 10 °C and 86 °F = 30 °C
    expect(safeBand({ min: 50, max: 86 }, "metric")).toEqual({ low: 10, high: 30 });
  });
});
