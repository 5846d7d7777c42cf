import type { ReactNode } from "react";

/**
 * A plain, accessible table in the notebook style; horizontal scroll on narrow screens. The scroller
 * is `relative` so screen-reader-only text in the cells (absolutely placed) scrolls with it instead of
 * widening the page.
 */
export function Table({ caption, head, children }: { caption: string; head: ReactNode; children: ReactNode }) {
  return (
    // Focusable and named, so a keyboard can scroll a table wider than the screen (axe: scrollable-region-focusable).
    <div
      role="region"
      aria-label={caption}
      tabIndex={0}
      className="relative overflow-x-auto rounded-card border border-rule bg-paper-card shadow-card focus-visible:outline-hidden focus-visible:ring-3 focus-visible:ring-fern-ring"
    >
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">{head}</thead>
        <tbody className="divide-y divide-rule">{children}</tbody>
      </table>
    </div>
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
