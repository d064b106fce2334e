import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SupervisionPreference } from "../lib/schedule/schema";

// Device schedules, layouts and layout revisions. The schema is owned by migrations/20261201-0004-design.ts.

export class ScheduleDetectorRecord extends Model<InferAttributes<ScheduleDetectorRecord>, InferCreationAttributes<ScheduleDetectorRecord>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare label: string;
  declare catalogId: string;
  declare area: string;
  declare room: string;
  declare cableM: number;
  /** Where cableM came from: typed by the designer, or measured along a route on the floor plans. */
  declare cableBasis: CreationOptional<"typed" | "measured-on-plan">;
  declare gaugeAwg: number | null;
  declare gaugeMm2: number | null;
  declare supervision: SupervisionPreference;
  declare position: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Layout extends Model<InferAttributes<Layout>, InferCreationAttributes<Layout>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare name: string;
  declare status: CreationOptional<string>;
  declare currentRevision: number;
  declare version: number;
  declare createdBy: number | null;
  /** Archived layouts stay readable; an approved or commissioned layout is archived, never deleted. */
  declare archivedAt: CreationOptional<Date | null>;
  declare archivedBy: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class LayoutRevision extends Model<InferAttributes<LayoutRevision>, InferCreationAttributes<LayoutRevision>> {
  declare id: CreationOptional<number>;
  declare layoutId: number;
  declare revision: number;
  declare document: unknown;
  declare summary: unknown;
  declare note: string;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
}

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true } as const;
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE } as const;
const supervision = ["double-eol", "single-eol", "shared-ok", "none"] as const;

export function initDesignModels(sequelize: Sequelize) {
  ScheduleDetectorRecord.init(
    {
      id,
      siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      label: { type: DataTypes.STRING(200), allowNull: false },
      catalogId: { type: DataTypes.STRING(63), allowNull: false },
      area: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
      room: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
      cableM: { type: DataTypes.DOUBLE, allowNull: false },
      cableBasis: { type: DataTypes.ENUM("typed", "measured-on-plan"), allowNull: false, defaultValue: "typed" },
      gaugeAwg: { type: DataTypes.TINYINT.UNSIGNED, allowNull: true },
      gaugeMm2: { type: DataTypes.DOUBLE, allowNull: true },
      supervision: { type: DataTypes.ENUM(...supervision), allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      ...stamps,
    },
    { sequelize, modelName: "ScheduleDetectorRecord", tableName: "schedule_detectors" },
  );
  Layout.init(
    {
      id,
      siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: false },
      status: { type: DataTypes.STRING(30), allowNull: false, defaultValue: "draft" },
      currentRevision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      archivedAt: { type: DataTypes.DATE, allowNull: true },
      archivedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      ...stamps,
    },
    { sequelize, modelName: "Layout", tableName: "layouts" },
  );
  LayoutRevision.init(
    {
      id,
      layoutId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      document: { type: DataTypes.JSON, allowNull: false },
      summary: { type: DataTypes.JSON, allowNull: false },
      note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
      createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: "LayoutRevision", tableName: "layout_revisions", updatedAt: false },
  );
  // Called after the foundation models are bound (the last line of initModels).
  const { Site, User } = sequelize.models;
  Layout.belongsTo(Site, { foreignKey: "siteId", as: "site" });
  ScheduleDetectorRecord.belongsTo(Site, { foreignKey: "siteId", as: "site" });
  Layout.hasMany(LayoutRevision, { foreignKey: "layoutId", as: "revisions" });
  Layout.hasOne(LayoutRevision, { foreignKey: "layoutId", as: "current" });
  LayoutRevision.belongsTo(User, { foreignKey: "createdBy", as: "creator" });
}
