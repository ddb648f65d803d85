import type { ReactElement } from "react";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import type { PermitSheetKey, PlannedSheet } from "@/lib/documents/packets/sheet-plan";
import { CalculationSheet } from "./sheets/calculation-sheet";
import { CoverSheet } from "./sheets/cover-sheet";
import { LabelSheet } from "./sheets/label-sheet";
import { SingleLineSheet } from "./sheets/single-line-sheet";
import { StorageDataSheet } from "./sheets/storage-data-sheet";
import { StructuralSheet } from "./sheets/structural-sheet";
import { SystemSummarySheet } from "./sheets/system-summary-sheet";

export type DrawnSheet = { sheet: PlannedSheet<string>; page: ReactElement };

/** The permit packet's generated sheets (11 × 17 landscape) as planned, each as its own page element, in order. */
export function permitSheetPages(input: PrintedPacket, sheets: PlannedSheet<PermitSheetKey>[]): DrawnSheet[] {
  let checkIndex = 1;
  return sheets.map((sheet) => ({
    sheet,
    page: permitSheetPage(input, sheet, sheets, () => {
      const first = checkIndex;
      checkIndex += sheet.checks.length;
      return first;
    }),
  }));
}

function permitSheetPage(
  input: PrintedPacket,
  sheet: PlannedSheet<PermitSheetKey>,
  sheets: PlannedSheet<PermitSheetKey>[],
  nextCheckIndex: () => number,
): ReactElement {
  switch (sheet.key) {
    case "cover":
      return <CoverSheet key={sheet.number} input={input} sheet={sheet} sheets={sheets} />;
    case "system-summary":
      return <SystemSummarySheet key={sheet.number} input={input} sheet={sheet} />;
    case "single-line":
      return <SingleLineSheet key={sheet.number} input={input} sheet={sheet} />;
    case "calculations":
      // Calculation rows are numbered on across sheets, so a sheet starts where the last one ended.
      return <CalculationSheet key={sheet.number} input={input} sheet={sheet} checks={sheet.checks} firstIndex={nextCheckIndex()} />;
    case "labels":
      return <LabelSheet key={sheet.number} input={input} sheet={sheet} range={sheet.labels} />;
    case "structural":
      return <StructuralSheet key={sheet.number} input={input} sheet={sheet} />;
    case "storage-data":
      return <StorageDataSheet key={sheet.number} input={input} sheet={sheet} />;
  }
}
