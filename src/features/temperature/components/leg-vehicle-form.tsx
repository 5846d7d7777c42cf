import { VEHICLE_CONDITIONING_WORDS } from "@shared/words";
import { useState, type FormEvent } from "react";
import { legVehicleInputSchema } from "@shared/temperature/schemas";
import type { TripPlanDto } from "@shared/temperature/report";
import { formatTemp } from "@shared/units";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/api-client";
import { parseOptions } from "@/lib/form-resolver";
import { useUnitSystem } from "@/lib/units-preference";
import { useDeclareLegVehicle } from "../api/trip-plan";
import { VEHICLE_NOT_SAID, VehicleFields, vehicleOf, type VehicleForm } from "./vehicle-fields";

type LegPlan = TripPlanDto["legs"][number];

/** One leg's vehicle as its courier declared it; the courier (or the sender) may change it. */
export function LegVehicleForm({ transferId, leg }: { transferId: string; leg: LegPlan }) {
  const [system] = useUnitSystem();
  const [value, setValue] = useState<VehicleForm>(() =>
    leg.vehicle
      ? { vehicle: leg.vehicle, minF: leg.vehicleRangeF?.min ?? 65, maxF: leg.vehicleRangeF?.max ?? 80 }
      : VEHICLE_NOT_SAID,
  );
  const [errors, setErrors] = useState<Record<string, string>>({});
  const declare = useDeclareLegVehicle(transferId);
  const serverError = declare.error instanceof ApiError ? declare.error : null;
  const err = (key: string) => errors[key] ?? (serverError?.field === key ? serverError.message : undefined);
  const said = leg.vehicle
    ? `${VEHICLE_CONDITIONING_WORDS[leg.vehicle]}${leg.vehicleRangeF ? ` (${formatTemp(leg.vehicleRangeF.min, system)} to ${formatTemp(leg.vehicleRangeF.max, system)})` : ""}`
    : "not declared";
  const title = `Leg ${leg.sequence}, ${leg.courierName}`;

  if (!leg.canDeclare)
    return (
      <p className="text-sm">
        {title}: {said}.
      </p>
    );

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = legVehicleInputSchema.safeParse(vehicleOf(value), parseOptions());
    if (!parsed.success) {
      const found: Record<string, string> = {};
      for (const issue of parsed.error.issues) found[issue.path.join(".")] ??= issue.message;
      setErrors(found);
      return;
    }
    setErrors({});
    declare.mutate({ legId: leg.id, body: { ...parsed.data, vehicleRangeF: parsed.data.vehicleRangeF ?? null } });
  }

  return (
    <form className="grid gap-3 border-t border-rule pt-3" onSubmit={submit} noValidate>
      <VehicleFields value={value} onChange={setValue} errorFor={err} label={`${title}: the vehicle`} />
      {serverError && !serverError.field ? <p className="text-sm text-brick">{serverError.message}</p> : null}
      <div>
        <Button type="submit" variant="secondary" busy={declare.isPending}>
          Save this leg&rsquo;s vehicle
        </Button>
      </div>
    </form>
  );
}
