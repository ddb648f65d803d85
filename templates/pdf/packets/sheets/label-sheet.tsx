import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { WarningLabel } from "@/lib/engineering";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import { PlanSheet } from "../../shared/sheet-page";
import { COLORS, base } from "../../shared/styles";
import type { SheetInfo } from "../../shared/title-block";

const s = StyleSheet.create({
  intro: { fontSize: 8, color: COLORS.inkSoft, marginBottom: 10, lineHeight: 1.35 },
  grid: { flexDirection: "row", flexWrap: "wrap", marginRight: -14 },
  card: { width: "33.333%", paddingRight: 14, marginBottom: 14 },
  cardHead: { flexDirection: "row", justifyContent: "space-between", marginBottom: 3 },
  // The drawing of the label itself: a heavy border around large capitals, like the plate.
  plate: { borderWidth: 2.5, borderColor: COLORS.ink, padding: 3 },
  plateInner: {
    borderWidth: 0.8,
    borderColor: COLORS.ink,
    paddingVertical: 8,
    paddingHorizontal: 10,
    minHeight: 64,
    justifyContent: "center",
  },
  plateText: { fontSize: 10.5, fontWeight: 700, textAlign: "center", lineHeight: 1.3 },
  wording: { marginTop: 3, fontSize: 7, color: COLORS.inkSoft },
  explanation: { marginTop: 3, fontSize: 7.5, lineHeight: 1.3 },
  details: { marginTop: 4, paddingLeft: 2 },
  detailRow: { flexDirection: "row", marginTop: 2 },
  detailName: { width: 110, fontSize: 7.5, color: COLORS.inkSoft },
  detailValue: { flex: 1, fontSize: 7.5 },
});

function LabelCard({ label, values, index }: { label: WarningLabel; values: { name: string; value: string }[]; index: number }) {
  return (
    <View style={s.card} wrap={false}>
      <View style={s.cardHead}>
        <Text style={[base.strong, { fontSize: 8.5 }]}>
          L{index}. {label.title}
        </Text>
        <Text style={[base.faint, { fontSize: 7.5 }]}>{label.clause}</Text>
      </View>
      <View style={s.plate}>
        <View style={s.plateInner}>
          <Text style={s.plateText}>{label.text}</Text>
        </View>
      </View>
      <Text style={s.wording}>
        {label.prescribed ? `Wording prescribed by ${label.clause}.` : `${label.clause} asks for this content; the wording is ours.`}
      </Text>
      <Text style={s.explanation}>
        <Text style={base.strong}>What it means: </Text>
        {label.explanation}
      </Text>
      <View style={s.details}>
        {values.map((v) => (
          <View key={v.name} style={s.detailRow}>
            <Text style={s.detailName}>{v.name}</Text>
            <Text style={[s.detailValue, base.measure]}>{v.value}</Text>
          </View>
        ))}
        <View style={s.detailRow}>
          <Text style={s.detailName}>Where it goes</Text>
          <Text style={s.detailValue}>{label.placement}</Text>
        </View>
      </View>
    </View>
  );
}

/** Every label the review requires, drawn with its computed values and its place. */
export function LabelSheet({ input, sheet, range }: { input: PrintedPacket; sheet: SheetInfo; range?: [number, number] }) {
  const [first, end] = range ?? [0, input.review.labels.length];
  return (
    <PlanSheet
      input={input}
      sheet={sheet}
      subtitle={`${input.review.labels.length} labels required by the design review, NEC ${input.review.edition}`}
    >
      <Text style={s.intro}>
        Where the NEC prescribes a label's words, the plate shows them as the clause gives them; elsewhere it shows the content the clause
        asks for, with the values computed for this design. Beside each plate, what it means in plain words. Make each label permanent and
        suited to its environment (sunlight, weather); letter height, colours and any additional wording as NEC 110.21(B) and the AHJ
        require. Where the AHJ prescribes its own text, use that text with these values.
      </Text>
      <View style={s.grid}>
        {input.review.labels.slice(first, end).map((label, i) => (
          <LabelCard key={label.id} label={label} values={input.facts.labelValues[first + i]!} index={first + i + 1} />
        ))}
      </View>
    </PlanSheet>
  );
}
