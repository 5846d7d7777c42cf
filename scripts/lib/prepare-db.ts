import { initORM, migrate } from "../../server/db/orm";
import { UserSchema } from "../../server/db/entities/user.entity";
import { DemoSeeder } from "../../server/db/seeders/DemoSeeder";
import { seedReferenceData } from "../../server/db/seeders/reference.seeder";
import { createLinks } from "../../server/mail/links";

/**
 * As the owner role (`ownerUrl`, D18): applies the committed migrations, loads the reference data (species catalogue and the
 * like) when missing, and seeds the demo scenario when asked and the database has no users.
 * `publicUrl` is the address of the app that will serve it: the demo's e-mails link there.
 */
export async function prepareDatabase(
  ownerUrl: string,
  options: { seed: false } | { seed: true; publicUrl: string },
): Promise<{ seeded: boolean }> {
  const orm = await initORM(ownerUrl, { poolMax: 2 });
  try {
    await migrate(orm);
    await seedReferenceData(ownerUrl);
    if (!options.seed) return { seeded: false };
    const users = await orm.em.fork().count(UserSchema, {});
    if (users > 0) return { seeded: false };
    const em = orm.em.fork();
    await new DemoSeeder(createLinks(options.publicUrl)).run(em);
    await em.flush();
    return { seeded: true };
  } finally {
    await orm.close();
  }
}
