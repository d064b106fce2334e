import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

import { roles, type Role } from "../lib/auth/permissions";
import { initCatalogModels } from "./catalog";
import { paperSizes, unitSystems, type PaperSize, type UnitSystem } from "../lib/organisation/settings-schema";
import { initAccountModels } from "./account";
export { AccountToken } from "./account";

export { OrganisationCatalog } from "./catalog";
import { initReviewModels } from "./review";
export { CommissioningPhoto, CommissioningReading, LayoutComment, LayoutDecision, LayoutReview, RevisionSnapshot } from "./review";
import { initDesignModels } from "./design";
import { initSiteStructureModels } from "./site-structure";
import { initPlanModels } from "./plan";
export { FloorPlan, PlanItem, PlanRoute } from "./plan";
export { Floor, SiteInstaller } from "./site-structure";
export { Layout, LayoutRevision, ScheduleDetectorRecord } from "./design";

export class Organisation extends Model<InferAttributes<Organisation>, InferCreationAttributes<Organisation>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare currency: CreationOptional<string>;
  declare locale: CreationOptional<string>;
  declare timeZone: CreationOptional<string>;
  declare paper: CreationOptional<PaperSize>;
  declare units: CreationOptional<UnitSystem>;
  /** One person may both send a layout for review and approve it (off by default). */
  declare soloApproval: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare passwordHash: string | null;
  /** Raised to end the user's sessions; the session token carries the value it was signed in with. */
  declare sessionVersion: CreationOptional<number>;
  /** False only for an account made through sign-up until its e-mail link is opened. */
  declare emailConfirmed: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare userId: number;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Site extends Model<InferAttributes<Site>, InferCreationAttributes<Site>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare name: string;
  declare address: string;
  declare description: string;
  declare contactName: CreationOptional<string>;
  declare contactPhone: CreationOptional<string>;
  declare contactEmail: CreationOptional<string>;
  declare notes: CreationOptional<string | null>;
  declare securityGrade: CreationOptional<number | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Area extends Model<InferAttributes<Area>, InferCreationAttributes<Area>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare floorId: number;
  declare name: string;
  declare position: number;
}

export class Room extends Model<InferAttributes<Room>, InferCreationAttributes<Room>> {
  declare id: CreationOptional<number>;
  declare areaId: number;
  declare name: string;
  declare position: CreationOptional<number>;
}

export class AuditEntry extends Model<InferAttributes<AuditEntry>, InferCreationAttributes<AuditEntry>> {
  declare id: CreationOptional<number>;
  declare organisationId: number | null;
  declare userId: number | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string | null;
  declare detail: unknown;
  declare createdAt: CreationOptional<Date>;
}

export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedByUserId: number;
  declare expiresAt: Date;
  declare acceptedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
}

export class MailMessage extends Model<InferAttributes<MailMessage>, InferCreationAttributes<MailMessage>> {
  declare id: CreationOptional<number>;
  declare envelopeTo: string;
  declare envelopeFrom: string;
  declare subject: string;
  declare text: string;
  declare html: string | null;
  declare attachments: { filename: string; contentType: string; size: number; contentBase64: string }[];
  declare receivedAt: CreationOptional<Date>;
}

export class SignInThrottle extends Model<InferAttributes<SignInThrottle>, InferCreationAttributes<SignInThrottle>> {
  declare key: string;
  declare failures: number;
  declare lastFailureAt: Date;
}

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true } as const;
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE } as const;

/**
 * Binds every model to a Sequelize instance. The schema itself is owned by migrations/.
 * modelName is explicit: the production build minifies class names, and Sequelize would otherwise name models after them.
 */
export function initModels(sequelize: Sequelize) {
  Organisation.init(
    {
      id,
      name: { type: DataTypes.STRING(200), allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false, defaultValue: "EUR" },
      locale: { type: DataTypes.STRING(35), allowNull: false, defaultValue: "en-GB" },
      timeZone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: "UTC" },
      paper: { type: DataTypes.ENUM(...paperSizes), allowNull: false, defaultValue: "a4" },
      units: { type: DataTypes.ENUM(...unitSystems), allowNull: false, defaultValue: "metric" },
      soloApproval: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      ...stamps,
    },
    { sequelize, modelName: "Organisation", tableName: "organisations" },
  );
  User.init(
    { id, email: { type: DataTypes.STRING(254), allowNull: false, unique: true }, name: { type: DataTypes.STRING(200), allowNull: false }, passwordHash: { type: DataTypes.STRING(100), allowNull: true }, sessionVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 }, emailConfirmed: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true }, ...stamps },
    { sequelize, modelName: "User", tableName: "users" },
  );
  Membership.init(
    { id, organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false }, userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false }, role: { type: DataTypes.ENUM(...roles), allowNull: false }, ...stamps },
    { sequelize, modelName: "Membership", tableName: "memberships" },
  );
  Site.init(
    {
      id,
      organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: false },
      address: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
      description: { type: DataTypes.TEXT, allowNull: false },
      contactName: { type: DataTypes.STRING(200), allowNull: false, defaultValue: "" },
      contactPhone: { type: DataTypes.STRING(60), allowNull: false, defaultValue: "" },
      contactEmail: { type: DataTypes.STRING(254), allowNull: false, defaultValue: "" },
      notes: { type: DataTypes.TEXT, allowNull: true },
      securityGrade: { type: DataTypes.TINYINT.UNSIGNED, allowNull: true },
      archivedAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { sequelize, modelName: "Site", tableName: "sites" },
  );
  Area.init(
    { id, siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false }, floorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false }, name: { type: DataTypes.STRING(200), allowNull: false }, position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 } },
    { sequelize, modelName: "Area", tableName: "areas", timestamps: false },
  );
  Room.init(
    { id, areaId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false }, name: { type: DataTypes.STRING(200), allowNull: false }, position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 } },
    { sequelize, modelName: "Room", tableName: "rooms", timestamps: false },
  );
  AuditEntry.init(
    {
      id,
      organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      action: { type: DataTypes.STRING(100), allowNull: false },
      entityType: { type: DataTypes.STRING(60), allowNull: false },
      entityId: { type: DataTypes.STRING(60), allowNull: true },
      detail: { type: DataTypes.JSON, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: "AuditEntry", tableName: "audit_entries", updatedAt: false },
  );
  Invitation.init(
    {
      id,
      organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.ENUM(...roles), allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      invitedByUserId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: "Invitation", tableName: "invitations", updatedAt: false },
  );
  MailMessage.init(
    {
      id,
      envelopeTo: { type: DataTypes.STRING(1000), allowNull: false },
      envelopeFrom: { type: DataTypes.STRING(500), allowNull: false },
      subject: { type: DataTypes.STRING(500), allowNull: false },
      text: { type: DataTypes.TEXT("medium"), allowNull: false },
      html: { type: DataTypes.TEXT("medium"), allowNull: true },
      attachments: { type: DataTypes.JSON, allowNull: false },
      receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    },
    { sequelize, modelName: "MailMessage", tableName: "mail_messages", timestamps: false },
  );
  SignInThrottle.init(
    { key: { type: DataTypes.STRING(300), primaryKey: true }, failures: { type: DataTypes.INTEGER, allowNull: false }, lastFailureAt: { type: DataTypes.DATE, allowNull: false } },
    { sequelize, modelName: "SignInThrottle", tableName: "sign_in_throttle", timestamps: false },
  );

  initCatalogModels(sequelize);
  initAccountModels(sequelize);

  Membership.belongsTo(Organisation, { foreignKey: "organisationId" });
  Membership.belongsTo(User, { foreignKey: "userId" });
  User.hasMany(Membership, { foreignKey: "userId" });
  Site.hasMany(Area, { foreignKey: "siteId", as: "areas" });
  Area.hasMany(Room, { foreignKey: "areaId", as: "rooms" });
  initSiteStructureModels(sequelize);
  initDesignModels(sequelize);
  initReviewModels(sequelize);
  initPlanModels(sequelize);
}
