import { useQuery } from "@tanstack/react-query";
import type { AnimalInput, TaxonBriefDto } from "@shared/schemas/transfer";
import type { AnimalOrigin, IdentifierKind, Sex } from "@shared/constants";
import { api } from "@/lib/api-client";

type RegisterLine = {
  registerEntryId: string;
  taxonId: string;
  count: number;
  sex: Sex;
  identifier: string | null;
  identifierKind: string | null;
  origin: AnimalOrigin;
  hatchDate: string | null;
  weightG: number | null;
  lengthMm: number | null;
};

/** Animal lines prefilled from the sender's register (issue 15 §2), for a new transfer. */
export const useRegisterLines = (ids: string | null) =>
  useQuery({
    queryKey: ["register", "transfer-lines", ids],
    enabled: ids !== null,
    queryFn: async ({ signal }) => {
      const body = await api<{ animals: RegisterLine[]; taxa: TaxonBriefDto[] }>(
        `/api/register/transfer-lines?ids=${encodeURIComponent(ids!)}`,
        { signal },
      );
      const animals: Omit<AnimalInput, "containerKey">[] = body.animals.map((line) => ({
        taxonId: line.taxonId,
        count: line.count,
        sex: line.sex,
        identifier: line.identifier ?? "",
        identifierKind: (line.identifierKind as IdentifierKind | null) ?? null,
        origin: line.origin,
        lengthMm: line.lengthMm,
        lengthKind: null,
        weightG: line.weightG,
        hatchDate: line.hatchDate,
        notes: "",
        registerEntryId: line.registerEntryId,
      }));
      return { animals, taxa: Object.fromEntries(body.taxa.map((taxon) => [taxon.id, taxon])) };
    },
  });
