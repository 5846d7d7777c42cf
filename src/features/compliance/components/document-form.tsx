import { DOCUMENT_KIND_WORDS } from "@shared/words";
import { Controller, useFieldArray, useForm, type FieldErrors } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import type { z } from "zod";
import { DOCUMENT_KINDS } from "@shared/constants";
import { JURISDICTIONS, jurisdictionName } from "@shared/compliance/jurisdiction";
import { documentInputSchema, type DocumentDto } from "@shared/schemas/compliance";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useCreateDocument, useUpdateDocument } from "../api/documents";
import { LinesField } from "./lines-field";
import { TaxaPicker } from "./taxa-picker";

type FormIn = z.input<typeof documentInputSchema>;
type FormOut = z.output<typeof documentInputSchema>;

const emptyToNull = (value: unknown) => (value === "" || value === undefined ? null : value);
const ACCREDITED = [
  { value: "", label: "Not recorded" },
  { value: "true", label: "Yes, USDA-accredited" },
  { value: "false", label: "No" },
];

function defaultsOf(existing: DocumentDto | undefined, holderName: string): FormIn {
  if (!existing) {
    return {
      kind: "state_import_permit",
      jurisdiction: "US",
      number: "",
      holderName,
      speciesCovered: [],
      validFrom: null,
      validTo: null,
      issuedOn: null,
      veterinarianName: null,
      veterinarianAccredited: null,
      inspectionDate: null,
      statements: [],
      animalsCovered: [],
      notes: null,
    };
  }
  const details = existing.details;
  return {
    kind: existing.kind,
    jurisdiction: existing.jurisdiction,
    number: existing.number,
    holderName: existing.holderName,
    speciesCovered: details?.speciesCovered ?? [],
    validFrom: existing.validFrom,
    validTo: existing.validTo,
    issuedOn: existing.issuedOn,
    veterinarianName: details?.veterinarianName ?? null,
    veterinarianAccredited: details?.veterinarianAccredited ?? null,
    inspectionDate: details?.inspectionDate ?? null,
    statements: details?.statements ?? [],
    animalsCovered: details?.animalsCovered ?? [],
    notes: details?.notes ?? null,
  };
}

/** The first message react-hook-form holds for a list field, wherever in the list it sits. */
function listError(errors: FieldErrors<FormIn>, name: "speciesCovered" | "statements"): string | undefined {
  const entry = errors[name] as { message?: string } | { message?: string }[] | undefined;
  if (!entry) return undefined;
  if (Array.isArray(entry)) return entry.find((e) => e?.message)?.message;
  return entry.message;
}

/** Records a permit or certificate, or edits one; the same shared schema checks it here and on the server. */
export function DocumentForm({
  existing,
  holderName,
  onDone,
}: {
  existing?: DocumentDto;
  holderName: string;
  onDone: () => void;
}) {
  const create = useCreateDocument();
  const update = useUpdateDocument();
  const mutation = existing ? update : create;
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: keeperResolver(documentInputSchema),
    defaultValues: defaultsOf(existing, holderName),
  });
  const animals = useFieldArray({ control: form.control, name: "animalsCovered" });
  const e = form.formState.errors;
  const isCertificate = form.watch("kind") === "cvi";
  const submit = form.handleSubmit((values) => {
    if (existing) update.mutate({ id: existing.id, input: values }, { onSuccess: onDone });
    else create.mutate(values, { onSuccess: onDone });
  });
  const date = (name: "validFrom" | "validTo" | "issuedOn" | "inspectionDate") =>
    form.register(name, { setValueAs: emptyToNull });

  return (
    <form className="grid gap-4 sm:grid-cols-2" onSubmit={submit} noValidate>
      {mutation.error ? (
        <div className="sm:col-span-2">
          <Notice tone="block" role="alert">
            {mutation.error instanceof ApiError ? mutation.error.message : "Not saved."}
          </Notice>
        </div>
      ) : null}
      <SelectField
        label="Kind"
        options={DOCUMENT_KINDS.map((k) => ({ value: k, label: DOCUMENT_KIND_WORDS[k] }))}
        {...form.register("kind")}
      />
      <SelectField
        label="Issued by"
        options={JURISDICTIONS.map((j) => ({
          value: j,
          label: j === "US" ? "Federal (US)" : `${jurisdictionName(j)} (${j})`,
        }))}
        error={e.jurisdiction?.message}
        {...form.register("jurisdiction")}
      />
      <TextField label="Number" error={e.number?.message} {...form.register("number")} />
      <TextField label="Holder (as printed)" error={e.holderName?.message} {...form.register("holderName")} />
      <TextField label="Valid from" type="date" error={e.validFrom?.message} {...date("validFrom")} />
      <TextField label="Valid to (last valid day)" type="date" error={e.validTo?.message} {...date("validTo")} />
      <TextField
        label="Issued on"
        type="date"
        error={e.issuedOn?.message}
        hint={isCertificate ? "A certificate's age counts from this day." : undefined}
        {...date("issuedOn")}
      />
      <div className="sm:col-span-2">
        <Controller
          control={form.control}
          name="speciesCovered"
          render={({ field }) => (
            <TaxaPicker
              label="Species covered"
              hint="Choose each from the species list, at any rank; older names are found too."
              value={field.value}
              onChange={field.onChange}
              error={listError(e, "speciesCovered")}
            />
          )}
        />
      </div>
      {isCertificate ? (
        <fieldset className="grid gap-4 rounded-card border border-rule p-4 sm:col-span-2 sm:grid-cols-2">
          <legend className="px-1 text-sm font-semibold">Certificate of veterinary inspection</legend>
          <TextField
            label="Veterinarian"
            error={e.veterinarianName?.message}
            {...form.register("veterinarianName", { setValueAs: emptyToNull })}
          />
          <SelectField
            label="Accredited veterinarian"
            options={ACCREDITED}
            {...form.register("veterinarianAccredited", {
              setValueAs: (v: unknown) =>
                v === "true" || v === true ? true : v === "false" || v === false ? false : null,
            })}
          />
          <TextField
            label="Inspection date"
            type="date"
            error={e.inspectionDate?.message}
            {...date("inspectionDate")}
          />
          <Controller
            control={form.control}
            name="statements"
            render={({ field }) => (
              <LinesField
                label="Statements, one per line"
                hint="For example: examined and found free of ticks."
                value={field.value}
                onChange={field.onChange}
                onBlur={field.onBlur}
                error={listError(e, "statements")}
              />
            )}
          />
          <div className="flex flex-col gap-2 sm:col-span-2">
            <p className="text-sm font-semibold">Animals the certificate covers</p>
            {animals.fields.map((row, index) => (
              <div key={row.id} className="grid items-end gap-2 sm:grid-cols-[2fr_1fr_2fr_auto]">
                <TextField
                  label="Scientific name"
                  error={e.animalsCovered?.[index]?.scientificName?.message}
                  {...form.register(`animalsCovered.${index}.scientificName`)}
                />
                <TextField
                  label="Count"
                  type="number"
                  min={1}
                  error={e.animalsCovered?.[index]?.count?.message}
                  {...form.register(`animalsCovered.${index}.count`, { valueAsNumber: true })}
                />
                <TextField
                  label="Identifier (microchip, mark)"
                  {...form.register(`animalsCovered.${index}.identifier`, { setValueAs: emptyToNull })}
                />
                <Button type="button" variant="ghost" onClick={() => animals.remove(index)}>
                  Remove
                </Button>
              </div>
            ))}
            <Button
              type="button"
              variant="secondary"
              className="self-start"
              onClick={() => animals.append({ scientificName: "", count: 1, identifier: null })}
            >
              Add an animal
            </Button>
          </div>
        </fieldset>
      ) : null}
      <div className="sm:col-span-2">
        <TextAreaField
          label="Notes (seen by your organisation only)"
          error={e.notes?.message}
          {...form.register("notes", { setValueAs: emptyToNull })}
        />
      </div>
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" busy={mutation.isPending}>
          {existing ? "Save changes" : "Add the document"}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
