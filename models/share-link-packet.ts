import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** One packet revision a share link covers. */
export class ShareLinkPacket extends Model<InferAttributes<ShareLinkPacket>, InferCreationAttributes<ShareLinkPacket>> {
  declare shareLinkId: string;
  declare packetId: string;

  static initModel(sequelize: Sequelize) {
    ShareLinkPacket.init(
      {
        shareLinkId: { type: DataTypes.UUID, primaryKey: true },
        packetId: { type: DataTypes.UUID, primaryKey: true },
      },
      { sequelize, modelName: "ShareLinkPacket", tableName: "share_link_packets", underscored: true, timestamps: false },
    );
  }
}
