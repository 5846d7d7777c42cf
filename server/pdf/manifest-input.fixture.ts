import type { ManifestAnimal, ManifestBox, ManifestInput } from "./manifest-input";

/*
 * Invented demo data for the PDF tests and the benchmark: the organisations, people, addresses,
 * phone numbers (555-01xx, reserved for fiction) and permit numbers do not exist. The taxa are
 * real, with their scientific names; venomous flags follow the species.
 */

const TAXA: Pick<ManifestAnimal, "scientificName" | "commonName" | "venomous">[] = [
  { scientificName: "Pantherophis guttatus", commonName: "Corn snake", venomous: false },
  { scientificName: "Python regius", commonName: "Ball python", venomous: false },
  { scientificName: "Lampropeltis californiae", commonName: "California kingsnake", venomous: false },
  { scientificName: "Eublepharis macularius", commonName: "Leopard gecko", venomous: false },
  { scientificName: "Correlophus ciliatus", commonName: "Crested gecko", venomous: false },
  { scientificName: "Pogona vitticeps", commonName: "Central bearded dragon", venomous: false },
  { scientificName: "Ambystoma mexicanum", commonName: "Axolotl", venomous: false },
  { scientificName: "Dendrobates tinctorius", commonName: "Dyeing poison frog", venomous: false },
  { scientificName: "Terrapene carolina", commonName: "Eastern box turtle", venomous: false },
  { scientificName: "Crotalus atrox", commonName: "Western diamondback rattlesnake", venomous: true },
  { scientificName: "Agkistrodon contortrix", commonName: "Eastern copperhead", venomous: true },
  { scientificName: "Heloderma suspectum", commonName: "Gila monster", venomous: true },
];

const SEXES = ["male", "female", "unknown"] as const;
const ORIGINS = ["captive_bred", "captive_hatched", "long_term_captive"] as const;

/** The `i`-th demo animal line: taxa, sexes and origins cycle so every box mixes them. */
export function buildAnimal(i: number, overrides: Partial<ManifestAnimal> = {}): ManifestAnimal {
  const taxon = TAXA[i % TAXA.length] ?? TAXA[0]!;
  return {
    ...taxon,
    count: 1,
    sex: SEXES[i % SEXES.length] ?? "unknown",
    identifier: `PH-${String(1000 + i)}`,
    origin: ORIGINS[i % ORIGINS.length] ?? "captive_bred",
    lengthMm: 120 + ((i * 37) % 600),
    weightG: 15 + ((i * 53) % 900),
    notes: i % 4 === 0 ? "Fed 5 days before shipping; shed 2 weeks ago." : null,
    ...overrides,
  };
}

/** `boxCount` boxes of `animalsPerBox` single-animal lines each, numbered 1..boxCount. */
export function buildBoxes(boxCount: number, animalsPerBox: number): ManifestBox[] {
  return Array.from({ length: boxCount }, (_, b) => ({
    id: `box-${b + 1}`,
    label: `Shipping box ${String.fromCharCode(65 + (b % 26))}`,
    index: b + 1,
    lengthMm: 400,
    widthMm: 300,
    heightMm: 250,
    insulation: { material: "eps" as const, wallThicknessMm: 25 },
    pack: b % 2 === 0 ? ("heat_40h" as const) : ("none" as const),
    sealNumber: `S-${String(48210 + b)}`,
    animals: Array.from({ length: animalsPerBox }, (_, a) => buildAnimal(b * animalsPerBox + a)),
  }));
}

/** A complete demo manifest input (3 boxes, 9 animal lines) with shallow overrides. */
export function buildManifestInput(overrides: Partial<ManifestInput> = {}): ManifestInput {
  return {
    transferNumber: "HW-2026-0042",
    mode: "overnight_air",
    purpose: "education_exhibition",
    plannedDeparture: { at: "2026-04-14T21:30:00Z", tz: "America/Chicago" },
    expectedArrival: { at: "2026-04-15T14:30:00Z", tz: "America/New_York" },
    sender: {
      organisation: "Prairie Hollow Herpetoculture (demo)",
      contactName: "Dana Whitlock",
      street: "1487 Larkspur Road",
      city: "Dayton",
      state: "OH",
      zip: "45402",
      phone24h: "(937) 555-0142",
      email: "dana@prairiehollow.example",
    },
    receiver: {
      organisation: "Cedar Bluff Nature Center (demo)",
      contactName: "Marcus Ellery",
      street: "22 Old Mill Lane",
      city: "Asheville",
      state: "NC",
      zip: "28801",
      phone24h: "(828) 555-0177",
      email: "m.ellery@cedarbluff.example",
    },
    couriers: [{ name: "Renata Vosk", organisation: "Bluegrass Ground Couriers (demo)", phone: "(859) 555-0109" }],
    boxes: buildBoxes(3, 3),
    documents: [
      {
        kind: "state_import_permit",
        number: "NC-WRC-IMP-26-0318",
        issuer: "North Carolina (demo issuer)",
        holder: "Cedar Bluff Nature Center (demo)",
        validFrom: "2026-01-01",
        validTo: "2026-12-31",
      },
      {
        kind: "cvi",
        number: "CVI-OH-889-2041",
        issuer: "Dr. L. Farrow, accredited veterinarian (demo)",
        holder: "Prairie Hollow Herpetoculture (demo)",
        validFrom: "2026-04-02",
        validTo: "2026-05-02",
      },
    ],
    temperature: {
      advice: "Highs of 62–66 °F at both ends: add one 40-hour heat pack taped to the lid.",
      safeRangeF: { minF: 65, maxF: 85 },
      packingNotes: "Each animal in its own deli cup or cloth bag; crumpled paper fills the gaps.",
    },
    verdicts: [
      {
        check: "compliance",
        headline: "UNVERIFIED",
        short: "UNVERIFIED",
        tone: "caution",
        detail:
          "No rule in Hatchway's library stops these animals, but the rules of Ohio and North Carolina have not been reviewed.",
        checkedAt: "2026-04-13T19:05:00Z",
        tz: "America/New_York",
      },
      {
        check: "temperature",
        headline: "Forecast checked: ship with the packing advised",
        short: "pack as advised",
        tone: "ok",
        detail: "Add one 40-hour heat pack taped to the lid.",
        checkedAt: "2026-04-13T18:00:00Z",
        tz: "America/New_York",
      },
    ],
    handlingNotes: "Venomous animals are double-contained in locked inner boxes.",
    emergencyContacts: [{ name: "Dr. L. Farrow (demo)", role: "Sender's veterinarian", phone: "(937) 555-0188" }],
    handoffUrl: "https://hatchway.example/handoff/HW-2026-0042?k=7f3a9c2e",
    generatedAt: "2026-04-13T19:05:00Z",
    generatedTz: "America/Chicago",
    ...overrides,
  };
}
