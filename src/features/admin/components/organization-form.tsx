import { ORGANIZATION_KIND_WORDS } from "@shared/words";
import { useForm } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import type { z } from "zod";
import { ORGANIZATION_KINDS, US_STATES } from "@shared/constants";
import { organizationInputSchema, type OrganizationDto } from "@shared/schemas/auth";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useCreateOrganization, useUpdateOrganization } from "../api/organizations";

type FormIn = z.input<typeof organizationInputSchema>;
type FormOut = z.output<typeof organizationInputSchema>;

/** Create an organisation, or edit one when `existing` is given. Same schema as the server. */
export function OrganizationForm({ existing, onDone }: { existing?: OrganizationDto; onDone: () => void }) {
  const create = useCreateOrganization();
  const update = useUpdateOrganization();
  const mutation = existing ? update : create;
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: keeperResolver(organizationInputSchema),
    defaultValues: existing
      ? {
          name: existing.name,
          kind: existing.kind,
          address: existing.address,
          phone: existing.phone,
          email: existing.email,
        }
      : { name: "", kind: "breeder", address: { street: "", city: "", state: "TN", zip: "" }, phone: "", email: "" },
  });
  const e = form.formState.errors;
  const submit = form.handleSubmit((values) => {
    if (existing) update.mutate({ id: existing.id, patch: values }, { onSuccess: onDone });
    else create.mutate(values, { onSuccess: onDone });
  });

  return (
    <form className="grid gap-4 sm:grid-cols-2" onSubmit={submit} noValidate>
      {mutation.error ? (
        <div className="sm:col-span-2">
          <Notice tone="block" role="alert">
            {mutation.error instanceof ApiError ? mutation.error.message : "Not saved."}
          </Notice>
        </div>
      ) : null}
      <TextField label="Name" error={e.name?.message} {...form.register("name")} />
      <SelectField
        label="Kind"
        options={ORGANIZATION_KINDS.map((k) => ({ value: k, label: ORGANIZATION_KIND_WORDS[k] }))}
        {...form.register("kind")}
      />
      <TextField label="Street" error={e.address?.street?.message} {...form.register("address.street")} />
      <TextField label="City" error={e.address?.city?.message} {...form.register("address.city")} />
      <SelectField
        label="State"
        options={US_STATES.map((s) => ({ value: s, label: s }))}
        error={e.address?.state?.message}
        {...form.register("address.state")}
      />
      <TextField label="ZIP" inputMode="numeric" error={e.address?.zip?.message} {...form.register("address.zip")} />
      <TextField label="Phone (24-hour contact)" type="tel" error={e.phone?.message} {...form.register("phone")} />
      <TextField label="E-mail" type="email" error={e.email?.message} {...form.register("email")} />
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" busy={mutation.isPending}>
          {existing ? "Save changes" : "Add organisation"}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
