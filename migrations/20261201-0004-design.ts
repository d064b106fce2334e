import { DataTypes, type QueryInterface } from "sequelize";

// Device schedules and layouts with their revisions.
const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const stamps = { created_at: { type: DataTypes.DATE, allowNull: false }, updated_at: { type: DataTypes.DATE, allowNull: false } };
const ref = (table: string, onDelete = "CASCADE") => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: table, key: "id" },
  onDelete,
});
const supervision = ["double-eol", "single-eol", "shared-ok", "none"];

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("schedule_detectors", {
    id,
    site_id: ref("sites"),
    label: { type: DataTypes.STRING(200), allowNull: false },
    catalog_id: { type: DataTypes.STRING(63), allowNull: false },
    area: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
    room: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
    // One-way run from the detector to its board, metres.
    cable_m: { type: DataTypes.DOUBLE, allowNull: false },
    // Exactly one of the two is set: AWG or mm².
    gauge_awg: { type: DataTypes.TINYINT.UNSIGNED, allowNull: true },
    gauge_mm2: { type: DataTypes.DOUBLE, allowNull: true },
    supervision: { type: DataTypes.ENUM(...supervision), allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...stamps,
  });
  await qi.addIndex("schedule_detectors", ["site_id", "position"]);

  await qi.createTable("layouts", {
    id,
    site_id: ref("sites"),
    name: { type: DataTypes.STRING(200), allowNull: false },
    // 'draft' until the review workflow adds its states.
    status: { type: DataTypes.STRING(30), allowNull: false, defaultValue: "draft" },
    current_revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    // Optimistic concurrency: every save is UPDATE ... WHERE version = the version the editor loaded.
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    created_by: { ...ref("users", "SET NULL"), allowNull: true },
    ...stamps,
  });
  await qi.addIndex("layouts", ["site_id"]);

  await qi.createTable("layout_revisions", {
    id,
    layout_id: ref("layouts"),
    revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    document: { type: DataTypes.JSON, allowNull: false },
    // The server's solve of this revision: finding counts and capacity figures.
    summary: { type: DataTypes.JSON, allowNull: false },
    note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
    created_by: { ...ref("users", "SET NULL"), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("layout_revisions", ["layout_id", "revision"], { unique: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ["layout_revisions", "layouts", "schedule_detectors"]) await qi.dropTable(t);
}
