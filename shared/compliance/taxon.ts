import { LIMITS } from "@shared/constants";
import { NO_CONTROL_CHARACTERS } from "../schemas/common";
import { z } from "../validation/zod";

/**
 * Ranks a lineage may carry. Wider than TAXON_RANKS because some rules name a rank between
 * order and family: Hawaii's ban covers every snake, suborder Serpentes.
 */
export const LINEAGE_RANKS = [
  "class",
  "order",
  "suborder",
  "infraorder",
  "superfamily",
  "family",
  "subfamily",
  "genus",
  "species",
  "subspecies",
] as const;
export type LineageRank = (typeof LINEAGE_RANKS)[number];

/** A selector entry that covers every animal (used by rules on all wildlife, e.g. the Lacey Act). */
export const ANY_TAXON = "*";

const taxonNameSchema = z
  .string()
  .trim()
  .min(1)
  .max(LIMITS.nameMax)
  .refine((name) => !name.includes("\u0000"), { params: { instruction: NO_CONTROL_CHARACTERS } });

/** The taxon the server resolves from a scientific name before calling the evaluation. */
export const resolvedTaxonSchema = z.strictObject({
  scientificName: taxonNameSchema,
  rank: z.enum(LINEAGE_RANKS),
  /** From class down to the taxon itself. */
  lineage: z.array(z.strictObject({ rank: z.enum(LINEAGE_RANKS), scientificName: taxonNameSchema })).max(20),
  synonyms: z.array(taxonNameSchema).max(200),
  venomous: z.boolean(),
});
export type ResolvedTaxon = z.infer<typeof resolvedTaxonSchema>;

/** Which taxa a rule covers: names at any rank (or ANY_TAXON); descendants and synonyms are covered too. */
export const taxonSelectorSchema = z.strictObject({
  taxa: z.array(taxonNameSchema).min(1).max(500),
  /** Descendants of these are left out even when a broader name above selects them. */
  exceptTaxa: z.array(taxonNameSchema).max(100).optional(),
});
export type TaxonSelector = z.infer<typeof taxonSelectorSchema>;

/** Scientific names compare without regard to case or spacing. */
export function normalizeTaxonName(name: string): string {
  return name.trim().replace(/\s+/g, " ").toLowerCase();
}

/** The genus and, for a trinomial, the species a name places the taxon under. */
function impliedParents(name: string): string[] {
  const words = name.split(" ");
  const parents = words.length >= 2 ? [words[0] as string] : [];
  if (words.length >= 3) parents.push(`${words[0]} ${words[1]}`);
  return parents;
}

/**
 * Every normalised name a rule or a permit may use for this taxon: its own name, each ancestor,
 * each synonym, and the genus (and species, for a trinomial) that a name or synonym places it
 * under, so "Geochelone" still finds Stigmochelys pardalis (formerly Geochelone pardalis) and
 * "Python molurus" finds Python bivittatus (formerly Python molurus bivittatus).
 */
export function taxonMatchKeys(taxon: ResolvedTaxon): Set<string> {
  const keys = new Set<string>();
  for (const entry of taxon.lineage) keys.add(normalizeTaxonName(entry.scientificName));
  for (const name of [taxon.scientificName, ...taxon.synonyms]) {
    const normalized = normalizeTaxonName(name);
    keys.add(normalized);
    for (const parent of impliedParents(normalized)) keys.add(parent);
  }
  return keys;
}

/** Items looked up by the normalised names their selectors use, with their normalised exceptions. */
export interface TaxonIndex<T> {
  readonly byName: ReadonlyMap<string, readonly T[]>;
  readonly exceptions: ReadonlyMap<T, readonly string[]>;
}

/**
 * Indexes items by selector name so that each animal costs one lookup per name it goes by,
 * whatever the number of rules.
 */
export function indexBySelector<T extends { selector: TaxonSelector }>(items: readonly T[]): TaxonIndex<T> {
  const byName = new Map<string, T[]>();
  const exceptions = new Map<T, string[]>();
  for (const item of items) {
    for (const name of new Set(item.selector.taxa.map(normalizeTaxonName))) {
      const bucket = byName.get(name);
      if (bucket) bucket.push(item);
      else byName.set(name, [item]);
    }
    const except = item.selector.exceptTaxa ?? [];
    if (except.length) exceptions.set(item, except.map(normalizeTaxonName));
  }
  return { byName, exceptions };
}

/** The indexed items whose selector covers a taxon with these keys, each once. */
export function itemsForTaxon<T>(index: TaxonIndex<T>, keys: ReadonlySet<string>): T[] {
  const found = new Set<T>(index.byName.get(ANY_TAXON));
  for (const key of keys) {
    for (const item of index.byName.get(key) ?? []) found.add(item);
  }
  return [...found].filter((item) => !index.exceptions.get(item)?.some((name) => keys.has(name)));
}
