import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

export class Organization extends Model<InferAttributes<Organization>, InferCreationAttributes<Organization>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare licenseNumber: string | null;
  declare phone: string | null;
  declare timeZone: CreationOptional<string>; // IANA name, one of lib/domain/time-zones
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Organization.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        licenseNumber: { type: DataTypes.STRING(60), allowNull: true },
        phone: { type: DataTypes.STRING(40), allowNull: true },
        timeZone: { type: DataTypes.STRING(60), allowNull: false, defaultValue: "America/New_York" },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Organization", tableName: "organizations", underscored: true },
    );
  }
}
