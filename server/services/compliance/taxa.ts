import type { EntityManager } from "@mikro-orm/postgresql";
import type { TaxonRank } from "@shared/constants";
import { normalizeTaxonName, type ResolvedTaxon } from "@shared/compliance/taxon";

/** A row of the species catalogue as the lineage walk needs it. */
export type TaxonNode = {
  id: string;
  rank: TaxonRank;
  scientificName: string;
  parentId: string | null;
  synonyms: readonly string[];
  venomous: boolean;
};

/** Deepest catalogue we walk: class … subspecies is six ranks; more means a cycle. */
const LINEAGE_DEPTH_MAX = 12;

/**
 * The taxon the evaluation reads, built from catalogue nodes: the lineage from class down to the
 * node itself, and the synonyms of the node and of every ancestor (so a rule written under an old
 * genus name, such as Broghammerus, still finds the species filed under Malayopython).
 */
export function resolvedTaxonOf(nodeId: string, nodes: ReadonlyMap<string, TaxonNode>): ResolvedTaxon {
  const chain: TaxonNode[] = [];
  for (let node = nodes.get(nodeId); node; node = node.parentId ? nodes.get(node.parentId) : undefined) {
    if (chain.length >= LINEAGE_DEPTH_MAX) throw new Error(`taxon ${nodeId}: the parent chain does not end`);
    chain.push(node);
  }
  const own = chain[0];
  if (!own) throw new Error(`taxon ${nodeId} is not in the catalogue`);
  const synonyms = [...new Set(chain.flatMap((node) => node.synonyms))];
  return {
    scientificName: own.scientificName,
    rank: own.rank,
    lineage: chain.reverse().map((node) => ({ rank: node.rank, scientificName: node.scientificName })),
    synonyms,
    venomous: own.venomous,
  };
}

type NodeRow = {
  id: string;
  rank: TaxonRank;
  scientific_name: string;
  parent_id: string | null;
  synonyms: string[];
  venomous: boolean;
};

/** The catalogue rows from the taxa chosen by `startSql` (a query of taxon ids) up to their classes. */
const lineageSql = (startSql: string) => `chain AS (
    SELECT t.id, t.rank, t.scientific_name, t.parent_id, t.synonyms, t.venomous, 0 AS depth FROM taxon t WHERE t.id IN (${startSql})
    UNION
    SELECT p.id, p.rank, p.scientific_name, p.parent_id, p.synonyms, p.venomous, c.depth + 1
      FROM taxon p JOIN chain c ON p.id = c.parent_id WHERE c.depth < ${LINEAGE_DEPTH_MAX}
  )`;

const NODES_JSON = `(SELECT coalesce(json_agg(DISTINCT jsonb_build_object('id', id, 'rank', rank, 'scientific_name', scientific_name, 'parent_id', parent_id, 'synonyms', synonyms, 'venomous', venomous)), '[]') FROM chain)`;

function resolveAll(ids: readonly string[], rows: readonly NodeRow[]): Map<string, ResolvedTaxon> {
  const nodes = new Map<string, TaxonNode>(
    rows.map((r) => [
      r.id,
      {
        id: r.id,
        rank: r.rank,
        scientificName: r.scientific_name,
        parentId: r.parent_id,
        synonyms: r.synonyms,
        venomous: r.venomous,
      },
    ]),
  );
  return new Map(ids.filter((id) => nodes.has(id)).map((id) => [id, resolvedTaxonOf(id, nodes)]));
}

/** Resolves catalogue taxa by id, with their ancestors, in one round trip. */
export async function resolveTaxaById(em: EntityManager, ids: readonly string[]): Promise<Map<string, ResolvedTaxon>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const [row] = await em.execute<{ nodes: NodeRow[] }[]>(
    `WITH RECURSIVE ${lineageSql("SELECT json_array_elements_text(?::json)::uuid")} SELECT ${NODES_JSON} AS nodes`,
    [JSON.stringify(unique)],
    "all",
  );
  return resolveAll(unique, row?.nodes ?? []);
}

/**
 * Finds catalogue taxa by scientific name or synonym, ignoring case and spacing, with their
 * lineages, in one round trip. A name that is one taxon's scientific name and another's synonym
 * goes to the first. Unknown names are absent.
 */
export async function findTaxaByName(em: EntityManager, names: readonly string[]): Promise<Map<string, ResolvedTaxon>> {
  const keys = [...new Set(names.map(normalizeTaxonName))];
  if (keys.length === 0) return new Map();
  const [row] = await em.execute<{ named: { key: string; taxon_id: string }[]; nodes: NodeRow[] }[]>(
    `WITH RECURSIVE named AS (
       SELECT DISTINCT ON (lower(tn.name)) lower(tn.name) AS key, tn.taxon_id
         FROM taxon_name tn
        WHERE lower(tn.name) IN (SELECT json_array_elements_text(?::json)) AND tn.kind IN ('scientific', 'synonym')
        ORDER BY lower(tn.name), (tn.kind = 'scientific') DESC, tn.taxon_id
     ), ${lineageSql("SELECT taxon_id FROM named")}
     SELECT (SELECT coalesce(json_agg(named), '[]') FROM named) AS named, ${NODES_JSON} AS nodes`,
    [JSON.stringify(keys)],
    "all",
  );
  const named = row?.named ?? [];
  const taxa = resolveAll(
    named.map((n) => n.taxon_id),
    row?.nodes ?? [],
  );
  const byKey = new Map<string, ResolvedTaxon>();
  for (const { key, taxon_id } of named) {
    const taxon = taxa.get(taxon_id);
    if (taxon) byKey.set(key, taxon);
  }
  return byKey;
}
