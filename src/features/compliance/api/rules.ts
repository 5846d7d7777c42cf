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
    // A new version can change every verdict and the coverage counts.
    onSuccess: () => client.invalidateQueries({ queryKey: complianceKeys.all }),
  });
}

/** Adds a new rule to the library as its version 1. */
export function useCreateRule() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: RuleVersionInput) =>
      api<{ version: RuleVersionDto }>("/api/compliance/rules", { method: "POST", body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: complianceKeys.all }),
  });
}

/** Retires a rule (or puts it back in force) as its next version; the rule itself is unchanged. */
export function useRetireRule() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ current, retired }: { current: RuleVersionDto; retired: boolean }) =>
      api<{ version: RuleVersionDto }>(`/api/compliance/rules/${encodeURIComponent(current.rule.id)}/versions`, {
        method: "POST",
        body: { retired, rule: { ...current.rule, version: current.rule.version + 1 } },
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: complianceKeys.all }),
  });
}
