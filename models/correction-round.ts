import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { FilingItem } from "./filing-item";

/** Round N of an authority's comments on a filing: its letter, its items, and the resubmission that answered it. */
export class CorrectionRound extends Model<InferAttributes<CorrectionRound>, InferCreationAttributes<CorrectionRound>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare filingId: string;
  declare number: number;
  declare receivedOn: string;
  declare letterFileId: CreationOptional<string | null>;
  declare revisionAtReceipt: CreationOptional<number | null>;
  declare resubmittedPacketId: CreationOptional<string | null>;
  declare answeredAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare items?: NonAttribute<FilingItem[]>;

  static initModel(sequelize: Sequelize) {
    CorrectionRound.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        filingId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        receivedOn: { type: DataTypes.DATEONLY, allowNull: false },
        letterFileId: { type: DataTypes.UUID, allowNull: true },
        revisionAtReceipt: { type: DataTypes.INTEGER, allowNull: true },
        resubmittedPacketId: { type: DataTypes.UUID, allowNull: true },
        answeredAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "CorrectionRound", tableName: "correction_rounds", underscored: true },
    );
  }
}
