import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { InspectionKind, NecEdition } from "@/lib/domain/stored-values";

/** An authority having jurisdiction (AHJ) and the site data its reviews need. */
export class Jurisdiction extends Model<InferAttributes<Jurisdiction>, InferCreationAttributes<Jurisdiction>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare name: string;
  declare state: string;
  declare necEdition: NecEdition;
  declare recordLowTempC: number;
  declare highDesignTempC: number;
  declare notes: string;
  declare reviewDays: CreationOptional<number>;
  declare permitValidDays: CreationOptional<number>;
  declare requiredInspections: CreationOptional<InspectionKind[]>;
  // The residential ESS siting limits it adopted; null: the published ones.
  declare essCode: CreationOptional<string | null>;
  declare essPerUnitKwh: CreationOptional<number | null>;
  declare essGarageKwh: CreationOptional<number | null>;
  declare essOutdoorKwh: CreationOptional<number | null>;
  declare essUtilitySpaceKwh: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Jurisdiction.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(160), allowNull: false },
        state: { type: DataTypes.STRING(2), allowNull: false },
        necEdition: { type: DataTypes.INTEGER, allowNull: false },
        recordLowTempC: { type: DataTypes.DOUBLE, allowNull: false },
        highDesignTempC: { type: DataTypes.DOUBLE, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        reviewDays: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 10 },
        permitValidDays: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 180 },
        requiredInspections: { type: DataTypes.JSONB, allowNull: false, defaultValue: ["final"] },
        essCode: { type: DataTypes.STRING(60), allowNull: true },
        essPerUnitKwh: { type: DataTypes.DOUBLE, allowNull: true },
        essGarageKwh: { type: DataTypes.DOUBLE, allowNull: true },
        essOutdoorKwh: { type: DataTypes.DOUBLE, allowNull: true },
        essUtilitySpaceKwh: { type: DataTypes.DOUBLE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Jurisdiction", tableName: "jurisdictions", underscored: true },
    );
  }
}
