import { allForYear } from "@18f/us-federal-holidays";

// The library's dateString is built and formatted in one local zone, so it is a plain calendar
// date whatever the runtime's zone is; caching per year keeps the 18F computation off hot paths.
const observedByYear = new Map<number, ReadonlyMap<string, string>>();

function observedIn(year: number): ReadonlyMap<string, string> {
  let holidays = observedByYear.get(year);
  if (!holidays) {
    holidays = new Map(allForYear(year).map((h) => [h.dateString, h.name]));
    observedByYear.set(year, holidays);
  }
  return holidays;
}

/**
 * Name of the federal holiday observed on a calendar date `YYYY-MM-DD`, or undefined.
 * 5 U.S.C. 6103 holidays with OPM's weekend rule: Saturday observed on Friday, Sunday on Monday.
 */
export function federalHolidayOn(dateYmd: string): string | undefined {
  const year = Number(dateYmd.slice(0, 4));
  // New Year's Day on a Saturday is observed on 31 December of the year before.
  return observedIn(year).get(dateYmd) ?? observedIn(year + 1).get(dateYmd);
}
