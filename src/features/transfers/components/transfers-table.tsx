import type { TransferSortKey } from "@shared/constants";
import { TRANSFER_SORT_WORDS, VIEWER_ROLE_WORDS } from "@shared/words";
import { Link } from "react-router";
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from "@tanstack/react-table";
import type { TransferSummaryDto } from "@shared/schemas/transfer";
import { StatusBadge } from "@/components/ui/status-badge";
import { paths } from "@/config/paths";
import { formatInstant } from "@shared/dates";
import { ScrollRegion } from "@/components/ui/table";

export type SortKey = TransferSortKey;

const columns: ColumnDef<TransferSummaryDto>[] = [
  {
    id: "number",
    accessorKey: "number",
    header: "Number",
    cell: ({ row }) => (
      <div className="flex flex-col">
        <Link
          to={paths.transfers.detail.href(row.original.id)}
          className="font-semibold text-fern underline-offset-2 hover:underline"
        >
          {row.original.number}
        </Link>
        <span className="text-xs text-ink-soft">{VIEWER_ROLE_WORDS[row.original.viewerRole]}</span>
      </div>
    ),
  },
  {
    id: "status",
    accessorKey: "status",
    header: "State",
    cell: ({ row }) => <StatusBadge status={row.original.status} />,
  },
  {
    id: "parties",
    header: "Sender → receiver",
    enableSorting: false,
    cell: ({ row }) => (
      <span>
        {row.original.sender.name} <span aria-hidden>→</span>
        <span className="sr-only">to</span> {row.original.receiver.name}
      </span>
    ),
  },
  {
    id: "route",
    header: "Route",
    enableSorting: false,
    cell: ({ row }) => {
      const { origin, destination } = row.original;
      return (
        <span className="whitespace-nowrap">
          {origin.city}, {origin.state} <span aria-hidden>→</span>
          <span className="sr-only">to</span> {destination.city}, {destination.state}
        </span>
      );
    },
  },
  {
    id: "departure",
    accessorKey: "plannedDepartureAt",
    header: "Departs",
    cell: ({ row }) => formatInstant(row.original.plannedDepartureAt, row.original.origin.timeZone),
  },
  {
    id: "animals",
    header: "Animals",
    enableSorting: false,
    cell: ({ row }) => `${row.original.animalCount} in ${row.original.speciesCount} species`,
  },
  {
    id: "updated",
    accessorKey: "updatedAt",
    header: "Last change",
    cell: ({ row }) => formatInstant(row.original.updatedAt),
  },
];

type Props = {
  transfers: TransferSummaryDto[];
  sort: SortKey;
  dir: "asc" | "desc";
  onSort: (sort: SortKey, dir: "asc" | "desc") => void;
};

/** The transfers table; the server sorts and pages, the table only shows and asks. */
export function TransfersTable({ transfers, sort, dir, onSort }: Props) {
  const sorting: SortingState = [{ id: sort, desc: dir === "desc" }];
  const table = useReactTable({
    data: transfers,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => row.id,
    manualSorting: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const first = next[0];
      if (first) onSort(first.id as SortKey, first.desc ? "desc" : "asc");
    },
  });

  return (
    <ScrollRegion label="Transfers" className="rounded-card border border-rule bg-paper-card shadow-card">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">
          Transfers, sorted by {TRANSFER_SORT_WORDS[sort]} ({dir === "asc" ? "ascending" : "descending"})
        </caption>
        <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    className="px-3 py-2.5 font-semibold"
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex min-h-11 items-center gap-1 uppercase tracking-wide hover:text-ink"
                      >
                        {label}
                        <span aria-hidden className="text-ink-faint">
                          {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                        </span>
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
        <tbody className="divide-y divide-rule">
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="hover:bg-paper/60">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2.5 align-top">
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
