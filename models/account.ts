import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

// Single-use account links (e-mail confirmation, password reset); only the SHA-256 of the token is stored.
// The schema is owned by migrations/20261203-0101-organisation-settings-accounts.ts.

export const accountTokenPurposes = ["confirm-email", "reset-password"] as const;
export type AccountTokenPurpose = (typeof accountTokenPurposes)[number];

export class AccountToken extends Model<InferAttributes<AccountToken>, InferCreationAttributes<AccountToken>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare purpose: AccountTokenPurpose;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
}

export function initAccountModels(sequelize: Sequelize) {
  AccountToken.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      purpose: { type: DataTypes.ENUM(...accountTokenPurposes), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: "AccountToken", tableName: "account_tokens", updatedAt: false },
  );
}
