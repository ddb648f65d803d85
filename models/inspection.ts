import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { InspectionKind, InspectionResult } from "@/lib/domain/stored-values";
import type { FilingItem } from "./filing-item";

/** An inspection under a filing: when, by whom, its result and corrections, and the one it re-inspects. */
export class Inspection extends Model<InferAttributes<Inspection>, InferCreationAttributes<Inspection>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare filingId: string;
  declare kind: InspectionKind;
  declare scheduledFor: CreationOptional<string | null>;
  declare timeWindow: CreationOptional<string>;
  declare inspectorName: CreationOptional<string>;
  declare result: CreationOptional<InspectionResult | null>;
  declare resultOn: CreationOptional<string | null>;
  declare recordedAt: CreationOptional<Date | null>;
  declare notes: CreationOptional<string>;
  declare reinspectionOfId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare items?: NonAttribute<FilingItem[]>;

  static initModel(sequelize: Sequelize) {
    Inspection.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        filingId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        scheduledFor: { type: DataTypes.DATEONLY, allowNull: true },
        timeWindow: { type: DataTypes.STRING(40), allowNull: false, defaultValue: "" },
        inspectorName: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
        result: { type: DataTypes.STRING(20), allowNull: true },
        resultOn: { type: DataTypes.DATEONLY, allowNull: true },
        recordedAt: { type: DataTypes.DATE, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        reinspectionOfId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Inspection", tableName: "inspections", underscored: true },
    );
  }
}
