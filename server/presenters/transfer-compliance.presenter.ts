import type { EvaluateResponse } from "@shared/compliance/schemas";
import type { ComplianceOverrideDto, TransferComplianceDto } from "@shared/schemas/compliance";
import type { ComplianceOverride } from "../db/entities/compliance.entity";

/** `override.admin` must be populated. */
export function presentOverride(override: ComplianceOverride): ComplianceOverrideDto {
  const admin = override.admin.getEntity();
  return {
    reason: override.reason,
    at: override.createdAt.toISOString(),
    admin: { id: admin.id, displayName: admin.displayName },
    transferVersion: override.transferVersion,
  };
}

export function presentTransferCompliance(
  result: EvaluateResponse,
  shipDate: string,
  override: ComplianceOverride | null,
  abilities: TransferComplianceDto["abilities"],
): TransferComplianceDto {
  return { ...result, shipDate, override: override ? presentOverride(override) : null, abilities };
}
