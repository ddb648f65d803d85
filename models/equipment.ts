import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { EquipmentKind } from "@/lib/domain/stored-values";

/** A catalog item (PV module, inverter, module-level device or battery) with its data-sheet figures and an optional data sheet PDF in storage. */
export class Equipment extends Model<InferAttributes<Equipment>, InferCreationAttributes<Equipment>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare kind: EquipmentKind;
  declare maker: string;
  declare model: string;
  declare listing: string;
  // Checked against the kind's zod schema on every write and read.
  declare specs: Record<string, unknown>;
  declare datasheetKey: CreationOptional<string | null>;
  declare datasheetFileName: CreationOptional<string | null>;
  declare datasheetSizeBytes: CreationOptional<number | null>;
  declare datasheetUploadedAt: CreationOptional<Date | null>;
  declare isArchived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Equipment.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        maker: { type: DataTypes.STRING(80), allowNull: false },
        model: { type: DataTypes.STRING(80), allowNull: false },
        listing: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
        specs: { type: DataTypes.JSONB, allowNull: false },
        datasheetKey: { type: DataTypes.STRING(300), allowNull: true },
        datasheetFileName: { type: DataTypes.STRING(200), allowNull: true },
        datasheetSizeBytes: { type: DataTypes.INTEGER, allowNull: true },
        datasheetUploadedAt: { type: DataTypes.DATE, allowNull: true },
        isArchived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Equipment", tableName: "equipment", underscored: true },
    );
  }
}
