import type pg from "pg";
import { newId } from "../entities/base";
import { TAXA } from "./taxa.data";

/**
 * Loads the species catalogue (reference data, not demo data) when the table is empty:
 * every taxon with its parent, and one search row per scientific name, common name and synonym.
 */
export async function seedTaxa(client: pg.Pool | pg.Client): Promise<number> {
  const { rows } = await client.query<{ n: number }>("SELECT count(*)::int AS n FROM taxon");
  if ((rows[0]?.n ?? 0) > 0) return 0;
  const ids = new Map<string, string>();
  const taxa = [];
  const names = [];
  for (const t of TAXA) {
    const id = newId();
    ids.set(t.scientificName, id);
    const parentId = t.parent ? ids.get(t.parent) : null;
    if (t.parent && !parentId) throw new Error(`taxon seed: ${t.scientificName} comes before its parent ${t.parent}`);
    taxa.push({
      id,
      rank: t.rank,
      scientific_name: t.scientificName,
      parent_id: parentId,
      common_names: t.commonNames,
      synonyms: t.synonyms,
      venomous: t.venomous,
      profile_group: t.profileGroup,
    });
    names.push({ id: newId(), taxon_id: id, name: t.scientificName, kind: "scientific" });
    for (const n of t.commonNames) names.push({ id: newId(), taxon_id: id, name: n, kind: "common" });
    for (const n of t.synonyms) names.push({ id: newId(), taxon_id: id, name: n, kind: "synonym" });
  }
  // json_populate_recordset maps JSON arrays onto the text[] columns.
  await client.query("INSERT INTO taxon SELECT * FROM json_populate_recordset(NULL::taxon, $1::json)", [
    JSON.stringify(taxa),
  ]);
  await client.query("INSERT INTO taxon_name SELECT * FROM json_populate_recordset(NULL::taxon_name, $1::json)", [
    JSON.stringify(names),
  ]);
  return taxa.length;
}
