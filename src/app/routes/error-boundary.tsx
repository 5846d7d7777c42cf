import { isRouteErrorResponse, Link, useRouteError } from "react-router";
import { paths } from "@/config/paths";
import { useDocumentTitle } from "@/lib/document-title";
import { NotFoundRoute } from "./not-found";

/** Shown when a screen fails to render; says what happened without technical detail. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  useDocumentTitle(notFound ? null : "Something broke");
  if (notFound) return <NotFoundRoute />;
  return (
    <div role="alert" className="mx-auto max-w-xl px-4 py-16 text-center">
      <h1 className="text-2xl font-semibold">Something on this page broke</h1>
      <p className="mt-2 text-ink-soft">Nothing you saved is lost. Reload the page, or go back and try again.</p>
      <Link
        to={paths.home}
        className="mt-6 inline-flex min-h-11 items-center rounded-md bg-fern px-4 font-medium text-paper-card"
      >
        Back to Hatchway
      </Link>
    </div>
  );
}
