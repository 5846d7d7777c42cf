/**
 * How a person reads a date or a time, on every screen, on paper and in e-mail: one format,
 * with the time zone named. "Sat, Dec 5, 2026, 06:35 EST" for an instant; "Sat, Dec 5, 2026"
 * for a calendar date. A 24-hour clock: no AM/PM to misread on a courier's phone at night.
 */

const instantFormats = new Map<string, Intl.DateTimeFormat>();
const dateFormats = new Map<string, Intl.DateTimeFormat>();

/** The zone the code runs in (the browser's, on a screen); "UTC" where none is known. */
function runtimeZone(): string {
  return new Intl.DateTimeFormat("en-US").resolvedOptions().timeZone ?? "UTC";
}

function instantFormat(timeZone: string): Intl.DateTimeFormat {
  let format = instantFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-US", {
      timeZone,
      weekday: "short",
      year: "numeric",
      month: "short",
      day: "numeric",
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
      timeZoneName: "short",
    });
    instantFormats.set(timeZone, format);
  }
  return format;
}

function dateFormat(timeZone: string): Intl.DateTimeFormat {
  let format = dateFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-US", {
      timeZone,
      weekday: "short",
      year: "numeric",
      month: "short",
      day: "numeric",
    });
    dateFormats.set(timeZone, format);
  }
  return format;
}

function toDate(at: string | number | Date): Date | null {
  const date = at instanceof Date ? at : new Date(at);
  return Number.isNaN(date.getTime()) ? null : date;
}

/** A zone name Intl accepts, or null (an unknown zone would throw). */
function knownZone(timeZone: string | null | undefined): string | null {
  if (!timeZone) return null;
  try {
    instantFormat(timeZone);
    return timeZone;
  } catch {
    return null;
  }
}

/**
 * An instant as "Tue, Apr 14, 2026, 16:30 CDT": the local time in `timeZone` (an IANA name,
 * e.g. the origin's), or in the zone the code runs in when none is given. An em dash when the
 * value is not a time.
 */
export function formatInstant(at: string | number | Date, timeZone?: string | null): string {
  const date = toDate(at);
  if (!date) return "—";
  return instantFormat(knownZone(timeZone) ?? runtimeZone()).format(date);
}

/**
 * A calendar date ("2026-04-14", or the date part of a longer ISO text) as "Tue, Apr 14, 2026".
 * A permit's last valid day is a day, not an instant: it reads the same in every zone.
 */
export function formatDate(isoDate: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})/.exec(isoDate);
  const date = match ? toDate(`${match[1]}-${match[2]}-${match[3]}T12:00:00Z`) : null;
  if (!date) return "—";
  return dateFormat("UTC").format(date);
}

/** The calendar date an instant falls on in `timeZone` (or the runtime's zone): "Tue, Apr 14, 2026". */
export function formatInstantDate(at: string | number | Date, timeZone?: string | null): string {
  const date = toDate(at);
  if (!date) return "—";
  return dateFormat(knownZone(timeZone) ?? runtimeZone()).format(date);
}

/** A span of calendar dates: "Tue, Apr 14, 2026 – Wed, Apr 14, 2027", or "from …" when open-ended. */
export function formatDateRange(from: string | null, to: string | null, none = "no dates given"): string {
  if (from && to) return `${formatDate(from)} – ${formatDate(to)}`;
  if (from) return `from ${formatDate(from)}`;
  if (to) return `until ${formatDate(to)}`;
  return none;
}

const hourFormats = new Map<string, Intl.DateTimeFormat>();

/** A short tick for a time axis, in the same 24-hour clock: "Tue 16:00". */
export function formatAxisHour(at: string | number | Date, timeZone?: string | null): string {
  const date = toDate(at);
  if (!date) return "";
  const zone = knownZone(timeZone) ?? runtimeZone();
  let format = hourFormats.get(zone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-US", {
      timeZone: zone,
      weekday: "short",
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
    });
    hourFormats.set(zone, format);
  }
  return format.format(date).replace(",", "");
}

/**
 * A span of time in words, rounded to what matters at that size: "45 s", "12 min", "5 h 20 min",
 * "12 days 3 h". Negative spans read as their size (the sentence says before or after).
 */
export function formatDuration(durationMs: number): string {
  const seconds = Math.round(Math.abs(durationMs) / 1000);
  if (seconds < 60) return `${seconds} s`;
  const minutes = Math.round(seconds / 60);
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 48) return minutes % 60 ? `${hours} h ${minutes % 60} min` : `${hours} h`;
  const days = Math.floor(hours / 24);
  return hours % 24 ? `${days} days ${hours % 24} h` : `${days} days`;
}

const clockFormats = new Map<string, Intl.DateTimeFormat>();

function clockFormat(timeZone: string): Intl.DateTimeFormat {
  let format = clockFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
      timeZoneName: "short",
    });
    clockFormats.set(timeZone, format);
  }
  return format;
}

/**
 * A stretch of time in one zone: "Tue, Jun 2, 2026, 12:30–13:30 EDT" within a day, else both ends
 * in full ("Tue, Jun 2, 2026, 22:00 EDT – Wed, Jun 3, 2026, 06:00 EDT").
 */
export function formatTimeSpan(
  from: string | number | Date,
  to: string | number | Date,
  timeZone?: string | null,
): string {
  const start = toDate(from);
  const end = toDate(to);
  if (!start || !end) return "—";
  const zone = knownZone(timeZone) ?? runtimeZone();
  if (formatInstantDate(start, zone) !== formatInstantDate(end, zone))
    return `${formatInstant(start, zone)} – ${formatInstant(end, zone)}`;
  const endParts = clockFormat(zone).formatToParts(end);
  const clock = (parts: Intl.DateTimeFormatPart[]) =>
    parts
      .filter((p) => p.type === "hour" || p.type === "minute" || p.type === "literal")
      .map((p) => p.value)
      .join("")
      .trim();
  const zoneName = endParts.find((p) => p.type === "timeZoneName")?.value ?? "";
  return `${formatInstantDate(start, zone)}, ${clock(clockFormat(zone).formatToParts(start))}–${clock(endParts)} ${zoneName}`.trim();
}
