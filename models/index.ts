import type { Sequelize } from "sequelize";
import { ApiToken } from "./api-token";
import { AuditEvent } from "./audit-event";
import { Design } from "./design";
import { Equipment } from "./equipment";
import { Invitation } from "./invitation";
import { Jurisdiction } from "./jurisdiction";
import { Organization } from "./organization";
import { Packet } from "./packet";
import { Project } from "./project";
import { SignInAttempt } from "./sign-in-attempt";
import { StageChange } from "./stage-change";
import { User } from "./user";
import { Utility } from "./utility";

export { AuditEvent, Design, Equipment, Invitation, Jurisdiction, Organization, Packet, Project, SignInAttempt, StageChange, User, Utility };
export { ApiToken };

let initialized: Sequelize | null = null;

/** Binds every model to one Sequelize instance and declares their associations. */
export function initModels(sequelize: Sequelize) {
  if (initialized === sequelize) return;
  initialized = sequelize;
  for (const model of [Organization, User, Invitation, SignInAttempt, Jurisdiction, Utility, Project, StageChange, AuditEvent, Equipment, Design, Packet]) {
    model.initModel(sequelize);
  }
  Project.belongsTo(Jurisdiction, { as: "jurisdiction", foreignKey: "jurisdictionId" });
  Project.belongsTo(Utility, { as: "utility", foreignKey: "utilityId" });
  Project.belongsTo(User, { as: "coordinator", foreignKey: "coordinatorId" });
  Project.belongsTo(User, { as: "installer", foreignKey: "installerId" });
  Packet.belongsTo(User, { as: "requestedBy", foreignKey: "requestedById" });
  StageChange.belongsTo(User, { as: "changedBy", foreignKey: "changedById" });
  AuditEvent.belongsTo(User, { as: "actor", foreignKey: "actorId" });
  ApiToken.initModel(sequelize);
  ApiToken.belongsTo(User, { as: "createdBy", foreignKey: "createdById" });
}
