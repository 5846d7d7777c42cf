import { transferListQuerySchema } from "@shared/schemas/transfer";
import type { TransferListFilters } from "@/lib/transfer-queries";

type FilterKey = "status" | "role" | "departFrom" | "departTo" | "q" | "sort" | "dir";
const KEYS: FilterKey[] = ["status", "role", "departFrom", "departTo", "q", "sort", "dir"];

/**
 * The list's filters live in the address bar, so a filtered list can be bookmarked or shared.
 * Each parameter is checked with the server's own schema; a value it would refuse is dropped.
 */
export function filtersFromSearch(search: URLSearchParams): TransferListFilters {
  const filters: Record<string, unknown> = {};
  for (const key of KEYS) {
    const raw = search.get(key);
    if (raw === null || raw === "") continue;
    const parsed = transferListQuerySchema.shape[key].safeParse(raw);
    if (parsed.success) filters[key] = parsed.data;
  }
  return filters as TransferListFilters;
}

/** The address-bar search after changing some filters; an empty value removes its parameter. */
export function withFilters(
  search: URLSearchParams,
  changes: Partial<Record<FilterKey, string | undefined>>,
): URLSearchParams {
  const next = new URLSearchParams(search);
  for (const [key, value] of Object.entries(changes)) {
    if (value) next.set(key, value);
    else next.delete(key);
  }
  return next;
}
