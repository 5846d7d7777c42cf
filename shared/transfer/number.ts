/** Crockford's base32 alphabet: no I, L, O or U, so a number read over the phone is unambiguous. */
const ALPHABET = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";

/**
 * A transfer number people can read out: "HW-" + two-digit year + "-" + five characters,
 * e.g. HW-27-4KQ7M. `randomBytes` supplies the randomness (five bytes).
 */
export function formatTransferNumber(year: number, randomBytes: Uint8Array): string {
  if (randomBytes.length < 5) throw new Error("formatTransferNumber needs five random bytes");
  const chars = Array.from(randomBytes.slice(0, 5), (b) => ALPHABET[b & 31]).join("");
  return `HW-${String(year % 100).padStart(2, "0")}-${chars}`;
}

export const TRANSFER_NUMBER_PATTERN = /^HW-\d{2}-[0-9A-HJKMNP-TV-Z]{5}$/;
