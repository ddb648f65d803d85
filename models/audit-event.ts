import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { AuditChanges } from "@/lib/domain/stored-values";
import type { User } from "./user";

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare actorId: string | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string;
  declare changes: AuditChanges;
  declare createdAt: CreationOptional<Date>;

  declare actor?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    AuditEvent.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        actorId: { type: DataTypes.UUID, allowNull: true },
        action: { type: DataTypes.STRING(60), allowNull: false },
        entityType: { type: DataTypes.STRING(40), allowNull: false },
        entityId: { type: DataTypes.UUID, allowNull: false },
        changes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "AuditEvent", tableName: "audit_events", underscored: true, updatedAt: false },
    );
  }
}
