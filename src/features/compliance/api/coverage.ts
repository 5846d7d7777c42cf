import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { Jurisdiction } from "@shared/compliance/jurisdiction";
import type { CoverageReviewInput, JurisdictionCoverageDto } from "@shared/schemas/compliance";
import { api } from "@/lib/api-client";
import { complianceKeys } from "./keys";

export const coverageQueryOptions = () =>
  queryOptions({
    queryKey: complianceKeys.coverage(),
    queryFn: ({ signal }) =>
      api<{ coverage: JurisdictionCoverageDto[] }>("/api/compliance/coverage", { signal }).then((r) => r.coverage),
  });

export const useCoverage = () => useQuery(coverageQueryOptions());

/** Records or withdraws a review; every compliance verdict may change, so all compliance queries refresh. */
export function useRecordReview(jurisdiction: Jurisdiction) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: CoverageReviewInput) =>
      api<{ coverage: JurisdictionCoverageDto }>(`/api/compliance/coverage/${jurisdiction}`, {
        method: "PATCH",
        body: input,
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: complianceKeys.all }),
  });
}
