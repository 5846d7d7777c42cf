import { describe, expect, it } from "vitest";
import { DEMO_TAXA as T } from "./demo-taxa";
import {
  ANY_TAXON,
  indexBySelector,
  itemsForTaxon,
  normalizeTaxonName,
  resolvedTaxonSchema,
  taxonMatchKeys,
  type TaxonSelector,
} from "./taxon";

const covers = (selector: TaxonSelector, taxon: Parameters<typeof taxonMatchKeys>[0]) =>
  itemsForTaxon(indexBySelector([{ selector }]), taxonMatchKeys(taxon)).length === 1;

describe("taxonMatchKeys", () => {
  it("holds the taxon, every ancestor, every synonym and the genus a synonym implies", () => {
    // [published] 9 CFR 74.1 calls the leopard tortoise Geochelone pardalis; [memory] Reptile Database: now Stigmochelys pardalis
    const keys = taxonMatchKeys(T.leopardTortoise);
    for (const name of [
      "stigmochelys pardalis",
      "stigmochelys",
      "testudinidae",
      "testudines",
      "reptilia",
      "geochelone pardalis",
      "geochelone",
    ]) {
      expect(keys.has(name)).toBe(true);
    }
    expect(keys.has("kinixys")).toBe(false);
  });

  it("places a taxon whose synonym is a trinomial under that older species", () => {
    // [published] 50 CFR 16.15 lists "Python molurus" including the Burmese python, once Python molurus bivittatus
    const keys = taxonMatchKeys(T.burmesePython);
    expect(keys.has("python molurus")).toBe(true);
    expect(taxonMatchKeys(T.ballPython).has("python molurus")).toBe(false);
  });
});

describe("selector matching", () => {
  it("matches any rank, ignores case and spacing, and honours exceptions", () => {
    // [published] 21 CFR 1240.62(a): order Testudinata, except families Dermochelyidae and Cheloniidae
    const turtles = { taxa: [" TESTUDINES "], exceptTaxa: ["Cheloniidae", "Dermochelyidae"] };
    expect(covers(turtles, T.redEaredSlider)).toBe(true);
    expect(covers(turtles, T.greenSeaTurtle)).toBe(false);
    expect(covers(turtles, T.cornSnake)).toBe(false);
    // [practice] a genus name covers its species and subspecies
    expect(covers({ taxa: ["trachemys"] }, T.redEaredSlider)).toBe(true);
    expect(covers({ taxa: [ANY_TAXON] }, T.axolotl)).toBe(true);
    expect(normalizeTaxonName("  Python   molurus\tbivittatus ")).toBe("python molurus bivittatus");
  });
});

describe("indexBySelector / itemsForTaxon", () => {
  it("returns each rule once, found under any of the taxon's names, and nothing for an unrelated taxon", () => {
    // [published] 9 CFR 74.1 names both Geochelone pardalis and G. sulcata: one rule, two names
    const tortoiseRule = {
      id: "a",
      selector: { taxa: ["Geochelone pardalis", "Stigmochelys pardalis", "Testudinidae"] },
    };
    const allRule = { id: "b", selector: { taxa: [ANY_TAXON] } };
    const seaRule = { id: "c", selector: { taxa: ["Testudines"], exceptTaxa: ["Testudinidae"] } };
    const index = indexBySelector([tortoiseRule, allRule, seaRule]);
    expect(
      itemsForTaxon(index, taxonMatchKeys(T.leopardTortoise))
        .map((r) => r.id)
        .sort(),
    ).toEqual(["a", "b"]);
    expect(itemsForTaxon(index, taxonMatchKeys(T.cornSnake)).map((r) => r.id)).toEqual(["b"]);
  });
});

describe("resolvedTaxonSchema", () => {
  it("accepts the demo taxa and refuses unknown keys and NUL", () => {
    // [practice] the server hands the function exactly this shape
    for (const taxon of Object.values(T)) expect(resolvedTaxonSchema.safeParse(taxon).success).toBe(true);
    expect(resolvedTaxonSchema.safeParse({ ...T.axolotl, common: "axolotl" }).success).toBe(false);
    expect(resolvedTaxonSchema.safeParse({ ...T.axolotl, scientificName: "Ambystoma\u0000" }).success).toBe(false);
  });
});
