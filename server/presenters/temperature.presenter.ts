import { isDeepStrictEqual } from "node:util";
import type { ProfileGroup } from "@shared/constants";
import { profileDataOf } from "@shared/temperature/profile-schema";
import { DEFAULT_PROFILES, type TemperatureProfile } from "@shared/temperature/profiles";
import type {
  TemperatureCheckDto,
  TemperatureProfileDto,
  TemperatureReport,
  TransferTemperatureDto,
} from "@shared/temperature/report";
import type { TemperatureAlert, TemperatureCheck, TemperatureProfileRow } from "../db/entities/temperature.entity";
import type { Transfer } from "../db/entities/transfer.entity";

export function presentCheck(c: TemperatureCheck): TemperatureCheckDto {
  return {
    id: c.id,
    mark: c.mark,
    checkedAt: c.checkedAt.toISOString(),
    transferVersion: c.transferVersion,
    verdict: c.verdict,
    adviceCode: c.adviceCode,
  };
}

function presentAlert(a: TemperatureAlert): TransferTemperatureDto["alert"] {
  const before = a.previousCheck.getEntity().result.advice;
  const now = a.check.getEntity().result.advice;
  return {
    at: a.createdAt.toISOString(),
    previous: { code: before.code, message: before.message },
    current: { code: now.code, message: now.message },
  };
}

/** The transfer's temperature answer, its latest advice-change flag and its stored checks. */
export function presentTransferTemperature(
  transfer: Transfer,
  report: TemperatureReport,
  alert: TemperatureAlert | null,
  checks: TemperatureCheck[],
): TransferTemperatureDto {
  return {
    ...report,
    transferVersion: transfer.version,
    alert: alert ? presentAlert(alert) : null,
    checks: checks.map(presentCheck),
  };
}

/** A group's profile in force, beside the guideline default it started from and who last edited it. */
export function presentProfile(
  group: ProfileGroup,
  profile: TemperatureProfile,
  row: TemperatureProfileRow | undefined,
): TemperatureProfileDto {
  const data = profileDataOf(profile);
  const guidelineDefault = profileDataOf(DEFAULT_PROFILES[group]);
  const editor = row?.updatedBy?.getEntity();
  return {
    group,
    ...data,
    guidelineDefault,
    edited: !isDeepStrictEqual(data, guidelineDefault),
    updatedAt: editor && row ? row.updatedAt.toISOString() : null,
    updatedBy: editor ? { id: editor.id, displayName: editor.displayName } : null,
  };
}
