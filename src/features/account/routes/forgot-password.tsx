import { useState, type FormEvent } from "react";
import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useDocumentTitle } from "@/lib/document-title";
import { useRequestPasswordReset } from "../api/account";

/** "Forgot your password?": the same answer whatever the address (issue 14, §1). */
export function ForgotPasswordRoute() {
  const [email, setEmail] = useState("");
  const [missing, setMissing] = useState<string | undefined>();
  const request = useRequestPasswordReset();
  useDocumentTitle("Forgot your password?");
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!email.trim()) return setMissing("Enter your e-mail address");
    setMissing(undefined);
    request.mutate(email.trim());
  };
  return (
    <main className="mx-auto max-w-md px-4 py-16">
      <form
        onSubmit={submit}
        noValidate
        className="flex flex-col gap-4 rounded-card border border-rule bg-paper-card p-6 shadow-card"
      >
        <h1 className="text-xl font-semibold">Forgot your password?</h1>
        {request.isSuccess ? (
          <Notice tone="ok" title="Check your e-mail">
            If an account uses that address, a link to choose a new password is on its way. It works once, for 24 hours.
          </Notice>
        ) : (
          <>
            <p className="text-ink-soft">We will e-mail you a link to choose a new one.</p>
            {request.error ? (
              <Notice tone="block" role="alert">
                {request.error instanceof ApiError ? request.error.message : "That did not work. Try again."}
              </Notice>
            ) : null}
            <TextField
              label="E-mail"
              type="email"
              autoComplete="username"
              value={email}
              error={missing}
              onChange={(e) => setEmail(e.target.value)}
            />
            <Button type="submit" busy={request.isPending}>
              Send the link
            </Button>
          </>
        )}
        <Link className="text-sm font-semibold text-fern underline" to={paths.signIn}>
          Back to sign in
        </Link>
      </form>
    </main>
  );
}
