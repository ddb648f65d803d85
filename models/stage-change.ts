import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { Stage, StageChangeCause } from "@/lib/domain/stored-values";
import type { User } from "./user";

export class StageChange extends Model<InferAttributes<StageChange>, InferCreationAttributes<StageChange>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare fromStage: Stage | null;
  declare toStage: Stage;
  declare changedById: string | null;
  declare note: string;
  declare cause: CreationOptional<StageChangeCause>;
  declare createdAt: CreationOptional<Date>;

  declare changedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    StageChange.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false },
        fromStage: { type: DataTypes.STRING(30), allowNull: true },
        toStage: { type: DataTypes.STRING(30), allowNull: false },
        changedById: { type: DataTypes.UUID, allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        cause: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "hand" },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "StageChange", tableName: "stage_changes", underscored: true, updatedAt: false },
    );
  }
}
