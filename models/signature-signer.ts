import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { SignatureMarkKind, SignerChannel, SignerRole, SignerStatus } from "@/lib/domain/stored-values";
import type { SignatureRequest } from "./signature-request";

/** One person asked to sign one request: their link (only its token's hash), their answer and its evidence. */
export class SignatureSigner extends Model<InferAttributes<SignatureSigner>, InferCreationAttributes<SignatureSigner>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare signatureRequestId: string;
  declare role: SignerRole;
  declare channel: CreationOptional<SignerChannel>;
  declare name: string;
  declare email: CreationOptional<string>;
  declare tokenHash: string | null;
  declare expiresAt: Date | null;
  declare status: CreationOptional<SignerStatus>;
  declare declineReason: CreationOptional<string>;
  declare consentText: CreationOptional<string | null>;
  declare consentedAt: CreationOptional<Date | null>;
  declare markKind: CreationOptional<SignatureMarkKind | null>;
  declare markKey: CreationOptional<string | null>;
  declare typedName: CreationOptional<string | null>;
  declare address: CreationOptional<string>;
  declare userAgent: CreationOptional<string>;
  declare openedAt: CreationOptional<Date | null>;
  declare signedAt: CreationOptional<Date | null>;
  declare declinedAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare remindedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare request?: NonAttribute<SignatureRequest>;

  static initModel(sequelize: Sequelize) {
    SignatureSigner.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        signatureRequestId: { type: DataTypes.UUID, allowNull: false },
        role: { type: DataTypes.STRING(20), allowNull: false },
        channel: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "link" },
        name: { type: DataTypes.STRING(200), allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false, defaultValue: "" },
        tokenHash: { type: DataTypes.STRING(64), allowNull: true, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: true },
        status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "sent" },
        declineReason: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        consentText: { type: DataTypes.TEXT, allowNull: true },
        consentedAt: { type: DataTypes.DATE, allowNull: true },
        markKind: { type: DataTypes.STRING(10), allowNull: true },
        markKey: { type: DataTypes.STRING(300), allowNull: true },
        typedName: { type: DataTypes.STRING(200), allowNull: true },
        address: { type: DataTypes.STRING(100), allowNull: false, defaultValue: "" },
        userAgent: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
        openedAt: { type: DataTypes.DATE, allowNull: true },
        signedAt: { type: DataTypes.DATE, allowNull: true },
        declinedAt: { type: DataTypes.DATE, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        remindedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "SignatureSigner", tableName: "signature_signers", underscored: true },
    );
  }
}
