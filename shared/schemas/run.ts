/**
 * A courier's run (issue 16): the public contract of `POST /api/runs`, `GET /api/runs/:id`,
 * `PATCH /api/runs/:id` and what they answer. The client imports the response types from here.
 */
import { vehicleRangeSchema } from "../temperature/schemas";
import { instruction } from "../validation/messages";
import { z } from "../validation/zod";
import { idSchema, instantSchema } from "./common";

/** Most transfers one run carries (80 stops) [practice: a van's day or two of work]. */
export const RUN_TRANSFERS_MAX = 40;
/** Most drivers named on one run (a team of two is usual [practice]). */
export const RUN_DRIVERS_MAX = 4;

const RANGE_NEEDS_CLIMATE_CONTROL =
  "a set range goes with a climate-controlled van; say the van is climate-controlled or leave the range out";

const transferIdsSchema = z
  .array(idSchema)
  .max(RUN_TRANSFERS_MAX)
  .refine((ids) => new Set(ids).size === ids.length, {
    params: { instruction: "name each transfer once" },
  });

const driverIdsSchema = z
  .array(idSchema)
  .max(RUN_DRIVERS_MAX)
  .refine((ids) => new Set(ids).size === ids.length, { params: { instruction: "name each driver once" } });

/** `POST /api/runs`. */
export const runInputSchema = z
  .strictObject({
    departAt: instantSchema,
    climateControlled: z.boolean(),
    vehicleRangeF: vehicleRangeSchema.nullable().optional(),
    driverIds: driverIdsSchema.optional(),
    transferIds: transferIdsSchema.pipe(
      z.array(idSchema).min(1, { error: instruction("put at least one transfer on the run") }),
    ),
  })
  .superRefine((input, ctx) => {
    if (input.vehicleRangeF != null && !input.climateControlled)
      ctx.addIssue({ code: "custom", path: ["vehicleRangeF"], params: { instruction: RANGE_NEEDS_CLIMATE_CONTROL } });
  });
export type RunInput = z.input<typeof runInputSchema>;
export type RunInputParsed = z.output<typeof runInputSchema>;

export const RUN_STOP_KINDS = ["pickup", "dropoff"] as const;
export type RunStopKind = (typeof RUN_STOP_KINDS)[number];

/** One stop as the driver orders it by hand. */
export const runStopOrderSchema = z.strictObject({ kind: z.enum(RUN_STOP_KINDS), transferId: idSchema });

/**
 * `PATCH /api/runs/:id`: a new order of every stop (`stops`, checked: each pickup before its
 * drop-off), or transfers to add (each put where it adds the least distance, the rest kept in
 * order) and to remove; and the van, the drivers or the departure. `version`, when given, must be
 * the run's current one (409 otherwise). The times are planned again after every change.
 */
export const runPatchSchema = z
  .strictObject({
    version: z.number().int().min(1).optional(),
    stops: z
      .array(runStopOrderSchema)
      .max(RUN_TRANSFERS_MAX * 2)
      .optional(),
    addTransferIds: transferIdsSchema.optional(),
    removeTransferIds: transferIdsSchema.optional(),
    departAt: instantSchema.optional(),
    climateControlled: z.boolean().optional(),
    vehicleRangeF: vehicleRangeSchema.nullable().optional(),
    driverIds: driverIdsSchema.optional(),
  })
  .superRefine((input, ctx) => {
    if (input.stops && (input.addTransferIds?.length || input.removeTransferIds?.length))
      ctx.addIssue({
        code: "custom",
        path: ["stops"],
        params: { instruction: "reorder the stops in one change and add or remove transfers in another" },
      });
    if (input.vehicleRangeF != null && input.climateControlled === false)
      ctx.addIssue({ code: "custom", path: ["vehicleRangeF"], params: { instruction: RANGE_NEEDS_CLIMATE_CONTROL } });
  });
export type RunPatch = z.input<typeof runPatchSchema>;
export type RunPatchParsed = z.output<typeof runPatchSchema>;

/** Where a stop is: the transfer's origin (pickup) or destination (drop-off). */
export type RunPlace = {
  label: string;
  street: string;
  city: string;
  state: string;
  zip: string;
  lat: number;
  lon: number;
  timeZone: string;
};

/** Why the plan rests: the 8-hour break, 11 hours of driving, or the 14-hour window (49 CFR 395.3). */
export const RUN_REST_REASONS = ["driving_8h", "driving_11h", "window_14h"] as const;

/** A rest the plan puts on the road, as stored and answered. */
export type RunRest = {
  kind: "break" | "off_duty";
  reason: (typeof RUN_REST_REASONS)[number];
  startAt: string;
  endAt: string;
  /** The rest falls on the road after this stop (index into `stops`). */
  afterStop: number;
  position: { lat: number; lon: number };
};

/** A rest as answered: with the local time zone and the town nearest where it falls. */
export type RunRestDto = RunRest & {
  /** IANA zone at the rest's position (tz-lookup), for its local times. */
  timeZone: string | null;
  /** "near Amarillo, TX", or null on open road far from any town. */
  near: string | null;
};

export type RunStopDto = {
  kind: RunStopKind;
  transferId: string;
  /** Planned arrival at the stop (ISO 8601). */
  at: string;
  /** Planned departure from the stop, after loading or unloading. */
  leaveAt: string;
  place: RunPlace;
  /** Road km from the stop before (0 for the first). */
  legKm: number;
  transferNumber: string;
  boxCount: number;
  /** The sender at a pickup, the receiver at a drop-off. */
  party: { organizationName: string; contactName: string | null; phone: string };
};

export type RunDto = {
  id: string;
  courierOrganization: { id: string; name: string };
  departAt: string;
  climateControlled: boolean;
  vehicleRangeF: { min: number; max: number } | null;
  drivers: { id: string; displayName: string }[];
  stops: RunStopDto[];
  drivingH: number;
  roadKm: number;
  finishAt: string;
  rests: RunRestDto[];
  /** The rests are planning guidance (49 CFR 395.3 binds vehicles over 10,000 lb). */
  guidance: string;
  version: number;
  abilities: { edit: boolean };
};

/** `PATCH /api/runs/:id` adds who was told that their arrival moved by more than 2 h, and the re-checks. */
export type RunNotifiedDto = {
  transferId: string;
  transferNumber: string;
  /** Signed hours: positive when the drop-off is now later. */
  arrivalMovedH: number;
  told: { party: "sender" | "receiver"; name: string }[];
};
/** Each transfer on the run assessed again after the change; verdict null where the check failed. */
export type RunRecheckDto = { transferId: string; verdict: string | null; adviceChanged: boolean };
export type RunPatchAnswerDto = RunDto & { notified: RunNotifiedDto[]; temperature: RunRecheckDto[] };

/** `GET /api/runs`: the caller's courier service's runs, soonest departure first. */
export type RunSummaryDto = {
  id: string;
  departAt: string;
  finishAt: string;
  climateControlled: boolean;
  stopCount: number;
  transferIds: string[];
  drivingH: number;
  version: number;
};
