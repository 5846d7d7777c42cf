import { describe, expect, it } from "vitest";
import { EARTH_MEAN_RADIUS_KM, haversineKm, interpolateGreatCircle } from "./geo";

const nashville = { lat: 36.12, lon: -86.67 };
const losAngeles = { lat: 33.94, lon: -118.4 };

describe("haversineKm", () => {
  it("matches the Rosetta Code reference distances", () => {
    // Rosetta Code "Haversine formula" task: BNA (36.12, −86.67) to LAX (33.94, −118.40)
    // is 2886.4444 km with R = 6371.0 km and 2887.2600 km with R = 6372.8 km [published]
    expect(haversineKm(nashville, losAngeles, 6371.0)).toBeCloseTo(2886.4444, 3);
    expect(haversineKm(nashville, losAngeles, 6372.8)).toBeCloseTo(2887.26, 3);
  });

  it("uses the IUGG mean radius by default", () => {
    // Moritz 1980 (IUGG): R1 = 6371.0088 km [published]; distance scales linearly with R
    expect(EARTH_MEAN_RADIUS_KM).toBe(6371.0088);
    expect(haversineKm(nashville, losAngeles)).toBeCloseTo((2886.4444 * 6371.0088) / 6371.0, 3);
  });

  it("gives one degree of latitude as R·π/180", () => {
    // arc length of 1° on a sphere = R·π/180 = 111.195 km for R = 6371.0088 km [memory]
    expect(haversineKm({ lat: 10, lon: 20 }, { lat: 11, lon: 20 })).toBeCloseTo(111.1951, 3);
  });
});

describe("interpolateGreatCircle", () => {
  it("splits the distance in proportion to the fraction", () => {
    // a point a fraction f along a great circle is f·d from the start and (1 − f)·d from the end
    // (geometry of the sphere) [memory]
    const total = haversineKm(nashville, losAngeles);
    for (const f of [0.1, 0.25, 0.5, 0.9]) {
      const p = interpolateGreatCircle(nashville, losAngeles, f);
      expect(haversineKm(nashville, p)).toBeCloseTo(f * total, 6);
      expect(haversineKm(p, losAngeles)).toBeCloseTo((1 - f) * total, 6);
    }
  });

  it("bows toward the pole, unlike a straight line on the map", () => {
    // great circles between mid-latitude points lie poleward of the parallel; the midpoint of
    // (45° N, 45° W) and (45° N, 45° E) is the normalised sum of their unit vectors, at
    // latitude atan(√2) = 54.7356° N (vector geometry of the sphere) [memory]
    const mid = interpolateGreatCircle({ lat: 45, lon: -45 }, { lat: 45, lon: 45 }, 0.5);
    expect(mid.lat).toBeCloseTo((Math.atan(Math.SQRT2) * 180) / Math.PI, 6);
    expect(mid.lat).toBeCloseTo(54.7356, 3);
    expect(mid.lon).toBeCloseTo(0, 9);
  });

  it("returns the end points at fractions 0 and 1", () => {
    expect(interpolateGreatCircle(nashville, losAngeles, 0).lat).toBeCloseTo(nashville.lat, 9);
    expect(interpolateGreatCircle(nashville, losAngeles, 1).lon).toBeCloseTo(losAngeles.lon, 9);
  });
});
