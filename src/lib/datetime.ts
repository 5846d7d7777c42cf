const pad = (n: number) => String(n).padStart(2, "0");

/**
 * A `datetime-local` value ("2027-03-09T16:00", wall-clock time in the browser's zone) as an
 * RFC 3339 instant with that zone's offset on that date ("2027-03-09T16:00:00-05:00").
 * Empty or malformed input gives "" so the schema reports the field.
 */
export function localInputToInstant(value: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/.exec(value);
  if (!m) return "";
  const [, y, mo, d, h, mi] = m.map(Number) as [number, number, number, number, number, number];
  const date = new Date(y, mo - 1, d, h, mi);
  if (Number.isNaN(date.getTime())) return "";
  // getTimezoneOffset is minutes *behind* UTC, so New York in winter gives +300.
  const offsetMin = -date.getTimezoneOffset();
  const sign = offsetMin >= 0 ? "+" : "-";
  const abs = Math.abs(offsetMin);
  return `${localInputOf(date)}:00${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
}

/** An instant as a `datetime-local` value in the browser's zone; "" for none. */
export function instantToLocalInput(iso: string | null | undefined): string {
  if (!iso) return "";
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? "" : localInputOf(date);
}

function localInputOf(date: Date): string {
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}T${pad(date.getHours())}:${pad(date.getMinutes())}`;
}
