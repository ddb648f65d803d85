import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { CommissioningStatus } from "@/lib/domain/stored-values";

/** The installer's commissioning readings for one project; checked against the design whenever they are read. */
export class CommissioningRecord extends Model<InferAttributes<CommissioningRecord>, InferCreationAttributes<CommissioningRecord>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare readings: Record<string, unknown>;
  declare status: CreationOptional<CommissioningStatus>;
  declare completedAt: CreationOptional<Date | null>;
  declare completedById: CreationOptional<string | null>;
  declare updatedById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CommissioningRecord.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false, unique: true },
        readings: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "open" },
        completedAt: { type: DataTypes.DATE, allowNull: true },
        completedById: { type: DataTypes.UUID, allowNull: true },
        updatedById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "CommissioningRecord", tableName: "commissioning_records", underscored: true },
    );
  }
}
