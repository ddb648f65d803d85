import type { Sequelize } from "sequelize";
import { ApiToken } from "./api-token";
import { AuditEvent } from "./audit-event";
import { CommissioningRecord } from "./commissioning-record";
import { Design } from "./design";
import { DeskDigest } from "./desk-digest";
import { CorrectionRound } from "./correction-round";
import { Equipment } from "./equipment";
import { Filing } from "./filing";
import { FilingItem } from "./filing-item";
import { Inspection } from "./inspection";
import { FeeSchedule } from "./fee-schedule";
import { Invitation } from "./invitation";
import { Jurisdiction } from "./jurisdiction";
import { Organization } from "./organization";
import { OutboxMessage } from "./outbox-message";
import { Packet } from "./packet";
import { Payment } from "./payment";
import { PaymentLine } from "./payment-line";
import { ProcessorEvent } from "./processor-event";
import { Project } from "./project";
import { ProjectFile } from "./project-file";
import { Refund } from "./refund";
import { ShareLink } from "./share-link";
import { ShareLinkAccess } from "./share-link-access";
import { ShareLinkMiss } from "./share-link-miss";
import { ShareLinkPacket } from "./share-link-packet";
import { SignInAttempt } from "./sign-in-attempt";
import { SignatureLinkAccess } from "./signature-link-access";
import { SignatureRequest } from "./signature-request";
import { SignatureSigner } from "./signature-signer";
import { StageChange } from "./stage-change";
import { StorageRemoval } from "./storage-removal";
import { User } from "./user";
import { Utility } from "./utility";

export {
  AuditEvent,
  Design,
  Equipment,
  Invitation,
  Jurisdiction,
  Organization,
  Packet,
  Project,
  SignInAttempt,
  StageChange,
  User,
  Utility,
};
export { ApiToken };
export { ShareLink, ShareLinkAccess, ShareLinkMiss, ShareLinkPacket };
export { OutboxMessage };
export { CommissioningRecord, ProjectFile, StorageRemoval };
export { FeeSchedule, Payment, PaymentLine, ProcessorEvent, Refund };
export { CorrectionRound, Filing, FilingItem, Inspection };
export { DeskDigest };
export { SignatureLinkAccess, SignatureRequest, SignatureSigner };

let initialized: Sequelize | null = null;

/** Binds every model to one Sequelize instance and declares their associations. */
export function initModels(sequelize: Sequelize) {
  if (initialized === sequelize) return;
  initialized = sequelize;
  for (const model of [
    Organization,
    User,
    Invitation,
    SignInAttempt,
    Jurisdiction,
    Utility,
    Project,
    StageChange,
    AuditEvent,
    Equipment,
    Design,
    Packet,
  ]) {
    model.initModel(sequelize);
  }
  Project.belongsTo(Jurisdiction, { as: "jurisdiction", foreignKey: "jurisdictionId" });
  Project.belongsTo(Utility, { as: "utility", foreignKey: "utilityId" });
  Project.belongsTo(User, { as: "coordinator", foreignKey: "coordinatorId" });
  Project.belongsTo(User, { as: "installer", foreignKey: "installerId" });
  Project.hasOne(Design, { as: "design", foreignKey: "projectId" });
  Packet.belongsTo(User, { as: "requestedBy", foreignKey: "requestedById" });
  StageChange.belongsTo(User, { as: "changedBy", foreignKey: "changedById" });
  AuditEvent.belongsTo(User, { as: "actor", foreignKey: "actorId" });
  ApiToken.initModel(sequelize);
  ApiToken.belongsTo(User, { as: "createdBy", foreignKey: "createdById" });
  OutboxMessage.initModel(sequelize);
  for (const model of [ShareLink, ShareLinkPacket, ShareLinkAccess, ShareLinkMiss]) model.initModel(sequelize);
  ShareLink.belongsToMany(Packet, { through: ShareLinkPacket, as: "packets", foreignKey: "shareLinkId", otherKey: "packetId" });
  Packet.belongsToMany(ShareLink, { through: ShareLinkPacket, as: "shareLinks", foreignKey: "packetId", otherKey: "shareLinkId" });
  ShareLink.hasMany(ShareLinkAccess, { as: "accesses", foreignKey: "shareLinkId" });
  ShareLink.belongsTo(User, { as: "createdBy", foreignKey: "createdById" });
  CommissioningRecord.initModel(sequelize);
  ProjectFile.initModel(sequelize);
  ProjectFile.belongsTo(User, { as: "uploadedBy", foreignKey: "uploadedById" });
  StorageRemoval.initModel(sequelize);
  for (const model of [FeeSchedule, Payment, PaymentLine, Refund, ProcessorEvent]) model.initModel(sequelize);
  Payment.hasMany(PaymentLine, { as: "lines", foreignKey: "paymentId" });
  Payment.hasMany(Refund, { as: "refunds", foreignKey: "paymentId" });
  Payment.belongsTo(User, { as: "createdBy", foreignKey: "createdById" });
  Refund.belongsTo(User, { as: "createdBy", foreignKey: "createdById" });
  for (const model of [Filing, CorrectionRound, Inspection, FilingItem]) model.initModel(sequelize);
  DeskDigest.initModel(sequelize);
  Filing.belongsTo(Packet, { as: "packet", foreignKey: "packetId" });
  Filing.hasMany(CorrectionRound, { as: "rounds", foreignKey: "filingId" });
  Filing.hasMany(Inspection, { as: "inspections", foreignKey: "filingId" });
  CorrectionRound.hasMany(FilingItem, { as: "items", foreignKey: "roundId" });
  Inspection.hasMany(FilingItem, { as: "items", foreignKey: "inspectionId" });
  Project.hasMany(Filing, { as: "filings", foreignKey: "projectId" });
  for (const model of [SignatureRequest, SignatureSigner, SignatureLinkAccess]) model.initModel(sequelize);
  SignatureRequest.hasMany(SignatureSigner, { as: "signers", foreignKey: "signatureRequestId" });
  SignatureSigner.belongsTo(SignatureRequest, { as: "request", foreignKey: "signatureRequestId" });
  SignatureRequest.belongsTo(User, { as: "createdBy", foreignKey: "createdById" });
}
