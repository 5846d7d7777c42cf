import { describe, expect, it } from "vitest";
import { jurisdictionName } from "@shared/compliance/jurisdiction";
import { FIPS_TO_USPS, stateAt, stateShapes, transitStatesAlong } from "./route-states";

describe("the Census state outlines", () => {
  it("name each FIPS code as the state the USPS code stands for", () => {
    // [published] FIPS state codes (ANSI INCITS 38) against USPS Publication 28 names
    const shapes = stateShapes();
    expect(shapes).toHaveLength(Object.keys(FIPS_TO_USPS).length);
    for (const { state, name } of shapes) {
      expect(jurisdictionName(state).replace(/^the /, "")).toBe(
        name.replace("United States Virgin Islands", "U.S. Virgin Islands").replace("Commonwealth of the ", ""),
      );
    }
  });

  it("place a position in its state", () => {
    // [published] tz-lookup tests: (40.7092, −74.0151) is in New York (lower Manhattan)
    expect(stateAt({ lat: 40.7092, lon: -74.0151 })).toBe("NY");
    // [memory] Springfield, Illinois 39.80 N 89.65 W; Eugene, Oregon 44.05 N 123.09 W; Honolulu 21.31 N 157.86 W
    expect(stateAt({ lat: 39.8, lon: -89.65 })).toBe("IL");
    expect(stateAt({ lat: 44.05, lon: -123.09 })).toBe("OR");
    expect(stateAt({ lat: 21.31, lon: -157.86 })).toBe("HI");
    // [practice] the middle of the Gulf of Mexico is in no state
    expect(stateAt({ lat: 25.5, lon: -90.5 })).toBeNull();
  });
});

describe("transitStatesAlong", () => {
  it("lists the states a drive crosses, in travel order", () => {
    // [memory] the Tennessee–Mississippi line is the 35th parallel and the Mississippi–Alabama line
    // runs near 88.2° W: the straight line from Memphis (35.15 N, 90.05 W) to Atlanta (33.75 N,
    // 84.39 W) leaves Tennessee for Mississippi, then Alabama, then Georgia
    expect(transitStatesAlong({ lat: 35.15, lon: -90.05 }, { lat: 33.75, lon: -84.39 }, "ground_courier")).toEqual([
      "TN",
      "MS",
      "AL",
      "GA",
    ]);
  });

  it("names no transit state by air", () => {
    // source: issue 12 §1 (product decision, D26): a flight passes over states; no hub is recorded
    expect(transitStatesAlong({ lat: 35.15, lon: -90.05 }, { lat: 44.05, lon: -123.09 }, "overnight_air")).toEqual([]);
  });
});
