import { useState } from "react";
import { useFieldArray, useForm } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import { legsInputSchema, type LegsInput, type TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { Loading, Notice } from "@/components/ui/feedback";
import { SelectField, TextField } from "@/components/ui/field";
import { ApiError } from "@/lib/api-client";
import { useAssignLegs } from "../api/assign-legs";
import { useDirectoryCouriers } from "../api/directory";
import { CourierServiceChoice } from "./courier-service-choice";
import { Section } from "./section";

type LegsParsed = import("zod").output<typeof legsInputSchema>;

function LegsEditor({ transfer, onDone }: { transfer: TransferDto; onDone: () => void }) {
  const couriers = useDirectoryCouriers();
  const assign = useAssignLegs(transfer.id);
  const form = useForm<LegsInput, unknown, LegsParsed>({
    resolver: keeperResolver(legsInputSchema),
    defaultValues: {
      legs: transfer.legs.length
        ? [...transfer.legs]
            .sort((a, b) => a.sequence - b.sequence)
            .map((l) => ({ courierId: l.courier.id, fromLabel: l.fromLabel ?? "", toLabel: l.toLabel ?? "" }))
        : [{ courierId: "", fromLabel: "", toLabel: "" }],
    },
  });
  const legs = useFieldArray({ control: form.control, name: "legs", keyName: "fieldKey" });
  const e = form.formState.errors.legs;

  if (couriers.isPending) return <Loading label="Loading couriers…" />;
  if (couriers.error)
    return (
      <Notice tone="block" role="alert">
        {(couriers.error as Error).message}
      </Notice>
    );
  const options = [
    { value: "", label: "Choose a courier…" },
    ...couriers.data.map((c) => ({
      value: c.id,
      label: c.organizationName ? `${c.displayName} (${c.organizationName})` : c.displayName,
    })),
  ];

  return (
    <form
      noValidate
      className="grid gap-3"
      onSubmit={form.handleSubmit((values) => assign.mutate(values, { onSuccess: onDone }))}
    >
      {assign.error ? (
        <Notice tone="block" role="alert">
          {assign.error instanceof ApiError ? assign.error.message : "Not saved."}
        </Notice>
      ) : null}
      {e?.root?.message || e?.message ? (
        <Notice tone="block" role="alert">
          {e.root?.message ?? e.message}
        </Notice>
      ) : null}
      <ol className="grid gap-3">
        {legs.fields.map((field, i) => (
          <li key={field.fieldKey}>
            <fieldset className="grid gap-3 rounded-md border border-rule p-3 sm:grid-cols-3">
              <legend className="px-1 font-semibold">Leg {i + 1}</legend>
              <SelectField
                label="Courier"
                options={options}
                error={e?.[i]?.courierId ? "Choose a courier" : undefined}
                {...form.register(`legs.${i}.courierId`)}
              />
              <TextField
                label="From (optional)"
                placeholder={i === 0 ? "The sender" : "Where they take over"}
                {...form.register(`legs.${i}.fromLabel`)}
              />
              <TextField
                label="To (optional)"
                placeholder={i === legs.fields.length - 1 ? "The receiver" : "Where they hand over"}
                {...form.register(`legs.${i}.toLabel`)}
              />
              {legs.fields.length > 1 ? (
                <div className="sm:col-span-3">
                  <Button
                    type="button"
                    variant="ghost"
                    onClick={() => legs.remove(i)}
                    aria-label={`Remove leg ${i + 1}`}
                  >
                    Remove
                  </Button>
                </div>
              ) : null}
            </fieldset>
          </li>
        ))}
      </ol>
      <div className="flex flex-wrap gap-2">
        <Button
          type="button"
          variant="secondary"
          onClick={() => legs.append({ courierId: "", fromLabel: "", toLabel: "" })}
          disabled={legs.fields.length >= 10}
        >
          Add a leg
        </Button>
        <Button type="submit" busy={assign.isPending}>
          Save couriers
        </Button>
        <Button type="button" variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** Who carries the boxes, leg by leg; the sender assigns them. */
export function LegsSection({ transfer: t }: { transfer: TransferDto }) {
  const [editing, setEditing] = useState(false);
  const legs = [...t.legs].sort((a, b) => a.sequence - b.sequence);
  return (
    <Section
      id="legs"
      title="Couriers and legs"
      actions={
        t.abilities.assignCouriers && !editing ? (
          <Button variant="secondary" onClick={() => setEditing(true)}>
            {legs.length ? "Change couriers" : "Assign couriers"}
          </Button>
        ) : null
      }
    >
      <CourierServiceChoice transfer={t} />
      {editing ? (
        <LegsEditor transfer={t} onDone={() => setEditing(false)} />
      ) : legs.length === 0 ? (
        <p className="text-ink-soft">No courier assigned yet.</p>
      ) : (
        <ol className="grid gap-2">
          {legs.map((leg, i) => (
            <li key={leg.id} className="rounded-md border border-rule p-3">
              <p className="font-semibold">
                Leg {i + 1}: {leg.fromLabel ?? (i === 0 ? t.sender.organization.name : "handover")}{" "}
                <span aria-hidden>→</span>
                <span className="sr-only">to</span>{" "}
                {leg.toLabel ?? (i === legs.length - 1 ? t.receiver.organization.name : "handover")}
              </p>
              <p className="text-sm">
                {leg.courier.displayName}
                {leg.courier.organizationName ? `, ${leg.courier.organizationName}` : ""}
                {leg.courier.phone ? (
                  <>
                    {" · "}
                    <a className="text-fern underline" href={`tel:${leg.courier.phone}`}>
                      {leg.courier.phone}
                    </a>
                  </>
                ) : null}
              </p>
            </li>
          ))}
        </ol>
      )}
    </Section>
  );
}
