/**
 * Integration tests: the private "test" PostgreSQL cluster on loopback, and a template
 * database with the committed migrations applied. Each test file gets a fresh copy.
 */
import { dropDatabase, ensureDatabase, startCluster, stopCluster } from "../../scripts/lib/postgres";
import { initORM, migrate } from "../../server/db/orm";
import { seedReferenceData } from "../../server/db/seeders/reference.seeder";
import { TEMPLATE_DB, TEST_PG_PORT } from "./constants";

export default async function setup() {
  const cluster = await startCluster("test", TEST_PG_PORT);
  await dropDatabase(cluster, TEMPLATE_DB);
  await ensureDatabase(cluster, TEMPLATE_DB);
  // As the owner role, like `npm start` and a deployment: the copies keep its ownership and grants.
  const orm = await initORM(cluster.url(TEMPLATE_DB, "owner"), { poolMax: 1 });
  try {
    await migrate(orm);
    await seedReferenceData(cluster.url(TEMPLATE_DB, "owner"));
  } finally {
    await orm.close();
  }
  return async () => {
    if (cluster.startedByUs) stopCluster(cluster);
  };
}
