import { DataTypes, type QueryInterface } from "sequelize";

// A site's security grade (EN 50131-1, 1 to 4); null until the designer chooses one. New layouts of the site take
// it as their grade, which then travels with each revision's document (so an approved revision keeps its grade).

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("sites", "security_grade", { type: DataTypes.TINYINT.UNSIGNED, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn("sites", "security_grade");
}
