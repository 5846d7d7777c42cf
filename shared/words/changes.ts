import {
  ANIMAL_ORIGINS,
  IDENTIFIER_KINDS,
  LENGTH_KINDS,
  PACK_KINDS,
  PURPOSES,
  SEXES,
  TRANSPORT_MODES,
  US_STATES,
  VEHICLE_CONDITIONINGS,
  WALL_MATERIALS,
} from "../constants";
import { jurisdictionName } from "../compliance/jurisdiction";
import { formatDate, formatInstant } from "../dates";
import { formatLength, formatTemp, formatWeight, tempInUnit, tempUnit, type UnitSystem } from "../units";
import { ANIMAL_ORIGIN_WORDS, IDENTIFIER_KIND_WORDS, LENGTH_KIND_WORDS, SEX_WORDS } from "./animals";
import { fieldName, fieldWord } from "./fields";
import { PACK_WORDS, WALL_MATERIAL_WORDS } from "./packing";
import { VEHICLE_CONDITIONING_WORDS } from "./temperature";
import { PURPOSE_WORDS, TRANSPORT_MODE_WORDS } from "./transfer";
import { boxName } from "./evidence";

const EMPTY = "nothing";

const wordsOf =
  <T extends string>(list: readonly T[], words: Readonly<Record<T, string>>) =>
  (value: unknown): string | null =>
    typeof value === "string" && (list as readonly string[]).includes(value) ? words[value as T] : null;

/** How the value of each field reads, by the field's key. */
const VALUE_WORDS: Readonly<Record<string, (value: unknown, system: UnitSystem) => string | null>> = {
  mode: wordsOf(TRANSPORT_MODES, TRANSPORT_MODE_WORDS),
  purpose: wordsOf(PURPOSES, PURPOSE_WORDS),
  sex: wordsOf(SEXES, SEX_WORDS),
  origin: wordsOf(ANIMAL_ORIGINS, ANIMAL_ORIGIN_WORDS),
  wallMaterial: wordsOf(WALL_MATERIALS, WALL_MATERIAL_WORDS),
  pack: wordsOf(PACK_KINDS, PACK_WORDS),
  identifierKind: wordsOf(IDENTIFIER_KINDS, IDENTIFIER_KIND_WORDS),
  lengthKind: wordsOf(LENGTH_KINDS, LENGTH_KIND_WORDS),
  state: (value) =>
    typeof value === "string" && (US_STATES as readonly string[]).includes(value)
      ? jurisdictionName(value as (typeof US_STATES)[number])
      : null,
  sale: (value) => (value === true ? "A sale" : value === false ? "Not a sale" : null),
  salePriceUsd: (value) => (typeof value === "number" ? `$${value.toLocaleString("en-US")}` : null),
  plannedDepartureAt: (value) => (typeof value === "string" ? formatInstant(value) : null),
  expectedArrivalAt: (value) => (typeof value === "string" ? formatInstant(value) : null),
  hatchDate: (value) => (typeof value === "string" ? formatDate(value) : null),
  weightG: (value, system) => (typeof value === "number" ? formatWeight(value, system) : null),
  // Ids mean nothing to a person; the transfer's page names the parties as they are now.
  receiverOrganizationId: () => "another organisation",
  receiverContactId: () => "another contact",
  vehicle: wordsOf(VEHICLE_CONDITIONINGS, VEHICLE_CONDITIONING_WORDS),
  vehicleRangeF: (value, system) => {
    const range = value as { min?: unknown; max?: unknown };
    if (typeof range?.min !== "number" || typeof range.max !== "number") return null;
    if (range.min === range.max) return formatTemp(range.min, system);
    return `${Math.round(tempInUnit(range.min, system))}–${Math.round(tempInUnit(range.max, system))} ${tempUnit(system)}`;
  },
  stops: (value) =>
    Array.isArray(value)
      ? value.length === 0
        ? "no stops"
        : `${value.length} ${value.length === 1 ? "stop" : "stops"}`
      : null,
};

/** A line added or removed whole: "2 × Pogona vitticeps" or the box's label. */
function itemSummary(list: string, value: Record<string, unknown>): string {
  if (list === "animals") {
    const count = typeof value.count === "number" ? value.count : null;
    const taxon = typeof value.taxon === "string" ? value.taxon : "an animal";
    return count === null ? taxon : `${count} × ${taxon}`;
  }
  return typeof value.label === "string" ? value.label : "a box";
}

function valueText(key: string, value: unknown, system: UnitSystem, list: string | null): string {
  if (value === null || value === undefined || value === "") return EMPTY;
  const words = VALUE_WORDS[key]?.(value, system);
  if (words) return words;
  if (/Mm$/.test(key) && typeof value === "number") return formatLength(value, system);
  if (typeof value === "string") return value;
  if (typeof value === "number") return value.toLocaleString("en-US");
  if (typeof value === "boolean") return value ? "Yes" : "No";
  if (list && typeof value === "object" && !Array.isArray(value))
    return itemSummary(list, value as Record<string, unknown>);
  return "changed";
}

const LINE_WORDS: Readonly<Record<string, string>> = { containers: "Box", animals: "Animal line", legs: "Leg" };

/**
 * One entry of a transfer's change history, as a person reads it: which field, what it was, what it
 * became. `field` is the history's own path: "origin.zip", "containers[Box A].lengthMm",
 * "animals[Pogona vitticeps PV-1]" (a whole line added or removed).
 */
export function describeChange(
  change: { field: string; oldValue: unknown; newValue: unknown },
  system: UnitSystem,
): { what: string; was: string; now: string } {
  const line = /^(containers|animals|legs)\[(.*)\](?:\.(.+))?$/.exec(change.field);
  if (line) {
    const [, list = "", label = "", key] = line;
    const group = `${LINE_WORDS[list] ?? "Line"} “${label}”`;
    if (!key) {
      const now = change.newValue === null ? "removed" : `added: ${valueText("", change.newValue, system, list)}`;
      const was = change.oldValue === null ? EMPTY : valueText("", change.oldValue, system, list);
      return { what: group, was, now };
    }
    return {
      what: `${group}: ${fieldWord(key)}`,
      was: valueText(key, change.oldValue, system, null),
      now: valueText(key, change.newValue, system, null),
    };
  }
  const path = change.field.split(".");
  const key = path.at(-1) ?? change.field;
  return {
    what: fieldName(path) ?? change.field,
    was: valueText(key, change.oldValue, system, null),
    now: valueText(key, change.newValue, system, null),
  };
}

/** The top-level fields an edit touched, in words: "planned departure, animal lines". */
export function changedFieldsText(fields: readonly string[]): string {
  return [...new Set(fields)].map(fieldWord).join(", ");
}

/** Shorter names where the sentence already says which box: "Box A: seal CR-1 → CR-2". */
const SENTENCE_FIELD_WORDS: Readonly<Record<string, string>> = { sealNumber: "seal" };
/** Fields whose values are words from a list, read lower-case inside a sentence ("sex not known → female"). */
const WORD_VALUED: ReadonlySet<string> = new Set([
  "mode",
  "purpose",
  "sex",
  "origin",
  "wallMaterial",
  "pack",
  "identifierKind",
  "lengthKind",
]);
const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);

/**
 * One entry of the change history as one sentence: "Box Turtles D: seal SEAL-0004 → SEAL-0044",
 * "How it travels: overnight air carrier → ground courier", "Animal line “Pogona vitticeps”: added
 * (2 × Pogona vitticeps)". Never a field path, an id or a piece of JSON.
 */
export function changeSentence(
  change: { field: string; oldValue: unknown; newValue: unknown },
  system: UnitSystem,
): string {
  const { what, was, now } = describeChange(change, system);
  const value = (text: string, key: string | undefined) =>
    text === EMPTY ? "none" : key && WORD_VALUED.has(key) ? lowerFirst(text) : text;
  const line = /^(containers|animals)\[(.*)\](?:\.(.+))?$/.exec(change.field);
  if (line) {
    const [, list = "", label = "", key] = line;
    const group = list === "containers" ? boxName(label) : what.split(":")[0]!;
    if (!key)
      return change.newValue === null
        ? `${group}: removed (${was})`
        : `${group}: ${now.replace(/^added: /, "added (")}${now.startsWith("added: ") ? ")" : ""}`;
    const name = SENTENCE_FIELD_WORDS[key] ?? fieldWord(key);
    return `${group}: ${name} ${value(was, key)} → ${value(now, key)}`;
  }
  const key = change.field.split(".").at(-1);
  return `${what}: ${value(was, key)} → ${value(now, key)}`;
}
