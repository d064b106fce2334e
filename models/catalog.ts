import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** One uploaded version of an organisation's catalog file (schema: migrations/20261201-0002-organisation-catalogs.ts). */
export class OrganisationCatalog extends Model<InferAttributes<OrganisationCatalog>, InferCreationAttributes<OrganisationCatalog>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare version: number;
  declare fileName: string;
  declare yamlText: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare uploadedBy: number | null;
  declare createdAt: CreationOptional<Date>;
}

export function initCatalogModels(sequelize: Sequelize) {
  OrganisationCatalog.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      fileName: { type: DataTypes.STRING(120), allowNull: false },
      yamlText: { type: DataTypes.TEXT("medium"), allowNull: false },
      sizeBytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      sha256: { type: DataTypes.CHAR(64), allowNull: false },
      uploadedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: "OrganisationCatalog", tableName: "organisation_catalogs", updatedAt: false },
  );
}
