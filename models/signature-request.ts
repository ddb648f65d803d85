import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { SignedDocumentKind } from "@/lib/domain/stored-values";
import type { SignatureSigner } from "./signature-signer";
import type { User } from "./user";

/** A generated document put up for signatures; the original stays as stored, the signed copy is a new object. */
export class SignatureRequest extends Model<InferAttributes<SignatureRequest>, InferCreationAttributes<SignatureRequest>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare projectId: string;
  declare documentKind: SignedDocumentKind;
  declare packetId: string | null;
  declare title: string;
  declare originalKey: string;
  declare originalSha256: string;
  declare signedKey: CreationOptional<string | null>;
  declare signedSha256: CreationOptional<string | null>;
  declare signedAt: CreationOptional<Date | null>;
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare signers?: NonAttribute<SignatureSigner[]>;
  declare createdBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    SignatureRequest.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        projectId: { type: DataTypes.UUID, allowNull: false },
        documentKind: { type: DataTypes.STRING(30), allowNull: false },
        packetId: { type: DataTypes.UUID, allowNull: true },
        title: { type: DataTypes.STRING(200), allowNull: false },
        originalKey: { type: DataTypes.STRING(300), allowNull: false },
        originalSha256: { type: DataTypes.STRING(64), allowNull: false },
        signedKey: { type: DataTypes.STRING(300), allowNull: true },
        signedSha256: { type: DataTypes.STRING(64), allowNull: true },
        signedAt: { type: DataTypes.DATE, allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "SignatureRequest", tableName: "signature_requests", underscored: true },
    );
  }
}
