import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A payment-processor event already handled; its id is the key, so a repeat changes nothing. */
export class ProcessorEvent extends Model<InferAttributes<ProcessorEvent>, InferCreationAttributes<ProcessorEvent>> {
  declare id: string;
  declare type: string;
  declare receivedAt: Date;

  static initModel(sequelize: Sequelize) {
    ProcessorEvent.init(
      {
        id: { type: DataTypes.STRING(255), primaryKey: true },
        type: { type: DataTypes.STRING(100), allowNull: false },
        receivedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: "ProcessorEvent", tableName: "processor_events", underscored: true, timestamps: false },
    );
  }
}
