import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { ProjectFileKind } from "@/lib/domain/stored-values";
import type { User } from "./user";

/** A file uploaded from the field; its type was judged from its bytes, its key made by the server. */
export class ProjectFile extends Model<InferAttributes<ProjectFile>, InferCreationAttributes<ProjectFile>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare kind: ProjectFileKind;
  declare objectKey: string;
  declare fileName: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare uploadedById: string | null;
  declare createdAt: CreationOptional<Date>;

  declare uploadedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    ProjectFile.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        objectKey: { type: DataTypes.STRING(300), allowNull: false, unique: true },
        fileName: { type: DataTypes.STRING(200), allowNull: false },
        contentType: { type: DataTypes.STRING(60), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        uploadedById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "ProjectFile", tableName: "project_files", underscored: true, updatedAt: false },
    );
  }
}
