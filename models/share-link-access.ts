import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { ShareLinkAccessKind } from "@/lib/domain/stored-values";

/** One opening of a share link's page or one download through it, for the coordinator's access log. */
export class ShareLinkAccess extends Model<InferAttributes<ShareLinkAccess>, InferCreationAttributes<ShareLinkAccess>> {
  declare id: CreationOptional<number>;
  declare shareLinkId: string;
  declare kind: ShareLinkAccessKind;
  declare packetId: string | null;
  declare address: string;
  declare userAgent: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ShareLinkAccess.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        shareLinkId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        packetId: { type: DataTypes.UUID, allowNull: true },
        address: { type: DataTypes.STRING(100), allowNull: false },
        userAgent: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "ShareLinkAccess", tableName: "share_link_accesses", underscored: true, updatedAt: false },
    );
  }
}
