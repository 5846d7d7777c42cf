import type { TaxonSearchHitDto } from "@shared/schemas/transfer";
import { api } from "./api-client";

/** Looks up species by a few letters of any of their names; the signal cancels a stale search. */
export type TaxonSearch = (q: string, signal: AbortSignal) => Promise<TaxonSearchHitDto[]>;

/** The server's typo-tolerant species search, `GET /api/taxa?q=`. */
export const searchTaxa: TaxonSearch = (q, signal) =>
  api<{ taxa: TaxonSearchHitDto[] }>(`/api/taxa?q=${encodeURIComponent(q)}`, { signal }).then((r) => r.taxa);
