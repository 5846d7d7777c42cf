import type { EntityManager } from "@mikro-orm/postgresql";
import { UniqueConstraintViolationException } from "@mikro-orm/core";
import type { Rule } from "@shared/compliance/rule";
import { indexBySelector, itemsForTaxon, normalizeTaxonName, taxonMatchKeys } from "@shared/compliance/taxon";
import type { RuleListQuery, RuleVersionInput } from "@shared/schemas/compliance";
import type { Actor } from "../../auth/actor";
import { ComplianceRuleSchema, type ComplianceRule } from "../../db/entities/compliance.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { conflict, invalidField, notFound } from "../../http/errors";
import { findTaxaByName } from "./taxa";

/** Every stored version, grouped by rule and oldest first. */
async function versionsByRule(
  em: EntityManager,
  where: { ruleKey?: string } = {},
): Promise<Map<string, ComplianceRule[]>> {
  const rows = await em.find(ComplianceRuleSchema, where, {
    orderBy: { ruleKey: "asc", version: "asc" },
    populate: ["createdBy"],
  });
  const grouped = new Map<string, ComplianceRule[]>();
  for (const row of rows) {
    const versions = grouped.get(row.ruleKey);
    if (versions) versions.push(row);
    else grouped.set(row.ruleKey, [row]);
  }
  return grouped;
}

/** Per database (ORM driver): the rules as of a row count. The table is append-only, so the count names its state. */
const activeRulesCache = new WeakMap<object, { rowCount: number; rules: readonly Rule[] }>();

/**
 * The rules an evaluation uses: every version of each rule whose newest version is not retired
 * (the evaluation picks the version in force on the ship date). Kept in memory between calls
 * and re-read when a version was added; the result is shared, so treat it as read-only.
 */
export async function loadActiveRules(em: EntityManager): Promise<readonly Rule[]> {
  const [counted] = await em.execute<{ n: number }[]>("SELECT count(*)::int AS n FROM compliance_rule", [], "all");
  const rowCount = counted?.n ?? 0;
  const cached = activeRulesCache.get(em.getDriver());
  if (cached?.rowCount === rowCount) return cached.rules;
  const rows = await em.execute<{ rule_key: string; data: Rule; retired: boolean }[]>(
    "SELECT rule_key, data, retired FROM compliance_rule ORDER BY rule_key, version",
    [],
    "all",
  );
  const retired = new Map(rows.map((row) => [row.rule_key, row.retired]));
  const rules = Object.freeze(rows.filter((row) => !retired.get(row.rule_key)).map((row) => row.data));
  // A version added between the two reads only makes the next call read again.
  activeRulesCache.set(em.getDriver(), { rowCount, rules });
  return rules;
}

/** The newest version of each rule, filtered by jurisdiction and by a taxon name at any rank. */
export async function listCurrentRules(
  em: EntityManager,
  query: RuleListQuery,
): Promise<{ current: ComplianceRule; versionCount: number }[]> {
  const grouped = await versionsByRule(em);
  let current = [...grouped.values()].map((versions) => ({
    current: versions[versions.length - 1] as ComplianceRule,
    versionCount: versions.length,
  }));
  if (query.jurisdiction) current = current.filter(({ current: row }) => row.data.jurisdiction === query.jurisdiction);
  if (query.taxon) {
    const wanted = normalizeTaxonName(query.taxon);
    const taxon = (await findTaxaByName(em, [query.taxon])).get(wanted);
    if (taxon) {
      const covering = new Set(
        itemsForTaxon(
          indexBySelector(current.map(({ current: row }) => ({ selector: row.data.selector, row }))),
          taxonMatchKeys(taxon),
        ).map((item) => item.row),
      );
      current = current.filter(({ current: row }) => covering.has(row));
    } else {
      current = current.filter(({ current: row }) =>
        row.data.selector.taxa.some((name) => normalizeTaxonName(name).includes(wanted)),
      );
    }
  }
  return current;
}

/** Every version of one rule, newest first. */
export async function ruleHistory(em: EntityManager, ruleKey: string): Promise<ComplianceRule[]> {
  const versions = (await versionsByRule(em, { ruleKey })).get(ruleKey);
  if (!versions) throw notFound("That rule");
  return versions.reverse();
}

function insertVersion(em: EntityManager, actor: Actor, input: RuleVersionInput): ComplianceRule {
  const { rule, retired } = input;
  return em.create(ComplianceRuleSchema, {
    ruleKey: rule.id,
    version: rule.version,
    data: rule,
    retired,
    reviewedOn: rule.reviewedOn,
    reviewedBy: rule.reviewedBy,
    createdBy: em.getReference(UserSchema, actor.id),
  });
}

async function flushVersion(em: EntityManager, row: ComplianceRule): Promise<ComplianceRule> {
  try {
    await em.flush();
  } catch (err) {
    if (err instanceof UniqueConstraintViolationException) {
      throw conflict(
        `Someone else saved version ${row.version} of this rule a moment ago. Reload it and make your change again.`,
      );
    }
    throw err;
  }
  await em.populate(row, ["createdBy"]);
  return row;
}

/**
 * Saves an edit of a rule as its next version; the previous versions stay as they were. The
 * input must name the rule and the version after the newest one (409 when someone was faster).
 */
export async function appendRuleVersion({
  em,
  actor,
  ruleKey,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  ruleKey: string;
  input: RuleVersionInput;
}) {
  if (input.rule.id !== ruleKey)
    throw invalidField(["rule", "id"], "a rule keeps its reference; create a new rule instead");
  const newest = await em.findOne(ComplianceRuleSchema, { ruleKey }, { orderBy: { version: "desc" } });
  if (!newest) throw notFound("That rule");
  if (input.rule.version !== newest.version + 1) {
    throw conflict(
      `This rule is at version ${newest.version}, so the edit must be version ${newest.version + 1}. Reload it and make your change again.`,
      { currentVersion: newest.version },
    );
  }
  return flushVersion(em, insertVersion(em, actor, input));
}

/** Adds a rule to the library as its version 1. */
export async function createRule({ em, actor, input }: { em: EntityManager; actor: Actor; input: RuleVersionInput }) {
  if (input.rule.version !== 1) throw invalidField(["rule", "version"], "a new rule starts at version 1");
  if (await em.count(ComplianceRuleSchema, { ruleKey: input.rule.id }))
    throw conflict(`A rule with the id ${input.rule.id} exists already.`);
  return flushVersion(em, insertVersion(em, actor, input));
}
