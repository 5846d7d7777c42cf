import { describe, expect, it } from "vitest";
import { cToF } from "../../shared/units";
import { fakeTemperatureC } from "./climate";

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
