import type { PacketInput } from "@/lib/packets/packet-input";
import { PacketDocument } from "./packet-document";
import { planPermitSheets } from "./sheet-plan";
import { CalculationSheet } from "./sheets/calculation-sheet";
import { CoverSheet } from "./sheets/cover-sheet";
import { LabelSheet } from "./sheets/label-sheet";
import { SingleLineSheet } from "./sheets/single-line-sheet";
import { StructuralSheet } from "./sheets/structural-sheet";
import { SystemSummarySheet } from "./sheets/system-summary-sheet";

/** The permit packet's generated sheets (11 × 17 landscape); data sheets are appended afterwards. */
export function PermitPacket({ input }: { input: PacketInput }) {
  const sheets = planPermitSheets(input);
  let checkIndex = 1;
  return (
    <PacketDocument input={input}>
      {sheets.map((sheet) => {
        switch (sheet.key) {
          case "cover":
            return <CoverSheet key={sheet.number} input={input} sheet={sheet} sheets={sheets} />;
          case "system-summary":
            return <SystemSummarySheet key={sheet.number} input={input} sheet={sheet} />;
          case "single-line":
            return <SingleLineSheet key={sheet.number} input={input} sheet={sheet} />;
          case "calculations": {
            const first = checkIndex;
            checkIndex += sheet.checks.length;
            return <CalculationSheet key={sheet.number} input={input} sheet={sheet} checks={sheet.checks} firstIndex={first} />;
          }
          case "labels":
            return <LabelSheet key={sheet.number} input={input} sheet={sheet} />;
          case "structural":
            return <StructuralSheet key={sheet.number} input={input} sheet={sheet} />;
        }
      })}
    </PacketDocument>
  );
}
