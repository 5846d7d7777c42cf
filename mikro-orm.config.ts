// Used by the MikroORM CLI (`npm run db:migration:create`); the app builds its config in server/db/config.ts.
import { ormConfig } from "./server/db/config";

export default ormConfig(process.env.DATABASE_URL ?? "postgres://hatchway@127.0.0.1:54328/hatchway");
