import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { FeeAuthorityKind } from "@/lib/domain/stored-values";

/** An AHJ's or a utility's fees; `lines` hold every version of each fee, chosen by effective date when worked out. */
export class FeeSchedule extends Model<InferAttributes<FeeSchedule>, InferCreationAttributes<FeeSchedule>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare authorityKind: FeeAuthorityKind;
  declare authorityId: string;
  declare lines: unknown[];
  declare updatedById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    FeeSchedule.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        authorityKind: { type: DataTypes.STRING(12), allowNull: false },
        authorityId: { type: DataTypes.UUID, allowNull: false },
        lines: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        updatedById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "FeeSchedule", tableName: "fee_schedules", underscored: true },
    );
  }
}
