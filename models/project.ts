import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { FilingStatus, HoldState, Stage, WaitingParty } from "@/lib/domain/stored-values";
import type { Jurisdiction } from "./jurisdiction";
import type { Utility } from "./utility";
import type { Filing } from "./filing";
import type { Design } from "./design";
import type { User } from "./user";

export class Project extends Model<InferAttributes<Project>, InferCreationAttributes<Project>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare number: CreationOptional<number>;
  declare customerName: string;
  declare customerEmail: string | null;
  declare customerPhone: string | null;
  declare street: string;
  declare city: string;
  declare state: string;
  declare postalCode: string;
  declare jurisdictionId: string | null;
  declare utilityId: string | null;
  declare utilityAccountNumber: string | null;
  declare meterNumber: string | null;
  declare mainBreakerA: number | null;
  declare busbarA: number | null;
  declare serviceVoltageV: number | null;
  declare servicePhases: number | null;
  declare stage: CreationOptional<Stage>;
  declare stageChangedAt: CreationOptional<Date>;
  declare coordinatorId: string | null;
  declare installerId: string | null;
  declare declaredValuationCents: CreationOptional<number | null>;
  /** The stage last set by hand; it stands until the facts of the filings pass it. */
  declare handStage: CreationOptional<Stage | null>;
  declare holdState: CreationOptional<HoldState | null>;
  declare holdReason: CreationOptional<string>;
  declare holdSince: CreationOptional<Date | null>;
  // Kept from the filings on every change to them, so the projects list filters on columns.
  declare waitingOn: CreationOptional<WaitingParty | null>;
  declare waitingSince: CreationOptional<Date | null>;
  declare permitStatus: CreationOptional<FilingStatus | null>;
  declare interconnectionStatus: CreationOptional<FilingStatus | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare jurisdiction?: NonAttribute<Jurisdiction | null>;
  declare utility?: NonAttribute<Utility | null>;
  declare coordinator?: NonAttribute<User | null>;
  declare installer?: NonAttribute<User | null>;
  declare design?: NonAttribute<Design | null>;
  declare filings?: NonAttribute<Filing[]>;

  static initModel(sequelize: Sequelize) {
    Project.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        organizationId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.INTEGER, autoIncrement: true, allowNull: false },
        customerName: { type: DataTypes.STRING(160), allowNull: false },
        customerEmail: { type: DataTypes.STRING(254), allowNull: true },
        customerPhone: { type: DataTypes.STRING(40), allowNull: true },
        street: { type: DataTypes.STRING(200), allowNull: false },
        city: { type: DataTypes.STRING(100), allowNull: false },
        state: { type: DataTypes.STRING(2), allowNull: false },
        postalCode: { type: DataTypes.STRING(10), allowNull: false },
        jurisdictionId: { type: DataTypes.UUID, allowNull: true },
        utilityId: { type: DataTypes.UUID, allowNull: true },
        utilityAccountNumber: { type: DataTypes.STRING(40), allowNull: true },
        meterNumber: { type: DataTypes.STRING(40), allowNull: true },
        mainBreakerA: { type: DataTypes.INTEGER, allowNull: true },
        busbarA: { type: DataTypes.INTEGER, allowNull: true },
        serviceVoltageV: { type: DataTypes.INTEGER, allowNull: true },
        servicePhases: { type: DataTypes.INTEGER, allowNull: true },
        stage: { type: DataTypes.STRING(30), allowNull: false, defaultValue: "draft" },
        stageChangedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        coordinatorId: { type: DataTypes.UUID, allowNull: true },
        installerId: { type: DataTypes.UUID, allowNull: true },
        declaredValuationCents: {
          type: DataTypes.BIGINT,
          allowNull: true,
          // pg returns BIGINT as a string; cents below 2^53 are exact as numbers.
          get() {
            const v = this.getDataValue("declaredValuationCents") as unknown;
            return v === null || v === undefined ? null : Number(v);
          },
        },
        handStage: { type: DataTypes.STRING(30), allowNull: true },
        holdState: { type: DataTypes.STRING(20), allowNull: true },
        holdReason: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        holdSince: { type: DataTypes.DATE, allowNull: true },
        waitingOn: { type: DataTypes.STRING(20), allowNull: true, defaultValue: "office" },
        waitingSince: { type: DataTypes.DATE, allowNull: true, defaultValue: DataTypes.NOW },
        permitStatus: { type: DataTypes.STRING(30), allowNull: true },
        interconnectionStatus: { type: DataTypes.STRING(30), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Project", tableName: "projects", underscored: true },
    );
  }
}
