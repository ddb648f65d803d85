import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** One comment of a correction round, or one correction of an inspection, with its answer. */
export class FilingItem extends Model<InferAttributes<FilingItem>, InferCreationAttributes<FilingItem>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare roundId: CreationOptional<string | null>;
  declare inspectionId: CreationOptional<string | null>;
  declare position: number;
  declare text: string;
  declare reference: CreationOptional<string>;
  declare response: CreationOptional<string>;
  declare designRevision: CreationOptional<number | null>;
  declare resolved: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    FilingItem.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        roundId: { type: DataTypes.UUID, allowNull: true },
        inspectionId: { type: DataTypes.UUID, allowNull: true },
        position: { type: DataTypes.INTEGER, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        reference: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
        response: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        designRevision: { type: DataTypes.INTEGER, allowNull: true },
        resolved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "FilingItem", tableName: "filing_items", underscored: true },
    );
  }
}
