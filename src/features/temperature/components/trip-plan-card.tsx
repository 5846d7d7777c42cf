import { PARKED_WORDS, VEHICLE_CONDITIONING_WORDS } from "@shared/words";
import { useState, type FormEvent } from "react";
import { formatInstant } from "@shared/dates";
import { tripPlanInputSchema } from "@shared/temperature/schemas";
import type { TripPlanDto } from "@shared/temperature/report";
import { formatTemp } from "@shared/units";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { instantToLocalInput } from "@/lib/datetime";
import { parseOptions } from "@/lib/form-resolver";
import { useUnitSystem } from "@/lib/units-preference";
import { useUpdateTripPlan } from "../api/trip-plan";
import { LegVehicleForm } from "./leg-vehicle-form";
import { StopsEditor, stopRowsOf, stopsOf } from "./stops-editor";
import { VEHICLE_NOT_SAID, VehicleFields, vehicleOf, type VehicleForm } from "./vehicle-fields";

const formOf = (plan: TripPlanDto): VehicleForm =>
  plan.vehicle
    ? { vehicle: plan.vehicle, minF: plan.vehicleRangeF?.min ?? 65, maxF: plan.vehicleRangeF?.max ?? 80 }
    : VEHICLE_NOT_SAID;

/** How the box travels on this transfer: the vehicle, the planned stops, each leg's vehicle. */
export function TripPlanCard({
  transferId,
  plan,
  departureAt,
}: {
  transferId: string;
  plan: TripPlanDto;
  departureAt: string;
}) {
  const [system] = useUnitSystem();
  if (!plan.applies) return null;
  const range = plan.vehicleRangeF
    ? ` (${formatTemp(plan.vehicleRangeF.min, system)} to ${formatTemp(plan.vehicleRangeF.max, system)})`
    : "";
  return (
    <div className="flex flex-col gap-3 rounded-md border border-rule p-3">
      <h3 className="font-semibold">How the box travels</h3>
      {plan.followingPickupAt ? (
        <p className="text-sm text-ink-soft">
          The box was picked up {formatInstant(plan.followingPickupAt)}: the model follows the trip from then.
        </p>
      ) : null}
      <p className="text-sm">
        Vehicle: {plan.vehicle ? `${VEHICLE_CONDITIONING_WORDS[plan.vehicle]}${range}` : "not said"}.{" "}
        {plan.stops.length === 0
          ? "No stops planned."
          : `Stops: ${plan.stops.map((s) => `${formatInstant(s.at)}, ${s.durationMin} min, ${PARKED_WORDS[s.parked].toLowerCase()}`).join("; ")}.`}
      </p>
      {plan.canEdit ? <PlanForm transferId={transferId} plan={plan} departureAt={departureAt} /> : null}
      {plan.legs.map((leg) => (
        <LegVehicleForm key={leg.id} transferId={transferId} leg={leg} />
      ))}
    </div>
  );
}

function PlanForm({ transferId, plan, departureAt }: { transferId: string; plan: TripPlanDto; departureAt: string }) {
  const [vehicle, setVehicle] = useState<VehicleForm>(() => formOf(plan));
  const [rows, setRows] = useState(() => stopRowsOf(plan.stops));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useUpdateTripPlan(transferId);
  const serverError = save.error instanceof ApiError ? save.error : null;
  const err = (key: string) => errors[key] ?? (serverError?.field === key ? serverError.message : undefined);

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = tripPlanInputSchema.safeParse({ ...vehicleOf(vehicle), stops: stopsOf(rows) }, parseOptions());
    if (!parsed.success) {
      const found: Record<string, string> = {};
      for (const issue of parsed.error.issues) found[issue.path.join(".")] ??= issue.message;
      setErrors(found);
      return;
    }
    setErrors({});
    save.mutate({ ...parsed.data, vehicleRangeF: parsed.data.vehicleRangeF ?? null });
  }

  return (
    <form className="grid gap-4" onSubmit={submit} noValidate>
      <VehicleFields value={vehicle} onChange={setVehicle} errorFor={err} />
      <StopsEditor rows={rows} onChange={setRows} errorFor={err} startAt={instantToLocalInput(departureAt)} />
      {serverError && !serverError.field ? (
        <Notice tone="block" role="alert">
          {serverError.message}
        </Notice>
      ) : null}
      {save.isSuccess && !save.isPending ? (
        <p className="text-sm text-fern">Saved; the verdict above is for this plan.</p>
      ) : null}
      <div>
        <Button type="submit" busy={save.isPending}>
          Save how the box travels
        </Button>
      </div>
    </form>
  );
}
