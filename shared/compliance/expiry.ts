/** A document whose last valid day is this many days away, or fewer, is shown as expiring and reminded about. */
export const EXPIRY_WARNING_DAYS = 30;

export const EXPIRY_STATUSES = ["open", "valid", "expiring", "expired"] as const;
export type ExpiryStatus = (typeof EXPIRY_STATUSES)[number];

/** Whole calendar days from one ISO date (YYYY-MM-DD) to another, counted in UTC so no clock change shifts it. */
export function daysFromTo(fromIso: string, toIso: string): number {
  const dayNumber = (iso: string) => {
    const [year, month, day] = iso.split("-").map(Number) as [number, number, number];
    return Date.UTC(year, month - 1, day) / 86_400_000;
  };
  return dayNumber(toIso) - dayNumber(fromIso);
}

/**
 * Where a document stands on `todayIso`: "open" without an end date; "expired" once its last valid
 * day (`validTo`, inclusive) has passed; "expiring" when that day is at most EXPIRY_WARNING_DAYS
 * days away; otherwise "valid". `daysLeft` counts days from today to the last valid day.
 */
export function expiryOf(validTo: string | null, todayIso: string): { status: ExpiryStatus; daysLeft: number | null } {
  if (validTo === null) return { status: "open", daysLeft: null };
  const daysLeft = daysFromTo(todayIso, validTo);
  if (daysLeft < 0) return { status: "expired", daysLeft };
  return { status: daysLeft <= EXPIRY_WARNING_DAYS ? "expiring" : "valid", daysLeft };
}

/** Today's date in UTC as YYYY-MM-DD. */
export function todayUtc(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}
