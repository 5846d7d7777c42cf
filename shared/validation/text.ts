/** A UTF-16 surrogate without its other half: no character is made of one. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
const LONE_SURROGATES = new RegExp(LONE_SURROGATE.source, "g");

/** Whether a string is well-formed Unicode: every surrogate in a pair (ES2024's isWellFormed). */
export function isWellFormedText(value: string): boolean {
  return !LONE_SURROGATE.test(value);
}

/** The most of a person's input a message ever repeats back. */
export const EXCERPT_MAX = 40;

/**
 * A short, printable excerpt of something a person sent, to name it in a message without
 * echoing it whole: control characters become "·", broken characters "�", and anything past
 * `max` characters is cut with "…".
 */
export function excerpt(value: string, max = EXCERPT_MAX): string {
  const printable = value
    .replace(LONE_SURROGATES, "\ufffd")
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029\ufeff]/g, "·");
  const characters = [...printable];
  return characters.length > max ? `${characters.slice(0, max - 1).join("")}…` : printable;
}
