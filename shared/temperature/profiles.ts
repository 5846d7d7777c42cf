import type { ProfileGroup } from "../constants";

/**
 * Ambient bands of the shipping guideline, °F, compared with the daytime highs at the origin,
 * the destination and every place on the way. A band "a–b" of the published table covers
 * a ≤ T < b + 1 for measured values, except the top band "92–95", which ends at 95 inclusive.
 */
export type AdviceBandsF = {
  /** Below this: do not ship. */
  doNotShipBelow: number;
  /** From doNotShipBelow up to (not including) this: heat pack. */
  heatPackBelow: number;
  /** From this up to holdFrom: cold pack (null: never for this class). */
  coldPackFrom: number | null;
  /** From this up to doNotShipAbove inclusive: hold at a staffed facility only. */
  holdFrom: number;
  /** Above this: do not ship. */
  doNotShipAbove: number;
};

export type { AnimalClass } from "../constants";
import type { AnimalClass } from "../constants";

/** A species group's temperature profile: data, editable by admins, never law. */
export type TemperatureProfile = {
  group: ProfileGroup;
  label: string;
  animalClass: AnimalClass;
  /** Inside-box temperatures the animals tolerate in transit, °F. */
  safeTransitF: { min: number; max: number };
  bandsF: AdviceBandsF;
  /** Where the numbers come from, shown beside every verdict. */
  source: string;
};

export const GUIDELINE_SOURCE =
  'REPTILES magazine, "How to ship your reptiles, amphibians, fish and invertebrates" (guideline, not law)';

/** The reptile and amphibian columns of the SOURCES.md guideline table [practice]. */
export const GUIDELINE_BANDS_F: Readonly<Record<AnimalClass, AdviceBandsF>> = {
  reptile: { doNotShipBelow: 38, heatPackBelow: 70, coldPackFrom: null, holdFrom: 92, doNotShipAbove: 95 },
  amphibian: { doNotShipBelow: 38, heatPackBelow: 60, coldPackFrom: 80, holdFrom: 92, doNotShipAbove: 95 },
};

type GroupDefaults = { label: string; animalClass: AnimalClass; min: number; max: number };

/**
 * Safe transit ranges per group, °F: keepers' rules of thumb for a day or two in a box, set
 * inside each group's usual keeping range [memory]. Starting points for admins to review.
 */
const GROUP_DEFAULTS: Readonly<Record<ProfileGroup, GroupDefaults>> = {
  temperate_aquatic_turtle: { label: "Temperate aquatic turtles", animalClass: "reptile", min: 50, max: 85 },
  tropical_tortoise: { label: "Tropical tortoises", animalClass: "reptile", min: 65, max: 90 },
  temperate_tortoise: { label: "Temperate tortoises and box turtles", animalClass: "reptile", min: 55, max: 85 },
  desert_reptile: { label: "Desert reptiles", animalClass: "reptile", min: 65, max: 92 },
  temperate_snake: { label: "Temperate snakes", animalClass: "reptile", min: 55, max: 85 },
  tropical_snake: { label: "Tropical snakes", animalClass: "reptile", min: 70, max: 88 },
  tropical_lizard: { label: "Tropical lizards", animalClass: "reptile", min: 68, max: 88 },
  temperate_lizard: { label: "Temperate lizards", animalClass: "reptile", min: 55, max: 85 },
  salamander: { label: "Salamanders and newts", animalClass: "amphibian", min: 45, max: 70 },
  frog_toad: { label: "Temperate frogs and toads", animalClass: "amphibian", min: 50, max: 78 },
  tropical_frog: { label: "Tropical frogs", animalClass: "amphibian", min: 65, max: 80 },
  crocodilian: { label: "Crocodilians", animalClass: "reptile", min: 70, max: 90 },
};

/** Default profile of every group, built from the guideline table and the ranges above. */
export const DEFAULT_PROFILES: Readonly<Record<ProfileGroup, TemperatureProfile>> = Object.fromEntries(
  Object.entries(GROUP_DEFAULTS).map(([group, d]) => [
    group,
    {
      group: group as ProfileGroup,
      label: d.label,
      animalClass: d.animalClass,
      safeTransitF: { min: d.min, max: d.max },
      bandsF: GUIDELINE_BANDS_F[d.animalClass],
      source: `${GUIDELINE_SOURCE}; safe transit range: keepers' practice, guideline defaults`,
    },
  ]),
) as Record<ProfileGroup, TemperatureProfile>;
