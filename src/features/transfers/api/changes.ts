import { queryOptions, useQuery } from "@tanstack/react-query";
import type { TransferChangeDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { transferKeys } from "@/lib/transfer-queries";

export const changesQueryOptions = (id: string) =>
  queryOptions({
    queryKey: transferKeys.changes(id),
    queryFn: ({ signal }) =>
      api<{ changes: TransferChangeDto[] }>(`/api/transfers/${encodeURIComponent(id)}/changes`, { signal }).then(
        (r) => r.changes,
      ),
  });

export const useChanges = (id: string) => useQuery(changesQueryOptions(id));
