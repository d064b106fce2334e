import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import { planItemKinds, type PlanCalibration, type PlanItemKind, type StoredRouteLeg } from "../lib/plan/plan-schema";

// Floor plans, what is placed on them and the cable routes drawn across them. Schema: migrations/20261204-1201-floor-plans.ts.

export class FloorPlan extends Model<InferAttributes<FloorPlan>, InferCreationAttributes<FloorPlan>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare floorId: number;
  declare s3Key: string;
  declare fileName: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare widthPx: number;
  declare heightPx: number;
  /** null until the plan is calibrated. */
  declare metresPerPixel: number | null;
  declare calibration: PlanCalibration | null;
  declare uploadedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class PlanItem extends Model<InferAttributes<PlanItem>, InferCreationAttributes<PlanItem>> {
  declare id: CreationOptional<number>;
  declare planId: number;
  declare kind: PlanItemKind;
  /** The schedule's detector, for kind "detector" only (each detector is placed once in its site). */
  declare detectorId: number | null;
  declare label: CreationOptional<string>;
  declare x: number;
  declare y: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class PlanRoute extends Model<InferAttributes<PlanRoute>, InferCreationAttributes<PlanRoute>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  /** The device the cable starts at (one route per device). */
  declare fromItemId: number;
  /** The board it is wired to. */
  declare toItemId: number;
  declare legs: StoredRouteLeg[];
  declare deviceSlackM: number;
  declare boardSlackM: number;
  declare riseM: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true } as const;
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE } as const;
const int = (allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull });
const metres = () => ({ type: DataTypes.DOUBLE, allowNull: false });

export function initPlanModels(sequelize: Sequelize) {
  FloorPlan.init(
    {
      id,
      siteId: int(),
      floorId: int(),
      s3Key: { type: DataTypes.STRING(512), allowNull: false },
      fileName: { type: DataTypes.STRING(100), allowNull: false },
      contentType: { type: DataTypes.STRING(40), allowNull: false },
      sizeBytes: int(),
      widthPx: int(),
      heightPx: int(),
      metresPerPixel: { type: DataTypes.DOUBLE, allowNull: true },
      calibration: { type: DataTypes.JSON, allowNull: true },
      uploadedBy: int(true),
      ...stamps,
    },
    { sequelize, modelName: "FloorPlan", tableName: "floor_plans" },
  );
  PlanItem.init(
    { id, planId: int(), kind: { type: DataTypes.ENUM(...planItemKinds), allowNull: false }, detectorId: int(true), label: { type: DataTypes.STRING(200), allowNull: false, defaultValue: "" }, x: metres(), y: metres(), ...stamps },
    { sequelize, modelName: "PlanItem", tableName: "plan_items" },
  );
  PlanRoute.init(
    { id, siteId: int(), fromItemId: int(), toItemId: int(), legs: { type: DataTypes.JSON, allowNull: false }, deviceSlackM: metres(), boardSlackM: metres(), riseM: metres(), ...stamps },
    { sequelize, modelName: "PlanRoute", tableName: "plan_routes" },
  );
  FloorPlan.hasMany(PlanItem, { foreignKey: "planId", as: "items" });
  PlanItem.belongsTo(FloorPlan, { foreignKey: "planId", as: "plan" });
}
