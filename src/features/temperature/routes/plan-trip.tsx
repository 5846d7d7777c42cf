import { parseOptions } from "@/lib/form-resolver";
import { PACK_WORDS, TRANSPORT_MODE_WORDS, WALL_MATERIAL_WORDS } from "@shared/words";
import { useState, type FormEvent } from "react";
import { Link } from "react-router";
import { paths } from "@/config/paths";
import {
  PACK_KINDS,
  PROFILE_GROUPS,
  TRANSPORT_MODES,
  WALL_MATERIALS,
  type PackKind,
  type ProfileGroup,
  type TransportMode,
  type WallMaterial,
} from "@shared/constants";
import type { TaxonBriefDto } from "@shared/schemas/transfer";
import { DEFAULT_PROFILES } from "@shared/temperature/profiles";
import { whatIfInputSchema, type WhatIfInput } from "@shared/temperature/schemas";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { MeasureField } from "@/components/ui/measure-field";
import { Card, PageHeader } from "@/components/ui/page";
import { TaxonCombobox } from "@/components/ui/taxon-combobox";
import { ApiError } from "@/lib/api-client";
import { instantToLocalInput, localInputToInstant } from "@/lib/datetime";
import { searchTaxa } from "@/lib/taxa-search";
import { useAssessTrip } from "../api/assess-trip";
import { useProfiles } from "../api/profiles";
import { AssessmentDetails } from "../components/assessment-details";
import { TemperatureCautions } from "../components/temperature-cautions";
import { StopsEditor, stopsOf, type StopRow } from "../components/stops-editor";
import { TemperatureChart } from "../components/temperature-chart";
import { TripMap } from "../components/trip-map";
import { VEHICLE_NOT_SAID, VehicleFields, vehicleOf, type VehicleForm } from "../components/vehicle-fields";
import { WeatherScenarioSwitch } from "../components/weather-scenario-switch";

type Form = {
  originZip: string;
  destinationZip: string;
  hubZip: string;
  departLocal: string;
  mode: TransportMode;
  by: "species" | "profile";
  taxon: TaxonBriefDto | null;
  profile: ProfileGroup;
  wall: WallMaterial;
  wallThicknessMm: number | null;
  lengthMm: number | null;
  widthMm: number | null;
  heightMm: number | null;
  contentsG: string;
  pack: PackKind;
  /** A steady outside temperature instead of the forecast, °F; null for the forecast. */
  steadyF: number | null;
  /** Ground courier and hand delivery: how the vehicle is held, and the driver's stops. */
  vehicle: VehicleForm;
  stops: StopRow[];
};

function tomorrowAtTen(): string {
  const d = new Date(Date.now() + 86_400_000);
  d.setHours(10, 0, 0, 0);
  return instantToLocalInput(d.toISOString());
}

// A medium foam shipper, 1.5 in walls, one animal and its cup [practice].
const START: Form = {
  originZip: "",
  destinationZip: "",
  hubZip: "",
  departLocal: "",
  mode: "overnight_air",
  by: "species",
  taxon: null,
  profile: "temperate_snake",
  wall: "eps",
  wallThicknessMm: 38.1,
  lengthMm: 355.6,
  widthMm: 304.8,
  heightMm: 254,
  contentsG: "500",
  pack: "none",
  steadyF: null,
  vehicle: VEHICLE_NOT_SAID,
  stops: [],
};

/** The form as the what-if request; what the schema cannot read is left for it to name. */
function requestOf(f: Form): unknown {
  const departAt = localInputToInstant(f.departLocal);
  return {
    origin: { zip: f.originZip.trim() },
    destination: { zip: f.destinationZip.trim() },
    ...(f.mode === "overnight_air" && f.hubZip.trim() ? { hub: { zip: f.hubZip.trim() } } : {}),
    departAt,
    mode: f.mode,
    ...(f.by === "profile" ? { profile: f.profile } : { scientificName: f.taxon?.scientificName }),
    box: {
      wall: f.wall,
      wallThicknessMm: f.wallThicknessMm,
      lengthMm: f.lengthMm,
      widthMm: f.widthMm,
      heightMm: f.heightMm,
      contentsG: f.contentsG.trim() === "" ? undefined : Number(f.contentsG),
      pack: f.pack,
    },
    ...(f.steadyF !== null ? { ambientOverrideF: [{ at: departAt, tempF: f.steadyF }] } : {}),
    ...(f.mode === "overnight_air" ? {} : groundFields(f)),
  };
}

/** The vehicle and stops of a ground trip, leaving out what the planner did not give. */
function groundFields(f: Form) {
  const { vehicle, vehicleRangeF } = vehicleOf(f.vehicle);
  return {
    ...(vehicle ? { vehicle } : {}),
    ...(vehicleRangeF ? { vehicleRangeF } : {}),
    ...(f.stops.length ? { stops: stopsOf(f.stops) } : {}),
  };
}

/** Field path → first message, from the same schema the server parses with. */
function validate(f: Form): { input: WhatIfInput | null; errors: Record<string, string> } {
  const result = whatIfInputSchema.safeParse(requestOf(f), parseOptions());
  if (result.success) return { input: result.data, errors: {} };
  const errors: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join(".");
    errors[key] ??= issue.message;
  }
  return { input: null, errors };
}

/** Plan a trip before a transfer exists: the forecast (or a temperature of your own) against a box and a species. */
export function PlanTripRoute() {
  const [form, setForm] = useState<Form>(() => ({ ...START, departLocal: tomorrowAtTen() }));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const assess = useAssessTrip();
  const profiles = useProfiles();
  const set = <K extends keyof Form>(key: K, value: Form[K]) => setForm((f) => ({ ...f, [key]: value }));
  const labelOf = (g: ProfileGroup) =>
    profiles.data?.profiles.find((p) => p.group === g)?.label ?? DEFAULT_PROFILES[g].label;
  const serverError = assess.error instanceof ApiError ? assess.error : null;
  const suggestions = (serverError?.body?.error as { suggestions?: string[] } | undefined)?.suggestions ?? [];
  const err = (key: string) => errors[key] ?? (serverError?.field === key ? serverError.message : undefined);

  function submit(event: FormEvent) {
    event.preventDefault();
    const { input, errors: found } = validate(form);
    setErrors(found);
    if (input) assess.mutate(input);
  }

  return (
    <>
      <PageHeader title="Plan a trip" eyebrow="Temperature">
        Before you draft a transfer: how warm or cold the box would get on a given day, and what to pack. Nothing is
        saved.
      </PageHeader>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <Card title="The trip">
          <form className="grid gap-4" onSubmit={submit} noValidate>
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField
                label="From (ZIP code)"
                inputMode="numeric"
                autoComplete="postal-code"
                value={form.originZip}
                onChange={(e) => set("originZip", e.target.value)}
                error={err("origin.zip")}
              />
              <TextField
                label="To (ZIP code)"
                inputMode="numeric"
                value={form.destinationZip}
                onChange={(e) => set("destinationZip", e.target.value)}
                error={err("destination.zip")}
              />
              <SelectField
                label="How"
                options={TRANSPORT_MODES.map((m) => ({ value: m, label: TRANSPORT_MODE_WORDS[m] }))}
                value={form.mode}
                onChange={(e) => set("mode", e.target.value as TransportMode)}
                error={err("mode")}
              />
              {form.mode === "overnight_air" ? (
                <TextField
                  label="Air hub (ZIP code, optional)"
                  inputMode="numeric"
                  value={form.hubZip}
                  onChange={(e) => set("hubZip", e.target.value)}
                  error={err("hub.zip")}
                  hint="Leave empty to split the night between both ends."
                />
              ) : null}
              <TextField
                label="Leaves"
                type="datetime-local"
                value={form.departLocal}
                onChange={(e) => set("departLocal", e.target.value)}
                error={err("departAt")}
              />
            </div>

            <fieldset className="grid gap-3">
              <legend className="text-sm font-semibold">Animals</legend>
              <div className="flex flex-wrap gap-4 text-sm">
                {(["species", "profile"] as const).map((by) => (
                  <label key={by} className="inline-flex min-h-11 items-center gap-2">
                    <input type="radio" name="by" checked={form.by === by} onChange={() => set("by", by)} />
                    {by === "species" ? "By species" : "By temperature profile"}
                  </label>
                ))}
              </div>
              {form.by === "species" ? (
                <TaxonCombobox
                  label="Species"
                  value={form.taxon}
                  onChange={(t) => set("taxon", t)}
                  search={searchTaxa}
                  error={err("scientificName") ?? err("profile")}
                />
              ) : (
                <SelectField
                  label="Temperature profile"
                  options={PROFILE_GROUPS.map((g) => ({ value: g, label: labelOf(g) }))}
                  value={form.profile}
                  onChange={(e) => set("profile", e.target.value as ProfileGroup)}
                  error={err("profile")}
                />
              )}
              {suggestions.length > 0 ? (
                <p className="text-sm text-ink-soft">Did you mean: {suggestions.join(", ")}?</p>
              ) : null}
            </fieldset>

            <fieldset className="grid gap-4 sm:grid-cols-2">
              <legend className="text-sm font-semibold sm:col-span-2">The box (outside measurements)</legend>
              <MeasureField
                kind="length"
                label="Length"
                value={form.lengthMm}
                onChange={(v) => set("lengthMm", v)}
                error={err("box.lengthMm")}
              />
              <MeasureField
                kind="length"
                label="Width"
                value={form.widthMm}
                onChange={(v) => set("widthMm", v)}
                error={err("box.widthMm")}
              />
              <MeasureField
                kind="length"
                label="Height"
                value={form.heightMm}
                onChange={(v) => set("heightMm", v)}
                error={err("box.heightMm")}
              />
              <MeasureField
                kind="length"
                label="Wall thickness"
                value={form.wallThicknessMm}
                onChange={(v) => set("wallThicknessMm", v)}
                error={err("box.wallThicknessMm")}
              />
              <SelectField
                label="Wall"
                options={WALL_MATERIALS.map((w) => ({ value: w, label: WALL_MATERIAL_WORDS[w] }))}
                value={form.wall}
                onChange={(e) => set("wall", e.target.value as WallMaterial)}
              />
              <SelectField
                label="Pack you plan"
                options={PACK_KINDS.map((p) => ({ value: p, label: PACK_WORDS[p] }))}
                value={form.pack}
                onChange={(e) => set("pack", e.target.value as PackKind)}
              />
              <TextField
                label="Contents (g)"
                inputMode="numeric"
                value={form.contentsG}
                onChange={(e) => set("contentsG", e.target.value)}
                error={err("box.contentsG")}
                hint="Animals, cups and damp substrate together."
              />
            </fieldset>

            {form.mode === "overnight_air" ? null : (
              <fieldset className="grid gap-4">
                <legend className="text-sm font-semibold">The vehicle and the stops</legend>
                <VehicleFields value={form.vehicle} onChange={(v) => set("vehicle", v)} errorFor={err} />
                <StopsEditor
                  rows={form.stops}
                  onChange={(rows) => set("stops", rows)}
                  errorFor={err}
                  startAt={form.departLocal}
                />
                <p className="text-sm text-ink-soft">
                  Never leave animals in a parked vehicle: a closed car in the sun gains about 40 °F in an hour, even on
                  a mild day.
                </p>
              </fieldset>
            )}

            <MeasureField
              kind="temperature"
              label="Or a steady outside temperature instead of the forecast"
              value={form.steadyF}
              onChange={(v) => set("steadyF", v)}
              error={err("ambientOverrideF.0.tempF")}
              hint="Leave empty to use the forecast for the origin, the destination and the way between."
            />
            {serverError && !serverError.field ? (
              <Notice tone="block" role="alert">
                {serverError.message}
              </Notice>
            ) : null}
            <div>
              <Button type="submit" busy={assess.isPending}>
                Check the trip
              </Button>
            </div>
          </form>
        </Card>

        <div className="flex flex-col gap-4">
          <WeatherScenarioSwitch />
          {assess.data ? (
            <Card title="What to expect">
              <div className="flex flex-col gap-4">
                <AssessmentDetails report={assess.data} />
                <TemperatureChart report={assess.data} />
                <TripMap report={assess.data} title="the planned trip" />
              </div>
            </Card>
          ) : (
            <Notice tone="info" title="How it works">
              Hatchway lays out the trip hour by hour, reads the forecast at each end and along the way, works out the
              air around the box where it is (a vehicle, a carrier&rsquo;s building, a parked car, a doorstep), and
              models how the inside of the box follows it with and without a heat or cold pack. The bands come from the
              shipping guideline for the species&rsquo; group.
            </Notice>
          )}
          <p className="text-sm">
            <Link to={paths.modelAccuracy} className="text-fern underline">
              How close the model has been to the box readings on your transfers
            </Link>
          </p>
          <TemperatureCautions />
        </div>
      </div>
    </>
  );
}
