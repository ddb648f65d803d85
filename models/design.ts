import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { ReviewStatus } from "@/lib/domain/stored-values";

/** The one design of a project: the editor's draft as typed, and the outcome of its last review. */
export class Design extends Model<InferAttributes<Design>, InferCreationAttributes<Design>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare draft: Record<string, unknown>;
  declare reviewStatus: CreationOptional<ReviewStatus>;
  declare reviewSummary: Record<string, unknown> | null;
  declare revision: CreationOptional<number>;
  declare updatedById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Design.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false, unique: true },
        draft: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        reviewStatus: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "incomplete" },
        reviewSummary: { type: DataTypes.JSONB, allowNull: true },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        updatedById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Design", tableName: "designs", underscored: true },
    );
  }
}
