import { REGISTER_STATUS_WORDS, SEX_WORDS } from "@shared/words";
import { useEffect, useState } from "react";
import { Link, useSearchParams } from "react-router";
import type { RowSelectionState } from "@tanstack/react-table";
import { REGISTER_STATUSES, SEXES } from "@shared/constants";
import type { TaxonBriefDto } from "@shared/schemas/transfer";
import { registerQuerySchema } from "@shared/schemas/register";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { SelectField, TextField } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page";
import { TaxonCombobox } from "@/components/ui/taxon-combobox";
import { paths } from "@/config/paths";
import { searchTaxa } from "@/lib/taxa-search";
import { registerCsvHref, useRegister, type RegisterFilters } from "../api/get-register";
import { usePermitPlans } from "../api/register-report";
import { RegisterTable, type RegisterSort } from "../components/register-table";

const KEYS = [
  "q",
  "taxonId",
  "sex",
  "status",
  "permitId",
  "quarantine",
  "from",
  "to",
  "sort",
  "dir",
  "cursor",
] as const;

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
  // A new filter or order starts again at the first page.
  if (key !== "cursor") next.delete("cursor");
  return next;
}

const linkButton =
  "inline-flex min-h-11 items-center rounded-md border border-rule bg-paper-card px-4 font-medium text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-50";

/** The organisation's register: every animal it holds or held, filtered, sorted and paged by the server. */
export function RegisterRoute() {
  const [search, setSearch] = useSearchParams();
  const filters = filtersFrom(search);
  const register = useRegister({ ...filters, limit: 50 });
  const permits = usePermitPlans();
  const [q, setQ] = useState(filters.q ?? "");
  const [taxon, setTaxon] = useState<TaxonBriefDto | null>(null);
  const [selected, setSelected] = useState<RowSelectionState>({});
  // Cursors of the pages before this one, so "Previous page" goes back without an offset.
  const [previous, setPrevious] = useState<string[]>([]);

  const set = (key: (typeof KEYS)[number], value: string | undefined) => {
    if (key !== "cursor") setPrevious([]);
    setSearch((current) => withParam(current, key, value), { replace: true });
  };

  // The search box asks the server once typing pauses, not at every key.
  useEffect(() => {
    if (q === (search.get("q") ?? "")) return;
    const timer = setTimeout(() => setSearch((current) => withParam(current, "q", q.trim()), { replace: true }), 300);
    return () => clearTimeout(timer);
  }, [q, search, setSearch]);

  const chosen = Object.keys(selected).filter((id) => selected[id]);
  // After a reload the address keeps the species filter but not its name: take it from the rows it found.
  const found = register.data?.entries[0]?.taxon;
  const shownTaxon =
    taxon ??
    (filters.taxonId && found?.id === filters.taxonId ? { ...found, profileGroup: null, rank: "species" } : null);
  return (
    <>
      <PageHeader
        title="Collection register"
        eyebrow="Every animal, from arrival to departure"
        actions={
          <div className="flex flex-wrap gap-2">
            <Link to={paths.registerAdd} className={linkButton}>
              Add animals
            </Link>
            <Link to={paths.registerImport} className={linkButton}>
              Import a spreadsheet
            </Link>
            <Link to={paths.registerReport} className={linkButton}>
              Yearly report
            </Link>
            <Link to={paths.registerSettings} className={linkButton}>
              Quarantine length
            </Link>
            <a href={registerCsvHref(filters)} download className={linkButton}>
              Download as CSV
            </a>
          </div>
        }
      >
        The records your permits ask you to keep: what came in, hatched, died or left, and who is in quarantine.
      </PageHeader>
      <form
        role="search"
        aria-label="Filter the register"
        className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-4"
        onSubmit={(e) => e.preventDefault()}
      >
        <TextField
          label="Search"
          type="search"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          hint="Identifier, source or transfer"
        />
        <TaxonCombobox
          label="Species"
          value={shownTaxon}
          search={searchTaxa}
          onChange={(t) => {
            setTaxon(t);
            set("taxonId", t?.id);
          }}
        />
        <SelectField
          label="Status"
          options={[
            { value: "", label: "Any" },
            ...REGISTER_STATUSES.map((s) => ({ value: s, label: REGISTER_STATUS_WORDS[s] })),
          ]}
          value={filters.status ?? ""}
          onChange={(e) => set("status", e.target.value)}
        />
        <SelectField
          label="Permit"
          options={[
            { value: "", label: "Any" },
            ...(permits.data ?? []).map((p) => ({ value: p.id, label: `${p.number} (${p.jurisdiction})` })),
          ]}
          value={filters.permitId ?? ""}
          onChange={(e) => set("permitId", e.target.value)}
        />
        <SelectField
          label="Quarantine"
          options={[
            { value: "", label: "Any" },
            { value: "yes", label: "In quarantine" },
            { value: "no", label: "Not in quarantine" },
          ]}
          value={filters.quarantine ?? ""}
          onChange={(e) => set("quarantine", e.target.value)}
        />
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
      {chosen.length ? (
        <div className="mb-3 flex flex-wrap items-center gap-3">
          <span>
            {chosen.length} chosen. Species, identifiers, sex, origin and sizes fill the new transfer's animal lines.
          </span>
          <Link to={`${paths.transfers.new}?fromRegister=${chosen.join(",")}`} className={linkButton}>
            Start a transfer with these
          </Link>
        </div>
      ) : null}
      {register.isPending ? (
        <Loading label="Loading the register…" />
      ) : register.error ? (
        <Notice tone="block" role="alert">
          {(register.error as Error).message}
        </Notice>
      ) : register.data.entries.length === 0 ? (
        <EmptyState title="Nothing in the register here">
          {search.toString()
            ? "No entry matches these filters."
            : "Animals appear here when you sign a check-in, add them or import a spreadsheet."}
        </EmptyState>
      ) : (
        <>
          <RegisterTable
            entries={register.data.entries}
            sort={(filters.sort ?? "acquired") as RegisterSort}
            dir={filters.dir ?? "desc"}
            onSort={(sort, dir) => {
              setPrevious([]);
              setSearch((current) => withParam(withParam(current, "sort", sort), "dir", dir), { replace: true });
            }}
            selected={selected}
            onSelect={setSelected}
          />
          <nav aria-label="Register pages" className="mt-3 flex gap-2">
            <button
              type="button"
              className={linkButton}
              disabled={!filters.cursor}
              onClick={() => {
                const back = previous.at(-1);
                setPrevious(previous.slice(0, -1));
                setSearch((current) => withParam(current, "cursor", back), { replace: true });
              }}
            >
              Previous page
            </button>
            <button
              type="button"
              className={linkButton}
              disabled={!register.data.nextCursor}
              onClick={() => {
                setPrevious([...previous, filters.cursor ?? ""]);
                setSearch((current) => withParam(current, "cursor", register.data.nextCursor ?? undefined), {
                  replace: true,
                });
              }}
            >
              Next page
            </button>
          </nav>
        </>
      )}
    </>
  );
}
