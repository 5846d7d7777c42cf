import { Link } from "react-router";
import { paths } from "@/config/paths";
import { useDocumentTitle } from "@/lib/document-title";

export function NotFoundRoute() {
  useDocumentTitle("Page not found");
  return (
    <div className="mx-auto max-w-xl px-4 py-16 text-center">
      <p className="font-display text-5xl text-fern">404</p>
      <h1 className="mt-2 text-2xl font-semibold">This page is not in the notebook</h1>
      <p className="mt-2 text-ink-soft">The link may be old, or the record may belong to someone else.</p>
      <Link
        to={paths.home}
        className="mt-6 inline-flex min-h-11 items-center rounded-md bg-fern px-4 font-medium text-paper-card"
      >
        Back to Hatchway
      </Link>
    </div>
  );
}
