import { useId, type ReactNode } from "react";

/** A section of the transfer page: an anchor for the page's contents list, a heading, a card. */
export function Section({
  id,
  title,
  actions,
  children,
}: {
  id: string;
  title: string;
  actions?: ReactNode;
  children: ReactNode;
}) {
  const headingId = useId();
  return (
    <section
      id={id}
      aria-labelledby={headingId}
      className="scroll-mt-4 rounded-card border border-rule bg-paper-card p-4 shadow-card sm:p-5"
    >
      <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
        <h2 id={headingId} className="text-lg font-semibold">
          {title}
        </h2>
        {actions}
      </div>
      {children}
    </section>
  );
}
