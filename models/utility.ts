import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { InspectionKind } from "@/lib/domain/stored-values";

/** An electric utility the organization files interconnection applications with. */
export class Utility extends Model<InferAttributes<Utility>, InferCreationAttributes<Utility>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare name: string;
  declare serviceVoltages: string[];
  // The grid profiles the utility accepts at commissioning, each as the utility words it.
  declare acceptedGridProfiles: CreationOptional<string[]>;
  declare notes: string;
  declare reviewDays: CreationOptional<number>;
  declare requiredInspections: CreationOptional<InspectionKind[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Utility.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(160), allowNull: false },
        serviceVoltages: { type: DataTypes.ARRAY(DataTypes.STRING(40)), allowNull: false, defaultValue: [] },
        acceptedGridProfiles: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        reviewDays: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 15 },
        requiredInspections: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Utility", tableName: "utilities", underscored: true },
    );
  }
}
