import { VEHICLE_CONDITIONING_WORDS } from "@shared/words";
import { VEHICLE_CONDITIONINGS, type VehicleConditioning } from "@shared/constants";
import { DEFAULT_VEHICLE_RANGE_F } from "@shared/temperature/exposure";
import { SelectField } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";

/** The vehicle as a form holds it: not said, or how it is held, with a set range for climate control. */
export type VehicleForm = { vehicle: VehicleConditioning | ""; minF: number | null; maxF: number | null };

export const VEHICLE_NOT_SAID: VehicleForm = {
  vehicle: "",
  minF: DEFAULT_VEHICLE_RANGE_F.min,
  maxF: DEFAULT_VEHICLE_RANGE_F.max,
};

/** The form's vehicle as the API takes it. */
export function vehicleOf(form: VehicleForm) {
  return {
    vehicle: form.vehicle === "" ? null : form.vehicle,
    vehicleRangeF: form.vehicle === "climate_controlled" ? { min: form.minF, max: form.maxF } : null,
  };
}

/** How the vehicle is heated or cooled, and its set range when it is climate-controlled. */
export function VehicleFields({
  value,
  onChange,
  errorFor,
  label = "How the vehicle is heated or cooled",
}: {
  value: VehicleForm;
  onChange: (value: VehicleForm) => void;
  errorFor: (path: string) => string | undefined;
  label?: string;
}) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <SelectField
          label={label}
          options={[
            { value: "", label: "Not said" },
            ...VEHICLE_CONDITIONINGS.map((v) => ({ value: v, label: VEHICLE_CONDITIONING_WORDS[v] })),
          ]}
          value={value.vehicle}
          onChange={(e) => onChange({ ...value, vehicle: e.target.value as VehicleForm["vehicle"] })}
          error={errorFor("vehicle")}
          hint="Not said: modelled as not climate-controlled, and the verdict says what a climate-controlled vehicle would change."
        />
      </div>
      {value.vehicle === "climate_controlled" ? (
        <>
          <MeasureField
            kind="temperature"
            label="Set range, lowest"
            value={value.minF}
            onChange={(v) => onChange({ ...value, minF: v })}
            error={errorFor("vehicleRangeF.min")}
          />
          <MeasureField
            kind="temperature"
            label="Set range, highest"
            value={value.maxF}
            onChange={(v) => onChange({ ...value, maxF: v })}
            error={errorFor("vehicleRangeF.max") ?? errorFor("vehicleRangeF")}
          />
        </>
      ) : null}
    </div>
  );
}
