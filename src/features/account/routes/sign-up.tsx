import { useEffect } from "react";
import { useForm } from "react-hook-form";
import { Link, useSearchParams } from "react-router";
import { ORGANIZATION_KINDS, US_STATES } from "@shared/constants";
import { signupFormSchema, type SignupForm } from "@shared/schemas/account";
import { ORGANIZATION_KIND_WORDS } from "@shared/words";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useDocumentTitle } from "@/lib/document-title";
import { keeperResolver } from "@/lib/form-resolver";
import { useInvitation, useSignUp } from "../api/account";

const blank: SignupForm = {
  organization: { name: "", kind: "nature_centre", street: "", city: "", state: "OR", zip: "", phone: "", email: "" },
  user: { email: "", displayName: "", password: "", confirm: "" },
};

/** Sign an organisation up (issue 14, §1), or the one a sender invited (§3: name and state filled in). */
export function SignUpRoute() {
  const [params] = useSearchParams();
  const token = params.get("invitation");
  const invitation = useInvitation(token);
  const signUp = useSignUp();
  useDocumentTitle("Create an organisation");
  const form = useForm<SignupForm>({ resolver: keeperResolver(signupFormSchema), defaultValues: blank });
  const invited = invitation.data;
  useEffect(() => {
    if (!invited) return;
    form.setValue("organization.name", invited.organization.name);
    form.setValue("organization.state", invited.organization.state as SignupForm["organization"]["state"]);
    form.setValue("organization.kind", invited.organization.kind);
  }, [invited, form]);
  const e = form.formState.errors;

  if (signUp.isSuccess) {
    return (
      <main className="mx-auto max-w-md px-4 py-16">
        <Notice tone="ok" title="Check your e-mail">
          We sent a link to the address you gave. Open it within 24 hours to confirm the address and open the account.
        </Notice>
      </main>
    );
  }
  return (
    <main className="mx-auto max-w-2xl px-4 py-10">
      <form
        className="flex flex-col gap-4 rounded-card border border-rule bg-paper-card p-6 shadow-card"
        noValidate
        onSubmit={form.handleSubmit(({ organization, user }) =>
          signUp.mutate({
            organization,
            user: { email: user.email, displayName: user.displayName, password: user.password },
            ...(token && invited ? { invitation: token } : {}),
          }),
        )}
      >
        <h1 className="text-xl font-semibold">Create an organisation on Hatchway</h1>
        {invited ? (
          <Notice tone="info" title="You were invited">
            {invited.invitedBy.displayName}
            {invited.invitedBy.organizationName ? ` of ${invited.invitedBy.organizationName}` : ""} invited{" "}
            {invited.organization.name}. Once you confirm your address you will find what they sent waiting for you.
          </Notice>
        ) : null}
        {token && invitation.isError ? (
          <Notice tone="caution">This invitation has expired or was already used. You can still sign up below.</Notice>
        ) : null}
        {signUp.error ? (
          <Notice tone="block" role="alert">
            {signUp.error instanceof ApiError ? signUp.error.message : "That did not work. Try again."}
          </Notice>
        ) : null}
        <fieldset className="grid gap-3 sm:grid-cols-2">
          <legend className="mb-2 font-semibold">The organisation</legend>
          <TextField
            label="Name"
            readOnly={!!invited}
            error={e.organization?.name?.message}
            {...form.register("organization.name")}
          />
          <SelectField
            label="Kind"
            options={ORGANIZATION_KINDS.map((k) => ({ value: k, label: ORGANIZATION_KIND_WORDS[k] }))}
            error={e.organization?.kind?.message}
            {...form.register("organization.kind")}
          />
          <TextField label="Street" error={e.organization?.street?.message} {...form.register("organization.street")} />
          <TextField label="City" error={e.organization?.city?.message} {...form.register("organization.city")} />
          <SelectField
            label="State"
            options={US_STATES.map((s) => ({ value: s, label: s }))}
            error={e.organization?.state?.message}
            {...form.register("organization.state")}
          />
          <TextField label="ZIP code" error={e.organization?.zip?.message} {...form.register("organization.zip")} />
          <TextField
            label="Phone"
            type="tel"
            error={e.organization?.phone?.message}
            {...form.register("organization.phone")}
          />
          <TextField
            label="Organisation e-mail"
            type="email"
            error={e.organization?.email?.message}
            {...form.register("organization.email")}
          />
        </fieldset>
        <fieldset className="grid gap-3 sm:grid-cols-2">
          <legend className="mb-2 font-semibold">You (the organisation&rsquo;s manager)</legend>
          <TextField
            label="Your name"
            autoComplete="name"
            error={e.user?.displayName?.message}
            {...form.register("user.displayName")}
          />
          <TextField
            label="Your e-mail"
            type="email"
            autoComplete="email"
            error={e.user?.email?.message}
            {...form.register("user.email")}
          />
          <TextField
            label="Password"
            type="password"
            autoComplete="new-password"
            error={e.user?.password?.message}
            {...form.register("user.password")}
          />
          <TextField
            label="Password again"
            type="password"
            autoComplete="new-password"
            error={e.user?.confirm?.message}
            {...form.register("user.confirm")}
          />
        </fieldset>
        <Button type="submit" size="lg" busy={signUp.isPending}>
          Create the organisation
        </Button>
        <p className="text-sm text-ink-soft">
          Already on Hatchway?{" "}
          <Link className="font-semibold text-fern underline" to={paths.signIn}>
            Sign in
          </Link>
        </p>
      </form>
    </main>
  );
}
