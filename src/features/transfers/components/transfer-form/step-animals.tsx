import { ANIMAL_ORIGIN_WORDS, IDENTIFIER_KIND_WORDS, LENGTH_KIND_WORDS, SEX_WORDS } from "@shared/words";
import { useState } from "react";
import { Controller, useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { ANIMAL_ORIGINS, IDENTIFIER_KINDS, LENGTH_KINDS, SEXES } from "@shared/constants";
import type { TaxonBriefDto, TransferInput } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { MeasureField } from "@/components/ui/measure-field";
import { TaxonField } from "@/components/ui/taxon-combobox";
import type { TaxonSearch } from "@/lib/taxa-search";
import { duplicateAnimal, nextAnimal } from "./form-values";

const orNull = (v: unknown) => (v === "" || v == null ? null : v);
const numberOrNull = (v: unknown) => (v === "" || v == null ? null : Number(v));

type TaxaProps = {
  taxa: Record<string, TaxonBriefDto>;
  rememberTaxon: (t: TaxonBriefDto) => void;
  search: TaxonSearch;
};

function AnimalLine({
  index,
  onDuplicate,
  onRemove,
  taxa,
  rememberTaxon,
  search,
}: TaxaProps & { index: number; onDuplicate: () => void; onRemove: () => void }) {
  const { control, register, formState, getValues } = useFormContext<TransferInput>();
  const boxes = useWatch({ control, name: "containers" });
  const e = formState.errors.animals?.[index];
  const detailErrors = Boolean(e?.identifier || e?.lengthMm || e?.weightG || e?.hatchDate || e?.notes);
  const [more, setMore] = useState(() => {
    const a = getValues(`animals.${index}`);
    return Boolean(
      a.identifier || a.identifierKind || a.lengthMm || a.lengthKind || a.weightG || a.hatchDate || a.notes,
    );
  });
  const showMore = more || detailErrors;

  return (
    <fieldset className="grid gap-3 rounded-card border border-rule bg-paper-card p-4 shadow-card sm:grid-cols-6">
      <legend className="px-1 font-display font-semibold">Animal line {index + 1}</legend>
      <div className="sm:col-span-6">
        <TaxonField
          control={control}
          name={`animals.${index}.taxonId`}
          taxa={taxa}
          rememberTaxon={rememberTaxon}
          search={search}
        />
      </div>
      <TextField
        label="How many"
        type="number"
        inputMode="numeric"
        min={1}
        step={1}
        error={e?.count?.message}
        {...register(`animals.${index}.count`, { valueAsNumber: true })}
      />
      <SelectField
        label="Sex"
        options={SEXES.map((s) => ({ value: s, label: SEX_WORDS[s] }))}
        error={e?.sex?.message}
        {...register(`animals.${index}.sex`)}
      />
      <div className="sm:col-span-2">
        <SelectField
          label="Origin"
          options={[
            { value: "", label: "Choose…" },
            ...ANIMAL_ORIGINS.map((o) => ({ value: o, label: ANIMAL_ORIGIN_WORDS[o] })),
          ]}
          error={e?.origin?.message}
          {...register(`animals.${index}.origin`)}
        />
      </div>
      <div className="sm:col-span-2">
        <SelectField
          label="Travels in"
          options={[
            { value: "", label: "Not packed yet" },
            ...boxes.map((b) => ({ value: b.key, label: b.label || "Unnamed box" })),
          ]}
          error={e?.containerKey?.message}
          {...register(`animals.${index}.containerKey`, { setValueAs: orNull })}
        />
      </div>
      {showMore ? (
        <>
          <div className="sm:col-span-2">
            <TextField
              label="Identifier (optional)"
              error={e?.identifier?.message}
              {...register(`animals.${index}.identifier`)}
            />
          </div>
          <SelectField
            label="Kind of identifier"
            options={[
              { value: "", label: "None" },
              ...IDENTIFIER_KINDS.map((k) => ({ value: k, label: IDENTIFIER_KIND_WORDS[k] })),
            ]}
            {...register(`animals.${index}.identifierKind`, { setValueAs: orNull })}
          />
          <Controller
            control={control}
            name={`animals.${index}.lengthMm`}
            render={({ field, fieldState }) => (
              <MeasureField
                kind="length"
                label="Size"
                name={field.name}
                ref={field.ref}
                value={field.value}
                onChange={field.onChange}
                onBlur={field.onBlur}
                error={fieldState.error?.message}
              />
            )}
          />
          <SelectField
            label="Measured as"
            options={[
              { value: "", label: "Not measured" },
              ...LENGTH_KINDS.map((k) => ({ value: k, label: LENGTH_KIND_WORDS[k] })),
            ]}
            {...register(`animals.${index}.lengthKind`, { setValueAs: orNull })}
          />
          <TextField
            label="Weight (g)"
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            error={e?.weightG?.message}
            {...register(`animals.${index}.weightG`, { setValueAs: numberOrNull })}
          />
          <TextField
            label="Hatch or birth date"
            type="date"
            error={e?.hatchDate?.message}
            {...register(`animals.${index}.hatchDate`, { setValueAs: orNull })}
          />
          <div className="sm:col-span-5">
            <TextAreaField
              label="Notes on this line"
              className="min-h-16"
              error={e?.notes?.message}
              {...register(`animals.${index}.notes`)}
            />
          </div>
        </>
      ) : null}
      <div className="flex flex-wrap gap-2 sm:col-span-6">
        {!showMore ? (
          <Button type="button" variant="ghost" onClick={() => setMore(true)}>
            Add identifier, size, weight…
          </Button>
        ) : null}
        <Button type="button" variant="secondary" onClick={onDuplicate}>
          Duplicate line
        </Button>
        <Button type="button" variant="ghost" onClick={onRemove} aria-label={`Remove animal line ${index + 1}`}>
          Remove
        </Button>
      </div>
    </fieldset>
  );
}

/** Step 3: every animal, a line per species, sex and box (or per animal when each is marked). */
export function AnimalsStep(props: TaxaProps) {
  const { control, getValues, formState } = useFormContext<TransferInput>();
  const lines = useFieldArray({ control, name: "animals", keyName: "fieldKey" });
  const rootError = formState.errors.animals?.root?.message ?? formState.errors.animals?.message;
  return (
    <div className="grid gap-4">
      {rootError ? (
        <Notice tone="block" role="alert">
          {rootError}
        </Notice>
      ) : null}
      {lines.fields.map((field, index) => (
        <AnimalLine
          key={field.fieldKey}
          index={index}
          onDuplicate={() => lines.insert(index + 1, duplicateAnimal(getValues(`animals.${index}`)))}
          onRemove={() => lines.remove(index)}
          {...props}
        />
      ))}
      <div>
        <Button
          type="button"
          variant="secondary"
          onClick={() => lines.append(nextAnimal(getValues("animals").at(-1), getValues("containers")[0]?.key ?? null))}
        >
          Add another line
        </Button>
      </div>
    </div>
  );
}
