import type { PackKind, ParkedKind, ProfileGroup, ReadingSource, VehicleConditioning } from "../constants";
import type { AdviceCode, Verdict } from "./advice";
import type { ProfileData } from "./profile-schema";
import type { TripAssessment } from "./assess";
import type { TransitAssessment } from "./schemas";
import type { TripRouteDto } from "./route";
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
 * plus the profile whose safe band the chart shades, the calendar warnings, every box and the
 * route the map draws (its `hours` go with `hours`, one for one).
 */
export type TemperatureReport = TripAssessment & {
  profile: ProfileSummary;
  warnings: TransitWarning[];
  boxes: BoxTemperature[];
  route: TripRouteDto;
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

/**
 * A box temperature recorded at a handoff or the check-in, beside the model's inside temperature
 * for the same moment (issue 13: `at`, `place`, `tempF`, `modelF`). `modelF` is null where the
 * model has no value then (no forecast, or the reading lies outside the modelled trip).
 */
export type BoxReadingDto = {
  at: string;
  place: string;
  tempF: number;
  modelF: number | null;
  source: ReadingSource;
  /** tempF − modelF: positive when the box was warmer than the model said. */
  differenceF: number | null;
  /** Whether the reading is outside the safe range of a box's animals (an alert was raised). */
  outsideSafeRange: boolean;
};

type RangeDto = { min: number; max: number };

/** How the transfer's box travels, as the sender and the couriers said, and who may change it. */
export type TripPlanDto = {
  /** Whether the plan applies: ground courier and hand delivery (the overnight carrier is modelled as it is). */
  applies: boolean;
  vehicle: VehicleConditioning | null;
  vehicleRangeF: RangeDto | null;
  stops: { at: string; durationMin: number; parked: ParkedKind }[];
  legs: {
    id: string;
    sequence: number;
    courierName: string;
    vehicle: VehicleConditioning | null;
    vehicleRangeF: RangeDto | null;
    /** Whether the caller may declare this leg's vehicle. */
    canDeclare: boolean;
  }[];
  /** Whether the caller may change the vehicle and the stops. */
  canEdit: boolean;
  /** Set once the box is picked up: the model follows the trip from then. */
  followingPickupAt: string | null;
};

/** GET /api/transfers/:id/temperature. */
export type TransferTemperatureDto = TemperatureReport & {
  transferVersion: number;
  alert: TemperatureAlertDto | null;
  checks: TemperatureCheckDto[];
  readings: BoxReadingDto[];
  plan: TripPlanDto;
};

/** One reading against the prediction on record when the box left. */
export type ReadingAgainstModelDto = {
  transferId: string;
  number: string;
  at: string;
  place: string;
  tempF: number;
  modelF: number;
  differenceF: number;
};

/**
 * GET /api/temperature/model-accuracy: across the caller's organisation's transfers, how far the
 * model's prediction (the last stored check before the pickup) was from the box readings.
 */
export type ModelAccuracyDto = {
  transfers: number;
  readings: number;
  /** Readings with no prediction on record (no forecast at the time, or loaded without checks). */
  readingsWithoutModel: number;
  meanAbsoluteDifferenceF: number | null;
  /** Mean of reading − model: positive when boxes ran warmer than the model said. */
  meanDifferenceF: number | null;
  worst: ReadingAgainstModelDto | null;
  byTransfer: {
    transferId: string;
    number: string;
    readings: number;
    meanAbsoluteDifferenceF: number;
    worstDifferenceF: number;
  }[];
};

/** A profile as the profiles routes show it, with the guideline default it started from. */
export type TemperatureProfileDto = ProfileData & {
  group: ProfileGroup;
  guidelineDefault: ProfileData;
  edited: boolean;
  updatedAt: string | null;
  updatedBy: { id: string; displayName: string } | null;
};
