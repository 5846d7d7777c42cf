import { Link, Navigate, useSearchParams } from "react-router";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useDocumentTitle } from "@/lib/document-title";
import { useConfirmSignup } from "../api/account";

/**
 * The link in the confirmation e-mail. Confirming is a button, not the page load: mail scanners
 * that open links must not open the account.
 */
export function SignUpConfirmRoute() {
  const [params] = useSearchParams();
  const token = params.get("token") ?? "";
  const confirm = useConfirmSignup();
  useDocumentTitle("Confirm your e-mail address");
  if (confirm.isSuccess) return <Navigate to={paths.home} replace />;
  return (
    <main className="mx-auto max-w-md px-4 py-16">
      <div className="flex flex-col gap-4 rounded-card border border-rule bg-paper-card p-6 shadow-card">
        <h1 className="text-xl font-semibold">Confirm your e-mail address</h1>
        <p className="text-ink-soft">One click opens your organisation&rsquo;s account and signs you in.</p>
        {confirm.error ? (
          <Notice tone="block" role="alert">
            {confirm.error instanceof ApiError ? confirm.error.message : "That did not work. Try again."}
          </Notice>
        ) : null}
        <Button size="lg" busy={confirm.isPending} onClick={() => confirm.mutate(token)}>
          Confirm and open Hatchway
        </Button>
        <Link className="text-sm font-semibold text-fern underline" to={paths.signIn}>
          Sign in instead
        </Link>
      </div>
    </main>
  );
}
