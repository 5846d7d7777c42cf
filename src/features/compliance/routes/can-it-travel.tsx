import { ANIMAL_ORIGIN_WORDS, DOCUMENT_KIND_WORDS, PURPOSE_WORDS, SEX_WORDS } from "@shared/words";
import { Controller, useFieldArray, useForm, type UseFormReturn } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import type { z } from "zod";
import { ANIMAL_ORIGINS, DOCUMENT_KINDS, PURPOSES, SEXES, US_STATES } from "@shared/constants";
import { JURISDICTIONS, jurisdictionName } from "@shared/compliance/jurisdiction";
import { evaluateRequestSchema } from "@shared/compliance/schemas";
import { addDays } from "@shared/temperature/zoned-time";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { MeasureField } from "@/components/ui/measure-field";
import { Card, PageHeader } from "@/components/ui/page";
import { TaxonCombobox } from "@/components/ui/taxon-combobox";
import { ApiError } from "@/lib/api-client";
import { searchTaxa } from "@/lib/taxa-search";
import { useEvaluate } from "../api/evaluate";
import { CoverageList } from "../components/coverage-list";
import { FindingsByAnimal, ShipmentFindings } from "../components/findings-list";
import { LegalCaution } from "../components/legal-caution";
import { LinesField } from "../components/lines-field";
import { VerdictBanner } from "../components/verdict-banner";

type FormIn = z.input<typeof evaluateRequestSchema>;
type FormOut = z.output<typeof evaluateRequestSchema>;
type Form = UseFormReturn<FormIn, unknown, FormOut>;

const stateOptions = US_STATES.map((s) => ({ value: s, label: `${jurisdictionName(s)} (${s})` }));
const emptyToNull = (value: unknown) => (value === "" || value === undefined ? null : value);
const today = () => new Date().toISOString().slice(0, 10);
const newAnimal = (): FormIn["animals"][number] => ({
  scientificName: "",
  count: 1,
  lengthMm: null,
  origin: "captive_bred",
  sex: "unknown",
});
const newDocument = (): FormIn["documents"][number] => ({
  kind: "cvi",
  jurisdiction: "US",
  speciesCovered: [],
  validFrom: null,
  validTo: null,
  issuedOn: today(),
  statements: [],
});

/** "Python bivittatus" as a brief taxon for the picker, which shows what was chosen by its name. */
const chosen = (scientificName: string) =>
  scientificName
    ? { id: scientificName, scientificName, commonName: null, venomous: false, profileGroup: null, rank: "species" }
    : null;

function AnimalRows({ form }: { form: Form }) {
  const rows = useFieldArray({ control: form.control, name: "animals" });
  const e = form.formState.errors.animals;
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="text-sm font-semibold">Animals</legend>
      {rows.fields.map((row, index) => (
        <div
          key={row.id}
          className="grid items-start gap-3 rounded-card border border-rule bg-paper p-3 sm:grid-cols-2"
        >
          <div className="sm:col-span-2">
            <Controller
              control={form.control}
              name={`animals.${index}.scientificName`}
              render={({ field }) => (
                <TaxonCombobox
                  label="Species"
                  value={chosen(field.value)}
                  onChange={(taxon) => field.onChange(taxon?.scientificName ?? "")}
                  onBlur={field.onBlur}
                  search={searchTaxa}
                  error={e?.[index]?.scientificName?.message}
                />
              )}
            />
          </div>
          <TextField
            label="Count"
            type="number"
            min={1}
            error={e?.[index]?.count?.message}
            {...form.register(`animals.${index}.count`, { valueAsNumber: true })}
          />
          <Controller
            control={form.control}
            name={`animals.${index}.lengthMm`}
            render={({ field }) => (
              <MeasureField
                kind="length"
                label="Length"
                hint="Carapace for turtles"
                value={field.value}
                onChange={field.onChange}
                onBlur={field.onBlur}
                error={e?.[index]?.lengthMm?.message}
              />
            )}
          />
          <SelectField
            label="Origin"
            options={ANIMAL_ORIGINS.map((o) => ({ value: o, label: ANIMAL_ORIGIN_WORDS[o] }))}
            {...form.register(`animals.${index}.origin`)}
          />
          <SelectField
            label="Sex"
            options={SEXES.map((s) => ({ value: s, label: SEX_WORDS[s] }))}
            {...form.register(`animals.${index}.sex`)}
          />
          <Button
            type="button"
            variant="ghost"
            className="justify-self-start"
            disabled={rows.fields.length === 1}
            onClick={() => rows.remove(index)}
          >
            Remove this line
          </Button>
        </div>
      ))}
      <Button type="button" variant="secondary" className="self-start" onClick={() => rows.append(newAnimal())}>
        Add a species
      </Button>
    </fieldset>
  );
}

function DocumentRows({ form }: { form: Form }) {
  const rows = useFieldArray({ control: form.control, name: "documents" });
  const e = form.formState.errors.documents;
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="text-sm font-semibold">Permits and certificates you would have (optional)</legend>
      {rows.fields.map((row, index) => (
        <div key={row.id} className="grid gap-3 rounded-card border border-rule bg-paper p-3 sm:grid-cols-3">
          <SelectField
            label="Kind"
            options={DOCUMENT_KINDS.map((k) => ({ value: k, label: DOCUMENT_KIND_WORDS[k] }))}
            {...form.register(`documents.${index}.kind`)}
          />
          <SelectField
            label="Issued by"
            options={JURISDICTIONS.map((j) => ({
              value: j,
              label: j === "US" ? "Federal (US)" : `${jurisdictionName(j)} (${j})`,
            }))}
            {...form.register(`documents.${index}.jurisdiction`)}
          />
          <SelectField
            label="Held by"
            options={[
              { value: "", label: "Either party" },
              { value: "sender", label: "The sender" },
              { value: "receiver", label: "The receiver" },
            ]}
            {...form.register(`documents.${index}.holderSide`, {
              setValueAs: (v: unknown) => (v === "" || v == null ? undefined : v),
            })}
          />
          <TextField
            label="Issued on"
            type="date"
            error={e?.[index]?.issuedOn?.message}
            {...form.register(`documents.${index}.issuedOn`, { setValueAs: emptyToNull })}
          />
          <TextField
            label="Valid from"
            type="date"
            error={e?.[index]?.validFrom?.message}
            {...form.register(`documents.${index}.validFrom`, { setValueAs: emptyToNull })}
          />
          <TextField
            label="Valid to"
            type="date"
            error={e?.[index]?.validTo?.message}
            {...form.register(`documents.${index}.validTo`, { setValueAs: emptyToNull })}
          />
          <Controller
            control={form.control}
            name={`documents.${index}.speciesCovered`}
            render={({ field }) => (
              <LinesField label="Species named, one per line" value={field.value} onChange={field.onChange} />
            )}
          />
          <Controller
            control={form.control}
            name={`documents.${index}.statements`}
            render={({ field }) => (
              <LinesField
                label="Statements, one per line"
                hint="e.g. examined and found free of ticks"
                value={field.value}
                onChange={field.onChange}
              />
            )}
          />
          <Button type="button" variant="ghost" className="self-end" onClick={() => rows.remove(index)}>
            Remove
          </Button>
        </div>
      ))}
      <Button type="button" variant="secondary" className="self-start" onClick={() => rows.append(newDocument())}>
        Add a permit or certificate
      </Button>
    </fieldset>
  );
}

type Suggestion = { scientificName: string; commonName: string | null };

/** The 400 for a species not in the list carries close matches: offer them as one-tap fixes. */
function UnknownSpecies({ error, form }: { error: ApiError; form: Form }) {
  const detail = (error.body?.error ?? {}) as { suggestions?: Suggestion[] };
  const index = Number(/^animals\.(\d+)\./.exec(error.field ?? "")?.[1] ?? -1);
  return (
    <Notice tone="block" role="alert" title="That species is not in the list">
      <p>{error.message}</p>
      {index >= 0 && detail.suggestions?.length ? (
        <div className="mt-2 flex flex-wrap gap-2">
          {detail.suggestions.map((s) => (
            <Button
              key={s.scientificName}
              type="button"
              variant="secondary"
              onClick={() => form.setValue(`animals.${index}.scientificName`, s.scientificName)}
            >
              <i>{s.scientificName}</i>
              {s.commonName ? ` (${s.commonName})` : ""}
            </Button>
          ))}
        </div>
      ) : null}
    </Notice>
  );
}

/** "Can this travel?": a what-if against the rule library before any transfer is drafted. Nothing is stored. */
export function CanItTravelRoute() {
  const evaluate = useEvaluate();
  const form: Form = useForm<FormIn, unknown, FormOut>({
    resolver: keeperResolver(evaluateRequestSchema),
    defaultValues: {
      originState: "TN",
      destinationState: "OH",
      transitStates: [],
      shipDate: addDays(today(), 3),
      purpose: "private_keeping",
      sale: false,
      animals: [newAnimal()],
      documents: [],
    },
  });
  const e = form.formState.errors;
  const submit = form.handleSubmit((request) => evaluate.mutate(request));
  const error = evaluate.error;

  return (
    <>
      <PageHeader title="Can this travel?">
        Check animals against the federal rules and those of the states on the route before you draft a transfer.
        Nothing is saved.
      </PageHeader>
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <Card>
          <form onSubmit={submit} noValidate className="flex flex-col gap-5">
            <div className="grid gap-4 sm:grid-cols-2">
              <SelectField
                label="From"
                options={stateOptions}
                error={e.originState?.message}
                {...form.register("originState")}
              />
              <SelectField
                label="To"
                options={stateOptions}
                error={e.destinationState?.message}
                {...form.register("destinationState")}
              />
              <TextField
                label="Through (ground routes)"
                hint="USPS codes in order, e.g. KY, OH"
                error={e.transitStates?.message ?? e.transitStates?.[0]?.message}
                {...form.register("transitStates", {
                  setValueAs: (v: unknown) =>
                    typeof v === "string"
                      ? v
                          .split(/[\s,]+/)
                          .map((s) => s.toUpperCase())
                          .filter(Boolean)
                      : v,
                })}
              />
              <TextField label="Ship date" type="date" error={e.shipDate?.message} {...form.register("shipDate")} />
              <SelectField
                label="Purpose"
                options={PURPOSES.map((p) => ({ value: p, label: PURPOSE_WORDS[p] }))}
                {...form.register("purpose")}
              />
              <label className="flex min-h-11 items-center gap-2 self-end text-sm">
                <input type="checkbox" className="h-5 w-5" {...form.register("sale")} />
                The animals are sold (or given in connection with a business)
              </label>
            </div>
            <AnimalRows form={form} />
            <DocumentRows form={form} />
            <Button type="submit" size="lg" className="self-start" busy={evaluate.isPending}>
              Check the rules
            </Button>
          </form>
        </Card>
        <div className="flex flex-col gap-4" aria-live="polite">
          {error instanceof ApiError && error.code === "unknown_species" ? (
            <UnknownSpecies error={error} form={form} />
          ) : error ? (
            <Notice tone="block" role="alert">
              {error instanceof ApiError ? error.message : "The check did not run."}
            </Notice>
          ) : null}
          {evaluate.data ? (
            <>
              <VerdictBanner verdict={evaluate.data.verdict} coverage={evaluate.data.coverage} />
              <CoverageList coverage={evaluate.data.coverage} transitFrom="listed" />
              <ShipmentFindings findings={evaluate.data.shipmentFindings} />
              <FindingsByAnimal animals={evaluate.data.animals} />
            </>
          ) : (
            <Notice tone="info" title="How this works">
              Each species is looked up with its older names, then every rule of the library that applies on the ship
              date is listed with its source. Add the permits and certificates you would have to see whether they
              satisfy the rules.
            </Notice>
          )}
          <LegalCaution />
        </div>
      </div>
    </>
  );
}
