import { LIMITS, US_STATES } from "../constants";
import { limitsAsShown, type Quantity } from "../units";
import { isWellFormedText } from "../validation/text";
import { z } from "../validation/zod";

const NUL = "\u0000";
/** What a keeper is told about an invisible NUL character pasted into a field. */
export const NO_CONTROL_CHARACTERS = "remove the invisible control characters";

/**
 * What a keeper is told about a lone surrogate: half of a UTF-16 pair, which no character is
 * made of (JSON's `"\ud800"` escape can still write one). The server refuses it in any field.
 */
export const BROKEN_CHARACTER = "type it again: it holds a broken character (half of a UTF-16 pair, such as \\ud800)";

/** A trimmed text field that refuses NUL characters and broken characters, and caps its length. */
export function text(max: number = LIMITS.nameMax) {
  return z
    .string()
    .refine((s) => !s.includes(NUL), { params: { instruction: NO_CONTROL_CHARACTERS } })
    .refine((s) => isWellFormedText(s), { params: { instruction: BROKEN_CHARACTER } })
    .transform((s) => s.trim())
    .pipe(z.string().max(max));
}

/** A required text field: at least one visible character after trimming. */
export function requiredText(max: number = LIMITS.nameMax) {
  return text(max).pipe(z.string().min(1));
}

/** Optional free text: an empty string becomes null so the database keeps one "empty" value. */
export function optionalText(max: number = LIMITS.textMax) {
  return text(max)
    .transform((s) => (s === "" ? null : s))
    .nullable()
    .optional();
}

/**
 * E-mail addresses are compared after Unicode NFC normalisation and lower-casing, so
 * "Ann@Example.org" and "ann@example.org" are one account.
 */
export function emailKey(email: string): string {
  return email.normalize("NFC").trim().toLowerCase();
}

export const emailSchema = text(LIMITS.emailMax)
  .transform((s) => s.normalize("NFC"))
  .pipe(z.email());

export const passwordSchema = z
  .string()
  .refine((s) => !s.includes(NUL), { params: { instruction: NO_CONTROL_CHARACTERS } })
  .pipe(z.string().min(LIMITS.passwordMin).max(LIMITS.passwordMax));

export const usStateSchema = z.enum(US_STATES);

export const zipSchema = z.string().regex(/^\d{5}(-\d{4})?$/);

export const phoneSchema = text(40).pipe(z.string().regex(/^[0-9+()\-. ext]{7,40}$/i));

export const addressSchema = z.strictObject({
  street: requiredText(200),
  city: requiredText(100),
  state: usStateSchema,
  zip: zipSchema,
});
export type Address = z.infer<typeof addressSchema>;

export const idSchema = z.uuid();

/** A whole number within [min, max]; 1.5, -1, 1e309 and "3" are all refused. */
export function wholeNumber(min: number, max: number) {
  return z.int().min(min).max(max);
}

/**
 * A measurement in its stored unit (mm, °F or g, named by the field: `lengthMm`, `tempF`,
 * `weightG`), within [min, max] or above `above`. The message gives the limit in the person's
 * units, rounded to one decimal; the check accepts the limit as any system shows it, so a form
 * that says "at most 7.9 in" for 200 mm takes 7.9 in.
 */
export function measure(quantity: Quantity, bounds: { above?: number; min?: number; max: number }) {
  const highest = Math.max(...limitsAsShown(quantity, bounds.max));
  const lowest = bounds.min === undefined ? undefined : Math.min(...limitsAsShown(quantity, bounds.min));
  return z.number().check((ctx) => {
    const value = ctx.value;
    if (bounds.above !== undefined && !(value > bounds.above)) {
      ctx.issues.push({ code: "too_small", origin: "number", minimum: bounds.above, inclusive: false, input: value });
    } else if (lowest !== undefined && value < lowest - 1e-9) {
      ctx.issues.push({ code: "too_small", origin: "number", minimum: bounds.min!, inclusive: true, input: value });
    } else if (value > highest + 1e-9) {
      ctx.issues.push({ code: "too_big", origin: "number", maximum: bounds.max, inclusive: true, input: value });
    }
  });
}

/** An instant with an explicit offset, e.g. 2027-03-09T16:00:00-05:00. */
export const instantSchema = z.iso.datetime({ offset: true });
/** A calendar date, e.g. 2026-07-14. */
export const dateSchema = z.iso.date();
