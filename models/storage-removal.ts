import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A stored object to remove because its record is gone; kept until storage confirms the removal. */
export class StorageRemoval extends Model<InferAttributes<StorageRemoval>, InferCreationAttributes<StorageRemoval>> {
  declare id: CreationOptional<string>;
  declare objectKey: string;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: Date;
  declare lastError: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    StorageRemoval.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        objectKey: { type: DataTypes.STRING(300), allowNull: false, unique: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: false },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "StorageRemoval", tableName: "storage_removals", underscored: true },
    );
  }
}
