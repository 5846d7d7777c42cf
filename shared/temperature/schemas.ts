import { LIMITS, PACK_KINDS, PROFILE_GROUPS, TRANSPORT_MODES, WALL_MATERIALS } from "../constants";
import { ADVICE_CODES, VERDICTS } from "./advice";
import { instantSchema, measure } from "../schemas/common";
import { instruction } from "../validation/messages";
import { z } from "../validation/zod";
import { AMBIENT_OVERRIDE_MAX, CONTENTS_G_MIN, PLAUSIBLE_AMBIENT_F } from "./limits";

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

/** The what-if request of issue 5, section 5 (plus the optional air hub of section 1). */
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
  })
  .superRefine((input, ctx) => {
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
    }),
  ),
  suggestedDeparture: instantSchema.nullable(),
  sources: z.array(z.strictObject({ id: z.string(), title: z.string() })),
});

export type TransitAssessment = z.infer<typeof transitAssessmentSchema>;
