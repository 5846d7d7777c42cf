/**
 * The one map from a schema's complaint to a sentence a keeper reads: "Box 2 wall thickness: use
 * at most 7.9 in." It names the field (shared/words/fields.ts), says what to do, speaks in the
 * person's units, and never shows the validator's own wording. The form shows it under the field;
 * the server answers the same sentence in its 400 body.
 *
 * zod calls `keeperErrorMap` for every issue a schema has no message of its own for (installed
 * globally in ./zod.ts, and passed per parse where the person's units are known). Refinements
 * give their instruction as `params: { instruction }` so that the field is named here, once.
 */
import type { z } from "zod";
import { formatInstantDate } from "../dates";
import { DEFAULT_UNIT_SYSTEM, formatLimit, type Quantity, type UnitSystem } from "../units";
import { fieldName } from "../words/fields";
import { excerpt } from "./text";

/** Unknown keys named in one message; the rest are counted. */
const KEYS_NAMED_MAX = 3;

/** What a map may read on an issue, raw (while zod parses) or final (after). */
type IssueLike = {
  readonly code?: string;
  readonly path?: readonly PropertyKey[];
  readonly message?: string;
  readonly input?: unknown;
  readonly expected?: string;
  readonly origin?: string;
  readonly format?: string;
  readonly minimum?: number | bigint | Date;
  readonly maximum?: number | bigint | Date;
  readonly inclusive?: boolean;
  readonly keys?: readonly string[];
  readonly divisor?: number | bigint;
  readonly params?: Record<string, unknown>;
  readonly note?: string;
};

/** What the measurement at a path measures, from the unit in its name (STYLE.md: `lengthMm`, `tempF`, `weightG`). */
export function quantityAt(path: readonly PropertyKey[]): Quantity | "money" | null {
  for (let i = path.length - 1; i >= 0; i--) {
    const key = path[i];
    if (typeof key !== "string") continue;
    if (/Mm$/.test(key)) return "length";
    if (/F$/.test(key)) return "temperature";
    if (/G$/.test(key)) return "weight";
    if (/Usd$/.test(key)) return "money";
  }
  return null;
}

function limitText(value: number | bigint | Date, path: readonly PropertyKey[], units: UnitSystem): string {
  if (value instanceof Date) return formatInstantDate(value, "UTC");
  const n = Number(value);
  const quantity = quantityAt(path);
  if (quantity === "money") return `$${n.toLocaleString("en-US")}`;
  if (quantity) return formatLimit(quantity, n, units);
  return n.toLocaleString("en-US");
}

/** What the person should do for a value of the wrong kind. */
function typeInstruction(expected: string | undefined, input: unknown): string {
  if (expected === "boolean") return "answer yes or no";
  if (input === undefined || input === null || input === "") return "fill this in";
  if (expected === "int" && typeof input === "number" && Number.isFinite(input)) return "use a whole number";
  switch (expected) {
    case "number":
    case "int":
    case "bigint":
      return "enter a number";
    case "array":
      return "give a list";
    case "object":
      return "give the details as a group of fields";
    case "date":
      return "enter a date";
    default:
      return "enter it as text";
  }
}

/** Instructions for text fields with a fixed shape, by the field's key. */
const FORMAT_BY_FIELD: Readonly<Record<string, string>> = {
  zip: "enter a 5-digit ZIP code, such as 97401",
  phone: "enter a phone number, such as +1 503 555 0100",
  email: "enter an e-mail address, such as name@example.org",
  id: "use lower-case letters, digits, dots and dashes",
  scientificName: "write the genus and species, such as Pogona vitticeps",
  url: "enter a web address that starts with https://",
};

function lastKey(path: readonly PropertyKey[]): string | undefined {
  return [...path].reverse().find((part): part is string => typeof part === "string");
}

function formatInstruction(format: string | undefined, path: readonly PropertyKey[], input: unknown): string {
  if (input === "") return "fill this in";
  const key = lastKey(path);
  if (format === "regex" && key && FORMAT_BY_FIELD[key]) return FORMAT_BY_FIELD[key];
  switch (format) {
    case "email":
      return FORMAT_BY_FIELD.email!;
    case "url":
      return FORMAT_BY_FIELD.url!;
    case "uuid":
    case "guid":
      return "choose one from the list";
    case "date":
      return "enter a real date, such as 2026-07-14";
    case "datetime":
      return "enter a real date and time";
    case "time":
      return "enter a time, such as 14:30";
    default:
      return "check how this is written";
  }
}

function sizeNoun(origin: string | undefined, count: number): string {
  if (origin === "string") return count === 1 ? "character" : "characters";
  if (origin === "array" || origin === "set") return count === 1 ? "entry" : "entries";
  return "";
}

function tooSmall(issue: IssueLike, path: readonly PropertyKey[], units: UnitSystem): string {
  const minimum = issue.minimum ?? 0;
  if (issue.origin === "string" && Number(minimum) <= 1) return "fill this in";
  if (issue.origin === "string" || issue.origin === "array" || issue.origin === "set") {
    const n = Number(minimum);
    return issue.origin === "string" ? `use at least ${n} ${sizeNoun(issue.origin, n)}` : `add at least ${n}`;
  }
  if (issue.origin === "date") return `use a date on or after ${limitText(minimum, path, units)}`;
  const limit = limitText(minimum, path, units);
  return issue.inclusive === false ? `use more than ${limit}` : `use at least ${limit}`;
}

function tooBig(issue: IssueLike, path: readonly PropertyKey[], units: UnitSystem): string {
  const maximum = issue.maximum ?? 0;
  if (issue.origin === "string") return `use at most ${Number(maximum).toLocaleString("en-US")} characters`;
  if (issue.origin === "array" || issue.origin === "set")
    return `use at most ${Number(maximum).toLocaleString("en-US")}`;
  if (issue.origin === "date") return `use a date on or before ${limitText(maximum, path, units)}`;
  const limit = limitText(maximum, path, units);
  return issue.inclusive === false ? `use less than ${limit}` : `use at most ${limit}`;
}

/** The instruction alone, lower-case: what the person should do about the issue. */
function instructionFor(issue: IssueLike, units: UnitSystem): string {
  const path = issue.path ?? [];
  switch (issue.code) {
    case "invalid_type": {
      const hint = FORMAT_BY_FIELD[lastKey(path) ?? ""];
      const missing = issue.input === undefined || issue.input === null || issue.input === "";
      return hint && !missing && issue.expected === "string" ? hint : typeInstruction(issue.expected, issue.input);
    }
    case "too_small":
      return tooSmall(issue, path, units);
    case "too_big":
      return tooBig(issue, path, units);
    case "invalid_format":
      return formatInstruction(issue.format, path, issue.input);
    case "not_multiple_of":
      return issue.divisor === 1 ? "use a whole number" : `use a multiple of ${Number(issue.divisor)}`;
    case "unrecognized_keys": {
      // Named, never echoed whole: a few keys, each cut short (server messages quote at most an excerpt).
      const all = issue.keys ?? [];
      const named = all.slice(0, KEYS_NAMED_MAX).map((key) => `“${excerpt(key)}”`);
      if (all.length > KEYS_NAMED_MAX) named.push(`${all.length - KEYS_NAMED_MAX} more`);
      const keys = named.join(", ");
      return all.length > 1 ? `remove ${keys}: these are not fields here` : `remove ${keys}: it is not a field here`;
    }
    case "invalid_value":
      return "choose one from the list";
    case "invalid_union":
      // A kind that picks the form of the rest ("kind": "prohibited") is a choice from a list.
      return issue.note === "No matching discriminator"
        ? "choose one from the list"
        : "check this value: it is not one of the forms accepted here";
    case "invalid_key":
    case "invalid_element":
      return "check each entry of this list";
    case "custom": {
      const instruction = issue.params?.instruction;
      return typeof instruction === "string" ? instruction : "check this value";
    }
    default:
      return "check this value";
  }
}

/** "Box 2 wall thickness: use at most 7.9 in." — the field, then what to do. */
export function sentence(path: readonly PropertyKey[], instruction: string): string {
  const field = fieldName(path);
  const text = field ? `${field}: ${instruction}` : instruction.charAt(0).toUpperCase() + instruction.slice(1);
  return /[.!?]$/.test(text) ? text : `${text}.`;
}

/**
 * A schema's own instruction for one check, told with the field's name like every other message:
 * `.min(1, { error: instruction("assign at least one courier") })`.
 */
export function instruction(text: string): (issue: { readonly path?: readonly PropertyKey[] }) => string {
  return (issue) => sentence(issue.path ?? [], text);
}

/** The sentence for an issue in the given unit system. */
export function issueSentence(issue: IssueLike, units: UnitSystem = DEFAULT_UNIT_SYSTEM): string {
  return sentence(issue.path ?? [], instructionFor(issue, units));
}

/** A zod error map in the person's units, for a parse where they are known (a form, a request). */
export function errorMapFor(units: UnitSystem): z.core.$ZodErrorMap {
  return (issue) => issueSentence(issue as IssueLike, units);
}

/** The map installed globally: °F and inches, what a person sees before choosing. */
export const keeperErrorMap: z.core.$ZodErrorMap = errorMapFor(DEFAULT_UNIT_SYSTEM);

/**
 * An issue that has already been through a parse, told again in another unit system. Only a
 * measurement's limit depends on the units; any other issue keeps its message as it is.
 */
export function inUnits(issue: z.core.$ZodIssue, units: UnitSystem): string {
  const measured = (issue.code === "too_big" || issue.code === "too_small") && issue.origin === "number";
  const quantity = quantityAt(issue.path);
  if (!measured || !quantity || quantity === "money") return issue.message;
  return issueSentence(issue, units);
}

/** The first issue as the `{ field, message }` our 400 bodies and forms carry. */
export function describeIssues(
  error: z.ZodError,
  units: UnitSystem = DEFAULT_UNIT_SYSTEM,
): { field: string; message: string } {
  const issue = error.issues[0];
  if (!issue) return { field: "body", message: "Some of what was sent could not be read." };
  if (issue.code === "unrecognized_keys") {
    const key = issue.keys[0];
    return { field: key !== undefined ? excerpt(key) : issue.path.join(".") || "body", message: inUnits(issue, units) };
  }
  return { field: issue.path.length ? issue.path.join(".") : "body", message: inUnits(issue, units) };
}
