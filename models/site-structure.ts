import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

// A site's floors (ordered, each holding areas) and its assigned installers. Schema: migrations/20261203-0201-site-structure.ts.

export class Floor extends Model<InferAttributes<Floor>, InferCreationAttributes<Floor>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare name: string;
  declare position: number;
}

export class SiteInstaller extends Model<InferAttributes<SiteInstaller>, InferCreationAttributes<SiteInstaller>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare userId: number;
  declare createdAt: CreationOptional<Date>;
}

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true } as const;

/** Called from initModels after Site, Area and User are bound. */
export function initSiteStructureModels(sequelize: Sequelize) {
  Floor.init(
    { id, siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false }, name: { type: DataTypes.STRING(200), allowNull: false }, position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 } },
    { sequelize, modelName: "Floor", tableName: "floors", timestamps: false },
  );
  SiteInstaller.init(
    { id, siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false }, userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false }, createdAt: DataTypes.DATE },
    { sequelize, modelName: "SiteInstaller", tableName: "site_installers", updatedAt: false },
  );
  const { Site, Area, User } = sequelize.models;
  Site.hasMany(Floor, { foreignKey: "siteId", as: "floors" });
  Floor.hasMany(Area, { foreignKey: "floorId", as: "areas" });
  Site.hasMany(SiteInstaller, { foreignKey: "siteId", as: "installers" });
  SiteInstaller.belongsTo(User, { foreignKey: "userId", as: "user" });
}
