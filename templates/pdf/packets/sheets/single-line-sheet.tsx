import { StyleSheet, View } from "@react-pdf/renderer";
import { layoutSingleLine } from "@/lib/sld";
import type { PacketInput } from "@/lib/documents/packets/input";
import { PlanSheet } from "../../shared/sheet-page";
import { PdfSingleLine } from "../../shared/single-line";
import type { SheetInfo } from "../../shared/title-block";

// Room for the drawing in the body of an 11 × 17 sheet, below the sheet heading; the scene
// carries its own ratings line and notes, and is scaled down to fit when it is larger.
export const DIAGRAM_BOX = { widthPt: 1130, heightPt: 585 };

const s = StyleSheet.create({
  diagram: { width: DIAGRAM_BOX.widthPt, height: DIAGRAM_BOX.heightPt, alignItems: "center", justifyContent: "flex-start" },
});

/** The single-line diagram drawn from the design (the same scene the browser shows). */
export function SingleLineSheet({ input, sheet }: { input: PacketInput; sheet: SheetInfo }) {
  const scene = layoutSingleLine(input.design, { necEdition: input.jurisdiction.necEdition });
  return (
    <PlanSheet input={input} sheet={sheet} subtitle="Drawn from the design of this revision; not to scale">
      <View style={s.diagram}>
        <PdfSingleLine scene={scene} width={DIAGRAM_BOX.widthPt} height={DIAGRAM_BOX.heightPt} />
      </View>
    </PlanSheet>
  );
}
