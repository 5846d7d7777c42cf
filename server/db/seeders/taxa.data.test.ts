import { describe, it, expect } from "vitest";
import { PROFILE_GROUPS, TAXON_RANKS, type TaxonRank } from "@shared/constants";
import { TAXA, type TaxonSeed } from "./taxa.data";

const byName = new Map(TAXA.map((taxon) => [taxon.scientificName, taxon]));

/** Finds a taxon by its current name or any synonym, ignoring case. */
function resolve(name: string): TaxonSeed | undefined {
  const wanted = name.toLowerCase();
  return TAXA.find(
    (taxon) =>
      taxon.scientificName.toLowerCase() === wanted ||
      taxon.synonyms.some((synonym) => synonym.toLowerCase() === wanted),
  );
}

function ancestorAt(taxon: TaxonSeed, rank: TaxonRank): TaxonSeed | undefined {
  let node: TaxonSeed | undefined = taxon;
  while (node && node.rank !== rank) node = node.parent === null ? undefined : byName.get(node.parent);
  return node;
}

const rankIndex = (rank: TaxonRank) => TAXON_RANKS.indexOf(rank);
const speciesLevel = TAXA.filter((taxon) => taxon.rank === "species" || taxon.rank === "subspecies");

describe("taxa seed: lineage", () => {
  // Linnaean ranks: each node sits exactly one rank below its parent. ICZN Code, Art. 10.3-10.4 [memory]
  it("gives every node an existing parent of the next higher rank", () => {
    for (const taxon of TAXA.filter((t) => t.rank !== "class")) {
      const parent = taxon.parent === null ? undefined : byName.get(taxon.parent);
      expect(parent, `${taxon.scientificName} has parent ${taxon.parent}`).toBeDefined();
      expect(rankIndex(parent!.rank), `${taxon.scientificName} (${taxon.rank}) under ${parent!.rank}`).toBe(
        rankIndex(taxon.rank) - 1,
      );
    }
  });

  // Reptiles and amphibians are the two classes Hatchway covers [practice]
  it("has only Reptilia and Amphibia as roots", () => {
    const roots = TAXA.filter((taxon) => taxon.parent === null);
    expect(roots.map((taxon) => taxon.scientificName).sort()).toEqual(["Amphibia", "Reptilia"]);
    expect(roots.every((taxon) => taxon.rank === "class")).toBe(true);
  });

  // The seeder inserts in list order, so a parent must come first (our seeder contract) [practice]
  it("lists every parent before its children", () => {
    const seen = new Set<string>();
    for (const taxon of TAXA) {
      if (taxon.parent !== null)
        expect(seen.has(taxon.parent), `${taxon.scientificName} before ${taxon.parent}`).toBe(true);
      seen.add(taxon.scientificName);
    }
  });

  // A binomen is genus + specific name; a trinomen adds a subspecific name. ICZN Code, Art. 5.1-5.2 [memory]
  it("spells species as their genus plus one epithet and subspecies as their species plus one", () => {
    for (const taxon of TAXA) {
      const words = taxon.scientificName.split(" ");
      if (taxon.rank === "species") {
        expect(words, taxon.scientificName).toHaveLength(2);
        expect(words[0], taxon.scientificName).toBe(taxon.parent);
      } else if (taxon.rank === "subspecies") {
        expect(words, taxon.scientificName).toHaveLength(3);
        expect(words.slice(0, 2).join(" "), taxon.scientificName).toBe(taxon.parent);
      } else {
        expect(words, taxon.scientificName).toHaveLength(1);
      }
    }
  });

  // Names above species are capitalised single words; epithets are lower case. ICZN Code, Art. 11.8-11.9, 28 [memory]
  it("capitalises names the zoological way, current names and synonyms alike", () => {
    const pattern = /^[A-Z][a-z]+( [a-z]+){0,2}$/;
    for (const taxon of TAXA) {
      for (const name of [taxon.scientificName, ...taxon.synonyms]) expect(name, taxon.scientificName).toMatch(pattern);
    }
  });
});

describe("taxa seed: names stay unambiguous", () => {
  // One name, one taxon: a search by name must never have two answers. ICZN Code, Art. 52 (homonymy) [memory]
  it("has no duplicate scientific names", () => {
    const names = TAXA.map((taxon) => taxon.scientificName.toLowerCase());
    expect(names.length - new Set(names).size).toBe(0);
  });

  it("has no synonym used twice anywhere in the table", () => {
    const synonyms = TAXA.flatMap((taxon) => taxon.synonyms.map((synonym) => synonym.toLowerCase()));
    const repeated = synonyms.filter((synonym, index) => synonyms.indexOf(synonym) !== index);
    expect(repeated).toEqual([]);
  });

  it("has no synonym that is any taxon's current name", () => {
    const current = new Set(TAXA.map((taxon) => taxon.scientificName.toLowerCase()));
    const clashes = TAXA.flatMap((taxon) => taxon.synonyms.filter((synonym) => current.has(synonym.toLowerCase())));
    expect(clashes).toEqual([]);
  });
});

describe("taxa seed: coverage", () => {
  // Enough taxa for keepers to find what they ship (brief: at least 150) [practice]
  it("holds at least 150 species and subspecies", () => {
    expect(speciesLevel.length).toBeGreaterThanOrEqual(150);
  });

  // Keepers search by common name and the thermal check needs a profile group [practice]
  it("gives every species and subspecies a common name and a known profile group", () => {
    for (const taxon of speciesLevel) {
      expect(taxon.commonNames.length, taxon.scientificName).toBeGreaterThan(0);
      expect(
        taxon.commonNames.every((name) => name.trim() === name && name.length > 0),
        taxon.scientificName,
      ).toBe(true);
      expect(PROFILE_GROUPS, taxon.scientificName).toContain(taxon.profileGroup);
    }
  });

  // Salamanders, crocodilians and tortoises each share one husbandry band in the trade [practice]
  it("keeps profile groups consistent within orders and families", () => {
    const groupOf = (name: string) => resolve(name)?.profileGroup;
    for (const taxon of speciesLevel) {
      if (ancestorAt(taxon, "order")?.scientificName === "Caudata")
        expect(taxon.profileGroup, taxon.scientificName).toBe("salamander");
      if (ancestorAt(taxon, "order")?.scientificName === "Crocodylia")
        expect(taxon.profileGroup, taxon.scientificName).toBe("crocodilian");
      if (ancestorAt(taxon, "family")?.scientificName === "Testudinidae") {
        expect(["temperate_tortoise", "tropical_tortoise"], taxon.scientificName).toContain(taxon.profileGroup);
      }
    }
    expect(groupOf("Centrochelys sulcata")).toBe("tropical_tortoise");
    expect(groupOf("Testudo horsfieldii")).toBe("temperate_tortoise");
  });
});

describe("taxa seed: outside facts", () => {
  // 9 CFR 74.1 names Geochelone pardalis, Geochelone sulcata and Kinixys belliana [published]
  it("finds the 9 CFR 74.1 land tortoises under the regulation's names, in Testudinidae", () => {
    const expected = {
      "Geochelone pardalis": "Stigmochelys pardalis",
      "Geochelone sulcata": "Centrochelys sulcata",
      "Kinixys belliana": "Kinixys belliana",
    };
    for (const [printed, current] of Object.entries(expected)) {
      const taxon = resolve(printed);
      expect(taxon?.scientificName, printed).toBe(current);
      expect(ancestorAt(taxon!, "family")?.scientificName, printed).toBe("Testudinidae");
    }
  });

  // 21 CFR 1240.62(a): "order Testudinata ... except marine species (families Dermachelidae and Chelonidae)" [published]
  it("places the sea turtles in the 21 CFR 1240.62 exception families", () => {
    expect(ancestorAt(resolve("Chelonia mydas")!, "family")?.scientificName).toBe("Cheloniidae");
    expect(ancestorAt(resolve("Dermochelys coriacea")!, "family")?.scientificName).toBe("Dermochelyidae");
    expect(resolve("Chelonidae")?.scientificName).toBe("Cheloniidae");
    expect(resolve("Dermachelidae")?.scientificName).toBe("Dermochelyidae");
    expect(resolve("Testudinata")?.scientificName).toBe("Testudines");
  });

  // 16 U.S.C. 6602(3)(A) freshwater-turtle families and 6602(4)(A) marine-turtle families [published];
  // tortoises as family Testudinidae [memory]
  it("uses only turtle families that 16 U.S.C. 6602 names, plus Testudinidae", () => {
    const freshwater = [
      "Carettochelyidae",
      "Chelidae",
      "Chelydridae",
      "Dermatemydidae",
      "Emydidae",
      "Geoemydidae",
      "Kinosternidae",
      "Pelomedusidae",
      "Platysternidae",
      "Podocnemididae",
      "Trionychidae",
    ];
    const marine = ["Cheloniidae", "Dermochelyidae"];
    const turtleFamilies = TAXA.filter((taxon) => taxon.rank === "family" && taxon.parent === "Testudines");
    expect(turtleFamilies.length).toBeGreaterThan(3);
    for (const taxon of turtleFamilies) {
      expect([...freshwater, ...marine, "Testudinidae"]).toContain(taxon.scientificName);
    }
  });

  // 50 CFR 16.15(a) as amended effective 2015-04-09, names as printed in the rule [published]
  it("finds every injurious reptile of 50 CFR 16.15 under its current name or a synonym", () => {
    const printed = [
      "Boiga irregularis",
      "Python molurus",
      "Python molurus molurus",
      "Python molurus bivittatus",
      "Python sebae",
      "Python natalensis",
      "Python reticulatus",
      "Eunectes notaeus",
      "Eunectes murinus",
      "Eunectes deschauenseei",
      "Eunectes beniensis",
    ];
    for (const name of printed) {
      const taxon = resolve(name);
      expect(taxon, name).toBeDefined();
      expect(["species", "subspecies"], name).toContain(taxon!.rank);
      expect(ancestorAt(taxon!, "order")?.scientificName, name).toBe("Squamata");
    }
    expect(resolve("Python molurus bivittatus")?.scientificName).toBe("Python bivittatus");
    expect(resolve("Python reticulatus")?.scientificName).toBe("Malayopython reticulatus");
  });

  // 50 CFR 16.14 (81 FR 1534, 2016) lists genus Cynops, incl. C. orientalis and C. pyrrhogaster [published]
  it("places Cynops and its listed newts in Salamandridae", () => {
    expect(byName.get("Cynops")?.parent).toBe("Salamandridae");
    for (const name of ["Cynops orientalis", "Cynops pyrrhogaster"]) {
      expect(ancestorAt(resolve(name)!, "family")?.scientificName, name).toBe("Salamandridae");
    }
  });

  // Rattlesnakes, copperheads, cottonmouths, cobras, mambas, coral snakes: medically significant [practice]
  it("flags every Crotalus, viper and elapid species as venomous", () => {
    const front = speciesLevel.filter((taxon) =>
      ["Viperidae", "Elapidae"].includes(ancestorAt(taxon, "family")?.scientificName ?? ""),
    );
    expect(front.some((taxon) => taxon.parent === "Crotalus")).toBe(true);
    for (const taxon of front) expect(taxon.venomous, taxon.scientificName).toBe(true);
  });

  // Gila monster and beaded lizards deliver medically significant venom [practice]
  it("flags Heloderma as venomous", () => {
    const helodermas = speciesLevel.filter((taxon) => ancestorAt(taxon, "genus")?.scientificName === "Heloderma");
    expect(helodermas.length).toBeGreaterThan(0);
    for (const taxon of helodermas) expect(taxon.venomous, taxon.scientificName).toBe(true);
  });

  // Hognose bites stay local; poison frogs are poisonous, not venomous [practice]
  it("does not flag hognose snakes or poison frogs", () => {
    const harmless = speciesLevel.filter(
      (taxon) =>
        ancestorAt(taxon, "genus")?.scientificName === "Heterodon" ||
        ancestorAt(taxon, "family")?.scientificName === "Dendrobatidae",
    );
    expect(harmless.length).toBeGreaterThan(5);
    for (const taxon of harmless) expect(taxon.venomous, taxon.scientificName).toBe(false);
  });

  // A genus flagged venomous promises the flag for all its members (our data contract) [practice]
  it("flags every member of a venomous genus", () => {
    for (const taxon of speciesLevel) {
      if (ancestorAt(taxon, "genus")?.venomous) expect(taxon.venomous, taxon.scientificName).toBe(true);
    }
  });
});
