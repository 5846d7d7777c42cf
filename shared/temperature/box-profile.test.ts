import { describe, expect, it } from "vitest";
import {
  PACKING_ALLOWANCE_G,
  UNKNOWN_ANIMAL_WEIGHT_G,
  boxContentsG,
  mostCautiousProfile,
  profileForBox,
  type AnimalLine,
} from "./box-profile";
import { DEFAULT_PROFILES } from "./profiles";

const line = (over: Partial<AnimalLine>): AnimalLine => ({
  count: 1,
  weightG: null,
  profileGroup: null,
  animalClass: null,
  ...over,
});

describe("boxContentsG", () => {
  it("adds recorded weights, an assumed weight for the others, and the packing allowance", () => {
    // [memory] an adult leopard gecko weighs about 60 g and a corn snake hatchling about 7 g
    const geckos = line({ count: 2, weightG: 60 });
    const hatchlings = line({ count: 3, weightG: 7 });
    expect(boxContentsG([geckos, hatchlings])).toBe(PACKING_ALLOWANCE_G + 141);
    expect(boxContentsG([line({ count: 4 })])).toBe(PACKING_ALLOWANCE_G + 4 * UNKNOWN_ANIMAL_WEIGHT_G);
    expect(boxContentsG([])).toBe(PACKING_ALLOWANCE_G);
  });
});

describe("mostCautiousProfile", () => {
  it("takes the narrowest safe range, and on a tie the cooler one", () => {
    const { tropical_snake, tropical_lizard, crocodilian, tropical_tortoise } = DEFAULT_PROFILES;
    expect(mostCautiousProfile([tropical_tortoise, tropical_snake, crocodilian])?.group).toBe("tropical_snake");
    // [practice] overheating kills more often than cold: 68–88 °F goes before 70–90 °F (both 20 °F wide)
    expect(mostCautiousProfile([crocodilian, tropical_lizard])?.group).toBe("tropical_lizard");
    expect(mostCautiousProfile([])).toBeUndefined();
  });
});

describe("profileForBox", () => {
  it("uses the animals' own group", () => {
    const corn = line({ profileGroup: "temperate_snake", animalClass: "reptile" });
    expect(profileForBox([corn], [corn], DEFAULT_PROFILES).group).toBe("temperate_snake");
  });

  it("gives a genus-level entry the most cautious profile of its class on the transfer", () => {
    // [published] Ambystoma (mole salamanders) and Dendrobates (poison frogs) are amphibians
    const genus = line({ animalClass: "amphibian" });
    const frogs = line({ profileGroup: "tropical_frog", animalClass: "amphibian" });
    const newts = line({ profileGroup: "salamander", animalClass: "amphibian" });
    const snakes = line({ profileGroup: "tropical_snake", animalClass: "reptile" });
    expect(profileForBox([genus], [genus, newts, snakes], DEFAULT_PROFILES).group).toBe("salamander");
    expect(profileForBox([genus], [genus, newts, frogs, snakes], DEFAULT_PROFILES).group).toBe("tropical_frog");
    // none of its class on the transfer: the class's most cautious
    expect(profileForBox([genus], [genus, snakes], DEFAULT_PROFILES).group).toBe("tropical_frog");
  });

  it("falls back to the most cautious reptile profile when nothing is known", () => {
    expect(profileForBox([line({})], [line({})], DEFAULT_PROFILES).group).toBe("tropical_snake");
    expect(profileForBox([], [], DEFAULT_PROFILES).group).toBe("tropical_snake");
  });

  it("takes the most cautious profile when a box mixes groups", () => {
    const tortoise = line({ profileGroup: "tropical_tortoise", animalClass: "reptile" });
    const lizard = line({ profileGroup: "tropical_lizard", animalClass: "reptile" });
    expect(profileForBox([tortoise, lizard], [tortoise, lizard], DEFAULT_PROFILES).group).toBe("tropical_lizard");
  });
});
