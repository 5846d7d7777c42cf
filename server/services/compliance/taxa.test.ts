import { describe, expect, it } from "vitest";
import { evaluateCompliance } from "@shared/compliance/evaluate";
import { buildAnimal, buildFacts, buildInput } from "@shared/compliance/evaluate-fixtures";
import { STATE_RULES } from "@shared/compliance/state-rules.demo";
import { TAXA } from "../../db/seeders/taxa.data";
import { resolvedTaxonOf, type TaxonNode } from "./taxa";

/** The seed catalogue as nodes, keyed by scientific name (the seed's parent references use names). */
const nodes = new Map<string, TaxonNode>(
  TAXA.map((t) => [
    t.scientificName,
    {
      id: t.scientificName,
      rank: t.rank,
      scientificName: t.scientificName,
      parentId: t.parent,
      synonyms: t.synonyms,
      venomous: t.venomous,
    },
  ]),
);
const resolve = (name: string) => resolvedTaxonOf(name, nodes);
const familyOf = (name: string) => resolve(name).lineage.find((entry) => entry.rank === "family")?.scientificName;

/**
 * Lizard families of the catalogue (Reptile Database family list [memory]); every other family of
 * Squamata in it is a snake family. A new lizard family added to the catalogue must be added here.
 */
const LIZARD_FAMILIES = new Set([
  "Agamidae",
  "Anguidae",
  "Chamaeleonidae",
  "Crotaphytidae",
  "Dactyloidae",
  "Diplodactylidae",
  "Eublepharidae",
  "Gekkonidae",
  "Gerrhosauridae",
  "Helodermatidae",
  "Iguanidae",
  "Lacertidae",
  "Phrynosomatidae",
  "Scincidae",
  "Teiidae",
  "Varanidae",
]);

const toHawaii = (name: string) =>
  evaluateCompliance(
    buildInput({
      facts: buildFacts({ originState: "CA", destinationState: "HI" }),
      animals: [buildAnimal(resolve(name))],
      rules: STATE_RULES,
    }),
  ).animals[0]?.findings.find((f) => f.ruleId === "hi-hrs150a-6-live-snakes");

describe("taxa resolved from the catalogue", () => {
  it("walk from class down to the taxon, and carry the synonyms of the taxon and its ancestors", () => {
    // [published] 9 CFR 74.1 names Geochelone pardalis, now Stigmochelys pardalis (Reptile Database synonymy)
    const leopard = resolve("Stigmochelys pardalis");
    expect(leopard.lineage.map((e) => `${e.rank}:${e.scientificName}`)).toEqual([
      "class:Reptilia",
      "order:Testudines",
      "family:Testudinidae",
      "genus:Stigmochelys",
      "species:Stigmochelys pardalis",
    ]);
    expect(leopard.synonyms).toEqual(expect.arrayContaining(["Geochelone pardalis", "Testudinata"]));
    // [published] 50 CFR 16.15 lists Python reticulatus; the catalogue files it as Malayopython reticulatus, a subspecies inherits the name
    expect(resolve("Malayopython reticulatus jampeanus").synonyms).toEqual(
      expect.arrayContaining(["Python reticulatus", "Broghammerus"]),
    );
  });

  it("lets Hawaii's ban reach every snake of the catalogue, though the catalogue has no suborder Serpentes, and no lizard", () => {
    // [published] HRS 150A-6(3): no live snake may be brought into Hawaii; the catalogue hangs snakes straight from Squamata
    const squamates = TAXA.filter(
      (t) =>
        (t.rank === "species" || t.rank === "subspecies") &&
        resolve(t.scientificName).lineage.some((e) => e.scientificName === "Squamata"),
    );
    const snakes = squamates.filter((t) => !LIZARD_FAMILIES.has(familyOf(t.scientificName) ?? ""));
    expect(snakes.length).toBeGreaterThan(100);
    expect(new Set(snakes.map((t) => familyOf(t.scientificName)))).toEqual(
      new Set(["Boidae", "Colubridae", "Elapidae", "Pythonidae", "Viperidae"]),
    );
    for (const snake of snakes) expect(toHawaii(snake.scientificName)?.severity, snake.scientificName).toBe("blocks");
    for (const lizard of squamates.filter((t) => !snakes.includes(t)))
      expect(toHawaii(lizard.scientificName), lizard.scientificName).toBeUndefined();
  });

  it("refuses a parent chain that loops", () => {
    const loop = new Map<string, TaxonNode>([
      ["a", { id: "a", rank: "genus", scientificName: "A", parentId: "b", synonyms: [], venomous: false }],
      ["b", { id: "b", rank: "family", scientificName: "B", parentId: "a", synonyms: [], venomous: false }],
    ]);
    expect(() => resolvedTaxonOf("a", loop)).toThrow(/does not end/);
  });
});
