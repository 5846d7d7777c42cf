import tzLookup from "tz-lookup";

/** Wall-clock reading of an instant in a time zone. `weekday` is 0 for Sunday. */
export type ZonedParts = {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  weekday: number;
  offsetMin: number;
};

const MS_PER_MIN = 60_000;
export const MS_PER_HOUR = 3_600_000;
export const MS_PER_DAY = 86_400_000;

// Building an Intl formatter costs far more than using one; a trip touches few zones. Only the
// offset comes from Intl (a plain format is ~5× faster than formatToParts); the wall clock is
// then plain arithmetic on the shifted instant.
const offsetFormatters = new Map<string, Intl.DateTimeFormat>();

function offsetFormatterFor(timeZone: string): Intl.DateTimeFormat {
  let formatter = offsetFormatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat("en-US", { timeZone, timeZoneName: "longOffset" });
    offsetFormatters.set(timeZone, formatter);
  }
  return formatter;
}

/** IANA time zone at a position (tz-lookup's boundary data). Throws RangeError off the globe. */
export function timeZoneAt(lat: number, lon: number): string {
  return tzLookup(lat, lon);
}

// Offsets already read, by zone and quarter hour: every zone changes its offset on a quarter hour
// of UTC, and a trip's hours are read again for each later departure the search tries.
const knownOffsets = new Map<string, number>();
const KNOWN_OFFSETS_MAX = 50_000;
const MS_PER_QUARTER_HOUR = 15 * MS_PER_MIN;

/** UTC offset of `timeZone` at `utcMs`, in minutes (negative west of Greenwich). */
export function utcOffsetMin(utcMs: number, timeZone: string): number {
  const key = `${timeZone}|${Math.floor(utcMs / MS_PER_QUARTER_HOUR)}`;
  const known = knownOffsets.get(key);
  if (known !== undefined) return known;
  const offset = /GMT([+-])(\d{2}):(\d{2})/.exec(offsetFormatterFor(timeZone).format(utcMs));
  const minutes = offset ? (offset[1] === "-" ? -1 : 1) * (Number(offset[2]) * 60 + Number(offset[3])) : 0;
  if (knownOffsets.size >= KNOWN_OFFSETS_MAX) knownOffsets.clear();
  knownOffsets.set(key, minutes);
  return minutes;
}

/** The wall-clock date, time, weekday and UTC offset (minutes) of `utcMs` in `timeZone`. */
export function zonedParts(utcMs: number, timeZone: string): ZonedParts {
  const offsetMin = utcOffsetMin(utcMs, timeZone);
  const wall = new Date(utcMs + offsetMin * MS_PER_MIN);
  return {
    year: wall.getUTCFullYear(),
    month: wall.getUTCMonth() + 1,
    day: wall.getUTCDate(),
    hour: wall.getUTCHours(),
    minute: wall.getUTCMinutes(),
    weekday: wall.getUTCDay(),
    offsetMin,
  };
}

/**
 * The UTC instant (ms) of a wall-clock time in `timeZone`. A time skipped by a spring-forward
 * change resolves one hour later, as a clock set by hand would read.
 */
export function zonedTimeToUtcMs(
  local: { year: number; month: number; day: number; hour: number; minute: number },
  timeZone: string,
): number {
  const asIfUtc = Date.UTC(local.year, local.month - 1, local.day, local.hour, local.minute);
  // Two passes: the offset at the first guess can differ from the one at the answer near a change.
  let guess = asIfUtc - utcOffsetMin(asIfUtc, timeZone) * MS_PER_MIN;
  guess = asIfUtc - utcOffsetMin(guess, timeZone) * MS_PER_MIN;
  return guess;
}

const pad2 = (n: number) => String(n).padStart(2, "0");

/** Local calendar date `YYYY-MM-DD` of `utcMs` in `timeZone`. */
export function localDate(utcMs: number, timeZone: string): string {
  const p = zonedParts(utcMs, timeZone);
  return `${p.year}-${pad2(p.month)}-${pad2(p.day)}`;
}

/** Local time as ISO 8601 with the zone's offset, e.g. `2026-06-02T18:00-05:00`. */
export function localIsoTime(utcMs: number, timeZone: string): string {
  const p = zonedParts(utcMs, timeZone);
  const sign = p.offsetMin < 0 ? "-" : "+";
  const offset = Math.abs(p.offsetMin);
  return `${p.year}-${pad2(p.month)}-${pad2(p.day)}T${pad2(p.hour)}:${pad2(p.minute)}${sign}${pad2(Math.floor(offset / 60))}:${pad2(offset % 60)}`;
}

/** Weekday (0 = Sunday) of a calendar date `YYYY-MM-DD`. */
export function weekdayOf(dateYmd: string): number {
  return new Date(`${dateYmd}T12:00:00Z`).getUTCDay();
}

/** Calendar date `days` after `dateYmd`. */
export function addDays(dateYmd: string, days: number): string {
  return new Date(Date.parse(`${dateYmd}T12:00:00Z`) + days * MS_PER_DAY).toISOString().slice(0, 10);
}

/** Parses a 24-hour `HH:MM` clock reading. */
export function parseClock(clock: string): { hour: number; minute: number } {
  const match = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(clock);
  if (!match) throw new RangeError(`not a 24-hour HH:MM time: ${clock}`);
  return { hour: Number(match[1]), minute: Number(match[2]) };
}

/** The UTC instant of clock time `clock` on local date `dateYmd` in `timeZone`. */
export function localClockToUtcMs(dateYmd: string, clock: string, timeZone: string): number {
  const [year, month, day] = dateYmd.split("-").map(Number) as [number, number, number];
  return zonedTimeToUtcMs({ year, month, day, ...parseClock(clock) }, timeZone);
}
