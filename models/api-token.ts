import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { User } from "./user";

/** A bearer token an admin made for an integration. Only the SHA-256 of the token is kept. */
export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare name: string;
  declare tokenHash: string;
  declare createdById: string | null;
  declare lastUsedAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare createdBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    ApiToken.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(60), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        createdById: { type: DataTypes.UUID, allowNull: true },
        lastUsedAt: { type: DataTypes.DATE, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "ApiToken", tableName: "api_tokens", underscored: true },
    );
  }
}
