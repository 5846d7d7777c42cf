import type { LineageRank, ResolvedTaxon } from "./taxon";

type Lineage = readonly (readonly [LineageRank, string])[];

function resolved(lineage: Lineage, synonyms: readonly string[] = [], venomous = false): ResolvedTaxon {
  const own = lineage[lineage.length - 1];
  if (!own) throw new Error("a lineage ends with the taxon itself");
  return {
    scientificName: own[1],
    rank: own[0],
    lineage: lineage.map(([rank, scientificName]) => ({ rank, scientificName })),
    synonyms: [...synonyms],
    venomous,
  };
}

const TURTLE: Lineage = [
  ["class", "Reptilia"],
  ["order", "Testudines"],
];
const TORTOISE: Lineage = [...TURTLE, ["family", "Testudinidae"]];
const SNAKE: Lineage = [
  ["class", "Reptilia"],
  ["order", "Squamata"],
  ["suborder", "Serpentes"],
];
const LIZARD: Lineage = [
  ["class", "Reptilia"],
  ["order", "Squamata"],
];
const SALAMANDER: Lineage = [
  ["class", "Amphibia"],
  ["order", "Caudata"],
];

/**
 * Resolved taxa for demos, tests and benchmarks, shaped as the server's species lookup returns
 * them. Real taxa; lineages and synonyms as in The Reptile Database and Amphibian Species of the
 * World [memory].
 */
export const DEMO_TAXA = {
  leopardTortoise: resolved(
    [...TORTOISE, ["genus", "Stigmochelys"], ["species", "Stigmochelys pardalis"]],
    ["Geochelone pardalis"],
  ),
  sulcataTortoise: resolved(
    [...TORTOISE, ["genus", "Centrochelys"], ["species", "Centrochelys sulcata"]],
    ["Geochelone sulcata"],
  ),
  bellsHingeback: resolved([...TORTOISE, ["genus", "Kinixys"], ["species", "Kinixys belliana"]]),
  radiatedTortoise: resolved(
    [...TORTOISE, ["genus", "Astrochelys"], ["species", "Astrochelys radiata"]],
    ["Geochelone radiata"],
  ),
  redEaredSlider: resolved(
    [
      ...TURTLE,
      ["family", "Emydidae"],
      ["genus", "Trachemys"],
      ["species", "Trachemys scripta"],
      ["subspecies", "Trachemys scripta elegans"],
    ],
    ["Pseudemys scripta elegans"],
  ),
  easternBoxTurtle: resolved([
    ...TURTLE,
    ["family", "Emydidae"],
    ["genus", "Terrapene"],
    ["species", "Terrapene carolina"],
  ]),
  greenSeaTurtle: resolved([
    ...TURTLE,
    ["family", "Cheloniidae"],
    ["genus", "Chelonia"],
    ["species", "Chelonia mydas"],
  ]),
  leatherback: resolved([
    ...TURTLE,
    ["family", "Dermochelyidae"],
    ["genus", "Dermochelys"],
    ["species", "Dermochelys coriacea"],
  ]),
  burmesePython: resolved(
    [...SNAKE, ["family", "Pythonidae"], ["genus", "Python"], ["species", "Python bivittatus"]],
    ["Python molurus bivittatus"],
  ),
  reticulatedPython: resolved(
    [...SNAKE, ["family", "Pythonidae"], ["genus", "Malayopython"], ["species", "Malayopython reticulatus"]],
    ["Python reticulatus", "Broghammerus reticulatus"],
  ),
  ballPython: resolved([...SNAKE, ["family", "Pythonidae"], ["genus", "Python"], ["species", "Python regius"]]),
  cornSnake: resolved(
    [...SNAKE, ["family", "Colubridae"], ["genus", "Pantherophis"], ["species", "Pantherophis guttatus"]],
    ["Elaphe guttata"],
  ),
  westernDiamondback: resolved(
    [...SNAKE, ["family", "Viperidae"], ["genus", "Crotalus"], ["species", "Crotalus atrox"]],
    [],
    true,
  ),
  gilaMonster: resolved(
    [...LIZARD, ["family", "Helodermatidae"], ["genus", "Heloderma"], ["species", "Heloderma suspectum"]],
    [],
    true,
  ),
  beardedDragon: resolved([...LIZARD, ["family", "Agamidae"], ["genus", "Pogona"], ["species", "Pogona vitticeps"]]),
  orientalFireBelliedNewt: resolved([
    ...SALAMANDER,
    ["family", "Salamandridae"],
    ["genus", "Cynops"],
    ["species", "Cynops orientalis"],
  ]),
  axolotl: resolved([
    ...SALAMANDER,
    ["family", "Ambystomatidae"],
    ["genus", "Ambystoma"],
    ["species", "Ambystoma mexicanum"],
  ]),
  dyeingDartFrog: resolved([
    ["class", "Amphibia"],
    ["order", "Anura"],
    ["family", "Dendrobatidae"],
    ["genus", "Dendrobates"],
    ["species", "Dendrobates tinctorius"],
  ]),
  americanAlligator: resolved([
    ["class", "Reptilia"],
    ["order", "Crocodylia"],
    ["family", "Alligatoridae"],
    ["genus", "Alligator"],
    ["species", "Alligator mississippiensis"],
  ]),
} as const satisfies Record<string, ResolvedTaxon>;
