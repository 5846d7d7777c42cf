import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { RegisterPageDto, RegisterQuery } from "@shared/schemas/register";
import { api } from "@/lib/api-client";
import { toQueryString } from "@/lib/query-string";

export type RegisterFilters = RegisterQuery;

export const registerKeys = {
  all: ["register"] as const,
  list: (filters: RegisterFilters) => [...registerKeys.all, "list", filters] as const,
  entry: (id: string) => [...registerKeys.all, "entry", id] as const,
  permits: () => [...registerKeys.all, "permits"] as const,
  report: (query: Record<string, string>) => [...registerKeys.all, "report", query] as const,
};

export const registerQueryOptions = (filters: RegisterFilters) =>
  queryOptions({
    queryKey: registerKeys.list(filters),
    queryFn: ({ signal }) => api<RegisterPageDto>(`/api/register?${toQueryString(filters)}`, { signal }),
  });

// The last rows stay on screen while a new filter loads.
export const useRegister = (filters: RegisterFilters) =>
  useQuery({ ...registerQueryOptions(filters), placeholderData: keepPreviousData });

/** The same rows as CSV: a plain link, so the browser downloads it itself. */
export const registerCsvHref = (filters: RegisterFilters) => {
  const { cursor: _cursor, limit: _limit, ...rest } = filters;
  const query = toQueryString(rest);
  return query ? `/api/register.csv?${query}` : "/api/register.csv";
};
