import { describe, expect, it } from "vitest";
import { packingFindings } from "./packing";

const box = (id: string) => ({ id, label: `Box ${id}` });
const line = (id: string, containerId: string | null, name: string) => ({
  id,
  containerId,
  taxonId: name,
  scientificName: name,
});

// CITES Guidelines for the non-air transport of live wild animals and plants (Rp/3), 1.41:
// different species must not be loaded in the same compartment [published].
describe("packing findings", () => {
  it("flags two species in one box", () => {
    const f = packingFindings(
      [box("1")],
      [line("a", "1", "Pantherophis guttatus"), line("b", "1", "Lampropeltis triangulum")],
    );
    expect(f).toHaveLength(1);
    expect(f[0]).toMatchObject({ code: "mixed_species", containerId: "1", animalIds: ["a", "b"] });
    expect(f[0]!.message).toContain("Rp/3 1.41");
  });

  it("accepts several lines of one species in a box (e.g. males and females)", () => {
    expect(
      packingFindings([box("1")], [line("a", "1", "Pantherophis guttatus"), line("b", "1", "Pantherophis guttatus")]),
    ).toEqual([]);
  });

  it("flags unpacked animals and empty boxes", () => {
    const f = packingFindings(
      [box("1"), box("2")],
      [line("a", "1", "Pogona vitticeps"), line("b", null, "Pogona vitticeps")],
    );
    expect(f.map((x) => x.code).sort()).toEqual(["empty_box", "unpacked_animal"]);
  });

  it("an empty transfer needs animals and boxes", () => {
    expect(packingFindings([], []).map((x) => x.code)).toEqual(["no_animals", "no_boxes"]);
  });
});
