import { Link } from "react-router";
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type RowSelectionState,
} from "@tanstack/react-table";
import type { RegisterEntryDto } from "@shared/schemas/register";
import { formatDate } from "@shared/dates";
import { quarantineWords, REGISTER_STATUS_WORDS, SEX_WORDS } from "@shared/words";
import { Badge } from "@/components/ui/feedback";
import { TaxonName } from "@/components/ui/taxon-name";
import { paths } from "@/config/paths";
import { ScrollRegion } from "@/components/ui/table";

export type RegisterSort = "acquired" | "species";

/** Columns a 390 px phone leaves out, so what matters (species, identifier, count, status, quarantine) fits without scrolling. */
const WIDE_ONLY = new Set(["sex", "acquired", "source"]);
const cellClass = (id: string) => (WIDE_ONLY.has(id) ? "hidden md:table-cell" : "");

const columns: ColumnDef<RegisterEntryDto>[] = [
  {
    id: "select",
    header: "Choose",
    cell: ({ row }) => (
      <input
        type="checkbox"
        className="h-5 w-5"
        aria-label={`Choose ${row.original.taxon.scientificName}${row.original.identifier ? ` ${row.original.identifier}` : ""}`}
        checked={row.getIsSelected()}
        disabled={!row.getCanSelect()}
        onChange={row.getToggleSelectedHandler()}
      />
    ),
  },
  {
    id: "species",
    header: "Species",
    cell: ({ row }) => (
      <Link to={paths.registerEntry.href(row.original.id)} className="text-fern underline-offset-2 hover:underline">
        <TaxonName taxon={row.original.taxon} />
      </Link>
    ),
  },
  {
    id: "identifier",
    header: "Identifier",
    cell: ({ row }) => row.original.identifier ?? (row.original.kind === "group" ? "Group" : "—"),
  },
  { id: "sex", header: "Sex", cell: ({ row }) => SEX_WORDS[row.original.sex] },
  {
    id: "count",
    header: "In care",
    cell: ({ row }) => (
      <span className="tabular-nums">
        {row.original.countInCare} of {row.original.count}
      </span>
    ),
  },
  {
    id: "status",
    header: "Status",
    cell: ({ row }) => (
      <div className="flex flex-col gap-1">
        <Badge tone={row.original.status === "in_care" ? "neutral" : "caution"}>
          {REGISTER_STATUS_WORDS[row.original.status]}
        </Badge>
        {row.original.quarantine ? (
          <Badge tone="caution">{quarantineWords(row.original.quarantine.daysLeft)}</Badge>
        ) : null}
      </div>
    ),
  },
  {
    id: "acquired",
    header: "Acquired",
    cell: ({ row }) => <span className="whitespace-nowrap">{formatDate(row.original.dateAcquired)}</span>,
  },
  {
    id: "source",
    header: "From",
    cell: ({ row }) =>
      row.original.transferId ? (
        <Link className="text-fern underline" to={paths.transfers.detail.href(row.original.transferId)}>
          {row.original.sourceOrganization} ({row.original.transferNumber})
        </Link>
      ) : (
        (row.original.sourceOrganization ?? "—")
      ),
  },
];

type Props = {
  entries: RegisterEntryDto[];
  sort: RegisterSort;
  dir: "asc" | "desc";
  onSort: (sort: RegisterSort, dir: "asc" | "desc") => void;
  selected: RowSelectionState;
  onSelect: (next: RowSelectionState) => void;
};

/** The register's rows; the server filters, sorts and pages, the table shows and lets the keeper choose animals. */
export function RegisterTable({ entries, sort, dir, onSort, selected, onSelect }: Props) {
  const table = useReactTable({
    data: entries,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => row.id,
    enableRowSelection: (row) => row.original.countInCare > 0,
    state: { rowSelection: selected },
    onRowSelectionChange: (updater) => onSelect(typeof updater === "function" ? updater(selected) : updater),
  });
  const sortable: Record<string, RegisterSort> = { species: "species", acquired: "acquired" };
  return (
    <ScrollRegion label="Register" className="rounded-card border border-rule bg-paper-card shadow-card">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">
          Register, sorted by {sort === "species" ? "species" : "day acquired"} (
          {dir === "asc" ? "ascending" : "descending"})
        </caption>
        <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const key = sortable[header.id];
                const label = flexRender(header.column.columnDef.header, header.getContext());
                const active = key === sort;
                return (
                  <th
                    key={header.id}
                    scope="col"
                    className={`px-3 py-2 font-semibold ${cellClass(header.id)}`}
                    aria-sort={active ? (dir === "asc" ? "ascending" : "descending") : undefined}
                  >
                    {key ? (
                      <button
                        type="button"
                        className="inline-flex items-center gap-1 uppercase"
                        onClick={() => onSort(key, active && dir === "desc" ? "asc" : "desc")}
                      >
                        {label}
                        <span aria-hidden>{active ? (dir === "asc" ? "▲" : "▼") : "↕"}</span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-rule align-top">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={`px-3 py-2 ${cellClass(cell.column.id)}`}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
