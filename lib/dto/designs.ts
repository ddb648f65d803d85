import type { ReviewStatus } from "@/lib/domain/stored-values";
import type { DesignDraft } from "@/lib/schemas/design";

export type DesignDto = {
  projectId: string;
  draft: DesignDraft;
  isSaved: boolean;
  revision: number;
  reviewStatus: string;
  updatedAt: string | null;
};
export type DesignStatusDto = {
  reviewStatus: ReviewStatus;
  revision: number;
  updatedAt: string;
  counts: { pass: number; warn: number; fail: number } | null;
} | null;
