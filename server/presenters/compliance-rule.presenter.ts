import type { RuleVersionDto } from "@shared/schemas/compliance";
import type { ComplianceRule } from "../db/entities/compliance.entity";

/** One stored version of a rule; `createdBy` must be populated (null for the seed). */
export function presentRuleVersion(row: ComplianceRule): RuleVersionDto {
  const creator = row.createdBy?.getEntity() ?? null;
  return {
    rule: row.data,
    retired: row.retired,
    createdAt: row.createdAt.toISOString(),
    createdBy: creator ? { id: creator.id, displayName: creator.displayName } : null,
  };
}
