import { DataTypes, type QueryInterface } from "sequelize";

// An organisation's own catalog files, one row per uploaded version. Versions are never overwritten:
// the latest is the one in use, the older ones stay downloadable.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("organisation_catalogs", {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    organisation_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "organisations", key: "id" }, onDelete: "CASCADE" },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    file_name: { type: DataTypes.STRING(120), allowNull: false },
    yaml_text: { type: DataTypes.TEXT("medium"), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    uploaded_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("organisation_catalogs", ["organisation_id", "version"], { unique: true, name: "organisation_catalogs_org_version" });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("organisation_catalogs");
}
