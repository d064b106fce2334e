// Runs pending migrations against DATABASE_URL: `tsx scripts/migrate.ts [up|down]`. Two runs at once (two
// machines of a cluster, two test runs) take turns through the migration lock row.
import { Sequelize } from "sequelize";
import * as mariadb from "mariadb";
import { migrator } from "../lib/server/migrator";
import { withMigrationLock } from "../lib/server/migration-lock";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const sequelize = new Sequelize(url, { dialect: "mariadb", dialectModule: mariadb, logging: false });
const umzug = migrator(sequelize);
const done = await withMigrationLock(sequelize, () => (process.argv[2] === "down" ? umzug.down() : umzug.up()));
console.log(done.length ? `migrations applied: ${done.map((m) => m.name).join(", ")}` : "database schema is up to date");
await sequelize.close();
