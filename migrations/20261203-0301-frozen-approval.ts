import { DataTypes, type QueryInterface } from "sequelize";

// A second pair of eyes and a frozen approved design:
// (Whether one person may both send a layout for review and approve it is organisations.solo_approval, added with
// the organisation settings.)
// - layout_reviews.approved_solo: the approval was given without a second review (only with that setting on).
// - layouts.archived_at / archived_by: an approved or commissioned layout is archived, never deleted.
// - layout_revision_snapshots: the schedule rows and the catalog a revision was solved against, taken when it is
//   sent for review and kept with the approval, so the approved terminal sheet, its commissioning and comparison
//   never change when the live schedule or catalog does.

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("layout_reviews", "approved_solo", { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  await qi.addColumn("layouts", "archived_at", { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn("layouts", "archived_by", { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" });
  await qi.createTable("layout_revision_snapshots", {
    layout_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true, references: { model: "layouts", key: "id" }, onDelete: "CASCADE" },
    revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
    // the site's whole device schedule as the solver saw it (unplaced detectors are findings too)
    schedule: { type: DataTypes.JSON, allowNull: false },
    // the organisation's effective catalog at that moment, and the uploaded version it came from (null: shipped only)
    catalog: { type: DataTypes.JSON, allowNull: false },
    catalog_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    catalog_sha256: { type: DataTypes.CHAR(64), allowNull: false },
    taken_at: { type: DataTypes.DATE, allowNull: false },
    taken_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("layout_revision_snapshots");
  await qi.removeColumn("layouts", "archived_by");
  await qi.removeColumn("layouts", "archived_at");
  await qi.removeColumn("layout_reviews", "approved_solo");
}
