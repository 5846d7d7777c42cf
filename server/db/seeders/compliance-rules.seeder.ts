import type pg from "pg";
import { FEDERAL_RULES } from "@shared/compliance/federal-rules";
import { ruleSchema } from "@shared/compliance/rule";
import { STATE_RULES } from "@shared/compliance/state-rules.demo";
import { newId } from "../entities/base";

/**
 * Loads the seed rule library (reference data: the federal rules with their citations, Hawaii's
 * published bans and the labelled demo state rules) as version 1 of each rule the library does not
 * hold yet. A rule already there, in whatever version an admin made it, is left alone.
 */
export async function seedComplianceRules(client: pg.Pool | pg.Client): Promise<number> {
  const { rows } = await client.query<{ rule_key: string }>("SELECT DISTINCT rule_key FROM compliance_rule");
  const held = new Set(rows.map((row) => row.rule_key));
  const now = new Date().toISOString();
  const missing = [...FEDERAL_RULES, ...STATE_RULES].filter((rule) => !held.has(rule.id));
  if (missing.length === 0) return 0;
  const records = missing.map((candidate) => {
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
