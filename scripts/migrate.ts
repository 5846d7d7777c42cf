/**
 * `npm run db:migrate`: applies the committed migrations to the database in
 * MIGRATION_DATABASE_URL, which must name the owner role (hatchway_owner), never the app's
 * login (D18; README, "Deployment"). The server itself never migrates.
 */
import { initORM, migrate } from "../server/db/orm";
import { seedReferenceData } from "../server/db/seeders/reference.seeder";
import { announceRuntime } from "./lib/runtime";

async function main() {
  announceRuntime("migrate");
  const url = process.env.MIGRATION_DATABASE_URL;
  if (!url || !/^postgres(ql)?:\/\//.test(url))
    throw new Error("Set MIGRATION_DATABASE_URL to a postgres:// URL that connects as hatchway_owner.");
  const orm = await initORM(url, { poolMax: 1 });
  try {
    await migrate(orm);
  } finally {
    await orm.close();
  }
  await seedReferenceData(url);
  process.stdout.write("[migrate] the schema is up to date and the reference data is loaded\n");
}

main().catch((err: Error) => {
  console.error(`[migrate] ${err.message}`);
  process.exit(1);
});
