import type { Verdict } from "@shared/compliance/schemas";
import { VERDICT_LABELS } from "@shared/compliance/labels";
import { Notice } from "@/components/ui/feedback";

const TONE = { clear: "ok", needs_documents: "caution", blocked: "block" } as const;

const EXPLANATION: Record<Verdict, string> = {
  clear: "No rule in the library stops these animals on this route; read the advice below.",
  needs_documents:
    "A permit or certificate is still missing. The transfer cannot be cleared to travel until it is on file.",
  blocked: "A rule forbids this move as it stands. The transfer cannot be cleared to travel.",
};

/** The verdict in one line, in the notebook's colours: green clear, amber documents needed, brick blocked. */
export function VerdictBanner({ verdict, overridden = false }: { verdict: Verdict; overridden?: boolean }) {
  return (
    <Notice tone={TONE[verdict]} role="status" title={VERDICT_LABELS[verdict]}>
      {overridden
        ? "An administrator overrode this verdict for the current version of the transfer; the reason is in the custody trail."
        : EXPLANATION[verdict]}
    </Notice>
  );
}
