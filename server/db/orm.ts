import { MikroORM } from "@mikro-orm/postgresql";
import { ormConfig } from "./config";

export type Orm = MikroORM;

/** Opens the ORM once for a process. Tests pass their own database URL. */
export async function initORM(databaseUrl: string, options: { debug?: boolean; poolMax?: number } = {}): Promise<Orm> {
  return MikroORM.init(ormConfig(databaseUrl, options));
}

/** Applies the committed migrations; never generates schema at run time. */
export async function migrate(orm: Orm): Promise<void> {
  await orm.getMigrator().up();
}
