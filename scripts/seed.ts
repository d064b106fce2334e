// Demo data (a fictional organisation and building), seeded only into an empty database.
import { Sequelize } from "sequelize";
import * as mariadb from "mariadb";
import bcrypt from "bcryptjs";
import { initModels, Organisation } from "../models";
import { seedDemo } from "./demo/seed-demo";
import { seedRivalOrganisation } from "./demo/seed-rival";
import { PASSWORD_HASH_COST } from "../lib/auth/password";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const sequelize = new Sequelize(url, { dialect: "mariadb", dialectModule: mariadb, logging: false, define: { underscored: true } });
initModels(sequelize);
if ((await Organisation.count()) > 0) {
  console.log("demo data: database not empty, left as it is");
} else {
  await sequelize.transaction((t) => seedDemo(t, (p) => bcrypt.hash(p, PASSWORD_HASH_COST)));
  console.log("demo data: seeded (sign-ins in README.md)");
  // test-only: a second organisation for the browser tests' cross-organisation checks
  if (process.env.LOOPWRIGHT_SEED_RIVAL === "1") {
    await sequelize.transaction((t) => seedRivalOrganisation(t, (p) => bcrypt.hash(p, PASSWORD_HASH_COST)));
    console.log("test data: rival organisation seeded");
  }
}
await sequelize.close();
