import { describe, expect, it } from "vitest";
import { LIMITS } from "../constants";
import { whatIfInputSchema } from "./schemas";

const valid = {
  origin: { zip: "37203" },
  destination: { lat: 33.94, lon: -118.4 },
  departAt: "2026-06-02T10:00:00-05:00",
  mode: "overnight_air",
  profile: "tropical_snake",
  box: {
    wall: "eps",
    wallThicknessMm: 25,
    lengthMm: 300,
    widthMm: 300,
    heightMm: 300,
    contentsG: 800,
    pack: "heat_40h",
  },
  ambientOverrideF: [{ at: "2026-06-02T15:00:00Z", tempF: 55 }],
};

const issuesOf = (input: unknown) =>
  whatIfInputSchema.safeParse(input).error?.issues.map((i) => i.path.join(".")) ?? [];

describe("whatIfInputSchema", () => {
  it("accepts the what-if of issue 5", () => {
    expect(whatIfInputSchema.parse(valid)).toEqual(valid);
    const { profile: _profile, ...bySpecies } = valid;
    expect(whatIfInputSchema.safeParse({ ...bySpecies, scientificName: "Python regius" }).success).toBe(true);
  });

  it("rejects unknown keys at every level", () => {
    expect(issuesOf({ ...valid, admin: true })).toEqual([""]);
    expect(issuesOf({ ...valid, box: { ...valid.box, color: "red" } })).toEqual(["box"]);
    expect(whatIfInputSchema.safeParse({ ...valid, origin: { zip: "37203", lat: 1 } }).success).toBe(false);
  });

  it("wants exactly one of profile and scientificName", () => {
    const { profile: _profile, ...neither } = valid;
    expect(issuesOf(neither)).toEqual(["profile"]);
    expect(issuesOf({ ...valid, scientificName: "Python regius" })).toEqual(["profile"]);
  });

  it("caps sizes with the shared LIMITS", () => {
    expect(issuesOf({ ...valid, box: { ...valid.box, lengthMm: LIMITS.boxDimensionMmMax + 1 } })).toEqual([
      "box.lengthMm",
    ]);
    expect(issuesOf({ ...valid, box: { ...valid.box, wallThicknessMm: 160 } })).toEqual(["box.wallThicknessMm"]);
    expect(issuesOf({ ...valid, box: { ...valid.box, contentsG: 0 } })).toEqual(["box.contentsG"]);
  });

  it("rejects malformed places, dates, names and temperatures", () => {
    expect(issuesOf({ ...valid, origin: { zip: "3720\u0000" } })).not.toEqual([]);
    expect(issuesOf({ ...valid, destination: { lat: 91, lon: 0 } })).not.toEqual([]);
    expect(issuesOf({ ...valid, departAt: "2026-06-02" })).toEqual(["departAt"]);
    expect(issuesOf({ ...valid, profile: undefined, scientificName: "python; DROP" })).toEqual(["scientificName"]);
    // recorded surface extremes −128.6 °F and 134 °F (WMO) [memory]: 150 °F is no weather
    expect(issuesOf({ ...valid, ambientOverrideF: [{ at: "2026-06-02T15:00:00Z", tempF: 150 }] })).toEqual([
      "ambientOverrideF.0.tempF",
    ]);
    expect(issuesOf({ ...valid, ambientOverrideF: [] })).toEqual(["ambientOverrideF"]);
    expect(issuesOf({ ...valid, mode: "teleport" })).toEqual(["mode"]);
  });
});
