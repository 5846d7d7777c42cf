import type {
  AnimalClass,
  AnimalOrigin,
  CheckInOutcome,
  IdentifierKind,
  LengthKind,
  RegisterCondition,
  Sex,
  TaxonRank,
} from "../constants";

/** "Not known", never "unknown" on one page and "Unknown" on another. */
export const SEX_WORDS: Readonly<Record<Sex, string>> = {
  male: "Male",
  female: "Female",
  unknown: "Not known",
};

export const ANIMAL_ORIGIN_WORDS: Readonly<Record<AnimalOrigin, string>> = {
  captive_bred: "Captive-bred",
  captive_hatched: "Captive-hatched",
  wild_caught: "Wild-caught",
  long_term_captive: "Long-term captive",
  rescued: "Rescued",
};

export const IDENTIFIER_KIND_WORDS: Readonly<Record<IdentifierKind, string>> = {
  microchip: "Microchip",
  shell_notch: "Shell notch",
  photo_id: "Photo ID",
  band: "Band",
  other: "Other mark",
};

export const LENGTH_KIND_WORDS: Readonly<Record<LengthKind, string>> = {
  carapace: "Carapace length",
  snout_vent: "Snout–vent length",
  total: "Total length",
};

/** What the receiver found when opening a container. */
export const CHECK_IN_OUTCOME_WORDS: Readonly<Record<CheckInOutcome, string>> = {
  arrived_well: "Arrived well",
  arrived_problem: "Arrived with a problem",
  dead_on_arrival: "Dead on arrival",
  missing: "Missing",
};

/** How an animal in the register arrived; the last two are losses recorded at arrival. */
export const REGISTER_CONDITION_WORDS: Readonly<Record<RegisterCondition, string>> = {
  well: "Well",
  problem: "With a problem",
  dead_on_arrival: "Lost: dead on arrival",
  missing: "Lost: missing at arrival",
};

/** A taxon's rank, as it reads in "choose a species, not a genus". */
export const TAXON_RANK_WORDS: Readonly<Record<TaxonRank, string>> = {
  class: "class",
  order: "order",
  family: "family",
  genus: "genus",
  species: "species",
  subspecies: "subspecies",
};

/** The column of the temperature guideline a profile follows. */
export const ANIMAL_CLASS_WORDS: Readonly<Record<AnimalClass, string>> = {
  reptile: "Reptiles",
  amphibian: "Amphibians",
};
