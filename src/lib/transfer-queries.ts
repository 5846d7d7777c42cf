import {
  infiniteQueryOptions,
  queryOptions,
  useInfiniteQuery,
  useQuery,
  type QueryClient,
} from "@tanstack/react-query";
import type { TransferDto, TransferListDto, TransferListQuery } from "@shared/schemas/transfer";
import { api } from "./api-client";
import { toQueryString } from "./query-string";

/** The list filters a screen asks for; the cursor is the page parameter. */
export type TransferListFilters = Omit<TransferListQuery, "cursor">;

/** Query keys for transfers, from general to specific, shared by every screen that shows one. */
export const transferKeys = {
  all: ["transfers"] as const,
  lists: () => [...transferKeys.all, "list"] as const,
  list: (filters: TransferListFilters) => [...transferKeys.lists(), filters] as const,
  detail: (id: string) => [...transferKeys.all, "detail", id] as const,
  custody: (id: string) => [...transferKeys.detail(id), "custody"] as const,
  changes: (id: string) => [...transferKeys.detail(id), "changes"] as const,
  messages: (id: string) => [...transferKeys.detail(id), "messages"] as const,
};

export const transfersQueryOptions = (filters: TransferListFilters) =>
  infiniteQueryOptions({
    queryKey: transferKeys.list(filters),
    queryFn: ({ pageParam, signal }) =>
      api<TransferListDto>(`/api/transfers?${toQueryString({ ...filters, cursor: pageParam })}`, { signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });

/** A keyset-paged list: `fetchNextPage` follows `nextCursor`. */
export const useTransfers = (filters: TransferListFilters) => useInfiniteQuery(transfersQueryOptions(filters));

export const transferQueryOptions = (id: string) =>
  queryOptions({
    queryKey: transferKeys.detail(id),
    queryFn: ({ signal }) =>
      api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(id)}`, { signal }).then((r) => r.transfer),
  });

export const useTransfer = (id: string) => useQuery(transferQueryOptions(id));

/**
 * After any write that answers with the transfer: keep the answer, and refresh the lists and
 * the detail's satellites (custody log, edit history), which the write may have changed.
 */
export function storeTransfer(client: QueryClient, transfer: TransferDto): void {
  const detail = transferKeys.detail(transfer.id);
  client.setQueryData(detail, transfer);
  void client.invalidateQueries({ queryKey: transferKeys.lists() });
  void client.invalidateQueries({ queryKey: detail, predicate: (query) => query.queryKey.length > detail.length });
}
