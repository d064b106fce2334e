import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

// Review and commissioning records. The schema is owned by migrations/20261201-0006-review-commissioning.ts.

export class LayoutReview extends Model<InferAttributes<LayoutReview>, InferCreationAttributes<LayoutReview>> {
  declare layoutId: number;
  declare state: string;
  declare revision: number;
  declare approvedRevision: number | null;
  declare commissionedRevision: number | null;
  declare submittedBy: number | null;
  declare submittedAt: Date | null;
  declare approvedBy: number | null;
  declare approvedAt: Date | null;
  declare commissionedBy: number | null;
  declare commissionedAt: Date | null;
  /** Approved without a second review (the organisation allows one person to submit and approve). */
  declare approvedSolo: CreationOptional<boolean>;
  declare updatedAt: CreationOptional<Date>;
}

/** The schedule and catalog a revision was solved against, frozen when it was sent for review (schema: migrations/20261203-0301-frozen-approval.ts). */
export class RevisionSnapshot extends Model<InferAttributes<RevisionSnapshot>, InferCreationAttributes<RevisionSnapshot>> {
  declare layoutId: number;
  declare revision: number;
  declare schedule: unknown;
  declare catalog: unknown;
  declare catalogVersion: number | null;
  declare catalogSha256: string;
  declare takenAt: Date;
  declare takenBy: number | null;
}

export class LayoutComment extends Model<InferAttributes<LayoutComment>, InferCreationAttributes<LayoutComment>> {
  declare id: CreationOptional<number>;
  declare layoutId: number;
  declare revision: number;
  declare authorId: number | null;
  declare body: string;
  declare target: unknown;
  declare createdAt: CreationOptional<Date>;
}

export class LayoutDecision extends Model<InferAttributes<LayoutDecision>, InferCreationAttributes<LayoutDecision>> {
  declare id: CreationOptional<number>;
  declare layoutId: number;
  declare revision: number;
  declare kind: string;
  declare reason: string;
  declare comparedLayoutIds: number[] | null;
  declare decidedBy: number | null;
  declare createdAt: CreationOptional<Date>;
}

export class CommissioningReading extends Model<InferAttributes<CommissioningReading>, InferCreationAttributes<CommissioningReading>> {
  declare id: CreationOptional<number>;
  declare layoutId: number;
  declare revision: number;
  declare boardKey: string;
  declare input: number;
  declare testState: string;
  declare measuredOhms: number | null;
  declare isOpen: boolean;
  declare verdict: "pass" | "fail";
  declare diagnosis: string | null;
  declare diagnosisCodes: string[];
  declare recordedBy: number | null;
  declare clientId: string;
  declare createdAt: CreationOptional<Date>;
}

export class CommissioningPhoto extends Model<InferAttributes<CommissioningPhoto>, InferCreationAttributes<CommissioningPhoto>> {
  declare id: CreationOptional<number>;
  declare layoutId: number;
  declare revision: number;
  declare boardKey: string | null;
  declare input: number | null;
  declare s3Key: string;
  declare fileName: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare uploadedBy: number | null;
  declare clientId: string | null;
  declare createdAt: CreationOptional<Date>;
}

// Fresh objects for every attribute: Sequelize writes the column name into the definition it is given.
const id = () => ({ type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true });
const ref = () => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: false });
const userRef = () => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: true });

export function initReviewModels(sequelize: Sequelize) {
  LayoutReview.init(
    {
      layoutId: { ...ref(), primaryKey: true },
      state: { type: DataTypes.STRING(20), allowNull: false },
      revision: ref(),
      approvedRevision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      commissionedRevision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      submittedBy: userRef(),
      submittedAt: { type: DataTypes.DATE, allowNull: true },
      approvedBy: userRef(),
      approvedAt: { type: DataTypes.DATE, allowNull: true },
      commissionedBy: userRef(),
      commissionedAt: { type: DataTypes.DATE, allowNull: true },
      approvedSolo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: "LayoutReview", tableName: "layout_reviews", createdAt: false },
  );
  LayoutComment.init(
    { id: id(), layoutId: ref(), revision: ref(), authorId: userRef(), body: { type: DataTypes.TEXT, allowNull: false }, target: { type: DataTypes.JSON, allowNull: true }, createdAt: DataTypes.DATE },
    { sequelize, modelName: "LayoutComment", tableName: "layout_comments", updatedAt: false },
  );
  LayoutDecision.init(
    {
      id: id(),
      layoutId: ref(),
      revision: ref(),
      kind: { type: DataTypes.STRING(20), allowNull: false },
      reason: { type: DataTypes.TEXT, allowNull: false },
      comparedLayoutIds: { type: DataTypes.JSON, allowNull: true },
      decidedBy: userRef(),
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: "LayoutDecision", tableName: "layout_decisions", updatedAt: false },
  );
  CommissioningReading.init(
    {
      id: id(),
      layoutId: ref(),
      revision: ref(),
      boardKey: { type: DataTypes.STRING(40), allowNull: false },
      input: ref(),
      testState: { type: DataTypes.STRING(20), allowNull: false },
      measuredOhms: { type: DataTypes.DOUBLE, allowNull: true },
      isOpen: { type: DataTypes.BOOLEAN, allowNull: false },
      verdict: { type: DataTypes.ENUM("pass", "fail"), allowNull: false },
      diagnosis: { type: DataTypes.TEXT, allowNull: true },
      diagnosisCodes: { type: DataTypes.JSON, allowNull: false },
      recordedBy: userRef(),
      clientId: { type: DataTypes.CHAR(36), allowNull: false, unique: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: "CommissioningReading", tableName: "commissioning_readings", updatedAt: false },
  );
  CommissioningPhoto.init(
    {
      id: id(),
      layoutId: ref(),
      revision: ref(),
      boardKey: { type: DataTypes.STRING(40), allowNull: true },
      input: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      s3Key: { type: DataTypes.STRING(512), allowNull: false, unique: true },
      fileName: { type: DataTypes.STRING(100), allowNull: false },
      contentType: { type: DataTypes.STRING(40), allowNull: false },
      sizeBytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      uploadedBy: userRef(),
      clientId: { type: DataTypes.CHAR(36), allowNull: true, unique: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: "CommissioningPhoto", tableName: "commissioning_photos", updatedAt: false },
  );
  RevisionSnapshot.init(
    {
      layoutId: { ...ref(), primaryKey: true },
      revision: { ...ref(), primaryKey: true },
      schedule: { type: DataTypes.JSON, allowNull: false },
      catalog: { type: DataTypes.JSON, allowNull: false },
      catalogVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      catalogSha256: { type: DataTypes.CHAR(64), allowNull: false },
      takenAt: { type: DataTypes.DATE, allowNull: false },
      takenBy: userRef(),
    },
    { sequelize, modelName: "RevisionSnapshot", tableName: "layout_revision_snapshots", timestamps: false },
  );
  const { User, Layout } = sequelize.models;
  Layout.hasOne(LayoutReview, { foreignKey: "layoutId", as: "reviewRecord" });
  LayoutComment.belongsTo(User, { foreignKey: "authorId", as: "author" });
  LayoutDecision.belongsTo(User, { foreignKey: "decidedBy", as: "decider" });
  CommissioningReading.belongsTo(User, { foreignKey: "recordedBy", as: "recorder" });
  CommissioningPhoto.belongsTo(User, { foreignKey: "uploadedBy", as: "uploader" });
}
