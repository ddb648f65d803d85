import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SigningAccessKind } from "@/lib/domain/stored-values";

/** One use of a signing link (opened, a page read, a download, the signature or the refusal), for the access log. */
export class SignatureLinkAccess extends Model<InferAttributes<SignatureLinkAccess>, InferCreationAttributes<SignatureLinkAccess>> {
  declare id: CreationOptional<number>;
  declare signerId: string;
  declare kind: SigningAccessKind;
  declare address: string;
  declare userAgent: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SignatureLinkAccess.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        signerId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        address: { type: DataTypes.STRING(100), allowNull: false },
        userAgent: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "SignatureLinkAccess", tableName: "signature_link_accesses", underscored: true, updatedAt: false },
    );
  }
}
