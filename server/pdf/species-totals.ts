import type { ManifestBox } from "./manifest-input";

export interface SpeciesTotal {
  scientificName: string;
  commonName: string;
  /** Number of individual animals of this species in the whole shipment. */
  count: number;
  venomous: boolean;
  /** 1-based indexes of the boxes that hold the species, ascending. */
  boxIndexes: number[];
  /** The boxes that hold the species, by their index and the sender's label, in box order. */
  boxes: { index: number; label: string }[];
}

const keyOf = (scientificName: string): string => scientificName.trim().replace(/\s+/g, " ").toLowerCase();

/**
 * The per-species list 50 CFR 14.81 wants with a wildlife shipment: scientific name, number of
 * each species and whether venomous, summed over all boxes and sorted by scientific name.
 * Names that differ only in case or spacing count as one species; the first spelling is shown.
 */
export function speciesTotals(boxes: ManifestBox[]): SpeciesTotal[] {
  const totals = new Map<string, SpeciesTotal>();
  for (const box of boxes) {
    for (const animal of box.animals) {
      const key = keyOf(animal.scientificName);
      const total = totals.get(key) ?? {
        scientificName: animal.scientificName.trim().replace(/\s+/g, " "),
        commonName: animal.commonName,
        count: 0,
        venomous: false,
        boxIndexes: [],
        boxes: [],
      };
      total.count += animal.count;
      total.venomous ||= animal.venomous;
      if (!total.boxIndexes.includes(box.index)) {
        total.boxIndexes.push(box.index);
        total.boxes.push({ index: box.index, label: box.label });
      }
      totals.set(key, total);
    }
  }
  return [...totals.values()]
    .map((t) => ({
      ...t,
      boxIndexes: [...t.boxIndexes].sort((a, b) => a - b),
      boxes: [...t.boxes].sort((a, b) => a.index - b.index),
    }))
    .sort((a, b) => a.scientificName.localeCompare(b.scientificName, "en"));
}

/** Animals in one box (sum of counts). */
export function animalsInBox(box: ManifestBox): number {
  return box.animals.reduce((n, a) => n + a.count, 0);
}
