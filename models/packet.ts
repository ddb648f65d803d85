import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { PacketKind, PacketStatus, PacketStepRecord } from "@/lib/domain/stored-values";
import type { User } from "./user";

/** One generation of a project's permit or interconnection packet; ready rows are its revisions. */
export class Packet extends Model<InferAttributes<Packet>, InferCreationAttributes<Packet>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare kind: PacketKind;
  declare revision: number;
  declare designRevision: CreationOptional<number | null>;
  declare sentTo: CreationOptional<string[]>;
  declare status: CreationOptional<PacketStatus>;
  declare progress: CreationOptional<number>;
  declare step: CreationOptional<string>;
  declare steps: CreationOptional<PacketStepRecord[]>;
  declare input: Record<string, unknown>;
  declare changes: CreationOptional<string[]>;
  declare overrideReason: string | null;
  declare objectKey: CreationOptional<string | null>;
  declare sha256: CreationOptional<string | null>;
  declare sizeBytes: CreationOptional<number | null>;
  declare pageCount: CreationOptional<number | null>;
  declare error: CreationOptional<string | null>;
  declare attempts: CreationOptional<number>;
  declare requestedById: string | null;
  declare readyAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare requestedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    Packet.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        designRevision: { type: DataTypes.INTEGER, allowNull: true },
        sentTo: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "queued" },
        progress: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        step: { type: DataTypes.STRING(80), allowNull: false, defaultValue: "" },
        steps: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        input: { type: DataTypes.JSONB, allowNull: false },
        changes: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        overrideReason: { type: DataTypes.TEXT, allowNull: true },
        objectKey: { type: DataTypes.STRING(300), allowNull: true },
        sha256: { type: DataTypes.STRING(64), allowNull: true },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: true },
        pageCount: { type: DataTypes.INTEGER, allowNull: true },
        error: { type: DataTypes.TEXT, allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        requestedById: { type: DataTypes.UUID, allowNull: true },
        readyAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Packet", tableName: "packets", underscored: true },
    );
  }
}
