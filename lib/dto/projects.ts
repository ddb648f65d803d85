import type { FilingStatus, HoldState, Stage, WaitingParty } from "@/lib/domain/stored-values";

export type ProjectDto = {
  id: string;
  number: number;
  customerName: string;
  customerEmail: string | null;
  customerPhone: string | null;
  street: string;
  city: string;
  state: string;
  postalCode: string;
  address: string;
  jurisdiction: { id: string; name: string; necEdition: number } | null;
  utility: { id: string; name: string } | null;
  utilityAccountNumber: string | null;
  meterNumber: string | null;
  mainBreakerA: number | null;
  busbarA: number | null;
  serviceVoltageV: number | null;
  servicePhases: number | null;
  stage: Stage;
  stageLabel: string;
  nextAction: string;
  stageChangedAt: string;
  daysInStage: number;
  coordinator: { id: string; name: string } | null;
  installer: { id: string; name: string } | null;
  declaredValuationCents: number | null; // the owner's declared value of the work; percentage fees read it
  holdState: HoldState | null;
  holdReason: string;
  waitingOn: WaitingParty | null;
  waitingSince: string | null;
  /** Whole days the project has waited on that party, as daysInStage counts. */
  waitingDays: number | null;
  /** Days beyond the usual review time of the AHJ or utility that holds the project (its profile); null within it or when nobody outside holds it. */
  pastUsualDays: number | null;
  permitStatus: FilingStatus | null;
  interconnectionStatus: FilingStatus | null;
  createdAt: string;
  updatedAt: string;
};
export type StageChangeDto = {
  id: string;
  fromStage: Stage | null;
  toStage: Stage;
  toLabel: string;
  note: string;
  changedBy: string | null;
  createdAt: string;
};
