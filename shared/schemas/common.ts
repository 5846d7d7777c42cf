import { z } from "zod";
import { LIMITS, US_STATES } from "../constants";

const NUL = "\u0000";

/** A trimmed text field that refuses NUL characters and caps its length. */
export function text(max: number = LIMITS.nameMax) {
  return z
    .string()
    .refine((s) => !s.includes(NUL), { message: "Remove the NUL characters" })
    .transform((s) => s.trim())
    .pipe(z.string().max(max, { message: `Use at most ${max} characters` }));
}

/** A required text field: at least one visible character after trimming. */
export function requiredText(max: number = LIMITS.nameMax) {
  return text(max).pipe(z.string().min(1, { message: "Fill this in" }));
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
  .pipe(z.email({ message: "Enter an e-mail address" }));

export const passwordSchema = z
  .string()
  .refine((s) => !s.includes(NUL), { message: "Remove the NUL characters" })
  .pipe(
    z
      .string()
      .min(LIMITS.passwordMin, { message: `Use at least ${LIMITS.passwordMin} characters` })
      .max(LIMITS.passwordMax, { message: `Use at most ${LIMITS.passwordMax} characters` }),
  );

export const usStateSchema = z.enum(US_STATES, { message: "Choose a USPS state code such as OR or TN" });

export const zipSchema = z.string().regex(/^\d{5}(-\d{4})?$/, { message: "Enter a 5-digit ZIP code" });

export const phoneSchema = text(40).pipe(
  z.string().regex(/^[0-9+()\-. ext]{7,40}$/i, { message: "Enter a phone number" }),
);

export const addressSchema = z.strictObject({
  street: requiredText(200),
  city: requiredText(100),
  state: usStateSchema,
  zip: zipSchema,
});
export type Address = z.infer<typeof addressSchema>;

export const idSchema = z.uuid({ message: "Choose a valid record" });

/** Turns zod issues into the one-line message our 400 bodies carry, naming the field. */
export function describeIssues(error: z.ZodError): { field: string; message: string } {
  const issue = error.issues[0];
  if (!issue) return { field: "body", message: "The request is not valid." };
  const field = issue.path.length ? issue.path.join(".") : "body";
  if (issue.code === "unrecognized_keys") {
    const keys = issue.keys.join(", ");
    const where = issue.path.length ? ` in ${field}` : "";
    return {
      field: issue.keys[0] ?? field,
      message: `Unknown field${issue.keys.length > 1 ? "s" : ""}${where}: ${keys}.`,
    };
  }
  if (issue.code === "invalid_type") {
    // zod does not keep the input on the issue; its default message names what it received.
    if (/received undefined/.test(issue.message)) return { field, message: `${field}: fill this in` };
    return { field, message: `${field}: expected ${article(issue.expected)}` };
  }
  return { field, message: `${field}: ${issue.message}` };
}

function article(expected: string): string {
  return /^[aeiou]/.test(expected) ? `an ${expected}` : `a ${expected}`;
}
