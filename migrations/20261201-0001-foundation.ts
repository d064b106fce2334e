import { DataTypes, type QueryInterface } from "sequelize";

const roles = ["admin", "designer", "engineer", "installer"];
const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const stamps = { created_at: { type: DataTypes.DATE, allowNull: false }, updated_at: { type: DataTypes.DATE, allowNull: false } };
const ref = (table: string, onDelete = "CASCADE") => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: table, key: "id" },
  onDelete,
});

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("organisations", { id, name: { type: DataTypes.STRING(200), allowNull: false }, ...stamps });
  await qi.createTable("users", {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(200), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: true },
    ...stamps,
  });
  await qi.createTable("memberships", {
    id,
    organisation_id: ref("organisations"),
    user_id: ref("users"),
    role: { type: DataTypes.ENUM(...roles), allowNull: false },
    ...stamps,
  });
  await qi.addIndex("memberships", ["organisation_id", "user_id"], { unique: true });
  await qi.createTable("sites", {
    id,
    organisation_id: ref("organisations"),
    name: { type: DataTypes.STRING(200), allowNull: false },
    address: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
    description: { type: DataTypes.TEXT, allowNull: false },
    installer_user_id: { ...ref("users", "SET NULL"), allowNull: true },
    ...stamps,
  });
  await qi.createTable("areas", {
    id,
    site_id: ref("sites"),
    name: { type: DataTypes.STRING(200), allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
  });
  await qi.createTable("rooms", { id, area_id: ref("areas"), name: { type: DataTypes.STRING(200), allowNull: false } });
  await qi.createTable("audit_entries", {
    id,
    organisation_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    action: { type: DataTypes.STRING(100), allowNull: false },
    entity_type: { type: DataTypes.STRING(60), allowNull: false },
    entity_id: { type: DataTypes.STRING(60), allowNull: true },
    detail: { type: DataTypes.JSON, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("audit_entries", ["organisation_id", "created_at"]);
  await qi.createTable("invitations", {
    id,
    organisation_id: ref("organisations"),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.ENUM(...roles), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invited_by_user_id: ref("users"),
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.createTable("mail_messages", {
    id,
    envelope_to: { type: DataTypes.STRING(1000), allowNull: false },
    envelope_from: { type: DataTypes.STRING(500), allowNull: false },
    subject: { type: DataTypes.STRING(500), allowNull: false },
    text: { type: DataTypes.TEXT("medium"), allowNull: false },
    html: { type: DataTypes.TEXT("medium"), allowNull: true },
    attachments: { type: DataTypes.JSON, allowNull: false },
    received_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.createTable("sign_in_throttle", {
    key: { type: DataTypes.STRING(300), primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false },
    last_failure_at: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ["sign_in_throttle", "mail_messages", "invitations", "audit_entries", "rooms", "areas", "sites", "memberships", "users", "organisations"])
    await qi.dropTable(t);
}
