import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { z } from "zod";
import type { registerQuerySchema, RegisterEntryDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { toQueryString } from "@/lib/query-string";

export type RegisterFilters = z.input<typeof registerQuerySchema>;

export const registerKeys = {
  all: ["register"] as const,
  list: (filters: RegisterFilters) => [...registerKeys.all, filters] as const,
};

export const registerQueryOptions = (filters: RegisterFilters) =>
  queryOptions({
    queryKey: registerKeys.list(filters),
    queryFn: ({ signal }) =>
      api<{ entries: RegisterEntryDto[] }>(`/api/register?${toQueryString(filters)}`, { signal }).then(
        (r) => r.entries,
      ),
  });

// The last rows stay on screen while a new filter loads.
export const useRegister = (filters: RegisterFilters) =>
  useQuery({ ...registerQueryOptions(filters), placeholderData: keepPreviousData });

/** The same rows as CSV: a plain link, so the browser downloads it itself. */
export const registerCsvHref = (filters: RegisterFilters) => {
  const query = toQueryString(filters);
  return query ? `/api/register.csv?${query}` : "/api/register.csv";
};
