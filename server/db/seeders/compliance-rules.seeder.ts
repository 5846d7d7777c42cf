import type pg from "pg";
import { FEDERAL_RULES } from "@shared/compliance/federal-rules";
import { ruleSchema } from "@shared/compliance/rule";
import { STATE_RULES } from "@shared/compliance/state-rules.demo";
import { newId } from "../entities/base";

/**
 * Loads the seed rule library (reference data: the federal rules with their citations, Hawaii's
 * snake ban and the labelled demo state rules) as version 1 of each rule, when the table is empty.
 */
export async function seedComplianceRules(client: pg.Pool | pg.Client): Promise<number> {
  const { rows } = await client.query<{ n: number }>("SELECT count(*)::int AS n FROM compliance_rule");
  if ((rows[0]?.n ?? 0) > 0) return 0;
  const now = new Date().toISOString();
  const records = [...FEDERAL_RULES, ...STATE_RULES].map((candidate) => {
    const rule = ruleSchema.parse(candidate);
    return {
      id: newId(),
      rule_key: rule.id,
      version: rule.version,
      data: rule,
      retired: false,
      reviewed_on: rule.reviewedOn,
      reviewed_by: rule.reviewedBy,
      created_by_id: null,
      created_at: now,
    };
  });
  await client.query(
    "INSERT INTO compliance_rule SELECT * FROM json_populate_recordset(NULL::compliance_rule, $1::json)",
    [JSON.stringify(records)],
  );
  return records.length;
}
