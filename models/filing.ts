import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { AuthorityKind, FilingKind, FilingStatus, SubmissionChannel } from "@/lib/domain/stored-values";
import type { CorrectionRound } from "./correction-round";
import type { Inspection } from "./inspection";
import type { Packet } from "./packet";

/** One authority's yes the project needs: its status, number, what went in and when. */
export class Filing extends Model<InferAttributes<Filing>, InferCreationAttributes<Filing>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare kind: FilingKind;
  declare authorityKind: AuthorityKind | "other";
  declare authorityId: string | null;
  declare authorityName: string;
  declare title: CreationOptional<string>;
  declare status: CreationOptional<FilingStatus>;
  declare statusSince: Date;
  declare referenceNumber: CreationOptional<string | null>;
  declare channel: CreationOptional<SubmissionChannel | null>;
  declare sentTo: CreationOptional<string>;
  declare packetId: CreationOptional<string | null>;
  declare paymentId: CreationOptional<string | null>;
  declare submittedOn: CreationOptional<string | null>;
  declare decidedOn: CreationOptional<string | null>;
  declare expiresOn: CreationOptional<string | null>;
  declare nextFollowUpOn: CreationOptional<string | null>;
  declare ptoOn: CreationOptional<string | null>;
  declare revisionNeededSince: CreationOptional<Date | null>;
  declare customerSince: CreationOptional<Date | null>;
  declare notes: CreationOptional<string>;
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare packet?: NonAttribute<Packet | null>;
  declare rounds?: NonAttribute<CorrectionRound[]>;
  declare inspections?: NonAttribute<Inspection[]>;

  static initModel(sequelize: Sequelize) {
    Filing.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        authorityKind: { type: DataTypes.STRING(20), allowNull: false },
        authorityId: { type: DataTypes.UUID, allowNull: true },
        authorityName: { type: DataTypes.STRING(160), allowNull: false },
        title: { type: DataTypes.STRING(160), allowNull: false, defaultValue: "" },
        status: { type: DataTypes.STRING(30), allowNull: false, defaultValue: "preparing" },
        statusSince: { type: DataTypes.DATE, allowNull: false },
        referenceNumber: { type: DataTypes.STRING(80), allowNull: true },
        channel: { type: DataTypes.STRING(20), allowNull: true },
        sentTo: { type: DataTypes.STRING(200), allowNull: false, defaultValue: "" },
        packetId: { type: DataTypes.UUID, allowNull: true },
        paymentId: { type: DataTypes.UUID, allowNull: true },
        submittedOn: { type: DataTypes.DATEONLY, allowNull: true },
        decidedOn: { type: DataTypes.DATEONLY, allowNull: true },
        expiresOn: { type: DataTypes.DATEONLY, allowNull: true },
        nextFollowUpOn: { type: DataTypes.DATEONLY, allowNull: true },
        ptoOn: { type: DataTypes.DATEONLY, allowNull: true },
        revisionNeededSince: { type: DataTypes.DATE, allowNull: true },
        customerSince: { type: DataTypes.DATE, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Filing", tableName: "filings", underscored: true },
    );
  }
}
