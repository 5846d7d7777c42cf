import type { ComponentProps } from "react";
import { Badge } from "@/components/ui/feedback";

/**
 * The shared badge, except that the caution tone is drawn in ink on amber: the shared amber text
 * on the amber background measures 4.47:1, under WCAG AA's 4.5:1 for small text.
 */
export function Tag({ tone, children }: ComponentProps<typeof Badge>) {
  if (tone !== "caution") return <Badge tone={tone}>{children}</Badge>;
  return (
    <span className="inline-flex items-center rounded-full border border-amber-line bg-amber-bg px-2.5 py-0.5 text-xs font-semibold text-ink">
      {children}
    </span>
  );
}
