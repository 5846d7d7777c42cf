import type { RuleListQuery } from "@shared/schemas/compliance";

/** Query keys of the compliance feature, from general to specific. */
export const complianceKeys = {
  all: ["compliance"] as const,
  rules: () => [...complianceKeys.all, "rules"] as const,
  ruleList: (filters: RuleListQuery) => [...complianceKeys.rules(), "list", filters] as const,
  ruleHistory: (ruleKey: string) => [...complianceKeys.rules(), "history", ruleKey] as const,
  documents: () => [...complianceKeys.all, "documents"] as const,
  coverage: () => [...complianceKeys.all, "coverage"] as const,
  transfer: (transferId: string) => [...complianceKeys.all, "transfer", transferId] as const,
  transferDocuments: (transferId: string) => [...complianceKeys.transfer(transferId), "documents"] as const,
};
