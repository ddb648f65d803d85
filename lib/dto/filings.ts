// What the filings read answers: the API's shape (README, "Filings API") with the ids and labels screens need.
import type {
  FilingKind,
  FilingStatus,
  InspectionKind,
  InspectionResult,
  SubmissionChannel,
  WaitingParty,
} from "@/lib/domain/stored-values";

export type FilingItemDto = {
  id: string;
  text: string;
  reference: string;
  response: string;
  designRevision: number | null;
  resolved: boolean;
};

export type CorrectionRoundDto = {
  id: string;
  number: number;
  receivedAt: string;
  answeredAt: string | null;
  letterFileId: string | null;
  letterFileName: string | null;
  revisionAtReceipt: number | null;
  resubmittedRevision: number | null;
  items: FilingItemDto[];
};

export type InspectionDto = {
  id: string;
  kind: InspectionKind;
  scheduledFor: string | null;
  timeWindow: string;
  inspectorName: string;
  result: InspectionResult | null;
  resultOn: string | null;
  reinspectionOf: string | null;
  notes: string;
  items: FilingItemDto[];
};

export type FilingDto = {
  id: string;
  kind: FilingKind;
  title: string;
  authority: { kind: "ahj" | "utility" | "other"; id: string | null; name: string };
  status: FilingStatus;
  statusSince: string;
  referenceNumber: string | null;
  channel: SubmissionChannel | null;
  sentTo: string;
  submittedAt: string | null;
  decidedAt: string | null;
  expiresAt: string | null;
  packetRevision: number | null;
  packetId: string | null;
  paymentId: string | null;
  nextFollowUpOn: string | null;
  ptoOn: string | null;
  revisionNeededSince: string | null;
  customerSince: string | null;
  notes: string;
  rounds: CorrectionRoundDto[];
  inspections: InspectionDto[];
};

export type ProjectFilingsDto = {
  waitingOn: WaitingParty | null;
  waitingSince: string | null;
  filings: FilingDto[];
};
