import type { EntityManager } from "@mikro-orm/postgresql";
import { normalizeTaxonName } from "@shared/compliance/taxon";
import { invalidField } from "../../http/errors";
import { findTaxaByName } from "./taxa";

/** Close names from the catalogue for a name it does not hold (the taxa search, typo-tolerant). */
export type SuggestNames = (name: string) => Promise<{ scientificName: string; commonName: string | null }[]>;

type SpeciesLists = {
  speciesCovered?: unknown;
  animalsCovered?: unknown;
};

/**
 * A permit's or certificate's species in the catalogue's names: each name (scientific, any rank,
 * or an older synonym) becomes the catalogue's accepted name, so "Python molurus bivittatus" is
 * kept as "Python bivittatus" and matches rules written under either. A name the catalogue does
 * not hold is refused (400) with the closest names it does hold. Lists that are not lists of
 * names are left for the schema to refuse.
 */
export async function withCatalogueNames<T extends SpeciesLists>(
  em: EntityManager,
  suggest: SuggestNames,
  input: T,
): Promise<T> {
  const species = Array.isArray(input.speciesCovered) ? input.speciesCovered : null;
  const animals = Array.isArray(input.animalsCovered) ? input.animalsCovered : null;
  const names: { path: (string | number)[]; name: string }[] = [];
  species?.forEach((name, index) => {
    if (typeof name === "string" && name.trim()) names.push({ path: ["speciesCovered", index], name });
  });
  animals?.forEach((animal, index) => {
    const name = (animal as { scientificName?: unknown } | null)?.scientificName;
    if (typeof name === "string" && name.trim())
      names.push({ path: ["animalsCovered", index, "scientificName"], name });
  });
  if (names.length === 0) return input;
  const found = await findTaxaByName(
    em,
    names.map((entry) => entry.name.slice(0, 200)),
  );
  for (const { path, name } of names) {
    if (found.has(normalizeTaxonName(name))) continue;
    const shown = name.trim().slice(0, 100);
    const suggestions = shown.length >= 2 ? await suggest(shown) : [];
    const hint = suggestions.length ? ` Did you mean ${suggestions.map((s) => s.scientificName).join(", ")}?` : "";
    throw invalidField(path, `“${shown}” is not in the species list.${hint}`, { suggestions }, "unknown_species");
  }
  const canonical = (name: string) => found.get(normalizeTaxonName(name))?.scientificName ?? name;
  return {
    ...input,
    ...(species
      ? {
          speciesCovered: [...new Set(species.map((name) => (typeof name === "string" ? canonical(name) : name)))],
        }
      : {}),
    ...(animals
      ? {
          animalsCovered: animals.map((animal) => {
            const name = (animal as { scientificName?: unknown } | null)?.scientificName;
            return typeof name === "string" ? { ...(animal as object), scientificName: canonical(name) } : animal;
          }),
        }
      : {}),
  };
}
