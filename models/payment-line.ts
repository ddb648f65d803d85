import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A fee line as it was worked out when the payment was made; `feeKey` names the line in its schedule. */
export class PaymentLine extends Model<InferAttributes<PaymentLine>, InferCreationAttributes<PaymentLine>> {
  declare id: CreationOptional<string>;
  declare paymentId: string;
  declare feeKey: string;
  declare authority: string;
  declare name: string;
  declare arithmetic: string[];
  declare amountCents: number;

  static initModel(sequelize: Sequelize) {
    PaymentLine.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        paymentId: { type: DataTypes.UUID, allowNull: false },
        feeKey: { type: DataTypes.STRING(200), allowNull: false },
        authority: { type: DataTypes.STRING(200), allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: false },
        arithmetic: { type: DataTypes.JSONB, allowNull: false },
        amountCents: { type: DataTypes.INTEGER, allowNull: false },
      },
      { sequelize, modelName: "PaymentLine", tableName: "payment_lines", underscored: true, timestamps: false },
    );
  }
}
