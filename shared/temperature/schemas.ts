import {
  EXPOSURES,
  LIMITS,
  PACK_KINDS,
  PARKED_KINDS,
  PROFILE_GROUPS,
  TRANSPORT_MODES,
  VEHICLE_CONDITIONINGS,
  WALL_MATERIALS,
} from "../constants";
import { ADVICE_CODES, VERDICTS } from "./advice";
import { instantSchema, measure } from "../schemas/common";
import { instruction } from "../validation/messages";
import { z } from "../validation/zod";
import {
  AMBIENT_OVERRIDE_MAX,
  CONTENTS_G_MIN,
  PLAUSIBLE_AMBIENT_F,
  PLANNED_STOPS_MAX,
  STOP_DURATION_MIN_MAX,
  VEHICLE_RANGE_F,
} from "./limits";

/** A five-digit US ZIP code or a position in decimal degrees. */
export const placeInputSchema = z.union(
  [
    z.strictObject({ zip: z.string().regex(/^\d{5}$/) }),
    z.strictObject({ lat: z.number().min(-90).max(90), lon: z.number().min(-180).max(180) }),
  ],
  { error: instruction("give a 5-digit ZIP code, or a latitude and longitude") },
);

const ambientTempFSchema = measure("temperature", { min: PLAUSIBLE_AMBIENT_F.min, max: PLAUSIBLE_AMBIENT_F.max });

/** The box as the sender describes it; dimensions are outside measurements in mm. */
export const boxInputSchema = z
  .strictObject({
    wall: z.enum(WALL_MATERIALS),
    wallThicknessMm: measure("length", { above: 0, max: LIMITS.wallThicknessMmMax }),
    lengthMm: measure("length", { above: 0, max: LIMITS.boxDimensionMmMax }),
    widthMm: measure("length", { above: 0, max: LIMITS.boxDimensionMmMax }),
    heightMm: measure("length", { above: 0, max: LIMITS.boxDimensionMmMax }),
    /** Animals, substrate and cups as water-equivalent grams. */
    contentsG: measure("weight", { min: CONTENTS_G_MIN, max: LIMITS.weightGMax }),
    pack: z.enum(PACK_KINDS),
  })
  .superRefine((box, ctx) => {
    if (Math.min(box.lengthMm, box.widthMm, box.heightMm) <= 2 * box.wallThicknessMm) {
      ctx.addIssue({
        code: "custom",
        path: ["wallThicknessMm"],
        params: {
          instruction: "the walls take up the whole box; each side must be more than twice the wall thickness",
        },
      });
    }
  });

/** Outside temperatures that replace the forecast in a what-if. */
export const ambientOverrideSchema = z
  .array(z.strictObject({ at: instantSchema, tempF: ambientTempFSchema }))
  .min(1)
  .max(AMBIENT_OVERRIDE_MAX);

const vehicleTempFSchema = measure("temperature", { min: VEHICLE_RANGE_F.min, max: VEHICLE_RANGE_F.max });

/** A climate-controlled vehicle's set range, °F; the lowest may equal the highest (a set point). */
export const vehicleRangeSchema = z
  .strictObject({ min: vehicleTempFSchema, max: vehicleTempFSchema })
  .refine((range) => range.min <= range.max, {
    path: ["max"],
    params: { instruction: "the highest temperature cannot be below the lowest" },
  });

/** A stop the driver plans: when, how long, and where the vehicle waits. */
export const plannedStopSchema = z.strictObject({
  at: instantSchema,
  durationMin: z.number().int().min(1).max(STOP_DURATION_MIN_MAX),
  parked: z.enum(PARKED_KINDS),
});

/** How the box travels on a ground trip (issue 13): the vehicle, its set range, the driver's stops. */
export const tripExposureShape = {
  vehicle: z.enum(VEHICLE_CONDITIONINGS).optional(),
  vehicleRangeF: vehicleRangeSchema.optional(),
  stops: z.array(plannedStopSchema).max(PLANNED_STOPS_MAX).optional(),
};

const RANGE_NEEDS_CLIMATE_CONTROL =
  "a set range goes with a climate-controlled vehicle; choose that vehicle or leave the range out";

type ExposureFields = {
  mode: (typeof TRANSPORT_MODES)[number];
  departAt?: string;
  vehicle?: string | null;
  vehicleRangeF?: unknown;
  stops?: readonly { at: string }[] | null;
};

/** Cross-field checks of the exposure fields: ground modes only, a range only with climate control, stops after departure. */
export function checkExposureFields(input: ExposureFields, ctx: z.RefinementCtx): void {
  if (input.mode === "overnight_air") {
    for (const key of ["vehicle", "vehicleRangeF", "stops"] as const) {
      if (input[key] != null)
        ctx.addIssue({
          code: "custom",
          path: [key],
          params: {
            instruction:
              "the overnight carrier's vans, stations and hub are modelled as they are; give this for a ground courier or a hand delivery",
          },
        });
    }
  }
  if (input.vehicleRangeF != null && input.vehicle !== "climate_controlled")
    ctx.addIssue({
      code: "custom",
      path: ["vehicleRangeF"],
      params: { instruction: RANGE_NEEDS_CLIMATE_CONTROL },
    });
  const departMs = input.departAt ? Date.parse(input.departAt) : Number.NaN;
  (input.stops ?? []).forEach((stop, i) => {
    if (Number.isFinite(departMs) && Date.parse(stop.at) < departMs)
      ctx.addIssue({
        code: "custom",
        path: ["stops", i, "at"],
        params: { instruction: "a stop comes after the departure" },
      });
  });
}

/** The what-if request of issue 5, section 5 (plus the optional air hub of section 1, and issue 13's exposure). */
export const whatIfInputSchema = z
  .strictObject({
    origin: placeInputSchema,
    destination: placeInputSchema,
    hub: placeInputSchema.optional(),
    departAt: instantSchema,
    mode: z.enum(TRANSPORT_MODES),
    profile: z.enum(PROFILE_GROUPS).optional(),
    scientificName: z
      .string()
      .trim()
      .min(3)
      .max(LIMITS.nameMax)
      .regex(/^[A-Z][a-z]+( [a-z][a-z-]*){0,2}$/)
      .optional(),
    box: boxInputSchema,
    ambientOverrideF: ambientOverrideSchema.optional(),
    ...tripExposureShape,
  })
  .superRefine((input, ctx) => {
    checkExposureFields(input, ctx);
    if ((input.profile === undefined) === (input.scientificName === undefined)) {
      ctx.addIssue({
        code: "custom",
        path: ["profile"],
        params: { instruction: "give either a species or a temperature profile, not both" },
      });
    }
  });

export type PlaceInputParsed = z.infer<typeof placeInputSchema>;
export type BoxInput = z.infer<typeof boxInputSchema>;
export type WhatIfInput = z.infer<typeof whatIfInputSchema>;
export type PlannedStopInput = z.infer<typeof plannedStopSchema>;

const rangeFSchema = z.strictObject({ min: z.number(), max: z.number() });

/** The assessment the routes return, exactly (issue 5, section 5). */
export const transitAssessmentSchema = z.strictObject({
  verdict: z.enum(VERDICTS),
  advice: z.strictObject({ code: z.enum(ADVICE_CODES), pack: z.enum(PACK_KINDS).nullable(), message: z.string() }),
  ambientF: rangeFSchema.nullable(),
  insideF: rangeFSchema.nullable(),
  hoursOutsideRange: z.number().min(0).nullable(),
  hours: z.array(
    z.strictObject({
      at: instantSchema,
      place: z.string(),
      ambientF: z.number().nullable(),
      insideF: z.number().nullable(),
      exposure: z.enum(EXPOSURES),
      aroundBoxF: z.number().nullable(),
    }),
  ),
  suggestedDeparture: instantSchema.nullable(),
  sources: z.array(z.strictObject({ id: z.string(), title: z.string() })),
});

export type TransitAssessment = z.infer<typeof transitAssessmentSchema>;

/**
 * How the box travels on a transfer, as its sender sets it (PUT /api/transfers/:id/temperature/plan):
 * the vehicle (null: not said), its set range, the driver's planned stops. The whole plan each time.
 */
export const tripPlanInputSchema = z
  .strictObject({
    vehicle: z.enum(VEHICLE_CONDITIONINGS).nullable(),
    vehicleRangeF: vehicleRangeSchema.nullable().optional(),
    stops: z.array(plannedStopSchema).max(PLANNED_STOPS_MAX),
  })
  .superRefine((input, ctx) => {
    if (input.vehicleRangeF != null && input.vehicle !== "climate_controlled")
      ctx.addIssue({
        code: "custom",
        path: ["vehicleRangeF"],
        params: { instruction: RANGE_NEEDS_CLIMATE_CONTROL },
      });
  });
export type TripPlanInput = z.infer<typeof tripPlanInputSchema>;

/** The vehicle a courier declares for their leg (PUT /api/transfers/:id/legs/:legId/vehicle). */
export const legVehicleInputSchema = z
  .strictObject({
    vehicle: z.enum(VEHICLE_CONDITIONINGS).nullable(),
    vehicleRangeF: vehicleRangeSchema.nullable().optional(),
  })
  .superRefine((input, ctx) => {
    if (input.vehicleRangeF != null && input.vehicle !== "climate_controlled")
      ctx.addIssue({
        code: "custom",
        path: ["vehicleRangeF"],
        params: { instruction: RANGE_NEEDS_CLIMATE_CONTROL },
      });
  });
export type LegVehicleInput = z.infer<typeof legVehicleInputSchema>;
