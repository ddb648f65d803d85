import type { PacketInput } from "@/lib/packets/packet-input";
import { PacketDocument } from "./packet-document";
import { planInterconnectionSheets } from "./sheet-plan";
import { ApplicationSheet, FacilitySheet } from "./sheets/application-sheets";
import { SignatureSheet } from "./sheets/signature-sheet";
import { SingleLineSheet } from "./sheets/single-line-sheet";

/** The interconnection packet: letter-size application pages, an 11 × 17 diagram sheet, signatures. */
export function InterconnectionPacket({ input }: { input: PacketInput }) {
  const sheets = planInterconnectionSheets();
  const singleLine = sheets.find((s) => s.key === "single-line")!.number;
  return (
    <PacketDocument input={input}>
      {sheets.map((sheet) => {
        switch (sheet.key) {
          case "application":
            return <ApplicationSheet key={sheet.number} input={input} sheet={sheet} />;
          case "facility":
            return <FacilitySheet key={sheet.number} input={input} sheet={sheet} singleLineSheet={singleLine} />;
          case "single-line":
            return <SingleLineSheet key={sheet.number} input={input} sheet={sheet} />;
          case "signatures":
            return <SignatureSheet key={sheet.number} input={input} sheet={sheet} />;
        }
      })}
    </PacketDocument>
  );
}
