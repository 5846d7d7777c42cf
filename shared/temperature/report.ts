import type { PackKind, ProfileGroup } from "../constants";
import type { AdviceCode, Verdict } from "./advice";
import type { ProfileData } from "./profile-schema";
import type { TripAssessment } from "./assess";
import type { TransitAssessment } from "./schemas";
import type { TransitWarning } from "./timeline";

/** Worst first: a transfer's answer is its worst box's. An unknown forecast outranks every "ship". */
export const VERDICT_SEVERITY: readonly Verdict[] = ["forecast_unavailable", "do_not_ship", "hold", "pack", "ship"];

/** Verdicts that keep a transfer from becoming ready to ship unless a party overrides with a reason. */
export const BLOCKING_VERDICTS: readonly Verdict[] = ["forecast_unavailable", "do_not_ship"];

/** The more severe of two verdicts. */
export function worseVerdict(a: Verdict, b: Verdict): Verdict {
  return VERDICT_SEVERITY.indexOf(a) <= VERDICT_SEVERITY.indexOf(b) ? a : b;
}

/** Whether a verdict blocks "ready to ship" without an override. */
export function blocksShipping(verdict: Verdict): boolean {
  return BLOCKING_VERDICTS.includes(verdict);
}

export type ProfileSummary = { group: ProfileGroup; label: string; safeTransitF: { min: number; max: number } };

/** One box of a trip: its profile, what it was packed with, and its own verdict. */
export type BoxTemperature = {
  containerId: string | null;
  label: string;
  plannedPack: PackKind;
  contentsG: number;
  profile: ProfileSummary;
  verdict: Verdict;
  advice: TransitAssessment["advice"];
  insideF: TransitAssessment["insideF"];
  hoursOutsideRange: number | null;
};

/**
 * The answer of both temperature routes: the contract keys of issue 5 (those of the worst box),
 * plus the profile whose safe band the chart shades, the calendar warnings and every box.
 */
export type TemperatureReport = TripAssessment & {
  profile: ProfileSummary;
  warnings: TransitWarning[];
  boxes: BoxTemperature[];
};

export type { CheckMark } from "../constants";
import type { CheckMark } from "../constants";

export type TemperatureCheckDto = {
  id: string;
  mark: CheckMark;
  checkedAt: string;
  transferVersion: number;
  verdict: Verdict;
  adviceCode: AdviceCode;
};

/** The advice changed between two stored checks (set by the re-check before departure). */
export type TemperatureAlertDto = {
  at: string;
  previous: { code: AdviceCode; message: string };
  current: { code: AdviceCode; message: string };
};

/** GET /api/transfers/:id/temperature. */
export type TransferTemperatureDto = TemperatureReport & {
  transferVersion: number;
  alert: TemperatureAlertDto | null;
  checks: TemperatureCheckDto[];
};

/** A profile as the profiles routes show it, with the guideline default it started from. */
export type TemperatureProfileDto = ProfileData & {
  group: ProfileGroup;
  guidelineDefault: ProfileData;
  edited: boolean;
  updatedAt: string | null;
  updatedBy: { id: string; displayName: string } | null;
};
