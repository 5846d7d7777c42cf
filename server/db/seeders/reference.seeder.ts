import pg from "pg";
import { seedTaxa } from "./taxa.seeder";
import { seedComplianceRules } from "./compliance-rules.seeder";
import { seedJurisdictionCoverage } from "./jurisdiction-coverage.seeder";
import { seedTemperatureProfiles } from "./temperature-profiles.seeder";

/** Reference data every installation needs (not demo data); each part loads only when empty. */
export async function seedReferenceData(databaseUrl: string): Promise<void> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await seedTaxa(client);
    await seedComplianceRules(client);
    await seedJurisdictionCoverage(client);
    await seedTemperatureProfiles(client);
  } finally {
    await client.end();
  }
}
