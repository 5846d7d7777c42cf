import { describe, expect, it } from "vitest";
import { describeIssues } from "../validation/messages";
import { classifyAmbientF } from "./advice";
import { profileDataOf, profileDataSchema, profileFromData } from "./profile-schema";
import { DEFAULT_PROFILES } from "./profiles";

const snake = profileDataOf(DEFAULT_PROFILES.temperate_snake);
const fieldOf = (value: unknown) => {
  const result = profileDataSchema.safeParse(value);
  return result.success ? null : describeIssues(result.error).field;
};

describe("profileDataSchema", () => {
  it("accepts every guideline default and keeps it as it was", () => {
    for (const profile of Object.values(DEFAULT_PROFILES)) {
      const data = profileDataSchema.parse(profileDataOf(profile));
      expect(profileFromData(profile.group, data)).toEqual(profile);
    }
  });

  it("reads the bands the way the guideline table does", () => {
    // [practice] REPTILES magazine shipping guide, reptiles: 37 °F do not ship, 38–69 °F heat pack,
    // 70–91 °F none, 92–95 °F staffed facility only, 96 °F do not ship
    const bands = profileDataSchema.parse(snake).bandsF;
    expect([37, 38, 69, 70, 91, 92, 95, 96].map((f) => classifyAmbientF(f, bands))).toEqual([
      "do_not_ship_cold",
      "heat_pack",
      "heat_pack",
      "none",
      "none",
      "hold",
      "hold",
      "do_not_ship_hot",
    ]);
  });

  it("refuses a safe range that is empty or upside down", () => {
    expect(fieldOf({ ...snake, safeTransitF: { min: 70, max: 70 } })).toBe("safeTransitF.max");
    expect(fieldOf({ ...snake, safeTransitF: { min: 85, max: 55 } })).toBe("safeTransitF.max");
  });

  it("refuses bands out of the order they are read in", () => {
    const bands = snake.bandsF;
    expect(fieldOf({ ...snake, bandsF: { ...bands, heatPackBelow: 38 } })).toBe("bandsF.heatPackBelow");
    expect(fieldOf({ ...snake, bandsF: { ...bands, holdFrom: 60 } })).toBe("bandsF.holdFrom");
    expect(fieldOf({ ...snake, bandsF: { ...bands, doNotShipAbove: 90 } })).toBe("bandsF.doNotShipAbove");
    // a cold-pack band must sit between "no pack" and "hold": the amphibian column's 80 °F does
    expect(fieldOf({ ...snake, bandsF: { ...bands, coldPackFrom: 80 } })).toBeNull();
    expect(fieldOf({ ...snake, bandsF: { ...bands, coldPackFrom: 93 } })).toBe("bandsF.coldPackFrom");
  });

  it("refuses temperatures that are not weather and keys it does not know", () => {
    // [memory] WMO extremes: −128.6 °F (Vostok) and 134 °F (Death Valley); the schema allows −80 to 140 °F
    expect(fieldOf({ ...snake, safeTransitF: { min: 55, max: 999 } })).toBe("safeTransitF.max");
    expect(fieldOf({ ...snake, group: "temperate_snake" })).toBe("group");
    expect(fieldOf({ ...snake, label: "  " })).toBe("label");
  });
});
