import { SEX_WORDS } from "@shared/words";
import { useFieldArray, useFormContext } from "react-hook-form";
import { SEXES } from "@shared/constants";
import type { CheckInInput, TaxonBriefDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { TaxonField } from "@/components/ui/taxon-combobox";
import type { TaxonSearch } from "@/lib/taxa-search";

type Props = { taxa: Record<string, TaxonBriefDto>; rememberTaxon: (t: TaxonBriefDto) => void; search: TaxonSearch };

/** Animals found in the boxes that the manifest does not list. */
export function ExtrasEditor({ taxa, rememberTaxon, search }: Props) {
  const { control, register, formState } = useFormContext<CheckInInput>();
  const extras = useFieldArray({ control, name: "extras", keyName: "fieldKey" });
  return (
    <section aria-labelledby="extras-title" className="grid gap-3">
      <h2 id="extras-title" className="text-xl font-semibold">
        Arrived but not listed
      </h2>
      {extras.fields.length === 0 ? (
        <p className="text-ink-soft">
          Nothing extra? Good. If a box held an animal the manifest does not list, add it here.
        </p>
      ) : null}
      {extras.fields.map((field, i) => {
        const e = formState.errors.extras?.[i];
        return (
          <fieldset
            key={field.fieldKey}
            className="grid gap-3 rounded-card border border-amber-line bg-paper-card p-4 sm:grid-cols-4"
          >
            <legend className="px-1 font-semibold">Extra {i + 1}</legend>
            <div className="sm:col-span-4">
              <TaxonField
                control={control}
                name={`extras.${i}.taxonId`}
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
              {...register(`extras.${i}.count`, { valueAsNumber: true })}
            />
            <SelectField
              label="Sex"
              options={SEXES.map((s) => ({ value: s, label: SEX_WORDS[s] }))}
              {...register(`extras.${i}.sex`)}
            />
            <div className="sm:col-span-2">
              <TextField label="Notes" error={e?.notes?.message} {...register(`extras.${i}.notes`)} />
            </div>
            <div className="sm:col-span-4">
              <Button
                type="button"
                variant="ghost"
                onClick={() => extras.remove(i)}
                aria-label={`Remove extra ${i + 1}`}
              >
                Remove
              </Button>
            </div>
          </fieldset>
        );
      })}
      <div>
        <Button
          type="button"
          variant="secondary"
          onClick={() => extras.append({ taxonId: "", count: 1, sex: "unknown", notes: "" })}
        >
          Add an animal that was not listed
        </Button>
      </div>
    </section>
  );
}
