import type { CheckResult } from "@/lib/engineering";
import type { SheetInfo } from "@/templates/pdf/shared/title-block";
import { paginateChecks } from "./calculation-layout";
import { figuresOfReview } from "./check-methods";
import type { PacketInput } from "./input";

// Which sheets a packet holds, in order, numbered before anything is drawn so every title
// block can say "Sheet N of M" and the cover can index them.

export type PermitSheetKey = "cover" | "system-summary" | "single-line" | "calculations" | "labels" | "structural" | "storage-data";
export type InterconnectionSheetKey = "application" | "facility" | "single-line" | "signatures";

/** `labels`: the range of the review's labels a label sheet draws, [first, end). */
export type PlannedSheet<K extends string> = SheetInfo & { key: K; checks: CheckResult[]; labels?: [number, number] };

function numbered<K extends string>(
  sheets: { key: K; title: string; checks?: CheckResult[]; labels?: [number, number] }[],
): PlannedSheet<K>[] {
  return sheets.map((sheet, i) => ({ ...sheet, checks: sheet.checks ?? [], number: i + 1, total: sheets.length }));
}

/** Three rows of three label cards fill an 11 × 17 sheet; storage adds enough labels to need a second. */
export const LABELS_PER_SHEET = 9;

export function planPermitSheets(input: PacketInput): PlannedSheet<PermitSheetKey>[] {
  const groups = paginateChecks(input.review.checks, input.design, input.site, figuresOfReview(input));
  const calc = groups.map((checks, i) => ({
    key: "calculations" as const,
    title: groups.length === 1 ? "Calculations" : `Calculations (${i + 1} of ${groups.length})`,
    checks,
  }));
  const labelCount = input.review.labels.length;
  const labelSheets = Math.max(1, Math.ceil(labelCount / LABELS_PER_SHEET));
  const labels = Array.from({ length: labelSheets }, (_, i) => ({
    key: "labels" as const,
    title: labelSheets === 1 ? "Warning labels" : `Warning labels (${i + 1} of ${labelSheets})`,
    labels: [i * LABELS_PER_SHEET, Math.min(labelCount, (i + 1) * LABELS_PER_SHEET)] as [number, number],
  }));
  return numbered<PermitSheetKey>([
    { key: "cover", title: "Cover sheet" },
    { key: "system-summary", title: "System summary" },
    { key: "single-line", title: "Single-line diagram" },
    ...calc,
    ...labels,
    { key: "structural", title: "Structural summary" },
    ...(input.review.storage ? [{ key: "storage-data" as const, title: "Energy storage data" }] : []),
  ]);
}

export function planInterconnectionSheets(): PlannedSheet<InterconnectionSheetKey>[] {
  return numbered<InterconnectionSheetKey>([
    { key: "application", title: "Interconnection application" },
    { key: "facility", title: "Generating facility" },
    { key: "single-line", title: "Single-line diagram" },
    { key: "signatures", title: "Signatures" },
  ]);
}
