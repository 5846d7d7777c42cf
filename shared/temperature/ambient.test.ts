import { describe, expect, it } from "vitest";
import {
  ambientFromForecasts,
  ambientFromOverride,
  forecastWindow,
  indexForecasts,
  isPlausibleAmbientF,
} from "./ambient";
import type { TransitPlace } from "./places";
import { buildTransitTimeline } from "./timeline";

const nashville: TransitPlace = { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" };
const atlanta: TransitPlace = { label: "Atlanta, GA", lat: 33.749, lon: -84.388, timeZone: "America/New_York" };
const trip = buildTransitTimeline({
  mode: "ground_courier",
  origin: nashville,
  destination: atlanta,
  departAt: "2026-06-02T08:00:00-05:00",
});

describe("isPlausibleAmbientF", () => {
  it("accepts weather and rejects what no thermometer outdoors reads", () => {
    // recorded extremes −128.6 °F (Vostok 1983) and 134 °F (Death Valley 1913), WMO archive [memory]
    expect([-40, 0, 75, 120].every(isPlausibleAmbientF)).toBe(true);
    expect([Number.NaN, Number.POSITIVE_INFINITY, -200, 500, "75", null].some(isPlausibleAmbientF)).toBe(false);
  });
});

describe("forecastWindow", () => {
  it("covers the trip and seven more days of departures", () => {
    const window = forecastWindow(trip);
    expect(window.fromHour).toBe(trip.points[0]!.at);
    expect(Date.parse(window.toHour) - Date.parse(trip.points.at(-1)!.at)).toBe((7 * 24 + 1) * 3_600_000);
  });
});

describe("ambientFromForecasts", () => {
  const hours = (offsetF: number) => trip.points.map((p, i) => ({ at: p.at, tempF: 70 + offsetF + i }));

  it("reads each hour from the forecast nearest the hour's waypoint", () => {
    // the service answers with its grid cell's centre: a few km off the asked position
    const forecasts = trip.waypoints.map((w, i) => ({ lat: w.lat + 0.03, lon: w.lon - 0.03, hours: hours(i * 100) }));
    const ambient = ambientFromForecasts(trip, indexForecasts(forecasts));
    expect(ambient.size).toBe(trip.points.length);
    trip.points.forEach((p, i) => expect(ambient.get(p.at)).toBe(70 + p.waypoint * 100 + i));
  });

  it("prefers the nearest of several forecasts", () => {
    const origin = trip.waypoints[0]!;
    // 0.18° of latitude ≈ 20 km, 0.045° ≈ 5 km (111.2 km per degree) [memory]
    const near = { lat: origin.lat + 0.045, lon: origin.lon, hours: hours(0) };
    const far = { lat: origin.lat + 0.18, lon: origin.lon, hours: hours(500) };
    for (const forecasts of [
      [near, far],
      [far, near],
    ]) {
      expect(ambientFromForecasts(trip, indexForecasts(forecasts)).get(trip.points[0]!.at)).toBe(70);
    }
  });

  it("leaves out hours without a forecast nearby", () => {
    const farAway = [{ lat: 45, lon: -100, hours: hours(0) }];
    expect(ambientFromForecasts(trip, indexForecasts(farAway)).size).toBe(0);
  });
});

describe("ambientFromOverride", () => {
  it("interpolates linearly and holds the ends", () => {
    const first = Date.parse(trip.points[0]!.at);
    const at = (h: number) => new Date(first + h * 3_600_000).toISOString();
    const ambient = ambientFromOverride(trip, [
      { at: at(4), tempF: 90 },
      { at: at(1), tempF: 60 },
    ]);
    expect(ambient.get(at(0))).toBe(60);
    expect(ambient.get(at(2))).toBeCloseTo(70, 9);
    expect(ambient.get(at(3))).toBeCloseTo(80, 9);
    expect(ambient.get(trip.points.at(-1)!.at)).toBe(90);
  });
});
