import type { ReactNode } from "react";
import { useDocumentTitle } from "@/lib/document-title";

/** The page's heading; it also names the page in the browser tab (`documentTitle`, else `title`). */
export function PageHeader({
  title,
  documentTitle,
  eyebrow,
  actions,
  children,
}: {
  title: string;
  documentTitle?: string;
  eyebrow?: string;
  actions?: ReactNode;
  children?: ReactNode;
}) {
  useDocumentTitle(documentTitle ?? title);
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
      <div>
        {eyebrow ? <p className="text-xs font-semibold uppercase tracking-widest text-ink-faint">{eyebrow}</p> : null}
        <h1 className="text-2xl font-semibold sm:text-3xl">{title}</h1>
        {children ? <div className="mt-1 text-ink-soft">{children}</div> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </header>
  );
}

export function Card({
  title,
  children,
  actions,
  className = "",
}: {
  title?: string;
  children: ReactNode;
  actions?: ReactNode;
  className?: string;
}) {
  return (
    <section
      className={`rounded-card border border-rule bg-paper-card p-4 shadow-card sm:p-5 ${className}`}
      aria-label={title}
    >
      {title || actions ? (
        <div className="mb-3 flex items-center justify-between gap-3">
          {title ? <h2 className="text-lg font-semibold">{title}</h2> : <span />}
          {actions}
        </div>
      ) : null}
      {children}
    </section>
  );
}
