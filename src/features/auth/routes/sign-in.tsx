import { useRef, useState, type FormEvent } from "react";
import { Link, Navigate, useNavigate, useSearchParams } from "react-router";
import { paths } from "@/config/paths";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { safeNext } from "@/lib/safe-next";
import { useDocumentTitle } from "@/lib/document-title";
import { useSession, useSignIn } from "../api/session";

export function SignInRoute() {
  const session = useSession();
  const signIn = useSignIn();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const [email, setEmail] = useState("");
  const [password, setPassword] = useState("");
  const [missing, setMissing] = useState<{ email?: string; password?: string }>({});
  const emailInput = useRef<HTMLInputElement>(null);
  const passwordInput = useRef<HTMLInputElement>(null);
  useDocumentTitle("Sign in");

  if (session.data) return <Navigate to={safeNext(params.get("next"))} replace />;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    // Checked here, so an empty form never leaves the browser (nor counts against the sign-in limit).
    const found = {
      email: email.trim() ? undefined : "Enter your e-mail address",
      password: password ? undefined : "Enter your password",
    };
    setMissing(found);
    if (found.email || found.password) {
      (found.email ? emailInput : passwordInput).current?.focus();
      return;
    }
    signIn.mutate({ email, password }, { onSuccess: () => navigate(safeNext(params.get("next")), { replace: true }) });
  };
  const error =
    signIn.error instanceof ApiError ? signIn.error.message : signIn.error ? "Signing in failed. Try again." : null;

  return (
    <main className="flex min-h-screen items-center justify-center px-4 py-10">
      <div className="w-full max-w-md">
        <div className="mb-6 text-center">
          <p className="font-display text-4xl font-bold text-fern">Hatchway</p>
          <p className="mt-2 text-ink-soft">
            The shared record for animals on the move, from the sender&rsquo;s shelf to the receiver&rsquo;s enclosure.
          </p>
        </div>
        <form
          onSubmit={submit}
          className="flex flex-col gap-4 rounded-card border border-rule bg-paper-card p-6 shadow-card"
          noValidate
        >
          <h1 className="text-xl font-semibold">Sign in</h1>
          {error ? (
            <Notice tone="block" role="alert" title="Not signed in">
              {error}
            </Notice>
          ) : null}
          <TextField
            ref={emailInput}
            label="E-mail"
            type="email"
            autoComplete="username"
            required
            value={email}
            error={missing.email}
            onChange={(e) => setEmail(e.target.value)}
          />
          <TextField
            ref={passwordInput}
            label="Password"
            type="password"
            autoComplete="current-password"
            required
            value={password}
            error={missing.password}
            onChange={(e) => setPassword(e.target.value)}
          />
          <Button type="submit" size="lg" busy={signIn.isPending}>
            Sign in
          </Button>
          <div className="flex flex-wrap justify-between gap-2 text-sm">
            <Link className="font-semibold text-fern underline" to={paths.forgotPassword}>
              Forgot your password?
            </Link>
            <Link className="font-semibold text-fern underline" to={paths.signUp}>
              Create an organisation
            </Link>
          </div>
        </form>
      </div>
    </main>
  );
}
