/**
 * A permit's reporting year and due date (issue 15 §3). A year starts on the first of its start
 * month (1: a calendar year) and the report is due on the first given day-of-year after it ends.
 */
import { addDays } from "../temperature/zoned-time";

export type ReportingPlan = { startMonth: number; dueMonth: number; dueDay: number };

const pad = (n: number) => String(n).padStart(2, "0");
const daysInMonth = (year: number, month: number) => new Date(Date.UTC(year, month, 0)).getUTCDate();

/** The reporting year that begins in `year`: first and last day, inclusive. */
export function periodStartingIn(plan: Pick<ReportingPlan, "startMonth">, year: number): { from: string; to: string } {
  const from = `${year}-${pad(plan.startMonth)}-01`;
  const nextStart = `${year + 1}-${pad(plan.startMonth)}-01`;
  return { from, to: addDays(nextStart, -1) };
}

/** The first due day (month and day, shortened to the month's length) after `periodEnd`. */
export function dueDateAfter(plan: Pick<ReportingPlan, "dueMonth" | "dueDay">, periodEnd: string): string {
  const endYear = Number(periodEnd.slice(0, 4));
  for (const year of [endYear, endYear + 1]) {
    const day = Math.min(plan.dueDay, daysInMonth(year, plan.dueMonth));
    const candidate = `${year}-${pad(plan.dueMonth)}-${pad(day)}`;
    if (candidate > periodEnd) return candidate;
  }
  throw new Error("unreachable: a due day falls within a year after the period");
}

/** The last reporting year that has ended before `today`, and its due date. */
export function lastEndedPeriod(plan: ReportingPlan, today: string) {
  let year = Number(today.slice(0, 4));
  for (;;) {
    const period = periodStartingIn(plan, year);
    if (period.to < today) return { ...period, dueOn: dueDateAfter(plan, period.to) };
    year -= 1;
  }
}

/** The report due next (on or after `today`): the period it covers and its due date. */
export function nextDueReport(plan: ReportingPlan, today: string) {
  let year = Number(today.slice(0, 4)) - 2;
  for (;;) {
    const period = periodStartingIn(plan, year);
    const dueOn = dueDateAfter(plan, period.to);
    if (dueOn >= today) return { ...period, dueOn };
    year += 1;
  }
}

/** Reminders go out this many days before a report is due (issue 15 §3). */
export const REPORT_REMINDER_DAYS = [30, 7] as const;
