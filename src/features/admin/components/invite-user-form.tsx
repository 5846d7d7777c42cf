import { useEffect } from "react";
import { USER_ROLE_WORDS } from "@shared/words";
import { useForm } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import type { z } from "zod";
import { USER_ROLES, type OrganizationKind } from "@shared/constants";
import { roleMisfit } from "@shared/roles";
import { userInviteSchema } from "@shared/schemas/auth";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useOrganizations } from "../api/organizations";
import { useInviteUser } from "../api/users";

type FormIn = z.input<typeof userInviteSchema>;
type FormOut = z.output<typeof userInviteSchema>;

export function InviteUserForm({ onDone }: { onDone: () => void }) {
  const orgs = useOrganizations();
  const invite = useInviteUser();
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: keeperResolver(userInviteSchema),
    defaultValues: { email: "", displayName: "", role: "member", organizationId: null },
  });
  const errors = form.formState.errors;
  // The roles offered follow the organisation chosen: a courier service has couriers, a keeper
  // organisation members; without one, only the site admin or a courier on their own.
  const organizationId = form.watch("organizationId");
  const kind: OrganizationKind | null = (orgs.data ?? []).find((o) => o.id === organizationId)?.kind ?? null;
  const roles = USER_ROLES.filter((r) => !roleMisfit(r, kind));
  const role = form.watch("role");
  useEffect(() => {
    if (!roles.includes(role)) form.setValue("role", roles.includes("member") ? "member" : roles.at(-1)!);
  }, [roles, role, form]);
  const orgOptions = [
    { value: "", label: "— none —" },
    ...(orgs.data ?? []).map((o) => ({ value: o.id, label: o.name })),
  ];

  return (
    <form
      className="grid gap-4 sm:grid-cols-2"
      noValidate
      onSubmit={form.handleSubmit((values) =>
        invite.mutate(values, {
          onSuccess: () => {
            form.reset();
            onDone();
          },
        }),
      )}
    >
      {invite.error ? (
        <div className="sm:col-span-2">
          <Notice tone="block" role="alert">
            {invite.error instanceof ApiError ? invite.error.message : "The invitation was not sent."}
          </Notice>
        </div>
      ) : null}
      <TextField label="Name" error={errors.displayName?.message} {...form.register("displayName")} />
      <TextField label="E-mail" type="email" error={errors.email?.message} {...form.register("email")} />
      <SelectField
        label="Organisation"
        options={orgOptions}
        error={errors.organizationId?.message}
        {...form.register("organizationId", { setValueAs: (v: string) => (v === "" ? null : v) })}
      />
      <SelectField
        label="Role"
        options={roles.map((r) => ({ value: r, label: USER_ROLE_WORDS[r] }))}
        error={errors.role?.message}
        {...form.register("role")}
      />
      <div className="sm:col-span-2 flex gap-2">
        <Button type="submit" busy={invite.isPending}>
          Send invitation
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
