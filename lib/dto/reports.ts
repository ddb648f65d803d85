import type { WaitingParty } from "@/lib/domain/filings";
import type { Stage } from "@/lib/domain/stages";

/** One authority's figures for the filings submitted to it in a range (the cycle-times API's row). */
export type CycleTimeRow = {
  authorityId: string;
  name: string;
  filings: number;
  decided: number;
  medianDays: number | null;
  p90Days: number | null;
  firstPassRate: number | null;
  meanRounds: number | null;
  inspectionPassRate: number | null;
};

export type StageDurationRow = { stage: Stage; stays: number; medianDays: number | null };
export type WaitingCountRow = { waitingOn: WaitingParty | "nobody"; projects: number };
export type MonthlyApprovalsRow = { month: string; permits: number; interconnections: number };
export const AGE_BUCKETS = ["0–7 days", "8–30 days", "31–90 days", "over 90 days"] as const;
export type StageAgingRow = { stage: Stage; counts: number[] };

/** Everything the Reports page shows for one range of days. */
export type ReportsOverview = {
  from: string;
  to: string;
  ahj: CycleTimeRow[];
  utility: CycleTimeRow[];
  stageDurations: StageDurationRow[];
  waiting: WaitingCountRow[];
  monthlyApprovals: MonthlyApprovalsRow[];
  stageAging: StageAgingRow[];
};

/** A filing as the filings export writes it; days are calendar days of the organization's zone. */
export type FilingExportRow = {
  projectNumber: number;
  customerName: string;
  address: string;
  kind: string;
  authorityName: string;
  status: string;
  referenceNumber: string | null;
  channel: string | null;
  sentTo: string;
  packetRevision: number | null;
  submittedOn: string | null;
  decidedOn: string | null;
  expiresOn: string | null;
  nextFollowUpOn: string | null;
  ptoOn: string | null;
  rounds: number;
  inspections: number;
  inspectionsPassed: number;
};

/** One line of the bookkeeping export: a payment received or a refund given back, in cents. */
export type LedgerExportRow = {
  day: string;
  entry: "payment" | "refund";
  projectNumber: number;
  customerName: string;
  receiptNumber: string | null;
  processorReference: string | null;
  description: string;
  amountCents: number;
  currency: string;
  status: string;
};
