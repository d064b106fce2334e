import "server-only";
import { Sequelize } from "sequelize";
import * as mariadb from "mariadb";
import { env } from "./env";
import { initModels, Organisation } from "@/models";

const globalForDb = globalThis as unknown as { loopwrightSequelize?: Sequelize };

export function createSequelize(url: string): Sequelize {
  return new Sequelize(url, {
    dialect: "mariadb",
    dialectModule: mariadb,
    logging: false,
    pool: { max: 20, min: 0, idle: 10_000, acquire: 10_000 },
    dialectOptions: { connectTimeout: 3000 },
    define: { underscored: true },
  });
}

const instance = (): Sequelize => (globalForDb.loopwrightSequelize ??= createSequelize(env().DATABASE_URL));

/**
 * One Sequelize instance per process (kept on globalThis so dev reloads reuse it). The build may
 * give each route its own copy of the model classes, so each copy is bound to the shared instance.
 */
export function db(): Sequelize {
  bindModels();
  return instance();
}

/** Bind this bundle's copy of the model classes to the shared instance: call before querying a model directly (Model.findAll ...). */
export function bindModels(): void {
  const sequelize = instance();
  if (Organisation.sequelize !== sequelize) initModels(sequelize);
}
