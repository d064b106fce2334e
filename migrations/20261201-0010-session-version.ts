import { DataTypes, type QueryInterface } from "sequelize";

// A per-user counter carried in the session token: raising it ends every session signed in before
// (sign-out, a password set anew, a role change).
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("users", "session_version", { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn("users", "session_version");
}
