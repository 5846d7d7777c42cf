import { useFormContext } from "react-hook-form";
import type { HandoffInput, TransferDto } from "@shared/schemas/transfer";
import { TextField } from "@/components/ui/field";

/**
 * One card per box: the seal number the person reads, typed by them (never filled in), with the
 * number on record shown beside it to compare, and whether the seal is there and unbroken.
 */
export function SealFields({ boxes }: { boxes: TransferDto["containers"] }) {
  const { register, formState } = useFormContext<HandoffInput>();
  const errors = formState.errors.seals;
  return (
    <fieldset className="grid gap-3">
      <legend className="mb-2 font-display text-lg font-semibold">Seals</legend>
      <p className="text-base text-ink-soft">
        Read each seal yourself and type the number you see. Compare it with the number on record; if it differs, type
        what you read: Hatchway tells both parties.
      </p>
      {boxes.map((box, i) => (
        <div key={box.id} className="grid gap-2 rounded-card border border-rule bg-paper-card p-3">
          <p className="text-lg font-semibold">{box.label}</p>
          {box.sealNumber ? (
            <>
              <p className="text-base">
                Number on record: <span className="font-mono font-semibold">{box.sealNumber}</span>
              </p>
              <TextField
                label={`Seal number you read on ${box.label}`}
                autoComplete="off"
                autoCapitalize="characters"
                spellCheck={false}
                error={errors?.[i]?.sealNumber?.message}
                {...register(`seals.${i}.sealNumber`)}
              />
            </>
          ) : (
            <p className="text-base text-ink-soft">No seal number on record for this box.</p>
          )}
          <label className="flex min-h-14 cursor-pointer items-center gap-4">
            <input type="checkbox" className="h-8 w-8 shrink-0 accent-fern" {...register(`seals.${i}.intact`)} />
            <span className="text-lg">
              {box.sealNumber ? "The seal is there and unbroken" : "The box is closed and undamaged"}
            </span>
          </label>
        </div>
      ))}
    </fieldset>
  );
}
