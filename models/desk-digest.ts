import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A morning digest sent (or found empty) for one person on one local day; at most one per day. */
export class DeskDigest extends Model<InferAttributes<DeskDigest>, InferCreationAttributes<DeskDigest>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare userId: string;
  declare localDay: string;
  declare itemCount: number;
  declare outboxMessageId: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    DeskDigest.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        userId: { type: DataTypes.UUID, allowNull: false },
        localDay: { type: DataTypes.DATEONLY, allowNull: false },
        itemCount: { type: DataTypes.INTEGER, allowNull: false },
        outboxMessageId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "DeskDigest", tableName: "desk_digests", underscored: true, updatedAt: false },
    );
  }
}
