import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { RefundStatus } from "@/lib/domain/stored-values";
import type { User } from "./user";

/** Money returned on a payment, full or partial, by its id at the processor. */
export class Refund extends Model<InferAttributes<Refund>, InferCreationAttributes<Refund>> {
  declare id: CreationOptional<string>;
  declare paymentId: string;
  declare processorRefundId: string;
  declare amountCents: number;
  declare reason: string | null;
  /** pending or succeeded count as returned; failed (the processor could not return it) does not. */
  declare status: CreationOptional<RefundStatus>;
  /** The fee lines of the payment this refund gives back; empty when it returns money not tied to a line. */
  declare feeKeys: CreationOptional<string[]>;
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;

  declare createdBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    Refund.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        paymentId: { type: DataTypes.UUID, allowNull: false },
        processorRefundId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
        amountCents: { type: DataTypes.INTEGER, allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: true },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "succeeded" },
        feeKeys: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Refund", tableName: "refunds", underscored: true, updatedAt: false },
    );
  }
}
