import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** One failed sign-in, keyed by account or by client address; kept in PostgreSQL so throttling holds across app servers. */
export class SignInAttempt extends Model<InferAttributes<SignInAttempt>, InferCreationAttributes<SignInAttempt>> {
  declare id: CreationOptional<number>;
  declare key: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SignInAttempt.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        key: { type: DataTypes.STRING(300), allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "SignInAttempt", tableName: "sign_in_attempts", underscored: true, updatedAt: false },
    );
  }
}
