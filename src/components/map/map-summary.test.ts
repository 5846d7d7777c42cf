import { describe, expect, it } from "vitest";
import { mapSummary } from "./map-summary";
import type { MapHour, MapStop } from "./map-types";

const stop = (place: string, name = "Stop"): MapStop => ({ lat: 36, lon: -86, name, place, when: "—" });
const hour = (atMs: number, aroundF: number | null): MapHour => ({
  lat: 36,
  lon: -86,
  atMs,
  place: "somewhere",
  aroundF,
  exposure: "Outdoors",
});
const stops = [stop("Knoxville, TN", "Start"), stop("near Crossville, TN", "Break"), stop("Nashville, TN", "Arrival")];

describe("mapSummary", () => {
  it("names the ends, counts the stops between, and says the air in the chosen units", () => {
    const text = mapSummary(
      { title: "the trip", stops, hours: [hour(0, 60), hour(1, 70)], safeF: { min: 55, max: 85 } },
      "metric",
    );
    // 60 °F = 15.6 °C, 70 °F = 21.1 °C, 55 °F = 12.8 °C, 85 °F = 29.4 °C (NIST SP 811) [published]
    expect(text).toBe(
      "Map of the trip from Knoxville, TN to Nashville, TN, with 1 stop between. 2 dots mark where the box is each hour. " +
        "The air around the box runs from 15.6 °C to 21.1 °C. Every hour with a forecast is within the safe range, 12.8 °C to 29.4 °C.",
    );
  });

  it("counts the hours outside the range and the hours without a forecast, never calling them safe", () => {
    const text = mapSummary(
      {
        title: "the trip",
        stops,
        hours: [hour(0, 40), hour(1, 90), hour(2, 96), hour(3, null)],
        safeF: { min: 55, max: 85 },
      },
      "imperial",
    );
    expect(text).toContain("Outside the safe range (55 °F to 85 °F): 1 hour colder, 2 hours warmer.");
    expect(text).toContain("1 hour has no forecast.");
    const none = mapSummary(
      { title: "the trip", stops, hours: [hour(0, null)], safeF: { min: 55, max: 85 } },
      "imperial",
    );
    expect(none).toContain("The air around the box is not known");
    expect(none).not.toContain("within the safe range");
  });

  it("says when there is nothing to draw", () => {
    expect(mapSummary({ title: "the run", stops: [] }, "imperial")).toBe("Map of the run: no route to draw.");
  });
});
