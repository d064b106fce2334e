import { DataTypes, type QueryInterface } from "sequelize";

// Organisation settings (money, dates, paper, units, solo approval), e-mail confirmation for accounts made
// through sign-up, and single-use account links (e-mail confirmation, password reset) stored as hashes only.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("organisations", "currency", { type: DataTypes.CHAR(3), allowNull: false, defaultValue: "EUR" });
  await qi.addColumn("organisations", "locale", { type: DataTypes.STRING(35), allowNull: false, defaultValue: "en-GB" });
  await qi.addColumn("organisations", "time_zone", { type: DataTypes.STRING(64), allowNull: false, defaultValue: "UTC" });
  await qi.addColumn("organisations", "paper", { type: DataTypes.ENUM("a4", "letter"), allowNull: false, defaultValue: "a4" });
  await qi.addColumn("organisations", "units", { type: DataTypes.ENUM("metric", "imperial"), allowNull: false, defaultValue: "metric" });
  await qi.addColumn("organisations", "solo_approval", { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  // Accounts made before this (invitations, seeds) proved their address by receiving the invitation: confirmed.
  await qi.addColumn("users", "email_confirmed", { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true });
  await qi.createTable("account_tokens", {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    purpose: { type: DataTypes.ENUM("confirm-email", "reset-password"), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("account_tokens", ["user_id", "purpose"]);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("account_tokens");
  await qi.removeColumn("users", "email_confirmed");
  for (const c of ["solo_approval", "units", "paper", "time_zone", "locale", "currency"]) await qi.removeColumn("organisations", c);
}
