import { PURPOSE_WORDS, TRANSPORT_MODE_WORDS } from "@shared/words";
import { Controller, useFormContext, useWatch } from "react-hook-form";
import { PURPOSES, TRANSPORT_MODES, US_STATES } from "@shared/constants";
import type { DirectoryOrganizationDto, TransferInput } from "@shared/schemas/transfer";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { InviteOrganization } from "../invite-organization";
import { instantToLocalInput, localInputToInstant } from "@/lib/datetime";

const choose = { value: "", label: "Choose…" };
const stateOptions = [choose, ...US_STATES.map((s) => ({ value: s, label: s }))];
const browserZone = Intl.DateTimeFormat().resolvedOptions().timeZone;

function AddressFields({ which, legend }: { which: "origin" | "destination"; legend: string }) {
  const { register, formState } = useFormContext<TransferInput>();
  const e = formState.errors[which];
  return (
    <fieldset className="grid gap-3 rounded-card border border-rule p-4 sm:grid-cols-6">
      <legend className="px-1 font-display font-semibold">{legend}</legend>
      <div className="sm:col-span-6">
        <TextField
          label="Street"
          autoComplete="street-address"
          error={e?.street?.message}
          {...register(`${which}.street`)}
        />
      </div>
      <div className="sm:col-span-3">
        <TextField label="City" error={e?.city?.message} {...register(`${which}.city`)} />
      </div>
      <div className="sm:col-span-1">
        <SelectField label="State" options={stateOptions} error={e?.state?.message} {...register(`${which}.state`)} />
      </div>
      <div className="sm:col-span-2">
        <TextField label="ZIP" inputMode="numeric" error={e?.zip?.message} {...register(`${which}.zip`)} />
      </div>
    </fieldset>
  );
}

function InstantField({ name, label }: { name: "plannedDepartureAt" | "expectedArrivalAt"; label: string }) {
  const { control } = useFormContext<TransferInput>();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField
          label={label}
          type="datetime-local"
          name={field.name}
          ref={field.ref}
          onBlur={field.onBlur}
          value={instantToLocalInput(field.value)}
          onChange={(e) => field.onChange(localInputToInstant(e.target.value))}
          error={fieldState.error?.message}
          hint={`Your time zone: ${browserZone}`}
        />
      )}
    />
  );
}

/** Step 1: who receives, where from and to, how and when, and why. */
export function RouteStep({
  organizations,
  senderOrganizationId,
}: {
  organizations: DirectoryOrganizationDto[];
  senderOrganizationId: string | null;
}) {
  const { register, formState, setValue, getFieldState, control } = useFormContext<TransferInput>();
  const e = formState.errors;
  const receiverId = useWatch({ control, name: "receiverOrganizationId" });
  const sale = useWatch({ control, name: "sale" });
  const receivers = organizations.filter((o) => o.id !== senderOrganizationId && o.kind !== "courier_service");
  const receiver = receivers.find((o) => o.id === receiverId);

  return (
    <div className="grid gap-5">
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField
          label="Receiving organisation"
          options={[
            choose,
            ...receivers.map((o) => ({
              value: o.id,
              label: o.pending ? `${o.name} (invited, ${o.state})` : `${o.name} (${o.city}, ${o.state})`,
            })),
          ]}
          error={e.receiverOrganizationId?.message}
          {...register("receiverOrganizationId", {
            onChange: (event: { target: { value: string } }) => {
              const next = receivers.find((o) => o.id === event.target.value);
              setValue("receiverContactId", null);
              // Most animals go to the receiver's own address; keep what the sender typed, though.
              if (next && !getFieldState("destination", formState).isDirty) {
                setValue(
                  "destination",
                  { street: next.street, city: next.city, state: next.state, zip: next.zip },
                  { shouldValidate: formState.isSubmitted },
                );
              }
            },
          })}
        />
        <SelectField
          label="Contact there"
          options={[
            { value: "", label: "Anyone at the organisation" },
            ...(receiver?.contacts ?? []).map((c) => ({ value: c.id, label: c.displayName })),
          ]}
          error={e.receiverContactId?.message}
          {...register("receiverContactId", { setValueAs: (v: string | null) => (v ? v : null) })}
        />
      </div>
      <InviteOrganization
        party="receiver"
        onInvited={(organizationId) =>
          setValue("receiverOrganizationId", organizationId, {
            shouldDirty: true,
            shouldValidate: formState.isSubmitted,
          })
        }
      />
      <AddressFields which="origin" legend="Leaves from" />
      <AddressFields which="destination" legend="Goes to" />
      <div className="grid gap-3 sm:grid-cols-3">
        <SelectField
          label="How it travels"
          options={[choose, ...TRANSPORT_MODES.map((m) => ({ value: m, label: TRANSPORT_MODE_WORDS[m] }))]}
          error={e.mode?.message}
          {...register("mode")}
        />
        <InstantField name="plannedDepartureAt" label="Planned departure" />
        <InstantField name="expectedArrivalAt" label="Expected arrival" />
      </div>
      <div className="grid gap-3 sm:grid-cols-3">
        <SelectField
          label="Purpose"
          options={[choose, ...PURPOSES.map((p) => ({ value: p, label: PURPOSE_WORDS[p] }))]}
          error={e.purpose?.message}
          {...register("purpose")}
        />
        <label className="flex min-h-11 items-center gap-3 self-end rounded-md border border-rule bg-paper-card px-3 py-2">
          <input type="checkbox" className="h-5 w-5 accent-fern" {...register("sale")} />
          <span className="font-semibold">This is a sale</span>
        </label>
        {sale ? (
          <TextField
            label="Price (USD)"
            type="number"
            inputMode="decimal"
            min={0}
            step="0.01"
            error={e.salePriceUsd?.message}
            {...register("salePriceUsd", { setValueAs: (v: unknown) => (v === "" || v == null ? null : Number(v)) })}
          />
        ) : null}
      </div>
      <TextAreaField
        label="Handling notes"
        hint="Printed on the manifest and shown to everyone on the transfer."
        error={e.handlingNotes?.message}
        {...register("handlingNotes")}
      />
      <TextAreaField
        label="Private notes"
        hint="Only your organisation sees these."
        error={e.privateNotes?.message}
        {...register("privateNotes")}
      />
    </div>
  );
}
