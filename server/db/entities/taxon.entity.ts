import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { PROFILE_GROUPS, TAXON_RANKS } from "@shared/constants";
import { idProperty } from "./base";

/** A node of the species catalogue: class down to subspecies, with older names kept findable. */
export const TaxonSchema = defineEntity({
  name: "Taxon",
  tableName: "taxon",
  properties: {
    id: idProperty(),
    rank: p.enum([...TAXON_RANKS]),
    scientificName: p.string().length(200).unique(),
    parent: () => p.manyToOne(TaxonSchema).ref().nullable().index(),
    commonNames: p.array().default([]),
    synonyms: p.array().default([]),
    venomous: p.boolean().default(false),
    profileGroup: p.enum([...PROFILE_GROUPS]).nullable(),
  },
});
export type Taxon = InferEntity<typeof TaxonSchema>;

/** Every name a taxon is known by, one row each, for the trigram search. */
export const TaxonNameSchema = defineEntity({
  name: "TaxonName",
  tableName: "taxon_name",
  properties: {
    id: idProperty(),
    taxon: () => p.manyToOne(TaxonSchema).ref().index().deleteRule("cascade"),
    name: p.string().length(200),
    kind: p.enum(["scientific", "common", "synonym"]),
  },
});
