/**
 * Runs before each integration test file: a fresh database copied from the migrated
 * template, private to this worker, so files never see each other's rows.
 */
import { clusterOnPort, recreateFromTemplate } from "../../scripts/lib/postgres";
import { TEMPLATE_DB, TEST_PG_PORT } from "./constants";

const cluster = clusterOnPort("test", TEST_PG_PORT);
const db = `hatchway_w${process.env.VITEST_POOL_ID ?? process.env.VITEST_WORKER_ID ?? "0"}`;

for (let attempt = 0; ; attempt++) {
  try {
    await recreateFromTemplate(cluster, db, TEMPLATE_DB);
    break;
  } catch (err) {
    // Two workers copying the template at the same instant: wait and try again.
    if (attempt > 20) throw err;
    await new Promise((r) => setTimeout(r, 100 + Math.random() * 200));
  }
}
// The app connects as the app role (D18), as in production. Tests that load data the way the
// seeders do use the owner; tests that tamper with the evidence on purpose use the superuser.
process.env.TEST_DATABASE_URL = cluster.url(db, "app");
process.env.TEST_OWNER_DATABASE_URL = cluster.url(db, "owner");
process.env.TEST_ADMIN_DATABASE_URL = cluster.url(db, "admin");
