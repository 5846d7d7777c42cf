import { DOCUMENT_KIND_WORDS, SEVERITY_WORDS } from "@shared/words";
import { jurisdictionName } from "@shared/compliance/jurisdiction";
import type { EvaluateResponse, Finding } from "@shared/compliance/schemas";
import { Tag } from "./tag";

const SEVERITY_TONE = { blocks: "block", needs_document: "caution", advisory: "info" } as const;

function FindingItem({ finding }: { finding: Finding }) {
  const satisfied = finding.satisfiedBy;
  return (
    <li className="flex flex-col gap-1.5 border-t border-rule py-3 first:border-t-0">
      <div className="flex flex-wrap items-center gap-2">
        <Tag tone={satisfied ? "ok" : SEVERITY_TONE[finding.severity]}>
          {satisfied ? "Covered" : SEVERITY_WORDS[finding.severity]}
        </Tag>
        <span className="text-sm font-semibold">
          {finding.jurisdiction === "US" ? "Federal" : jurisdictionName(finding.jurisdiction)}
        </span>
      </div>
      <p className="text-sm leading-relaxed">{finding.message}</p>
      {satisfied ? (
        <p className="text-sm text-fern-dark">
          Satisfied by: {DOCUMENT_KIND_WORDS[satisfied.kind]}
          {satisfied.number ? ` no. ${satisfied.number}` : ""}
          {satisfied.jurisdiction !== "US" ? ` (${jurisdictionName(satisfied.jurisdiction)})` : ""}
        </p>
      ) : null}
      <p className="text-xs text-ink-soft">
        Source:{" "}
        {finding.citation.url ? (
          <a
            href={finding.citation.url}
            target="_blank"
            rel="noopener noreferrer"
            className="text-fern underline underline-offset-2"
          >
            {finding.citation.text}
          </a>
        ) : (
          finding.citation.text
        )}{" "}
        · rule {finding.ruleId}, version {finding.ruleVersion}
      </p>
    </li>
  );
}

/** Findings that apply to every animal, said once above the lines (the Lacey Act, box marking …). */
export function ShipmentFindings({ findings }: { findings: readonly Finding[] }) {
  if (findings.length === 0) return null;
  return (
    <section aria-label="Findings for every animal" className="rounded-card border border-rule bg-paper px-4 py-2">
      <h3 className="pt-2 font-semibold">For every animal in this transfer</h3>
      <ul>
        {findings.map((finding) => (
          <FindingItem key={finding.ruleId} finding={finding} />
        ))}
      </ul>
    </section>
  );
}

/** Each animal line with what differs for it: severity, what the rule says and why it applies, the source. */
export function FindingsByAnimal({ animals }: { animals: EvaluateResponse["animals"] }) {
  return (
    <div className="flex flex-col gap-4">
      {animals.map((animal, index) => (
        <section
          key={`${animal.scientificName}-${index}`}
          aria-label={`Findings for ${animal.scientificName}`}
          className="rounded-card border border-rule bg-paper px-4 py-2"
        >
          <h3 className="pt-2 font-semibold">
            <i>{animal.scientificName}</i>
          </h3>
          {animal.findings.length === 0 ? (
            <p className="py-3 text-sm text-ink-soft">Nothing more than the findings for every animal.</p>
          ) : (
            <ul>
              {animal.findings.map((finding) => (
                <FindingItem key={finding.ruleId} finding={finding} />
              ))}
            </ul>
          )}
        </section>
      ))}
    </div>
  );
}
