import { describe, expect, it } from "vitest";
import { placeFromPosition, placeFromZip, resolvePlace } from "./places";

describe("placeFromZip", () => {
  it("places 37203 in downtown Nashville, Central Time", () => {
    // USPS: ZIP 37203 is Nashville, TN, which keeps Central Time [practice]
    const place = placeFromZip("37203");
    expect(place).toMatchObject({ state: "TN", timeZone: "America/Chicago" });
    expect(place?.label).toContain("Nashville");
    expect(place?.lat).toBeCloseTo(36.15, 1);
    expect(place?.lon).toBeCloseTo(-86.79, 1);
  });

  it("places 85004 in Phoenix and 10001 in Manhattan", () => {
    // USPS: 85004 is Phoenix, AZ; 10001 is New York, NY [practice]
    expect(placeFromZip("85004")).toMatchObject({ state: "AZ", timeZone: "America/Phoenix" });
    expect(placeFromZip("10001")).toMatchObject({ state: "NY", timeZone: "America/New_York" });
  });

  it("refuses malformed, unknown and Canadian codes", () => {
    expect(placeFromZip("3720")).toBeUndefined();
    expect(placeFromZip("00000")).toBeUndefined();
    // the package also holds Canadian postal codes, looked up by their first three characters
    expect(placeFromZip("M5V")).toBeUndefined();
  });
});

describe("resolvePlace", () => {
  it("accepts a position and finds its zone", () => {
    // tz-lookup package tests: (41.8976, −87.6205) → America/Chicago [published]
    expect(placeFromPosition(41.8976, -87.6205)).toMatchObject({ timeZone: "America/Chicago" });
    expect(resolvePlace({ lat: 40.7092, lon: -74.0151 })?.timeZone).toBe("America/New_York");
    expect(resolvePlace({ zip: "99999" })).toBeUndefined();
  });
});
