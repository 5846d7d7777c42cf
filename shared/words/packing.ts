import type { PackKind, WallMaterial } from "../constants";

/** A pack as a label: on the form, the box list, the manifest and the labels. */
export const PACK_WORDS: Readonly<Record<PackKind, string>> = {
  none: "No heat or cold pack",
  heat_40h: "Heat pack, 40 hours",
  heat_72h: "Heat pack, 72 hours",
  cold: "Cold pack",
};

/** A pack inside a sentence: "Add a heat pack rated 40 hours, …". */
export const PACK_IN_SENTENCE: Readonly<Record<PackKind, string>> = {
  none: "no pack",
  heat_40h: "a heat pack rated 40 hours",
  heat_72h: "a heat pack rated 72 hours",
  cold: "a cold pack",
};

/** How to ready and place each pack [practice: REPTILES magazine shipping guide]. */
export const PACK_HANDLING_WORDS: Readonly<Record<PackKind, string>> = {
  heat_40h:
    "Open it an hour before packing so it is warm, and fix it to the lid or a wall with paper between it and the containers.",
  heat_72h:
    "Open it an hour before packing so it is warm, and fix it to the lid or a wall with paper between it and the containers.",
  cold: "Freeze it overnight, wrap it in paper, and keep it away from the containers.",
  none: "Pack the containers snugly so they cannot shift; no pack is needed.",
};

export const WALL_MATERIAL_WORDS: Readonly<Record<WallMaterial, string>> = {
  eps: "Expanded polystyrene (foam)",
  corrugated: "Corrugated board",
};
