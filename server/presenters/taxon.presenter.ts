import type { ProfileGroup } from "@shared/constants";
import type { TaxonBriefDto } from "@shared/schemas/transfer";

export type TaxonRow = {
  id: string;
  rank: string;
  scientific_name: string;
  common_names: string[];
  venomous: boolean;
  profile_group: ProfileGroup | null;
};

export function presentTaxonRow(row: TaxonRow): TaxonBriefDto {
  return {
    id: row.id,
    scientificName: row.scientific_name,
    commonName: row.common_names[0] ?? null,
    venomous: row.venomous,
    profileGroup: row.profile_group,
    rank: row.rank,
  };
}

type TaxonLike = {
  id: string;
  rank: string;
  scientificName: string;
  commonNames: string[];
  venomous: boolean;
  profileGroup?: ProfileGroup | null;
};

export function presentTaxon(t: TaxonLike): TaxonBriefDto {
  return {
    id: t.id,
    scientificName: t.scientificName,
    commonName: t.commonNames[0] ?? null,
    venomous: t.venomous,
    profileGroup: t.profileGroup ?? null,
    rank: t.rank,
  };
}
