import { initORM, migrate } from "../../server/db/orm";
import { UserSchema } from "../../server/db/entities/user.entity";
import { DemoSeeder } from "../../server/db/seeders/DemoSeeder";
import { seedReferenceData } from "../../server/db/seeders/reference.seeder";

/**
 * Applies the committed migrations, loads the reference data (species catalogue and the
 * like) when missing, and seeds the demo scenario when asked and the database has no users.
 */
export async function prepareDatabase(databaseUrl: string, options: { seed: boolean }): Promise<{ seeded: boolean }> {
  const orm = await initORM(databaseUrl, { poolMax: 2 });
  try {
    await migrate(orm);
    await seedReferenceData(databaseUrl);
    if (!options.seed) return { seeded: false };
    const users = await orm.em.fork().count(UserSchema, {});
    if (users > 0) return { seeded: false };
    await orm.getSeeder().seed(DemoSeeder);
    return { seeded: true };
  } finally {
    await orm.close();
  }
}
