import { describe, expect, it } from "vitest";
import { bandSegments, chartRows, hourTicks, readingPoints, safeBand } from "./chart-rows";

const hours = [
  {
    at: "2027-03-09T15:00:00.000Z",
    place: "Knoxville, TN",
    ambientF: 212,
    insideF: 32,
    exposure: "outdoors" as const,
    aroundBoxF: 212,
  },
  {
    at: "2027-03-09T16:00:00.000Z",
    place: "Knoxville, TN",
    ambientF: null,
    insideF: null,
    exposure: "indoors" as const,
    aroundBoxF: null,
  },
];

describe("chartRows", () => {
  it("keeps °F, or converts to °C, and leaves missing hours as gaps", () => {
    // [published] the Fahrenheit scale's definition: 212 °F = 100 °C, 32 °F = 0 °C
    expect(chartRows(hours, "metric")).toEqual([
      {
        atMs: Date.parse("2027-03-09T15:00:00Z"),
        place: "Knoxville, TN",
        exposure: "outdoors",
        outside: 100,
        around: 100,
        inside: 0,
      },
      {
        atMs: Date.parse("2027-03-09T16:00:00Z"),
        place: "Knoxville, TN",
        exposure: "indoors",
        outside: null,
        around: null,
        inside: null,
      },
    ]);
    expect(chartRows(hours, "imperial")[0]).toMatchObject({ outside: 212, around: 212, inside: 32 });
  });

  it("shades the safe band in the same unit", () => {
    // [published] 50 °F = 10 °C and 86 °F = 30 °C
    expect(safeBand({ min: 50, max: 86 }, "metric")).toEqual({ low: 10, high: 30 });
  });

  it("draws readings in the same unit, with the model beside them", () => {
    // [published] 212 °F = 100 °C
    const points = readingPoints(
      [
        {
          at: "2027-03-09T15:30:00.000Z",
          place: "Depot",
          tempF: 212,
          modelF: null,
          source: "pickup",
          differenceF: null,
          outsideSafeRange: true,
        },
      ],
      "metric",
    );
    expect(points).toEqual([{ atMs: Date.parse("2027-03-09T15:30:00Z"), reading: 100, model: null, place: "Depot" }]);
  });
});

describe("bandSegments", () => {
  it("places each exposure as a share of the time axis, clipped to it", () => {
    const axis = { fromMs: Date.parse("2027-03-09T15:00:00Z"), toMs: Date.parse("2027-03-09T19:00:00Z") };
    const segments = bandSegments(
      [
        {
          from: "2027-03-09T14:30:00Z",
          to: "2027-03-09T16:00:00Z",
          exposure: "indoors",
          place: "A",
          aroundMaxF: 70,
          aroundMinF: 70,
        },
        {
          from: "2027-03-09T16:00:00Z",
          to: "2027-03-09T16:20:00Z",
          exposure: "parked_sun",
          place: "B",
          aroundMaxF: 120,
          aroundMinF: 90,
        },
        {
          from: "2027-03-09T19:00:00Z",
          to: "2027-03-09T20:00:00Z",
          exposure: "outdoors",
          place: "C",
          aroundMaxF: 60,
          aroundMinF: 60,
        },
      ],
      axis,
    );
    expect(segments.map((s) => [s.exposure, s.fromShare, s.toShare])).toEqual([
      ["indoors", 0, 0.25],
      ["parked_sun", 0.25, 0.25 + 20 / 240],
    ]);
  });
});

describe("hourTicks", () => {
  it("puts a few ticks on whole hours across the axis", () => {
    const fromMs = Date.parse("2027-03-09T15:00:00Z");
    expect(hourTicks({ fromMs, toMs: fromMs + 4 * 3_600_000 })).toHaveLength(5);
    const long = hourTicks({ fromMs, toMs: fromMs + 96 * 3_600_000 });
    expect(long.length).toBeLessThanOrEqual(7);
    expect(long.every((t) => t % 3_600_000 === 0)).toBe(true);
  });
});
