import { COMPLIANCE_VERDICT_EXPLANATIONS, COMPLIANCE_VERDICT_WORDS } from "@shared/words";
import { nameInSentence, uncovered, type CoverageEntry } from "@shared/compliance/coverage";
import type { Verdict } from "@shared/compliance/schemas";
import { Notice } from "@/components/ui/feedback";

const TONE = { clear: "ok", unverified: "caution", needs_documents: "caution", blocked: "block" } as const;

/** "Tennessee (Tennessee Wildlife Resources Agency)" as a link to the agency. */
function AgencyToAsk({ entry }: { entry: CoverageEntry }) {
  const name = nameInSentence(entry);
  if (!entry.agency.url) return <>{name}</>;
  return (
    <>
      {name} (
      <a href={entry.agency.url} target="_blank" rel="noopener noreferrer" className="underline underline-offset-2">
        {entry.agency.name}
      </a>
      )
    </>
  );
}

/**
 * The verdict in one line, in the notebook's colours: green clear, amber unverified or documents
 * needed, brick blocked. An unverified verdict names each state on the route whose rules were not
 * reviewed and the agency to ask.
 */
export function VerdictBanner({
  verdict,
  coverage = [],
  overridden = false,
}: {
  verdict: Verdict;
  coverage?: readonly CoverageEntry[];
  overridden?: boolean;
}) {
  const open = uncovered(coverage);
  return (
    <Notice tone={TONE[verdict]} role="status" title={COMPLIANCE_VERDICT_WORDS[verdict]}>
      {overridden
        ? "An administrator overrode this verdict for the current version of the transfer; the reason is in the custody trail."
        : COMPLIANCE_VERDICT_EXPLANATIONS[verdict]}
      {verdict !== "clear" && open.length > 0 ? (
        <span className="mt-1 block">
          Not reviewed in Hatchway&apos;s library:{" "}
          {open.map((entry, index) => (
            <span key={entry.jurisdiction}>
              {index > 0 ? (index === open.length - 1 ? " and " : ", ") : null}
              <AgencyToAsk entry={entry} />
            </span>
          ))}
          . Ask them before the animals travel.
        </span>
      ) : null}
    </Notice>
  );
}
