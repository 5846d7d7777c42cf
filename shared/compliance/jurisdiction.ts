import { NON_CONTINENTAL, US_STATES, type UsState } from "@shared/constants";

/** The federal jurisdiction; every other jurisdiction is a USPS state or territory code. */
export const FEDERAL = "US";

export const JURISDICTIONS = [FEDERAL, ...US_STATES] as const;
export type Jurisdiction = (typeof JURISDICTIONS)[number];

const STATE_NAMES: Record<UsState, string> = {
  AL: "Alabama",
  AK: "Alaska",
  AZ: "Arizona",
  AR: "Arkansas",
  CA: "California",
  CO: "Colorado",
  CT: "Connecticut",
  DE: "Delaware",
  FL: "Florida",
  GA: "Georgia",
  HI: "Hawaii",
  ID: "Idaho",
  IL: "Illinois",
  IN: "Indiana",
  IA: "Iowa",
  KS: "Kansas",
  KY: "Kentucky",
  LA: "Louisiana",
  ME: "Maine",
  MD: "Maryland",
  MA: "Massachusetts",
  MI: "Michigan",
  MN: "Minnesota",
  MS: "Mississippi",
  MO: "Missouri",
  MT: "Montana",
  NE: "Nebraska",
  NV: "Nevada",
  NH: "New Hampshire",
  NJ: "New Jersey",
  NM: "New Mexico",
  NY: "New York",
  NC: "North Carolina",
  ND: "North Dakota",
  OH: "Ohio",
  OK: "Oklahoma",
  OR: "Oregon",
  PA: "Pennsylvania",
  RI: "Rhode Island",
  SC: "South Carolina",
  SD: "South Dakota",
  TN: "Tennessee",
  TX: "Texas",
  UT: "Utah",
  VT: "Vermont",
  VA: "Virginia",
  WA: "Washington",
  WV: "West Virginia",
  WI: "Wisconsin",
  WY: "Wyoming",
  DC: "the District of Columbia",
  PR: "Puerto Rico",
  GU: "Guam",
  VI: "the U.S. Virgin Islands",
  AS: "American Samoa",
  MP: "the Northern Mariana Islands",
};

/** The name a keeper reads in a sentence ("Ohio", "the District of Columbia", "federal law"). */
export function jurisdictionName(jurisdiction: Jurisdiction): string {
  return jurisdiction === FEDERAL ? "federal law" : STATE_NAMES[jurisdiction];
}

const nonContinental: ReadonlySet<string> = new Set(NON_CONTINENTAL);

/**
 * True when a move between two different jurisdictions starts or ends outside the continental
 * US: the "shipment" that 18 U.S.C. 42 forbids for injurious species (USARK v. Zinke).
 */
export function leavesContinentalUs(origin: UsState, destination: UsState): boolean {
  return origin !== destination && (nonContinental.has(origin) || nonContinental.has(destination));
}
