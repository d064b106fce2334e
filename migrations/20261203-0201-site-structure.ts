import { DataTypes, QueryTypes, type QueryInterface } from "sequelize";

// Sites as a firm edits them: a customer contact, notes, archiving; the structure as ordered floors, each with
// ordered areas and rooms; any number of installers per site (site_installers replaces sites.installer_user_id).
// Existing areas become floors of the same name holding one area each, so detectors' area names still match.
const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (table: string) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: table, key: "id" }, onDelete: "CASCADE" });

/** MariaDB refuses to drop a column a foreign key uses: drop the key first. */
async function dropColumnWithKey(qi: QueryInterface, table: string, column: string) {
  const fks = await qi.sequelize.query<{ name: string }>(
    "SELECT CONSTRAINT_NAME AS name FROM information_schema.KEY_COLUMN_USAGE WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = ? AND COLUMN_NAME = ? AND REFERENCED_TABLE_NAME IS NOT NULL",
    { replacements: [table, column], type: QueryTypes.SELECT },
  );
  for (const fk of fks) await qi.sequelize.query(`ALTER TABLE \`${table}\` DROP FOREIGN KEY \`${fk.name}\``);
  await qi.removeColumn(table, column);
}

export async function up({ context: qi }: { context: QueryInterface }) {
  const sql = qi.sequelize;
  await qi.addColumn("sites", "contact_name", { type: DataTypes.STRING(200), allowNull: false, defaultValue: "" });
  await qi.addColumn("sites", "contact_phone", { type: DataTypes.STRING(60), allowNull: false, defaultValue: "" });
  await qi.addColumn("sites", "contact_email", { type: DataTypes.STRING(254), allowNull: false, defaultValue: "" });
  await qi.addColumn("sites", "notes", { type: DataTypes.TEXT, allowNull: true });
  await qi.addColumn("sites", "archived_at", { type: DataTypes.DATE, allowNull: true });
  await qi.createTable("floors", { id, site_id: ref("sites"), name: { type: DataTypes.STRING(200), allowNull: false }, position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 } });
  await qi.addColumn("areas", "floor_id", { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "floors", key: "id" }, onDelete: "CASCADE" });
  await qi.addColumn("rooms", "position", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  await qi.createTable("site_installers", { id, site_id: ref("sites"), user_id: ref("users"), created_at: { type: DataTypes.DATE, allowNull: false } });
  await qi.addIndex("site_installers", ["site_id", "user_id"], { unique: true });

  const areas = await sql.query<{ id: number; site_id: number; name: string; position: number }>("SELECT id, site_id, name, position FROM areas", { type: QueryTypes.SELECT });
  for (const a of areas) {
    await sql.query("INSERT INTO floors (site_id, name, position) VALUES (?, ?, ?)", { replacements: [a.site_id, a.name, a.position] });
    await sql.query("UPDATE areas SET floor_id = LAST_INSERT_ID(), position = 0 WHERE id = ?", { replacements: [a.id] });
  }
  await sql.query("UPDATE rooms SET position = id");
  await sql.query("INSERT INTO site_installers (site_id, user_id, created_at) SELECT id, installer_user_id, NOW() FROM sites WHERE installer_user_id IS NOT NULL");
  await dropColumnWithKey(qi, "sites", "installer_user_id");
}

export async function down({ context: qi }: { context: QueryInterface }) {
  const sql = qi.sequelize;
  await qi.addColumn("sites", "installer_user_id", { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" });
  await sql.query("UPDATE sites s SET installer_user_id = (SELECT MIN(user_id) FROM site_installers i WHERE i.site_id = s.id)");
  await qi.dropTable("site_installers");
  await qi.removeColumn("rooms", "position");
  await dropColumnWithKey(qi, "areas", "floor_id");
  await qi.dropTable("floors");
  for (const c of ["archived_at", "notes", "contact_email", "contact_phone", "contact_name"]) await qi.removeColumn("sites", c);
}
