import { queryOptions, useQuery } from "@tanstack/react-query";
import type { CustodyLogDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { transferKeys } from "@/lib/transfer-queries";

export const custodyQueryOptions = (id: string) =>
  queryOptions({
    queryKey: transferKeys.custody(id),
    queryFn: ({ signal }) => api<CustodyLogDto>(`/api/transfers/${encodeURIComponent(id)}/custody`, { signal }),
  });

export const useCustody = (id: string, enabled: boolean) => useQuery({ ...custodyQueryOptions(id), enabled });
