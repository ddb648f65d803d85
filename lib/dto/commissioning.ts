import type { CommissioningCheck, CommissioningCompletion, CommissioningRecord as RecordFacts } from "@/lib/engineering/commissioning";
import type { CommissioningStatus } from "@/lib/domain/stored-values";
import type { CommissioningFacts } from "@/lib/field/commissioning-facts";
import type { CommissioningReadings } from "@/lib/schemas/commissioning";

export type CommissioningDto = {
  projectId: string;
  facts: CommissioningFacts;
  readings: CommissioningReadings;
  record: RecordFacts;
  results: CommissioningCheck[];
  completion: CommissioningCompletion;
  status: CommissioningStatus;
  updatedAt: string | null;
  completedAt: string | null;
};
export type SaveCommissioningResult = CommissioningDto & { completeRefused: string | null };
export type FieldSummaryDto = {
  status: CommissioningStatus | "not-started";
  completedAt: string | null;
  signedForms: number;
  photos: number;
};
