import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { Packet } from "./packet";
import type { ShareLinkAccess } from "./share-link-access";
import type { User } from "./user";

/** A read-only link for an inspector to chosen packet revisions of one project; only the token's hash is kept. */
export class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare tokenHash: string;
  declare recipientEmail: string | null;
  declare note: CreationOptional<string>;
  declare expiresAt: Date;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare packets?: NonAttribute<Packet[]>;
  declare accesses?: NonAttribute<ShareLinkAccess[]>;
  declare createdBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    ShareLink.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        recipientEmail: { type: DataTypes.STRING(254), allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "ShareLink", tableName: "share_links", underscored: true },
    );
  }
}
