import { REGISTER_CONDITION_WORDS, SEX_WORDS } from "@shared/words";
import { useEffect, useState } from "react";
import { Link, useSearchParams } from "react-router";
import { SEXES } from "@shared/constants";
import type { TaxonBriefDto } from "@shared/schemas/transfer";
import { registerQuerySchema } from "@shared/schemas/register";
import { Badge, EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { SelectField, TextField } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page";
import { Table, Td, Th } from "@/components/ui/table";
import { TaxonCombobox } from "@/components/ui/taxon-combobox";
import { TaxonName } from "@/components/ui/taxon-name";
import { paths } from "@/config/paths";
import { formatDate } from "@shared/dates";
import { formatWeight } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";
import { searchTaxa } from "@/lib/taxa-search";
import { registerCsvHref, useRegister, type RegisterFilters } from "../api/get-register";

const KEYS = ["q", "taxonId", "sex", "from", "to"] as const;

/** Filters from the address bar, each checked with the server's schema. */
function filtersFrom(search: URLSearchParams): RegisterFilters {
  const filters: Record<string, unknown> = {};
  for (const key of KEYS) {
    const parsed = registerQuerySchema.shape[key].safeParse(search.get(key) || undefined);
    if (parsed.success && parsed.data !== undefined) filters[key] = parsed.data;
  }
  return filters as RegisterFilters;
}

function withParam(search: URLSearchParams, key: string, value: string | undefined): URLSearchParams {
  const next = new URLSearchParams(search);
  if (value) next.set(key, value);
  else next.delete(key);
  return next;
}

/** The organisation's collection register: every animal it received, where from, and how it arrived. */
export function RegisterRoute() {
  const [search, setSearch] = useSearchParams();
  const filters = filtersFrom(search);
  const register = useRegister(filters);
  const [system] = useUnitSystem();
  const [q, setQ] = useState(filters.q ?? "");
  const [taxon, setTaxon] = useState<TaxonBriefDto | null>(null);

  const set = (key: (typeof KEYS)[number], value: string | undefined) =>
    setSearch((current) => withParam(current, key, value), { replace: true });

  // The search box asks the server once typing pauses, not at every key.
  useEffect(() => {
    if (q === (search.get("q") ?? "")) return;
    const timer = setTimeout(() => setSearch((current) => withParam(current, "q", q.trim()), { replace: true }), 300);
    return () => clearTimeout(timer);
  }, [q, search, setSearch]);

  return (
    <>
      <PageHeader
        title="Collection register"
        eyebrow="Animals received"
        actions={
          <a
            href={registerCsvHref(filters)}
            download
            className="inline-flex min-h-11 items-center rounded-md border border-rule bg-paper-card px-4 font-medium text-ink hover:bg-paper-deep"
          >
            Download as CSV
          </a>
        }
      >
        Every animal checked in from a transfer, for the records your permits ask you to keep.
      </PageHeader>
      <form
        role="search"
        aria-label="Filter the register"
        className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-5"
        onSubmit={(e) => e.preventDefault()}
      >
        <TextField
          label="Search"
          type="search"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          hint="Identifier, source or notes"
        />
        <div>
          <TaxonCombobox
            label="Species"
            value={taxon}
            search={searchTaxa}
            onChange={(t) => {
              setTaxon(t);
              set("taxonId", t?.id);
            }}
          />
          {filters.taxonId && !taxon ? (
            <button
              type="button"
              className="mt-1 min-h-11 text-sm font-medium text-fern underline"
              onClick={() => set("taxonId", undefined)}
            >
              Showing one species only: show all
            </button>
          ) : null}
        </div>
        <SelectField
          label="Sex"
          options={[{ value: "", label: "Any" }, ...SEXES.map((s) => ({ value: s, label: SEX_WORDS[s] }))]}
          value={filters.sex ?? ""}
          onChange={(e) => set("sex", e.target.value)}
        />
        <TextField
          label="Acquired on or after"
          type="date"
          value={filters.from ?? ""}
          onChange={(e) => set("from", e.target.value)}
        />
        <TextField
          label="Acquired on or before"
          type="date"
          value={filters.to ?? ""}
          onChange={(e) => set("to", e.target.value)}
        />
      </form>
      {register.isPending ? (
        <Loading label="Loading the register…" />
      ) : register.error ? (
        <Notice tone="block" role="alert">
          {(register.error as Error).message}
        </Notice>
      ) : register.data.entries.length === 0 ? (
        <EmptyState title="Nothing in the register yet">
          {Object.keys(filters).length
            ? "No entry matches these filters."
            : "Animals appear here when you sign a check-in."}
        </EmptyState>
      ) : (
        <Table
          caption="Collection register"
          head={
            <tr>
              <Th>Species</Th>
              <Th>Sex</Th>
              <Th className="text-right">Count</Th>
              <Th>Identifier</Th>
              <Th>Acquired</Th>
              <Th>From</Th>
              <Th>Transfer</Th>
              <Th>Condition</Th>
              <Th>Notes</Th>
            </tr>
          }
        >
          {register.data.entries.map((r) => (
            <tr key={r.id}>
              <Td>
                <TaxonName taxon={r.taxon} />
              </Td>
              <Td>{SEX_WORDS[r.sex]}</Td>
              <Td className="text-right tabular-nums">{r.count}</Td>
              <Td>{r.identifier ?? "—"}</Td>
              <Td className="whitespace-nowrap">{formatDate(r.dateAcquired)}</Td>
              <Td>{r.sourceOrganization}</Td>
              <Td>
                {r.transferId ? (
                  <Link className="text-fern underline" to={paths.transfers.detail.href(r.transferId)}>
                    {r.transferNumber}
                  </Link>
                ) : (
                  "—"
                )}
              </Td>
              <Td>
                <Badge tone={r.condition === "well" ? "ok" : r.condition === "problem" ? "caution" : "block"}>
                  {r.condition ? REGISTER_CONDITION_WORDS[r.condition] : "—"}
                </Badge>
              </Td>
              <Td className="whitespace-pre-wrap">
                {[r.notes, r.weightG != null ? `Weight at check-in: ${formatWeight(r.weightG, system)}` : null]
                  .filter(Boolean)
                  .join("\n")}
              </Td>
            </tr>
          ))}
        </Table>
      )}
    </>
  );
}
