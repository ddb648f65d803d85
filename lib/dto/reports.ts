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
