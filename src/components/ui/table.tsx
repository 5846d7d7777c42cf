import type { ReactNode } from "react";

/**
 * A box that scrolls sideways when its content is wider than the screen. It is a named region and
 * takes focus, so a keyboard can scroll it too (axe: scrollable-region-focusable).
 */
export function ScrollRegion({
  label,
  className = "",
  children,
}: {
  label: string;
  className?: string;
  children: ReactNode;
}) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className={`relative overflow-x-auto focus-visible:outline-hidden focus-visible:ring-3 focus-visible:ring-fern-ring ${className}`}
    >
      {children}
    </div>
  );
}

/**
 * A plain, accessible table in the notebook style; horizontal scroll on narrow screens. The scroller
 * is `relative` so screen-reader-only text in the cells (absolutely placed) scrolls with it instead of
 * widening the page.
 */
export function Table({ caption, head, children }: { caption: string; head: ReactNode; children: ReactNode }) {
  return (
    <ScrollRegion label={caption} className="rounded-card border border-rule bg-paper-card shadow-card">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">{head}</thead>
        <tbody className="divide-y divide-rule">{children}</tbody>
      </table>
    </ScrollRegion>
  );
}

export function Th({ children, className = "" }: { children?: ReactNode; className?: string }) {
  return (
    <th scope="col" className={`px-3 py-2.5 font-semibold ${className}`}>
      {children}
    </th>
  );
}

export function Td({ children, className = "" }: { children?: ReactNode; className?: string }) {
  return <td className={`px-3 py-2.5 align-top ${className}`}>{children}</td>;
}
