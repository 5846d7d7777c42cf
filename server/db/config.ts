import { fileURLToPath } from "node:url";
import { defineConfig } from "@mikro-orm/postgresql";
import { Migrator } from "@mikro-orm/migrations";
import { SeedManager } from "@mikro-orm/seeder";
import { ENTITIES } from "./entities";
import { MIGRATIONS } from "./migrations/index";

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

/** One ORM configuration for the server, the CLI, the seeders and the tests. */
export function ormConfig(databaseUrl: string, options: { debug?: boolean; poolMax?: number } = {}) {
  return defineConfig({
    clientUrl: databaseUrl,
    entities: ENTITIES,
    extensions: [Migrator, SeedManager],
    debug: options.debug ?? false,
    // No schema discovery at run time: the committed migrations are the schema.
    discovery: { warnWhenNoEntities: true },
    pool: { min: 0, max: options.poolMax ?? 10 },
    // Tables owned by libraries (sessions, sign-in throttling), created by our first migration,
    // and the custody chain's head, which only a trigger writes (D19).
    schemaGenerator: { skipTables: ["session", "auth_throttle", "custody_head"] },
    migrations: {
      path: here("./migrations"),
      pathTs: here("./migrations"),
      migrationsList: MIGRATIONS,
      tableName: "mikro_orm_migrations",
      transactional: true,
      allOrNothing: true,
      // No snapshot files: a new migration is diffed against the dev database.
      snapshot: false,
      emit: "ts",
      fileName: (timestamp, name) => `Migration${timestamp}${name ? "_" + name : ""}`,
    },
    seeder: {
      path: here("./seeders"),
      pathTs: here("./seeders"),
      defaultSeeder: "DemoSeeder",
      emit: "ts",
    },
  });
}
