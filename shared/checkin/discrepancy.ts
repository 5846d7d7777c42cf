import type { Sex } from "../constants";
import type { DiscrepancyRowDto } from "../schemas/transfer";

type ManifestLine = { id: string; taxonId: string; scientificName: string; sex: Sex; count: number };
type Outcome = {
  animalId: string;
  arrivedWell: number;
  arrivedProblem: number;
  deadOnArrival: number;
  missing: number;
};
type Extra = { taxonId: string; scientificName: string; sex: Sex; count: number };

/**
 * Compares what arrived with the manifest, by species and sex: expected, arrived well,
 * arrived with a problem, dead on arrival, missing, and extra (arrived but not listed).
 * Rows are sorted by scientific name, then sex.
 */
export function computeDiscrepancies(
  manifest: readonly ManifestLine[],
  outcomes: readonly Outcome[],
  extras: readonly Extra[],
): DiscrepancyRowDto[] {
  const rows = new Map<string, DiscrepancyRowDto>();
  const row = (taxonId: string, scientificName: string, sex: Sex) => {
    const key = `${taxonId}|${sex}`;
    let r = rows.get(key);
    if (!r) {
      r = {
        taxonId,
        scientificName,
        sex,
        expected: 0,
        arrivedWell: 0,
        arrivedProblem: 0,
        deadOnArrival: 0,
        missing: 0,
        extra: 0,
      };
      rows.set(key, r);
    }
    return r;
  };
  const byId = new Map(outcomes.map((o) => [o.animalId, o]));
  for (const line of manifest) {
    const r = row(line.taxonId, line.scientificName, line.sex);
    r.expected += line.count;
    const o = byId.get(line.id);
    if (!o) {
      r.missing += line.count;
      continue;
    }
    r.arrivedWell += o.arrivedWell;
    r.arrivedProblem += o.arrivedProblem;
    r.deadOnArrival += o.deadOnArrival;
    r.missing += o.missing;
  }
  for (const e of extras) row(e.taxonId, e.scientificName, e.sex).extra += e.count;
  const sexOrder: Record<Sex, number> = { male: 0, female: 1, unknown: 2 };
  return [...rows.values()].sort(
    (a, b) => a.scientificName.localeCompare(b.scientificName) || sexOrder[a.sex] - sexOrder[b.sex],
  );
}

/** True when every listed animal arrived well and nothing extra came. */
export function allAccountedFor(rows: readonly DiscrepancyRowDto[]): boolean {
  return rows.every((r) => r.arrivedWell === r.expected && r.extra === 0);
}

/** An outcome line must account for exactly the line's count. */
export function outcomeTotal(o: Outcome): number {
  return o.arrivedWell + o.arrivedProblem + o.deadOnArrival + o.missing;
}
