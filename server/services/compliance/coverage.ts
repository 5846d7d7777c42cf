import { ref } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { CoverageRecord } from "@shared/compliance/coverage";
import { FEDERAL, jurisdictionName, type Jurisdiction } from "@shared/compliance/jurisdiction";
import type { Rule } from "@shared/compliance/rule";
import type { CoverageReviewInput, JurisdictionCoverageDto } from "@shared/schemas/compliance";
import { localDate } from "@shared/temperature/zoned-time";
import type { Actor } from "../../auth/actor";
import { JurisdictionCoverageSchema, type JurisdictionCoverage } from "../../db/entities/compliance.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { conflict, invalidField, notFound } from "../../http/errors";
import { loadActiveRules } from "./rules";

type CoverageRow = {
  jurisdiction: string;
  wildlife_agency_name: string;
  wildlife_agency_url: string;
  state_veterinarian_name: string;
  state_veterinarian_url: string;
  reviewed_on: string | null;
  reviewed_by: string | null;
};

/** Every jurisdiction's coverage record, as the evaluation reads it (one query). */
export async function loadCoverageRecords(em: EntityManager): Promise<CoverageRecord[]> {
  const rows = await em.execute<CoverageRow[]>(
    `SELECT jurisdiction, wildlife_agency_name, wildlife_agency_url, state_veterinarian_name, state_veterinarian_url,
            to_char(reviewed_on, 'YYYY-MM-DD') AS reviewed_on, reviewed_by
       FROM jurisdiction_coverage`,
    [],
    "all",
  );
  return rows.map((row) => ({
    jurisdiction: row.jurisdiction as Jurisdiction,
    reviewedOn: row.reviewed_on,
    reviewedBy: row.reviewed_by,
    wildlifeAgency: { name: row.wildlife_agency_name, url: row.wildlife_agency_url },
    stateVeterinarian: { name: row.state_veterinarian_name, url: row.state_veterinarian_url },
  }));
}

function countRules(rules: readonly Rule[]): Map<string, { published: number; demo: number }> {
  // Only the newest version of each rule counts once.
  const newest = new Map<string, Rule>();
  for (const rule of rules) if ((newest.get(rule.id)?.version ?? 0) < rule.version) newest.set(rule.id, rule);
  const counts = new Map<string, { published: number; demo: number }>();
  for (const rule of newest.values()) {
    const count = counts.get(rule.jurisdiction) ?? { published: 0, demo: 0 };
    if (rule.demo) count.demo += 1;
    else count.published += 1;
    counts.set(rule.jurisdiction, count);
  }
  return counts;
}

/** `updatedBy` must be populated. */
function presentCoverage(
  row: JurisdictionCoverage,
  counts: ReadonlyMap<string, { published: number; demo: number }>,
): JurisdictionCoverageDto {
  const jurisdiction = row.jurisdiction as Jurisdiction;
  const rules = counts.get(jurisdiction) ?? { published: 0, demo: 0 };
  const updater = row.updatedBy?.getEntity() ?? null;
  return {
    jurisdiction,
    name: jurisdiction === FEDERAL ? "Federal law" : jurisdictionName(jurisdiction),
    covered: row.reviewedOn != null && rules.demo === 0,
    reviewedOn: row.reviewedOn ?? null,
    reviewedBy: row.reviewedBy ?? null,
    notes: row.notes ?? null,
    wildlifeAgency: { name: row.wildlifeAgencyName, url: row.wildlifeAgencyUrl },
    stateVeterinarian: { name: row.stateVeterinarianName, url: row.stateVeterinarianUrl },
    source: row.source,
    rules,
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: updater ? { id: updater.id, displayName: updater.displayName } : null,
  };
}

/** Every jurisdiction's record, federal first, then by name. */
export async function listCoverage(em: EntityManager): Promise<JurisdictionCoverageDto[]> {
  const [rows, rules] = await Promise.all([
    em.find(JurisdictionCoverageSchema, {}, { populate: ["updatedBy"] }),
    loadActiveRules(em),
  ]);
  const counts = countRules(rules);
  return rows
    .map((row) => presentCoverage(row, counts))
    .sort((a, b) =>
      a.jurisdiction === FEDERAL
        ? -1
        : b.jurisdiction === FEDERAL
          ? 1
          : a.name.replace(/^the /, "") < b.name.replace(/^the /, "")
            ? -1
            : 1,
    );
}

/**
 * Records (or withdraws) an administrator's review of a jurisdiction's rules. A review is refused
 * while demo rules stand for the jurisdiction (invented rules never count as coverage) and for a
 * day that has not come yet.
 */
export async function recordCoverageReview({
  em,
  actor,
  jurisdiction,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  jurisdiction: Jurisdiction;
  input: CoverageReviewInput;
}): Promise<JurisdictionCoverageDto> {
  const row = await em.findOne(JurisdictionCoverageSchema, { jurisdiction }, { populate: ["updatedBy"] });
  if (!row) throw notFound("That jurisdiction's coverage record");
  const counts = countRules(await loadActiveRules(em));
  const place = jurisdiction === FEDERAL ? "federal law" : jurisdictionName(jurisdiction);
  if (input.reviewedOn !== null) {
    const demo = counts.get(jurisdiction)?.demo ?? 0;
    if (demo > 0)
      throw conflict(
        `The library holds ${demo} demo rule${demo === 1 ? "" : "s"} for ${place}. Invented rules never count as a review: retire them first, then record the review.`,
      );
    // The latest calendar day on Earth (UTC+14), so no time zone finds today's review "to come".
    if (input.reviewedOn > localDate(Date.now(), "Pacific/Kiritimati"))
      throw invalidField(["reviewedOn"], "give the day the review was done, not a day to come");
  }
  row.reviewedOn = input.reviewedOn;
  row.reviewedBy = input.reviewedBy === null ? null : input.reviewedBy.trim();
  if (input.notes !== undefined) row.notes = input.notes;
  row.updatedBy = ref(em.getReference(UserSchema, actor.id));
  await em.flush();
  await em.populate(row, ["updatedBy"]);
  return presentCoverage(row, counts);
}
