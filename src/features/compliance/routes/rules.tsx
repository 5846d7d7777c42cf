import { RULE_EFFECT_WORDS } from "@shared/words";
import { useState, type FormEvent } from "react";
import { JURISDICTIONS, jurisdictionName, type Jurisdiction } from "@shared/compliance/jurisdiction";
import type { Rule } from "@shared/compliance/rule";
import type { RuleListQuery, RuleSummaryDto } from "@shared/schemas/compliance";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { Tag } from "../components/tag";
import { Card, PageHeader } from "@/components/ui/page";
import { Table, Td, Th } from "@/components/ui/table";
import { useViewer } from "@/lib/viewer";
import { useRetireRule, useRuleHistory, useRules } from "../api/rules";
import { CoverageAdmin } from "../components/coverage-admin";
import { RuleForm } from "../components/rule-form";
import { blankRule } from "../components/rule-form-values";
import type { RuleVersionDto } from "@shared/schemas/compliance";
import { formatDate, formatInstant } from "@shared/dates";

const inForce = (rule: Rule) =>
  `In force ${rule.effectiveFrom ? `from ${formatDate(rule.effectiveFrom)}` : "since a date not recorded"}${rule.effectiveTo ? ` until ${formatDate(rule.effectiveTo)}` : ", still in force"}`;

const place = (j: Jurisdiction) => (j === "US" ? "Federal" : jurisdictionName(j));

function VersionList({ versions }: { versions: RuleVersionDto[] }) {
  return (
    <ol className="flex flex-col gap-3" aria-label="Versions, newest first">
      {versions.map((v) => (
        <li key={v.rule.version} className="rounded-card border border-rule bg-paper px-4 py-3 text-sm">
          <p className="font-semibold">
            Version {v.rule.version}
            {v.retired ? " — retired" : ""} · reviewed {formatDate(v.rule.reviewedOn)} by {v.rule.reviewedBy}
            <span className="font-normal text-ink-soft">
              {" "}
              · saved {formatInstant(v.createdAt)}
              {v.createdBy ? ` by ${v.createdBy.displayName}` : " with the seed library"}
            </span>
          </p>
          <p className="mt-1">{v.rule.summary}</p>
          <p className="mt-1 text-ink-soft">
            {v.rule.citation.url ? (
              <a
                className="text-fern underline underline-offset-2"
                href={v.rule.citation.url}
                target="_blank"
                rel="noopener noreferrer"
              >
                {v.rule.citation.text}
              </a>
            ) : (
              v.rule.citation.text
            )}
          </p>
          <p className="mt-1 text-xs text-ink-soft">
            {inForce(v.rule)} · covers {v.rule.selector.taxa.map((t) => (t === "*" ? "every animal" : t)).join(", ")}
            {v.rule.selector.exceptTaxa?.length ? `, except ${v.rule.selector.exceptTaxa.join(", ")}` : ""}
          </p>
        </li>
      ))}
    </ol>
  );
}

/** One rule: its versions beside the form that writes the next one, and retiring in one step. */
function RuleHistory({ ruleKey, reviewer }: { ruleKey: string; reviewer: string }) {
  const history = useRuleHistory(ruleKey);
  const retire = useRetireRule();
  const [editing, setEditing] = useState(false);
  if (history.isPending) return <Loading label="Loading the rule's versions…" />;
  if (history.error)
    return (
      <Notice tone="block" role="alert">
        {(history.error as Error).message}
      </Notice>
    );
  const [current] = history.data.versions;
  if (!current) return null;
  const actions = editing ? null : (
    <>
      <Button onClick={() => setEditing(true)}>Edit</Button>
      <Button
        variant={current.retired ? "secondary" : "danger"}
        busy={retire.isPending}
        onClick={() => retire.mutate({ current, retired: !current.retired })}
      >
        {current.retired ? "Put back in force" : "Retire"}
      </Button>
    </>
  );
  return (
    <Card
      title={`${ruleKey}: version ${current.rule.version}${current.retired ? " (retired)" : ""}`}
      actions={actions}
      className="mb-6"
    >
      {retire.error ? (
        <Notice tone="block" role="alert">
          {(retire.error as Error).message}
        </Notice>
      ) : null}
      {editing ? (
        <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
          <RuleForm
            key={current.rule.version}
            base={{ rule: current.rule, retired: current.retired }}
            reviewer={reviewer}
            onDone={() => setEditing(false)}
          />
          <aside aria-label="Earlier versions">
            <h3 className="mb-2 font-semibold">Versions</h3>
            <VersionList versions={history.data.versions} />
          </aside>
        </div>
      ) : (
        <VersionList versions={history.data.versions} />
      )}
    </Card>
  );
}

function RuleRow({
  summary,
  selected,
  onSelect,
}: {
  summary: RuleSummaryDto;
  selected: boolean;
  onSelect: () => void;
}) {
  const { rule, retired } = summary.current;
  return (
    <tr className={selected ? "bg-fern-light/50" : undefined}>
      <Td>{place(rule.jurisdiction)}</Td>
      <Td className="max-w-md">
        <p>{rule.summary}</p>
        <p className="mt-1 text-xs text-ink-soft">{rule.citation.text}</p>
      </Td>
      <Td>
        <div className="flex flex-col items-start gap-1">
          <Tag
            tone={
              rule.effect.kind === "prohibited" ? "block" : rule.effect.kind.endsWith("required") ? "caution" : "info"
            }
          >
            {RULE_EFFECT_WORDS[rule.effect.kind]}
          </Tag>
          {rule.demo ? <Tag tone="neutral">Demo rule</Tag> : null}
          {retired ? <Tag tone="neutral">Retired</Tag> : null}
        </div>
      </Td>
      <Td>
        {formatDate(rule.reviewedOn)}
        <br />
        <span className="text-ink-soft">{rule.reviewedBy}</span>
      </Td>
      <Td>
        v{rule.version}
        {summary.versionCount > 1 ? ` of ${summary.versionCount}` : ""}
      </Td>
      <Td className="text-right">
        <Button variant="secondary" onClick={onSelect} aria-pressed={selected}>
          Versions
        </Button>
      </Td>
    </tr>
  );
}

/** The rule library for admins: filter by state and taxon, edit with citation and review date, every version kept. */
export function RulesRoute() {
  const viewer = useViewer();
  const [filters, setFilters] = useState<RuleListQuery>({});
  const [draft, setDraft] = useState<{ jurisdiction: string; taxon: string }>({ jurisdiction: "", taxon: "" });
  const [selected, setSelected] = useState<string | null>(null);
  const [view, setView] = useState<"rules" | "coverage">("rules");
  const [creating, setCreating] = useState(false);
  const rules = useRules(filters);

  const apply = (event: FormEvent) => {
    event.preventDefault();
    setFilters({
      ...(draft.jurisdiction ? { jurisdiction: draft.jurisdiction as RuleListQuery["jurisdiction"] } : {}),
      ...(draft.taxon.trim() ? { taxon: draft.taxon.trim() } : {}),
    });
  };

  return (
    <>
      <PageHeader
        title="Rule library"
        eyebrow="Administration"
        actions={
          <>
            <Button
              variant={view === "rules" ? "primary" : "secondary"}
              aria-pressed={view === "rules"}
              onClick={() => setView("rules")}
            >
              Rules
            </Button>
            <Button
              variant={view === "coverage" ? "primary" : "secondary"}
              aria-pressed={view === "coverage"}
              onClick={() => setView("coverage")}
            >
              Coverage by state
            </Button>
          </>
        }
      >
        Federal and state rules the compliance check applies, each with its source and last review. Demo rules are
        invented and say so. A state counts as covered only once an administrator has reviewed its rules.
      </PageHeader>
      {view === "coverage" ? <CoverageAdmin reviewer={viewer.user.displayName} /> : null}
      {view === "rules" && creating ? (
        <Card title="New rule" className="mb-6">
          <RuleForm
            base={{ blank: blankRule(viewer.user.displayName, new Date().toISOString().slice(0, 10)) }}
            reviewer={viewer.user.displayName}
            onDone={() => setCreating(false)}
          />
        </Card>
      ) : null}
      {view === "rules" ? (
        <>
          <form onSubmit={apply} className="mb-6 flex flex-wrap items-end gap-3" role="search">
            <div className="w-56">
              <SelectField
                label="State"
                value={draft.jurisdiction}
                onChange={(e) => setDraft({ ...draft, jurisdiction: e.target.value })}
                options={[
                  { value: "", label: "All" },
                  ...JURISDICTIONS.map((j) => ({
                    value: j,
                    label: j === "US" ? "Federal (US)" : `${jurisdictionName(j)} (${j})`,
                  })),
                ]}
              />
            </div>
            <div className="w-72">
              <TextField
                label="Taxon (any rank)"
                placeholder="e.g. Python bivittatus or Testudines"
                value={draft.taxon}
                onChange={(e) => setDraft({ ...draft, taxon: e.target.value })}
              />
            </div>
            <Button type="submit" variant="secondary">
              Filter
            </Button>
            {creating ? null : (
              <Button type="button" onClick={() => setCreating(true)}>
                New rule
              </Button>
            )}
          </form>
          {selected ? <RuleHistory key={selected} ruleKey={selected} reviewer={viewer.user.displayName} /> : null}
          {rules.isPending ? (
            <Loading label="Loading the rules…" />
          ) : rules.error ? (
            <Notice tone="block" role="alert">
              {(rules.error as Error).message}
            </Notice>
          ) : rules.data.length === 0 ? (
            <EmptyState title="No rule matches">
              Try another state, or a broader taxon such as the family or the order.
            </EmptyState>
          ) : (
            <Table
              caption="Rules"
              head={
                <tr>
                  <Th>Where</Th>
                  <Th>Rule</Th>
                  <Th>Effect</Th>
                  <Th>Reviewed</Th>
                  <Th>Version</Th>
                  <Th>
                    <span className="sr-only">Actions</span>
                  </Th>
                </tr>
              }
            >
              {rules.data.map((summary) => (
                <RuleRow
                  key={summary.ruleKey}
                  summary={summary}
                  selected={selected === summary.ruleKey}
                  onSelect={() => setSelected(selected === summary.ruleKey ? null : summary.ruleKey)}
                />
              ))}
            </Table>
          )}
        </>
      ) : null}
    </>
  );
}
