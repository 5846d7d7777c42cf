import { COMPLIANCE_VERDICT_EXPLANATIONS, COMPLIANCE_VERDICT_WORDS } from "@shared/words";
import type { Verdict } from "@shared/compliance/schemas";
import { Notice } from "@/components/ui/feedback";

const TONE = { clear: "ok", needs_documents: "caution", blocked: "block" } as const;

/** The verdict in one line, in the notebook's colours: green clear, amber documents needed, brick blocked. */
export function VerdictBanner({ verdict, overridden = false }: { verdict: Verdict; overridden?: boolean }) {
  return (
    <Notice tone={TONE[verdict]} role="status" title={COMPLIANCE_VERDICT_WORDS[verdict]}>
      {overridden
        ? "An administrator overrode this verdict for the current version of the transfer; the reason is in the custody trail."
        : COMPLIANCE_VERDICT_EXPLANATIONS[verdict]}
    </Notice>
  );
}
