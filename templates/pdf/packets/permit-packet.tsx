import type { ReactElement } from "react";
import type { PacketInput } from "@/lib/documents/packets/input";
import { PacketDocument } from "./packet-document";
import { planPermitSheets, type PlannedSheet, type PermitSheetKey } from "../../../lib/documents/packets/sheet-plan";
import { CalculationSheet } from "./sheets/calculation-sheet";
import { CoverSheet } from "./sheets/cover-sheet";
import { LabelSheet } from "./sheets/label-sheet";
import { SingleLineSheet } from "./sheets/single-line-sheet";
import { StructuralSheet } from "./sheets/structural-sheet";
import { SystemSummarySheet } from "./sheets/system-summary-sheet";

export type DrawnSheet = { sheet: PlannedSheet<string>; page: ReactElement };

/** The permit packet's generated sheets (11 × 17 landscape), each as its own page element, in order. */
export function permitSheetPages(input: PacketInput): DrawnSheet[] {
  const sheets = planPermitSheets(input);
  let checkIndex = 1;
  return sheets.map((sheet) => ({ sheet, page: permitSheetPage(input, sheet, sheets, () => {
    const first = checkIndex;
    checkIndex += sheet.checks.length;
    return first;
  }) }));
}

function permitSheetPage(input: PacketInput, sheet: PlannedSheet<PermitSheetKey>, sheets: PlannedSheet<PermitSheetKey>[], nextCheckIndex: () => number): ReactElement {
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
      return <LabelSheet key={sheet.number} input={input} sheet={sheet} />;
    case "structural":
      return <StructuralSheet key={sheet.number} input={input} sheet={sheet} />;
  }
}

/** The permit packet's generated sheets as one document; data sheets are appended afterwards. */
export function PermitPacket({ input }: { input: PacketInput }) {
  return <PacketDocument input={input}>{permitSheetPages(input).map((s) => s.page)}</PacketDocument>;
}
