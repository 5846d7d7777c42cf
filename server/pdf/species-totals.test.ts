import { describe, expect, it } from "vitest";
import { buildAnimal, buildBoxes } from "./manifest-input.fixture";
import type { ManifestBox } from "./manifest-input";
import { animalsInBox, speciesTotals } from "./species-totals";

function box(index: number, animals: ManifestBox["animals"]): ManifestBox {
  return { ...buildBoxes(1, 0)[0]!, index, animals };
}

describe("speciesTotals", () => {
  // 50 CFR 14.81: the list accompanying a wildlife shipment gives the scientific name, the number
  // of each species and whether venomous [published]. Expected numbers are counted by hand below.
  const boxes = [
    box(1, [
      buildAnimal(0, { scientificName: "Python regius", commonName: "Ball python", count: 2, venomous: false }),
      buildAnimal(1, { scientificName: "Crotalus atrox", commonName: "Western diamondback", count: 1, venomous: true }),
    ]),
    box(2, [
      buildAnimal(2, { scientificName: "python  regius ", commonName: "Royal python", count: 3, venomous: false }),
      buildAnimal(3, { scientificName: "Ambystoma mexicanum", commonName: "Axolotl", count: 6, venomous: false }),
    ]),
    box(3, [
      buildAnimal(4, { scientificName: "Crotalus atrox", commonName: "Western diamondback", count: 2, venomous: true }),
    ]),
  ];

  it("sums each species over all boxes, sorted by scientific name", () => {
    expect(speciesTotals(boxes).map((t) => [t.scientificName, t.count, t.venomous, t.boxIndexes])).toEqual([
      ["Ambystoma mexicanum", 6, false, [2]],
      ["Crotalus atrox", 3, true, [1, 3]],
      ["Python regius", 5, false, [1, 2]],
    ]);
  });

  it("names the boxes that hold each species by their labels, in box order", () => {
    expect(speciesTotals(boxes).map((t) => t.boxes.map((b) => b.index))).toEqual([[2], [1, 3], [1, 2]]);
    expect(speciesTotals(boxes)[0]?.boxes[0]?.label).toBe(boxes[1]?.label);
  });

  it("counts every animal once", () => {
    // hand count: 2 + 1 + 3 + 6 + 2 = 14
    expect(speciesTotals(boxes).reduce((n, t) => n + t.count, 0)).toBe(14);
    expect(boxes.map(animalsInBox)).toEqual([3, 9, 2]);
  });

  it("marks a species venomous when any line of it is", () => {
    const mixed = [
      box(1, [
        buildAnimal(0, { scientificName: "Heloderma suspectum", venomous: false }),
        buildAnimal(1, { scientificName: "Heloderma suspectum", venomous: true }),
      ]),
    ];
    expect(speciesTotals(mixed)[0]?.venomous).toBe(true);
  });
});
