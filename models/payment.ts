import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { PaymentLine } from "./payment-line";
import type { Refund } from "./refund";
import type { PaymentStatus } from "@/lib/domain/stored-values";
import type { User } from "./user";

/** One attempt to pay fee lines through the payment processor. */
export class Payment extends Model<InferAttributes<Payment>, InferCreationAttributes<Payment>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare status: CreationOptional<PaymentStatus>;
  declare amountCents: number;
  declare refundedCents: CreationOptional<number>;
  declare currency: CreationOptional<string>;
  declare checkoutSessionId: CreationOptional<string | null>;
  declare paymentIntentId: CreationOptional<string | null>;
  declare cardBrand: CreationOptional<string | null>;
  declare cardLast4: CreationOptional<string | null>;
  declare failureMessage: CreationOptional<string | null>;
  declare receiptNumber: CreationOptional<string | null>;
  declare receiptKey: CreationOptional<string | null>;
  declare paidAt: CreationOptional<Date | null>;
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare lines?: NonAttribute<PaymentLine[]>;
  declare refunds?: NonAttribute<Refund[]>;
  declare createdBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    Payment.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "pending" },
        amountCents: { type: DataTypes.INTEGER, allowNull: false },
        refundedCents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        currency: { type: DataTypes.STRING(3), allowNull: false, defaultValue: "usd" },
        checkoutSessionId: { type: DataTypes.STRING(255), allowNull: true, unique: true },
        paymentIntentId: { type: DataTypes.STRING(255), allowNull: true, unique: true },
        cardBrand: { type: DataTypes.STRING(40), allowNull: true },
        cardLast4: { type: DataTypes.STRING(4), allowNull: true },
        failureMessage: { type: DataTypes.TEXT, allowNull: true },
        receiptNumber: { type: DataTypes.STRING(40), allowNull: true, unique: true },
        receiptKey: { type: DataTypes.STRING(300), allowNull: true },
        paidAt: { type: DataTypes.DATE, allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Payment", tableName: "payments", underscored: true },
    );
  }
}
