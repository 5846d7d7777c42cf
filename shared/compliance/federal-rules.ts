import type { Rule } from "./rule";
import { ANY_TAXON } from "./taxon";

const REVIEW = { reviewedOn: "2026-12-01", reviewedBy: "Hatchway seed", demo: false } as const;
const ecfr = (title: number, section: string) => `https://www.ecfr.gov/current/title-${title}/section-${section}`;

/** Both spellings: the CFR text writes "Testudinata" and "Chelonidae"/"Dermachelidae". */
const TURTLES = ["Testudines", "Testudinata"];
const SEA_TURTLES = ["Cheloniidae", "Dermochelyidae", "Chelonidae", "Dermachelidae"];
const HERPTILES = ["Reptilia", "Amphibia"];

/**
 * Reptiles listed as injurious in 50 CFR 16.15, with the names the trade also uses for them
 * (Python molurus includes P. bivittatus; the reticulated python is now Malayopython).
 */
const INJURIOUS_REPTILES = [
  "Boiga irregularis",
  "Python molurus",
  "Python bivittatus",
  "Python molurus bivittatus",
  "Python sebae",
  "Python natalensis",
  "Python reticulatus",
  "Malayopython reticulatus",
  "Broghammerus reticulatus",
  "Eunectes notaeus",
  "Eunectes murinus",
  "Eunectes deschauenseei",
  "Eunectes beniensis",
];

/**
 * The 20 salamander genera of the 2016 listing (81 FR 1534), affirmed in 2025 (90 FR 2170).
 * Chioglossa and Cynops were read in the published species list [published]; the other genera
 * are from memory of the same rule [memory] and must be checked against 50 CFR 16.14 before
 * the library leaves seed status. The 16 genera added in 2025 are not encoded (not verified).
 */
const INJURIOUS_SALAMANDER_GENERA = [
  "Chioglossa",
  "Cynops",
  "Euproctus",
  "Hydromantes",
  "Hynobius",
  "Ichthyosaura",
  "Lissotriton",
  "Neurergus",
  "Notophthalmus",
  "Onychodactylus",
  "Paramesotriton",
  "Plethodon",
  "Pleurodeles",
  "Salamandra",
  "Salamandrella",
  "Salamandrina",
  "Siren",
  "Taricha",
  "Triturus",
  "Tylototriton",
];

/**
 * A few endangered or threatened reptiles commonly kept, with older names. [memory]: their
 * listing status must be checked against 50 CFR 17.11 before the library leaves seed status.
 */
const ESA_LISTED_REPTILES = [
  "Astrochelys radiata",
  "Geochelone radiata",
  "Astrochelys yniphora",
  "Geochelone yniphora",
  "Chelonoidis nigra",
  "Geochelone nigra",
  "Chilabothrus subflavus",
  "Epicrates subflavus",
  "Drymarchon couperi",
  "Drymarchon corais couperi",
];

/** Federal rules of the seed rule library, with their citations, scopes and exceptions. */
export const FEDERAL_RULES: readonly Rule[] = [
  {
    id: "us-21cfr1240.62-small-turtles",
    version: 1,
    jurisdiction: "US",
    governs: "movement",
    selector: { taxa: TURTLES, exceptTaxa: SEA_TURTLES },
    conditions: { sale: true, lengthBelowMm: 101.6, exceptPurposes: ["education_exhibition", "scientific"] },
    effect: { kind: "prohibited" },
    summary:
      "Live turtles and tortoises with a shell (carapace) shorter than 4 inches (101.6 mm), and viable turtle eggs, may not be sold or distributed commercially, within a state or across state lines. Sea turtles are outside this rule, and bona fide scientific, educational or exhibition use other than as pets, sales not in connection with a business, and export are exempt.",
    citation: {
      text: "21 CFR 1240.62(a), (b): turtles intrastate and interstate requirements, with the exceptions of the same section",
      url: ecfr(21, "1240.62"),
    },
    effectiveFrom: null,
    effectiveTo: null,
    ...REVIEW,
  },
  {
    id: "us-9cfr74.1-land-tortoises",
    version: 1,
    jurisdiction: "US",
    governs: "interstate",
    selector: {
      taxa: [
        "Geochelone pardalis",
        "Stigmochelys pardalis",
        "Geochelone sulcata",
        "Centrochelys sulcata",
        "Kinixys belliana",
      ],
    },
    conditions: {},
    effect: {
      kind: "certificate_required",
      withinDays: 30,
      statements: ["examined and found free of ticks"],
      accreditedVeterinarian: true,
      namesSpecies: true,
    },
    summary:
      "Leopard, African spurred and Bell's hinge-back tortoises may cross a state line only with a health certificate or CVI signed by an accredited veterinarian within 30 days before the move, stating that the tortoises were examined and found free of ticks.",
    citation: {
      text: "9 CFR 74.1: prohibition of interstate movement of land tortoises (66 FR 37128)",
      url: ecfr(9, "74.1"),
    },
    effectiveFrom: "2001-07-17",
    effectiveTo: null,
    ...REVIEW,
  },
  {
    id: "us-50cfr14.81-container-marking",
    version: 1,
    jurisdiction: "US",
    governs: "interstate",
    selector: { taxa: [ANY_TAXON] },
    conditions: {},
    effect: { kind: "packing" },
    summary:
      "Mark the outside of each box with the name and address of the shipper and of the consignee, and send with it a list of the contents by scientific name, with the number of each species and whether it is venomous.",
    citation: {
      text: "50 CFR 14.81 (marking of containers or packages); the alternative marking in 50 CFR 14.82(a)(1)",
      url: ecfr(50, "14.81"),
    },
    effectiveFrom: null,
    effectiveTo: null,
    ...REVIEW,
  },
  {
    id: "us-16usc3372-lacey-act",
    version: 1,
    jurisdiction: "US",
    governs: "interstate",
    selector: { taxa: [ANY_TAXON] },
    conditions: {},
    effect: { kind: "advisory" },
    summary:
      "Under the Lacey Act, moving an animal across state lines is a federal offence if it was taken, held, moved or sold against any state's law, and captive-bred animals count as wildlife: every state finding here matters federally too.",
    citation: {
      text: "Lacey Act, 16 U.S.C. 3371 (definition of wildlife) and 3372(a)(2)(A)",
      url: "https://www.law.cornell.edu/uscode/text/16/3372",
    },
    effectiveFrom: null,
    effectiveTo: null,
    ...REVIEW,
  },
  {
    id: "us-18usc42-injurious-reptiles",
    version: 1,
    jurisdiction: "US",
    governs: "interstate",
    selector: { taxa: INJURIOUS_REPTILES },
    conditions: { routeLeavesContinental: true },
    effect: {
      kind: "prohibited",
      unlessPermit: { documentKinds: ["federal_permit"], holder: "either", namesSpecies: true },
    },
    summary:
      "This snake is listed as injurious wildlife: it may not be shipped between the continental US and Hawaii, the District of Columbia, Puerto Rico or a US territory without a federal permit for zoological, educational, medical or scientific purposes. Moves between two continental states are not covered by this rule.",
    citation: {
      text: "18 U.S.C. 42; 50 CFR 16.15; scope: U.S. Ass'n of Reptile Keepers v. Zinke, 852 F.3d 1131 (D.C. Cir. 2017)",
      url: "https://www.law.cornell.edu/uscode/text/18/42",
    },
    effectiveFrom: null,
    effectiveTo: null,
    ...REVIEW,
  },
  {
    id: "us-50cfr16.14-injurious-salamanders",
    version: 1,
    jurisdiction: "US",
    governs: "interstate",
    selector: { taxa: INJURIOUS_SALAMANDER_GENERA },
    conditions: { routeLeavesContinental: true },
    effect: {
      kind: "prohibited",
      unlessPermit: { documentKinds: ["federal_permit"], holder: "either", namesSpecies: true },
    },
    summary:
      "Salamanders of this genus are listed as injurious (salamander chytrid fungus): they may not be shipped between the continental US and Hawaii, the District of Columbia, Puerto Rico or a US territory without a federal permit for zoological, educational, medical or scientific purposes.",
    citation: {
      text: "50 CFR 16.14; 81 FR 1534 (2016 interim rule, 20 genera); 90 FR 2170 (2025 final rule)",
      url: ecfr(50, "16.14"),
    },
    effectiveFrom: "2016-01-28",
    effectiveTo: null,
    ...REVIEW,
  },
  {
    id: "us-50cfr17.21-endangered-commerce",
    version: 1,
    jurisdiction: "US",
    governs: "interstate",
    selector: { taxa: ESA_LISTED_REPTILES },
    conditions: { sale: true },
    effect: {
      kind: "permit_required",
      permit: { documentKinds: ["federal_permit", "captive_bred_registration"], holder: "either", namesSpecies: true },
    },
    summary:
      "This species is listed under the Endangered Species Act: delivering or selling it across state lines in the course of a commercial activity needs a federal permit or a captive-bred wildlife registration.",
    citation: { text: "50 CFR 17.21(e)-(g) and 17.31 (endangered and threatened wildlife)", url: ecfr(50, "17.21") },
    effectiveFrom: null,
    effectiveTo: null,
    ...REVIEW,
  },
  {
    id: "us-9cfr1.1-no-transport-standard",
    version: 1,
    jurisdiction: "US",
    governs: "movement",
    selector: { taxa: HERPTILES },
    conditions: {},
    effect: { kind: "advisory" },
    summary:
      "No federal humane-transport standard covers reptiles or amphibians: the Animal Welfare Act rules cover warm-blooded animals only, and the 1998 proposal to extend them was withdrawn. Packing and temperature care are up to you and your carrier.",
    citation: { text: "9 CFR 1.1 (definition of animal); 63 FR 45444 (withdrawal, 1998)", url: ecfr(9, "1.1") },
    effectiveFrom: null,
    effectiveTo: null,
    ...REVIEW,
  },
];
