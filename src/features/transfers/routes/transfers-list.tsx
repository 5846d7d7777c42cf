import { TRANSFER_LIST_ROLE_WORDS, TRANSFER_STATUS_WORDS } from "@shared/words";
import { useEffect, useState } from "react";
import { Link, useSearchParams } from "react-router";
import { TRANSFER_LIST_ROLES, TRANSFER_STATUSES } from "@shared/constants";
import { Button } from "@/components/ui/button";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { SelectField, TextField } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { useTransfers } from "@/lib/transfer-queries";
import { useViewer } from "@/lib/viewer";
import { filtersFromSearch, withFilters } from "../components/list-filters";
import { TransfersTable, type SortKey } from "../components/transfers-table";

const roleOptions = [
  { value: "", label: "Any part I play" },
  ...TRANSFER_LIST_ROLES.map((role) => ({ value: role, label: TRANSFER_LIST_ROLE_WORDS[role] })),
];
const statusOptions = [
  { value: "", label: "Any state" },
  ...TRANSFER_STATUSES.map((s) => ({ value: s, label: TRANSFER_STATUS_WORDS[s] })),
];

/** The home page of members and admins: every transfer they can see, newest plans first. */
export function TransfersListRoute() {
  const viewer = useViewer();
  const [search, setSearch] = useSearchParams();
  const filters = filtersFromSearch(search);
  const list = useTransfers(filters);
  const update = (changes: Parameters<typeof withFilters>[1]) =>
    setSearch(withFilters(search, changes), { replace: true });

  // The search box asks the server once typing pauses, not at every key.
  const [q, setQ] = useState(filters.q ?? "");
  useEffect(() => {
    if (q === (search.get("q") ?? "")) return;
    const timer = setTimeout(
      () => setSearch((current) => withFilters(current, { q: q.trim() }), { replace: true }),
      300,
    );
    return () => clearTimeout(timer);
  }, [q, search, setSearch]);

  const rows = list.data?.pages.flatMap((page) => page.transfers) ?? [];
  const filtered = ["status", "role", "departFrom", "departTo", "q"].some((k) => search.get(k));

  return (
    <>
      <PageHeader
        title="Transfers"
        eyebrow={viewer.user.organization?.name ?? "All organisations"}
        actions={
          viewer.abilities.draftTransfers ? (
            <Link
              to={paths.transfers.new}
              className="inline-flex min-h-11 items-center rounded-md border border-fern-dark bg-fern px-4 font-medium text-paper-card hover:bg-fern-dark"
            >
              New transfer
            </Link>
          ) : null
        }
      >
        Every move you send, receive or carry, with where it stands.
      </PageHeader>

      <form
        role="search"
        aria-label="Filter transfers"
        className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-5"
        onSubmit={(e) => e.preventDefault()}
      >
        <TextField
          label="Search"
          type="search"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          hint="Number, organisation or species"
        />
        <SelectField
          label="State"
          options={statusOptions}
          value={filters.status ?? ""}
          onChange={(e) => update({ status: e.target.value })}
        />
        <SelectField
          label="My part"
          options={roleOptions}
          value={filters.role ?? ""}
          onChange={(e) => update({ role: e.target.value })}
        />
        <TextField
          label="Departs on or after"
          type="date"
          value={filters.departFrom ?? ""}
          onChange={(e) => update({ departFrom: e.target.value })}
        />
        <TextField
          label="Departs on or before"
          type="date"
          value={filters.departTo ?? ""}
          onChange={(e) => update({ departTo: e.target.value })}
        />
      </form>

      {list.isPending ? (
        <Loading label="Loading transfers…" />
      ) : list.error ? (
        <Notice tone="block" role="alert" title="The list did not load">
          {(list.error as Error).message}
        </Notice>
      ) : rows.length === 0 ? (
        <EmptyState title={filtered ? "No transfer matches these filters" : "No transfers yet"}>
          {filtered
            ? "Clear a filter or two to see more."
            : viewer.abilities.draftTransfers
              ? "Start one with “New transfer”."
              : "Transfers you take part in appear here."}
        </EmptyState>
      ) : (
        <>
          <TransfersTable
            transfers={rows}
            sort={(filters.sort ?? "departure") as SortKey}
            dir={filters.dir ?? "desc"}
            onSort={(sort, dir) => update({ sort, dir })}
          />
          <div className="mt-4 flex items-center gap-3">
            <p className="text-sm text-ink-soft" role="status">
              Showing {rows.length} {rows.length === 1 ? "transfer" : "transfers"}
              {list.hasNextPage ? "; there are more" : ""}.
            </p>
            {list.hasNextPage ? (
              <Button variant="secondary" onClick={() => void list.fetchNextPage()} busy={list.isFetchingNextPage}>
                Show more
              </Button>
            ) : null}
          </div>
        </>
      )}
    </>
  );
}
