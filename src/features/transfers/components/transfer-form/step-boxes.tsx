import { PACK_WORDS, WALL_MATERIAL_WORDS } from "@shared/words";
import { Controller, useFieldArray, useFormContext } from "react-hook-form";
import { PACK_KINDS, WALL_MATERIALS } from "@shared/constants";
import type { TransferInput } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { MeasureField } from "@/components/ui/measure-field";
import { duplicateBox, nextBox } from "./form-values";

type Dimension = "lengthMm" | "widthMm" | "heightMm" | "wallThicknessMm";
const dimensions: { name: Dimension; label: string }[] = [
  { name: "lengthMm", label: "Length" },
  { name: "widthMm", label: "Width" },
  { name: "heightMm", label: "Height" },
  { name: "wallThicknessMm", label: "Wall thickness" },
];

/** Step 2: the insulated boxes, each with its size, walls, pack and seal. */
export function BoxesStep() {
  const { control, register, formState, getValues, setValue } = useFormContext<TransferInput>();
  const boxes = useFieldArray({ control, name: "containers", keyName: "fieldKey" });
  const errors = formState.errors.containers;

  function remove(index: number) {
    const key = getValues(`containers.${index}.key`);
    // Animals in a removed box are unpacked, not lost.
    getValues("animals").forEach((a, i) => {
      if (a.containerKey === key) setValue(`animals.${i}.containerKey`, null);
    });
    boxes.remove(index);
  }

  return (
    <div className="grid gap-4">
      <Notice tone="info">
        Every animal travels in its own container inside an insulated box; different species never share a box. Heat
        packs are taped to the box wall, never against an animal's container.
      </Notice>
      {errors?.root?.message || errors?.message ? (
        <Notice tone="block" role="alert">
          {errors.root?.message ?? errors.message}
        </Notice>
      ) : null}
      {boxes.fields.map((field, index) => {
        const e = errors?.[index];
        return (
          <fieldset
            key={field.fieldKey}
            className="grid gap-3 rounded-card border border-rule bg-paper-card p-4 shadow-card sm:grid-cols-4"
          >
            <legend className="px-1 font-display font-semibold">Box {index + 1}</legend>
            <div className="sm:col-span-2">
              <TextField
                label="Label on the box"
                error={e?.label?.message}
                {...register(`containers.${index}.label`)}
              />
            </div>
            <div className="sm:col-span-2">
              <TextField
                label="Seal number (optional)"
                error={e?.sealNumber?.message}
                {...register(`containers.${index}.sealNumber`)}
              />
            </div>
            {dimensions.map((d) => (
              <Controller
                key={d.name}
                control={control}
                name={`containers.${index}.${d.name}`}
                render={({ field: f, fieldState }) => (
                  <MeasureField
                    kind="length"
                    label={d.label}
                    name={f.name}
                    ref={f.ref}
                    value={f.value}
                    onChange={f.onChange}
                    onBlur={f.onBlur}
                    error={fieldState.error?.message}
                  />
                )}
              />
            ))}
            <div className="sm:col-span-2">
              <SelectField
                label="Walls"
                options={WALL_MATERIALS.map((m) => ({ value: m, label: WALL_MATERIAL_WORDS[m] }))}
                error={e?.wallMaterial?.message}
                {...register(`containers.${index}.wallMaterial`)}
              />
            </div>
            <div className="sm:col-span-2">
              <SelectField
                label="Pack"
                options={PACK_KINDS.map((p) => ({ value: p, label: PACK_WORDS[p] }))}
                error={e?.pack?.message}
                {...register(`containers.${index}.pack`)}
              />
            </div>
            {e?.key?.message ? <p className="text-sm text-brick sm:col-span-4">{e.key.message}</p> : null}
            <div className="flex flex-wrap gap-2 sm:col-span-4">
              <Button
                type="button"
                variant="secondary"
                onClick={() =>
                  boxes.insert(index + 1, duplicateBox(getValues(`containers.${index}`), boxes.fields.length + 1))
                }
              >
                Duplicate box
              </Button>
              <Button
                type="button"
                variant="ghost"
                onClick={() => remove(index)}
                aria-label={`Remove box ${index + 1}`}
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
          onClick={() => boxes.append(nextBox(getValues("containers").at(-1), boxes.fields.length + 1))}
        >
          Add another box
        </Button>
      </div>
    </div>
  );
}
