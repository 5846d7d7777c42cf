/**
 * The names of the fields people fill in, as a message or the change history says them:
 * "Box 2 wall thickness", "Origin ZIP code", "Animal line 3 weight". Keys are the API's
 * field names; a key missing here is a gap the vocabulary test reports.
 */

/** A field's own name, lower-case, as it reads after a group ("box 2 …") or at the start of a sentence. */
export const FIELD_WORDS: Readonly<Record<string, string>> = {
  // the keeper's register (issue 15)
  ids: "chosen animals",
  registerEntryId: "register entry",
  acquiredOn: "day acquired",
  acquiredHow: "how it was acquired",
  permitIds: "permits",
  startQuarantine: "quarantine",
  counterparty: "to or from whom",
  permitNumber: "permit number",
  cause: "cause",
  corrects: "event corrected",
  on: "date",
  reportStartMonth: "first month of the reporting year",
  reportDueMonth: "month the report is due",
  reportDueDay: "day the report is due",
  quarantineDays: "quarantine length in days",
  overrides: "quarantine lengths by genus or species",
  days: "days",
  species: "species",
  permitId: "permit",
  quarantine: "in quarantine",
  format: "format",
  // people and organisations
  name: "name",
  kind: "kind",
  address: "address",
  street: "street",
  city: "city",
  state: "state",
  zip: "ZIP code",
  phone: "phone number",
  email: "e-mail address",
  password: "password",
  confirm: "password typed again",
  token: "link from the e-mail",
  organization: "organisation",
  user: "first person",
  organizationName: "organisation name",
  currentPassword: "current password",
  newPassword: "new password",
  listed: "listing in the directory",
  invitation: "invitation link",
  mail: "e-mail choices",
  displayName: "name",
  role: "role",
  organizationId: "organisation",
  disabled: "account switched off",
  // the transfer
  receiverOrganizationId: "receiving organisation",
  receiverContactId: "receiver's contact",
  origin: "origin",
  destination: "destination",
  mode: "how it travels",
  plannedDepartureAt: "planned departure",
  expectedArrivalAt: "planned arrival",
  purpose: "purpose",
  sale: "sale",
  salePriceUsd: "sale price",
  handlingNotes: "handling notes",
  privateNotes: "private notes",
  containers: "boxes",
  animals: "animal lines",
  version: "version",
  to: "next state",
  reason: "reason",
  override: "override",
  overrideGates: "blocks the override answers",
  body: "message",
  // boxes
  key: "reference",
  label: "label",
  lengthMm: "length",
  widthMm: "width",
  heightMm: "height",
  wallMaterial: "wall material",
  wall: "wall material",
  wallThicknessMm: "wall thickness",
  pack: "pack",
  sealNumber: "seal number",
  contentsG: "weight of the contents",
  // animals
  taxonId: "species",
  taxon: "species",
  scientificName: "species",
  count: "number of animals",
  sex: "sex",
  identifier: "identifier",
  identifierKind: "kind of identifier",
  lengthKind: "how the length was measured",
  weightG: "weight",
  hatchDate: "hatch date",
  notes: "notes",
  note: "note",
  reference: "reference number",
  confirmedAt: "time it was confirmed on the phone",
  containerKey: "box it travels in",
  // couriers and handoffs
  legs: "legs",
  courierId: "courier",
  fromLabel: "where the leg starts",
  toLabel: "where the leg ends",
  handoffIndex: "handoff",
  boxesCounted: "boxes counted",
  seals: "seals",
  containerId: "box",
  intact: "seal intact",
  boxTempF: "box temperature",
  place: "place",
  text: "description",
  lat: "latitude",
  lon: "longitude",
  accuracyM: "accuracy",
  releasedByName: "name of the person handing over",
  receivedByName: "name of the person taking over",
  acknowledged: "confirmation",
  reasons: "reasons",
  earlyPickup: "early pickup",
  implausibleSpeed: "distance for the time",
  unexpectedParty: "person taking over",
  receiverCode: "receiver's one-time code",
  // photos
  moment: "moment",
  subject: "what it shows",
  caption: "caption",
  // check-in
  items: "outcomes",
  animalId: "listed animal",
  arrivedWell: "number that arrived well",
  arrivedProblem: "number that arrived with a problem",
  deadOnArrival: "number dead on arrival",
  missing: "number missing",
  problem: "problem",
  extras: "animals not listed",
  signedName: "signature",
  // lists and searches
  status: "state",
  departFrom: "earliest departure",
  departTo: "latest departure",
  q: "search",
  sort: "sort order",
  dir: "sort direction",
  cursor: "page link",
  limit: "page size",
  from: "first date",
  // permits, certificates and rules
  documentId: "document",
  documents: "documents",
  transferId: "transfer",
  jurisdiction: "issuing jurisdiction",
  number: "number",
  holderName: "holder's name",
  holderSide: "holder",
  validFrom: "first valid day",
  validTo: "last valid day",
  issuedOn: "issue date",
  speciesCovered: "species covered",
  veterinarianName: "veterinarian's name",
  veterinarianAccredited: "accredited veterinarian",
  inspectionDate: "inspection date",
  statements: "statements",
  animalsCovered: "animals covered",
  originState: "origin state",
  destinationState: "destination state",
  transitStates: "states on the way",
  shipDate: "ship date",
  rule: "rule",
  retired: "retired",
  id: "reference",
  governs: "what the rule governs",
  selector: "species",
  taxa: "species",
  exceptTaxa: "species left out",
  conditions: "conditions",
  effect: "effect",
  summary: "summary",
  citation: "citation",
  url: "link",
  effectiveFrom: "first day in force",
  effectiveTo: "last day in force",
  reviewedOn: "review date",
  reviewedBy: "reviewer",
  demo: "demo rule",
  origins: "origins",
  purposes: "purposes",
  exceptPurposes: "purposes left out",
  lengthBelowMm: "length below",
  lengthAboveMm: "length above",
  countAbove: "count above",
  sexes: "sexes",
  venomous: "venomous",
  routeLeavesContinental: "route leaving the continental US",
  permit: "permit",
  unlessPermit: "permit that lifts it",
  documentKinds: "kinds of document",
  holder: "holder",
  namesSpecies: "names the species",
  withinDays: "days before the ship date",
  accreditedVeterinarian: "accredited veterinarian",
  rank: "rank",
  lineage: "lineage",
  synonyms: "older names",
  // temperature
  hub: "air hub",
  departAt: "departure",
  profile: "temperature profile",
  box: "box",
  ambientOverrideF: "steady outside temperature",
  at: "time",
  tempF: "temperature",
  animalClass: "guideline column",
  safeTransitF: "safe range",
  min: "lowest",
  max: "highest",
  bandsF: "guideline bands",
  doNotShipBelow: "do not ship below",
  heatPackBelow: "heat pack below",
  coldPackFrom: "cold pack from",
  holdFrom: "hold from",
  doNotShipAbove: "do not ship above",
  source: "source",
  scenario: "weather scenario",
  vehicle: "vehicle",
  vehicleRangeF: "vehicle's set range",
  stops: "planned stops",
  durationMin: "length of the stop",
  parked: "where it waits",
  legId: "leg",
  // runs (issue 16)
  climateControlled: "climate-controlled van",
  transferIds: "transfers",
  addTransferIds: "transfers to add",
  removeTransferIds: "transfers to remove",
  driverIds: "drivers",
  // answers the API gives (their schemas are walked too)
  transitOnlyExempt: "exempt when only passing through",
  ruleId: "rule",
  ruleVersion: "rule version",
  severity: "severity",
  message: "message",
  satisfiedBy: "document that satisfies it",
  verdict: "verdict",
  findings: "findings",
  rulesUsed: "rules used",
  advice: "advice",
  code: "code",
  ambientF: "outside temperature",
  insideF: "inside temperature",
  hoursOutsideRange: "hours outside the safe range",
  hours: "hours",
  suggestedDeparture: "suggested departure",
  exposure: "where the box is",
  aroundBoxF: "air around the box",
  sources: "sources",
  title: "title",
  coverage: "rule coverage of the route",
  covered: "whether the rules were reviewed",
  agency: "wildlife agency",
  veterinarian: "state veterinarian",
  uncoveredBecause: "why the rules are not counted as reviewed",
  shipmentFindings: "findings for the whole shipment",
};

/** How a list's item is named: "Box 2", "Animal line 3". */
const ITEM_WORDS: Readonly<Record<string, string>> = {
  containers: "box",
  animals: "animal line",
  items: "animal line",
  extras: "unlisted animal",
  legs: "leg",
  seals: "seal",
  documents: "document",
  animalsCovered: "animal covered",
  speciesCovered: "species covered",
  statements: "statement",
  transitStates: "state on the way",
  taxa: "species",
  exceptTaxa: "species left out",
  lineage: "rank",
  synonyms: "older name",
  ambientOverrideF: "outside temperature",
  hours: "hour",
  stops: "stop",
  transferIds: "transfer",
  addTransferIds: "transfer to add",
  removeTransferIds: "transfer to remove",
  driverIds: "driver",
  documentKinds: "kind of document",
  origins: "origin",
  purposes: "purpose",
  exceptPurposes: "purpose left out",
  sexes: "sex",
};

/** Words for a key that is not in FIELD_WORDS (a gap the vocabulary test reports): "fooBar" → "foo bar". */
function spelledOut(key: string): string {
  return key.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase();
}

/** A field's name for a key, lower-case. */
export function fieldWord(key: string): string {
  return FIELD_WORDS[key] ?? spelledOut(key);
}

const capitalized = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** Groups that add nothing to the name of what they hold: an organisation has one address. */
const TRANSPARENT_GROUPS: ReadonlySet<string> = new Set(["address", "rule", "bandsF", "citation"]);

/** A group and a key that read better together than one after the other. */
const PAIR_WORDS: Readonly<Record<string, string>> = {
  "safeTransitF.min": "lowest safe temperature",
  "safeTransitF.max": "highest safe temperature",
  "citation.text": "citation",
  "citation.url": "citation link",
  "place.text": "place",
  "reasons.earlyPickup": "reason for the early pickup",
  "reasons.implausibleSpeed": "reason for the distance covered",
  "reasons.unexpectedParty": "reason for handing to someone else",
  "vehicleRangeF.min": "lowest temperature of the vehicle's set range",
  "vehicleRangeF.max": "highest temperature of the vehicle's set range",
};

/**
 * A field's full name for a path of the API, capitalised: ["containers", 1, "wallThicknessMm"]
 * → "Box 2 wall thickness"; ["origin", "zip"] → "Origin ZIP code"; [] → null (the whole form).
 */
export function fieldName(path: readonly PropertyKey[]): string | null {
  const words: string[] = [];
  path.forEach((part, i) => {
    const previous = path[i - 1];
    if (typeof part === "number") {
      const item = typeof previous === "string" ? ITEM_WORDS[previous] : undefined;
      if (item) words[words.length - 1] = `${item} ${part + 1}`;
      else words.push(`item ${part + 1}`);
      return;
    }
    const key = String(part);
    if (TRANSPARENT_GROUPS.has(key) && i < path.length - 1) return;
    const pair = typeof previous === "string" ? PAIR_WORDS[`${previous}.${key}`] : undefined;
    if (pair) {
      if (!TRANSPARENT_GROUPS.has(previous as string)) words.pop();
      words.push(pair);
      return;
    }
    words.push(fieldWord(key));
  });
  return words.length === 0 ? null : capitalized(words.join(" "));
}
