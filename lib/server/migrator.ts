import { Umzug, SequelizeStorage } from "umzug";
import type { Sequelize, QueryInterface } from "sequelize";
import { fileURLToPath } from "node:url";
import path from "node:path";

const migrationsDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../migrations");

/** Schema changes only through migrations/ (never sync()). Used by scripts/migrate.ts and the test setup. */
export function migrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: { glob: ["*.ts", { cwd: migrationsDir }] },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migrations" }),
    logger: undefined,
  });
}
