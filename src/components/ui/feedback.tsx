import type { ReactNode } from "react";

type Tone = "info" | "caution" | "block" | "ok";
const tones: Record<Tone, string> = {
  info: "border-slate bg-slate-bg text-ink",
  caution: "border-amber-line bg-amber-bg text-ink",
  block: "border-brick-line bg-brick-bg text-ink",
  ok: "border-fern-ring bg-fern-light text-ink",
};
const marks: Record<Tone, string> = { info: "i", caution: "!", block: "×", ok: "✓" };
const markColours: Record<Tone, string> = { info: "bg-slate", caution: "bg-amber", block: "bg-brick", ok: "bg-fern" };

/** A notice in the notebook's margin: information, a caution, a block, or all clear. */
export function Notice({
  tone = "info",
  title,
  children,
  role,
}: {
  tone?: Tone;
  title?: string;
  children?: ReactNode;
  role?: "alert" | "status";
}) {
  return (
    <div role={role} className={`flex gap-3 rounded-card border-l-4 border px-4 py-3 ${tones[tone]}`}>
      <span
        aria-hidden
        className={`mt-0.5 flex h-6 w-6 shrink-0 items-center justify-center rounded-full text-sm font-bold text-paper-card ${markColours[tone]}`}
      >
        {marks[tone]}
      </span>
      <div className="flex flex-col gap-1">
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div className="text-sm leading-relaxed">{children}</div> : null}
      </div>
    </div>
  );
}

export function Loading({ label = "Loading…" }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-3 py-8 text-ink-soft">
      <span className="h-5 w-5 animate-spin rounded-full border-2 border-fern border-t-transparent" aria-hidden />
      {label}
    </div>
  );
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-card border border-dashed border-rule bg-paper-card/60 px-6 py-10 text-center">
      <p className="font-display text-lg text-ink">{title}</p>
      {children ? <div className="max-w-prose text-sm text-ink-soft">{children}</div> : null}
      {action}
    </div>
  );
}

export function Badge({ tone = "info", children }: { tone?: Tone | "neutral"; children: ReactNode }) {
  const palette =
    tone === "neutral"
      ? "bg-paper-deep text-ink-soft border-rule"
      : tone === "ok"
        ? "bg-fern-light text-fern-dark border-fern-ring"
        : tone === "caution"
          ? "bg-amber-bg text-amber border-amber-line"
          : tone === "block"
            ? "bg-brick-bg text-brick border-brick-line"
            : "bg-slate-bg text-slate border-slate";
  return (
    <span className={`inline-flex items-center rounded-full border px-2.5 py-0.5 text-xs font-semibold ${palette}`}>
      {children}
    </span>
  );
}
