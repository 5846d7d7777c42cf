import type { Rule, StateTransitPolicy } from "./rule";
import { DEMO_RULE_NOTICE } from "./rule";

const DEMO = { reviewedOn: "2026-12-01", reviewedBy: "Hatchway seed", demo: true } as const;
const IN_FORCE = { effectiveFrom: null, effectiveTo: null } as const;
const demoCitation = (what: string) => ({
  text: `Invented for the Hatchway demo (${what}): ${DEMO_RULE_NOTICE}.`,
  url: null,
});

/**
 * Every snake: the suborder, and the snake families in case a taxonomy source leaves the
 * suborder out of the lineage.
 */
const SNAKES = [
  "Serpentes",
  "Acrochordidae",
  "Aniliidae",
  "Anomalepididae",
  "Anomochilidae",
  "Atractaspididae",
  "Boidae",
  "Bolyeriidae",
  "Calamariidae",
  "Candoiidae",
  "Charinidae",
  "Colubridae",
  "Cyclocoridae",
  "Cylindrophiidae",
  "Dipsadidae",
  "Elapidae",
  "Erycidae",
  "Gerrhopilidae",
  "Homalopsidae",
  "Lamprophiidae",
  "Leptotyphlopidae",
  "Loxocemidae",
  "Natricidae",
  "Pareidae",
  "Prosymnidae",
  "Psammophiidae",
  "Pseudaspididae",
  "Pseudoxenodontidae",
  "Pseudoxyrhophiidae",
  "Pythonidae",
  "Sanziniidae",
  "Sibynophiidae",
  "Tropidophiidae",
  "Typhlopidae",
  "Uropeltidae",
  "Viperidae",
  "Xenodermidae",
  "Xenopeltidae",
  "Xenophidiidae",
  "Xenotyphlopidae",
];

/**
 * Demo state rules (one of each effect kind, over ten states) and Hawaii's published bans on live
 * snakes and Gila monsters (HRS 150A-6(3), read in a stored copy of the statute [published]).
 * Everything marked demo is invented and says so in its citation.
 */
export const STATE_RULES: readonly Rule[] = [
  {
    id: "hi-hrs150a-6-live-snakes",
    version: 1,
    jurisdiction: "HI",
    governs: "import",
    selector: { taxa: SNAKES },
    conditions: {},
    effect: { kind: "prohibited" },
    summary:
      "Hawaii forbids bringing any live snake into the state; the only exceptions are for the state's own research and government zoos.",
    citation: {
      text: "Hawaii Revised Statutes 150A-6(3): importation of any live snake prohibited",
      url: "https://www.capitol.hawaii.gov/hrscurrent/Vol03_Ch0121-0200D/HRS0150A/HRS_0150A-0006.htm",
    },
    ...IN_FORCE,
    reviewedOn: "2026-12-01",
    reviewedBy: "Hatchway seed",
    demo: false,
  },
  {
    id: "hi-hrs150a-6-gila-monster",
    version: 1,
    jurisdiction: "HI",
    governs: "import",
    selector: { taxa: ["Heloderma suspectum"] },
    conditions: {},
    effect: { kind: "prohibited" },
    summary: "Hawaii forbids bringing a live Gila monster into the state.",
    citation: {
      text: "Hawaii Revised Statutes 150A-6(3): importation of any live snake, flying fox, fruit bat, Gila monster … prohibited",
      url: "https://www.capitol.hawaii.gov/hrscurrent/Vol03_Ch0121-0200D/HRS0150A/HRS_0150A-0006.htm",
    },
    ...IN_FORCE,
    reviewedOn: "2026-12-02",
    reviewedBy: "Hatchway seed",
    demo: false,
  },
  {
    id: "demo-oh-import-venomous-snakes",
    version: 1,
    jurisdiction: "OH",
    governs: "import",
    selector: { taxa: SNAKES },
    conditions: { venomous: true },
    effect: {
      kind: "permit_required",
      permit: { documentKinds: ["state_import_permit"], holder: "receiver", namesSpecies: true },
    },
    summary:
      "Demo rule: bringing a venomous snake into Ohio needs an Ohio import permit naming the species, held by the receiver.",
    citation: demoCitation("import permit for venomous snakes"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-tx-possession-large-constrictors",
    version: 1,
    jurisdiction: "TX",
    governs: "possession",
    selector: { taxa: ["Pythonidae", "Boidae"] },
    conditions: { lengthAboveMm: 2400 },
    effect: {
      kind: "permit_required",
      permit: { documentKinds: ["possession_permit"], holder: "receiver", namesSpecies: true },
    },
    summary:
      "Demo rule: keeping a python or boa longer than 2,400 mm (about 8 ft) in Texas needs a possession permit naming the species.",
    citation: demoCitation("possession permit for large constrictors"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-ga-import-chelonian-cvi",
    version: 1,
    jurisdiction: "GA",
    governs: "import",
    selector: { taxa: ["Testudines"] },
    conditions: {},
    effect: {
      kind: "certificate_required",
      withinDays: 10,
      statements: ["examined and found free of signs of infectious disease"],
      accreditedVeterinarian: true,
      namesSpecies: false,
    },
    summary: "Demo rule: turtles and tortoises coming into Georgia need a CVI issued within 10 days before the move.",
    citation: demoCitation("CVI for imported turtles and tortoises"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-pa-import-wild-box-turtles",
    version: 1,
    jurisdiction: "PA",
    governs: "import",
    selector: { taxa: ["Terrapene"] },
    conditions: { origins: ["wild_caught"] },
    effect: { kind: "prohibited" },
    summary:
      "Demo rule: wild-caught box turtles (genus Terrapene, native to the state) may not be brought into Pennsylvania.",
    citation: demoCitation("ban on a native genus"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-az-export-heloderma",
    version: 1,
    jurisdiction: "AZ",
    governs: "export",
    selector: { taxa: ["Heloderma"] },
    conditions: {},
    effect: {
      kind: "permit_required",
      permit: { documentKinds: ["export_permit"], holder: "sender", namesSpecies: true },
    },
    summary:
      "Demo rule: sending a Gila monster or beaded lizard out of Arizona needs an Arizona export permit naming the species, held by the sender.",
    citation: demoCitation("export permit for a native genus"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-ca-import-amphibian-advisory",
    version: 1,
    jurisdiction: "CA",
    governs: "import",
    selector: { taxa: ["Amphibia"] },
    conditions: {},
    effect: { kind: "advisory" },
    summary:
      "Demo rule: California may inspect amphibian shipments for chytrid fungus; keep the animals' health records with the box.",
    citation: demoCitation("advisory"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-nc-import-bulk-salamanders",
    version: 1,
    jurisdiction: "NC",
    governs: "import",
    selector: { taxa: ["Caudata"] },
    conditions: { countAbove: 25 },
    effect: {
      kind: "certificate_required",
      withinDays: 30,
      statements: [],
      accreditedVeterinarian: false,
      namesSpecies: true,
    },
    summary:
      "Demo rule: more than 25 salamanders of one kind coming into North Carolina need a health certificate issued within 30 days naming the species.",
    citation: demoCitation("certificate above a count"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-mi-possession-breeding-sliders",
    version: 1,
    jurisdiction: "MI",
    governs: "possession",
    selector: { taxa: ["Trachemys scripta"] },
    conditions: { sexes: ["female"], purposes: ["breeding"] },
    effect: {
      kind: "permit_required",
      permit: { documentKinds: ["possession_permit"], holder: "receiver", namesSpecies: true },
    },
    summary:
      "Demo rule: keeping female sliders for breeding in Michigan needs a possession licence naming the species.",
    citation: demoCitation("possession licence by sex and purpose"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-fl-transit-venomous-notice",
    version: 1,
    jurisdiction: "FL",
    governs: "transit",
    selector: { taxa: [...SNAKES, "Heloderma"] },
    conditions: { venomous: true },
    effect: { kind: "advisory" },
    summary:
      "Demo rule: a venomous animal driven through Florida must stay in a locked, labelled container for the whole time it is in the state.",
    citation: demoCitation("transit notice"),
    ...IN_FORCE,
    ...DEMO,
  },
  {
    id: "demo-ny-import-crocodilians",
    version: 1,
    jurisdiction: "NY",
    governs: "import",
    selector: { taxa: ["Crocodylia"] },
    conditions: {},
    effect: {
      kind: "prohibited",
      unlessPermit: { documentKinds: ["state_import_permit"], holder: "receiver", namesSpecies: true },
    },
    summary:
      "Demo rule: crocodilians may come into New York only under a New York import permit naming the species, held by the receiver.",
    citation: demoCitation("ban lifted by permit"),
    ...IN_FORCE,
    ...DEMO,
  },
];

/** Per-state transit settings; a state not listed here applies its import rules to transit too. */
export const STATE_TRANSIT_POLICIES: readonly StateTransitPolicy[] = [
  {
    state: "OH",
    transitOnlyExempt: true,
    citation: {
      text: "Ohio Rev. Code 1533.31: a shipment merely passing through Ohio by carrier is outside the state's import rules",
      url: "https://codes.ohio.gov/ohio-revised-code/section-1533.31",
    },
    demo: false,
  },
];
