import { useState, type FormEvent } from "react";
import { useNavigate } from "react-router";
import { DEFAULT_VEHICLE_RANGE_F } from "@shared/temperature/exposure";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { MeasureField } from "@/components/ui/measure-field";
import { Card, PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { localInputToInstant } from "@/lib/datetime";
import { useCreateRun } from "../api/runs";
import { TransferPicker } from "../components/transfer-picker";

/** The form of "Plan a run": the departure, the van, and the transfers it carries. */
export function RunNewRoute() {
  const navigate = useNavigate();
  const create = useCreateRun();
  const [departLocal, setDepartLocal] = useState("");
  const [climateControlled, setClimateControlled] = useState(false);
  const [range, setRange] = useState<{ min: number | null; max: number | null }>({ ...DEFAULT_VEHICLE_RANGE_F });
  const [transferIds, setTransferIds] = useState<string[]>([]);
  const serverError = create.error instanceof ApiError ? create.error : null;
  const err = (prefix: string) =>
    serverError?.field === prefix || serverError?.field?.startsWith(`${prefix}.`) ? serverError.message : undefined;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    create.mutate(
      {
        departAt: localInputToInstant(departLocal),
        climateControlled,
        vehicleRangeF: climateControlled ? { min: range.min ?? Number.NaN, max: range.max ?? Number.NaN } : null,
        transferIds,
      },
      { onSuccess: (run) => navigate(paths.run.href(run.id)) },
    );
  };

  return (
    <div className="mx-auto grid max-w-3xl gap-5">
      <PageHeader title="Plan a run">
        Pick the transfers the van carries; Hatchway orders the stops (each pickup before its drop-off), times them and
        places the rests. You can move stops afterwards.
      </PageHeader>
      <Card>
        <form onSubmit={submit} className="grid gap-5" noValidate>
          <TextField
            label="Leaves"
            type="datetime-local"
            value={departLocal}
            onChange={(event) => setDepartLocal(event.target.value)}
            error={err("departAt")}
            hint="When the van leaves for the first pickup, in your time zone."
          />
          <fieldset className="grid gap-3">
            <legend className="text-sm font-semibold">The van</legend>
            <label className="flex min-h-11 items-center gap-3">
              <input
                type="checkbox"
                className="h-5 w-5 accent-fern"
                checked={climateControlled}
                onChange={(event) => setClimateControlled(event.target.checked)}
              />
              Climate-controlled (heated and cooled to a set range)
            </label>
            {climateControlled ? (
              <div className="grid gap-4 sm:grid-cols-2">
                <MeasureField
                  kind="temperature"
                  label="Set range from"
                  value={range.min}
                  onChange={(min) => setRange((r) => ({ ...r, min }))}
                  error={err("vehicleRangeF")}
                />
                <MeasureField
                  kind="temperature"
                  label="Set range to"
                  value={range.max}
                  onChange={(max) => setRange((r) => ({ ...r, max }))}
                />
              </div>
            ) : (
              <p className="text-sm text-ink-soft">
                Without climate control the temperature check models the van as unconditioned.
              </p>
            )}
          </fieldset>
          <TransferPicker
            legend="Transfers on the run"
            chosen={transferIds}
            onChange={setTransferIds}
            error={err("transferIds")}
          />
          {serverError && !serverError.field ? (
            <Notice tone="block" role="alert">
              {serverError.message}
            </Notice>
          ) : null}
          <div>
            <Button type="submit" busy={create.isPending}>
              Plan the run
            </Button>
          </div>
        </form>
      </Card>
    </div>
  );
}
