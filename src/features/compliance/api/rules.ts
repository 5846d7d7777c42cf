import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type {
  RuleHistoryDto,
  RuleListQuery,
  RuleSummaryDto,
  RuleVersionDto,
  RuleVersionInput,
} from "@shared/schemas/compliance";
import { api } from "@/lib/api-client";
import { toQueryString } from "@/lib/query-string";
import { complianceKeys } from "./keys";

export const rulesQueryOptions = (filters: RuleListQuery) =>
  queryOptions({
    queryKey: complianceKeys.ruleList(filters),
    queryFn: ({ signal }) =>
      api<{ rules: RuleSummaryDto[] }>(`/api/compliance/rules?${toQueryString(filters)}`, { signal }).then(
        (r) => r.rules,
      ),
  });

export const useRules = (filters: RuleListQuery) => useQuery(rulesQueryOptions(filters));

export const ruleHistoryQueryOptions = (ruleKey: string) =>
  queryOptions({
    queryKey: complianceKeys.ruleHistory(ruleKey),
    queryFn: ({ signal }) => api<RuleHistoryDto>(`/api/compliance/rules/${encodeURIComponent(ruleKey)}`, { signal }),
  });

export const useRuleHistory = (ruleKey: string) => useQuery(ruleHistoryQueryOptions(ruleKey));

/** Saves an edit as the rule's next version; the list and the history refresh. */
export function useSaveRuleVersion() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: RuleVersionInput) =>
      api<{ version: RuleVersionDto }>(`/api/compliance/rules/${encodeURIComponent(input.rule.id)}/versions`, {
        method: "POST",
        body: input,
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: complianceKeys.rules() }),
  });
}
