import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { PROFILE_GROUPS } from "@shared/constants";
import { ADVICE_CODES, VERDICTS } from "@shared/temperature/advice";
import type { ProfileData } from "@shared/temperature/profile-schema";
import type { TemperatureReport } from "@shared/temperature/report";
import { idProperty } from "./base";
import { TransferSchema } from "./transfer.entity";
import { UserSchema } from "./user.entity";

import { CHECK_MARKS } from "@shared/constants";

export { CHECK_MARKS };

/**
 * One hour of forecast at one position, cached. Positions are rounded to 0.01° and kept ×100
 * as integers, so equal places share rows without float keys. Read and written with SQL only
 * (server/services/temperature/forecasts.ts); the entity keeps the schema known to the ORM.
 */
export const ForecastHourSchema = defineEntity({
  name: "ForecastHour",
  tableName: "forecast_hour",
  properties: {
    latE2: p.integer().primary(),
    lonE2: p.integer().primary(),
    hour: p.datetime().primary(),
    tempF: p.float().columnType("double precision"),
    /** Mean solar radiation of the hour ending at `hour`, W/m²; null in rows cached before it was asked for. */
    radiationWm2: p.float().columnType("double precision").nullable(),
    fetchedAt: p.datetime(),
  },
});

/** A group's temperature profile as admins edited it; groups without a row use the guideline default. */
export const TemperatureProfileSchema = defineEntity({
  name: "TemperatureProfile",
  tableName: "temperature_profile",
  properties: {
    profileGroup: p.enum([...PROFILE_GROUPS]).primary(),
    data: p.json<ProfileData>(),
    updatedBy: () => p.manyToOne(UserSchema).ref().nullable().deleteRule("set null"),
    updatedAt: p.datetime(),
  },
});
export type TemperatureProfileRow = InferEntity<typeof TemperatureProfileSchema>;

/** A stored assessment of a transfer: at the ready-to-ship gate, 24 h and 4 h before departure. */
export const TemperatureCheckSchema = defineEntity({
  name: "TemperatureCheck",
  tableName: "temperature_check",
  indexes: [{ properties: ["transfer", "checkedAt"] }],
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().deleteRule("cascade"),
    transferVersion: p.integer(),
    mark: p.enum([...CHECK_MARKS]),
    checkedAt: p.datetime(),
    verdict: p.enum([...VERDICTS]),
    adviceCode: p.enum([...ADVICE_CODES]),
    result: p.json<TemperatureReport>(),
  },
});
export type TemperatureCheck = InferEntity<typeof TemperatureCheckSchema>;

/** The flag on a transfer whose advice changed between two checks; both parties were e-mailed. */
export const TemperatureAlertSchema = defineEntity({
  name: "TemperatureAlert",
  tableName: "temperature_alert",
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().index().deleteRule("cascade"),
    previousCheck: () => p.manyToOne(TemperatureCheckSchema).ref().deleteRule("cascade"),
    check: () => p.manyToOne(TemperatureCheckSchema).ref().deleteRule("cascade"),
    previousAdviceCode: p.enum([...ADVICE_CODES]),
    adviceCode: p.enum([...ADVICE_CODES]),
    createdAt: p.datetime(),
  },
});
export type TemperatureAlert = InferEntity<typeof TemperatureAlertSchema>;
