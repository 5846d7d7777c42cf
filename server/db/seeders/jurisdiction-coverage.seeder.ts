import type pg from "pg";
import { COVERAGE_SEED } from "./jurisdiction-coverage.data";

/**
 * Loads a coverage record for every jurisdiction that has none (reference data): the offices to
 * confirm with and where their names were read, never a review. Rows that exist are left alone,
 * so an administrator's review is never overwritten.
 */
export async function seedJurisdictionCoverage(client: pg.Pool | pg.Client): Promise<number> {
  const now = new Date().toISOString();
  const records = COVERAGE_SEED.map((entry) => ({
    jurisdiction: entry.jurisdiction,
    wildlife_agency_name: entry.wildlifeAgency.name,
    wildlife_agency_url: entry.wildlifeAgency.url,
    state_veterinarian_name: entry.stateVeterinarian.name,
    state_veterinarian_url: entry.stateVeterinarian.url,
    source: entry.source,
    notes: entry.notes,
    reviewed_on: null,
    reviewed_by: null,
    updated_at: now,
    updated_by_id: null,
  }));
  const { rowCount } = await client.query(
    `INSERT INTO jurisdiction_coverage
       SELECT * FROM json_populate_recordset(NULL::jurisdiction_coverage, $1::json)
     ON CONFLICT (jurisdiction) DO NOTHING`,
    [JSON.stringify(records)],
  );
  return rowCount ?? 0;
}
