import type { CheckResult } from "@/lib/engineering";
import type { SheetInfo } from "@/templates/pdf/shared/title-block";
import { paginateChecks } from "./calculation-layout";
import { figuresOfReview } from "./check-methods";
import type { PacketInput } from "./input";

// Which sheets a packet holds, in order, numbered before anything is drawn so every title
// block can say "Sheet N of M" and the cover can index them.

export type PermitSheetKey = "cover" | "system-summary" | "single-line" | "calculations" | "labels" | "structural";
export type InterconnectionSheetKey = "application" | "facility" | "single-line" | "signatures";

export type PlannedSheet<K extends string> = SheetInfo & { key: K; checks: CheckResult[] };

function numbered<K extends string>(sheets: { key: K; title: string; checks?: CheckResult[] }[]): PlannedSheet<K>[] {
  return sheets.map((sheet, i) => ({ ...sheet, checks: sheet.checks ?? [], number: i + 1, total: sheets.length }));
}

export function planPermitSheets(input: PacketInput): PlannedSheet<PermitSheetKey>[] {
  const groups = paginateChecks(input.review.checks, input.design, input.site, figuresOfReview(input));
  const calc = groups.map((checks, i) => ({
    key: "calculations" as const,
    title: groups.length === 1 ? "Calculations" : `Calculations (${i + 1} of ${groups.length})`,
    checks,
  }));
  return numbered<PermitSheetKey>([
    { key: "cover", title: "Cover sheet" },
    { key: "system-summary", title: "System summary" },
    { key: "single-line", title: "Single-line diagram" },
    ...calc,
    { key: "labels", title: "Warning labels" },
    { key: "structural", title: "Structural summary" },
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
