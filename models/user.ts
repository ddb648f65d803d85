import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Role } from "@/lib/domain/stored-values";

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare passwordHash: string | null;
  declare isActive: CreationOptional<boolean>;
  declare lastSignInAt: Date | null;
  declare dailyDigest: CreationOptional<boolean>;
  declare calendarTokenHash: CreationOptional<string | null>;
  declare calendarTokenCreatedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        // Unique per organization; one active account with a password per address (migration 20261205001000).
        email: { type: DataTypes.STRING(254), allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.STRING(20), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: true },
        isActive: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        lastSignInAt: { type: DataTypes.DATE, allowNull: true },
        dailyDigest: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        calendarTokenHash: { type: DataTypes.STRING(64), allowNull: true },
        calendarTokenCreatedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "User", tableName: "users", underscored: true },
    );
  }
}
