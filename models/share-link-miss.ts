import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** One request with an unknown share token, by client address; kept in PostgreSQL so throttling holds across app servers. */
export class ShareLinkMiss extends Model<InferAttributes<ShareLinkMiss>, InferCreationAttributes<ShareLinkMiss>> {
  declare id: CreationOptional<number>;
  declare address: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ShareLinkMiss.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        address: { type: DataTypes.STRING(100), allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "ShareLinkMiss", tableName: "share_link_misses", underscored: true, updatedAt: false },
    );
  }
}
