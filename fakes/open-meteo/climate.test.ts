import { describe, expect, it } from "vitest";
import { cToF } from "../../shared/units";
import { fakeShortwaveRadiationWm2, fakeTemperatureC } from "./climate";

const dayF = (lat: number, lon: number, dateUtc: string) =>
  Array.from({ length: 24 }, (_, h) =>
    cToF(fakeTemperatureC(lat, lon, Date.parse(`${dateUtc}T00:00:00Z`) / 1000 + h * 3600)),
  );
const mean = (values: number[]) => values.reduce((a, b) => a + b, 0) / values.length;

describe("fakeTemperatureC", () => {
  it("gives Nashville summer and winter days near its climate normals", () => {
    // NOAA 1991–2020 normals, Nashville: July mean ≈ 80 °F (high 89.5, low 70.8),
    // January mean ≈ 40 °F (high 48.6, low 30.6) [memory]; the fake wobbles a few degrees
    const july = dayF(36.12, -86.67, "2026-07-15");
    const january = dayF(36.12, -86.67, "2026-01-15");
    expect(mean(july)).toBeGreaterThan(72);
    expect(mean(july)).toBeLessThan(88);
    expect(mean(january)).toBeGreaterThan(30);
    expect(mean(january)).toBeLessThan(50);
  });

  it("is warmest in the mid-afternoon local solar time", () => {
    // the daily maximum of air temperature comes about 2–4 h after solar noon [memory];
    // at 86.67° W solar time is UTC − 5.8 h, so 15:00 solar ≈ 20:48 UTC
    const july = dayF(36.12, -86.67, "2026-07-15");
    const warmestUtcHour = july.indexOf(Math.max(...july));
    expect([20, 21]).toContain(warmestUtcHour);
  });

  it("is colder toward the pole in winter and reversed south of the equator", () => {
    // Miami January mean ≈ 68 °F, Minneapolis ≈ 15 °F (NOAA normals) [memory]
    expect(mean(dayF(25.8, -80.2, "2026-01-15"))).toBeGreaterThan(mean(dayF(45, -93.3, "2026-01-15")) + 30);
    // the southern hemisphere's summer is in January [practice]
    expect(mean(dayF(-34, 151, "2026-01-15"))).toBeGreaterThan(mean(dayF(-34, 151, "2026-07-15")));
  });

  it("is deterministic", () => {
    expect(fakeTemperatureC(40, -100, 1_780_000_000)).toBe(fakeTemperatureC(40, -100, 1_780_000_000));
  });
});

describe("fakeShortwaveRadiationWm2", () => {
  const hourEnd = (isoUtc: string) => Date.parse(isoUtc) / 1000;
  /** The brightest hour of a UTC day at a place, W/m². */
  const dayPeak = (lat: number, lon: number, dateUtc: string) =>
    Math.max(
      ...Array.from({ length: 24 }, (_, h) =>
        fakeShortwaveRadiationWm2(lat, lon, hourEnd(`${dateUtc}T00:00:00Z`) + (h + 1) * 3600, true),
      ),
    );

  it("is zero at night", () => {
    // local midnight at 90° W is 06:00 UTC; the sun is far below the horizon (NOAA solar calculator) [practice]
    expect(fakeShortwaveRadiationWm2(38, -90, hourEnd("2026-07-15T06:00:00Z"))).toBe(0);
    expect(fakeShortwaveRadiationWm2(38, -90, hourEnd("2026-01-15T06:00:00Z"))).toBe(0);
  });

  it("is stronger in summer than in winter, and toward the equator in winter", () => {
    // noon sun height = 90° − |latitude − declination|, declination ±23.44° at the solstices
    // (Meeus, Astronomical Algorithms) [published]: at 45° N 68.4° in June, 21.6° in December
    const june = dayPeak(45, -93, "2026-06-21");
    const december = dayPeak(45, -93, "2026-12-21");
    expect(june).toBeGreaterThan(2 * december);
    expect(dayPeak(25.8, -80.2, "2026-12-21")).toBeGreaterThan(december + 150);
  });

  it("never exceeds the clear sky and is dimmed by clouds on some days", () => {
    // Haurwitz clear-sky global irradiance (Sandia PV_LIB, SAND2012-2389) [published]
    const hours = Array.from({ length: 24 * 10 }, (_, h) => hourEnd("2026-05-01T00:00:00Z") + h * 3600);
    const cloudy = hours.map((s) => fakeShortwaveRadiationWm2(36.12, -86.67, s));
    const clear = hours.map((s) => fakeShortwaveRadiationWm2(36.12, -86.67, s, true));
    cloudy.forEach((value, i) => expect(value).toBeLessThanOrEqual(clear[i]! + 0.1));
    expect(cloudy.some((value, i) => value < 0.7 * clear[i]!)).toBe(true);
  });
});
