import { Router } from "express";
import { z } from "zod";
import type { TaxonSearchHitDto } from "@shared/schemas/transfer";
import { text } from "@shared/schemas/common";
import type { AppContext } from "../../context";
import { requireUser } from "../../http/guards";
import { parse } from "../../http/validate";
import { presentTaxonRow, type TaxonRow } from "../../presenters/taxon.presenter";

const querySchema = z.strictObject({ q: text(100).pipe(z.string().min(2, { message: "Type at least two letters" })) });

const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * Species search by scientific name, common name or synonym, tolerant of typos
 * (pg_trgm similarity and word similarity), prefix matches first, species before genera.
 */
export async function searchTaxa(ctx: AppContext, q: string, limit = 20): Promise<TaxonSearchHitDto[]> {
  const needle = q.toLowerCase();
  const { rows } = await ctx.pool.query<
    TaxonRow & { synonyms: string[]; matched_name: string; matched_kind: "scientific" | "common" | "synonym" }
  >(
    `SELECT t.id, t.rank, t.scientific_name, t.common_names, t.synonyms, t.venomous, t.profile_group, best.name AS matched_name, best.kind AS matched_kind
       FROM (
         SELECT DISTINCT ON (tn.taxon_id) tn.taxon_id, tn.name, tn.kind,
                (lower(tn.name) = $1) AS exact,
                (lower(tn.name) LIKE $2 ESCAPE '\\') AS prefix,
                greatest(similarity(lower(tn.name), $1), word_similarity($1, lower(tn.name))) AS score
           FROM taxon_name tn
          WHERE lower(tn.name) % $1 OR $1 <% lower(tn.name) OR lower(tn.name) LIKE $3 ESCAPE '\\'
          ORDER BY tn.taxon_id, (lower(tn.name) = $1) DESC, (lower(tn.name) LIKE $2 ESCAPE '\\') DESC,
                   greatest(similarity(lower(tn.name), $1), word_similarity($1, lower(tn.name))) DESC
       ) best
       JOIN taxon t ON t.id = best.taxon_id
      ORDER BY best.exact DESC, best.prefix DESC, best.score DESC,
               CASE t.rank WHEN 'species' THEN 0 WHEN 'subspecies' THEN 1 WHEN 'genus' THEN 2 ELSE 3 END, t.scientific_name
      LIMIT $4`,
    [needle, `${likeEscape(needle)}%`, `%${likeEscape(needle)}%`, limit],
  );
  return rows.map((r) => ({
    ...presentTaxonRow(r),
    commonNames: r.common_names,
    synonyms: r.synonyms,
    matched: { name: r.matched_name, kind: r.matched_kind },
  }));
}

export function taxaRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireUser);
  router.get("/", async (req, res) => {
    const { q } = parse(querySchema, req.query);
    res.json({ taxa: await searchTaxa(ctx, q) });
  });
  return router;
}
