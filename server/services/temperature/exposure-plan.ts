import type { ParkedKind, VehicleConditioning } from "@shared/constants";
import type { ExposureInput } from "@shared/temperature/assess";
import type { RangeF } from "@shared/temperature/exposure";
import { townNear } from "@shared/temperature/places";
import type { DrivingOptions } from "@shared/temperature/timeline";

/** How a trip's box travels, as the what-if or a transfer states it (issue 13). */
export type TripExposureFields = {
  vehicle?: VehicleConditioning | null;
  vehicleRangeF?: RangeF | null;
  stops?: readonly { at: string; durationMin: number; parked: ParkedKind }[] | null;
};

/**
 * The timeline's driving options and the assessment's exposure input for a trip leaving at
 * `departMs`: each stop timed from the departure (so a later departure, or the actual pickup,
 * carries the stops with it), the towns along the way named.
 */
export function exposureOf(
  fields: TripExposureFields,
  departMs: number,
): { driving: Partial<DrivingOptions>; exposure: ExposureInput } {
  const stops = fields.stops ?? [];
  return {
    driving: {
      nameNear: townNear,
      plannedStops: stops.map((stop) => ({
        afterDepartMin: Math.max(0, (Date.parse(stop.at) - departMs) / 60_000),
        durationMin: stop.durationMin,
      })),
    },
    exposure: {
      vehicle: fields.vehicle ?? null,
      vehicleRangeF: fields.vehicleRangeF ?? null,
      stopParking: stops.map((stop) => stop.parked),
    },
  };
}
