import { useForm } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import { Link, useSearchParams } from "react-router";
import { passwordChoiceSchema, type PasswordChoice } from "@shared/schemas/auth";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useDocumentTitle } from "@/lib/document-title";
import { useSetPassword } from "../api/session";

/** The page an invitation e-mail links to: choose a password once. */
export function WelcomeRoute() {
  const [params] = useSearchParams();
  const token = params.get("token") ?? "";
  const setPassword = useSetPassword();
  useDocumentTitle("Choose your password");
  const form = useForm<PasswordChoice>({
    resolver: keeperResolver(passwordChoiceSchema),
    defaultValues: { password: "", confirm: "" },
  });

  if (setPassword.isSuccess) {
    return (
      <main className="mx-auto max-w-md px-4 py-16">
        <Notice tone="ok" title="Password saved">
          You can now{" "}
          <Link className="font-semibold text-fern underline" to={paths.signIn}>
            sign in
          </Link>
          .
        </Notice>
      </main>
    );
  }
  return (
    <main className="mx-auto max-w-md px-4 py-16">
      <form
        className="flex flex-col gap-4 rounded-card border border-rule bg-paper-card p-6 shadow-card"
        onSubmit={form.handleSubmit((v) => setPassword.mutate({ token, password: v.password }))}
        noValidate
      >
        <h1 className="text-xl font-semibold">Choose your Hatchway password</h1>
        <p className="text-sm text-ink-soft">
          At least 8 characters. A short sentence is easy to remember and hard to guess.
        </p>
        {setPassword.error ? (
          <Notice tone="block" role="alert">
            {setPassword.error instanceof ApiError ? setPassword.error.message : "That did not work."}
          </Notice>
        ) : null}
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          error={form.formState.errors.password?.message}
          {...form.register("password")}
        />
        <TextField
          label="Type it again"
          type="password"
          autoComplete="new-password"
          error={form.formState.errors.confirm?.message}
          {...form.register("confirm")}
        />
        <Button type="submit" busy={setPassword.isPending}>
          Save password
        </Button>
      </form>
    </main>
  );
}
