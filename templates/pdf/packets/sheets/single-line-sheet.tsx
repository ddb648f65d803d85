import { StyleSheet, View } from "@react-pdf/renderer";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import { PlanSheet } from "../../shared/sheet-page";
import { PdfSingleLine } from "../../shared/single-line";
import type { SheetInfo } from "../../shared/title-block";
import { DIAGRAM_BOX } from "./single-line-box";

const s = StyleSheet.create({
  diagram: { width: DIAGRAM_BOX.widthPt, height: DIAGRAM_BOX.heightPt, alignItems: "center", justifyContent: "flex-start" },
});

/** The single-line diagram drawn from the design (the same scene the browser shows). */
export function SingleLineSheet({ input, sheet }: { input: PrintedPacket; sheet: SheetInfo }) {
  return (
    <PlanSheet input={input} sheet={sheet} subtitle="Drawn from the design of this revision; not to scale">
      <View style={s.diagram}>
        <PdfSingleLine drawing={input.facts.singleLine} />
      </View>
    </PlanSheet>
  );
}
