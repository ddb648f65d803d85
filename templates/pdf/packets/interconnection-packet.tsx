import type { ReactElement } from "react";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import type { InterconnectionSheetKey, PlannedSheet } from "@/lib/documents/packets/sheet-plan";
import type { DrawnSheet } from "./permit-packet";
import { ApplicationSheet, FacilitySheet } from "./sheets/application-sheets";
import { SignatureSheet } from "./sheets/signature-sheet";
import { SingleLineSheet } from "./sheets/single-line-sheet";

/** The interconnection packet's pages, each as its own element: letter-size application pages, an 11 × 17 diagram sheet, signatures. */
export function interconnectionSheetPages(input: PrintedPacket, sheets: PlannedSheet<InterconnectionSheetKey>[]): DrawnSheet[] {
  const singleLine = sheets.find((s) => s.key === "single-line")!.number;
  return sheets.map((sheet) => {
    let page: ReactElement;
    switch (sheet.key) {
      case "application":
        page = <ApplicationSheet key={sheet.number} input={input} sheet={sheet} />;
        break;
      case "facility":
        page = <FacilitySheet key={sheet.number} input={input} sheet={sheet} singleLineSheet={singleLine} />;
        break;
      case "single-line":
        page = <SingleLineSheet key={sheet.number} input={input} sheet={sheet} />;
        break;
      case "signatures":
        page = <SignatureSheet key={sheet.number} input={input} sheet={sheet} />;
        break;
    }
    return { sheet, page };
  });
}
