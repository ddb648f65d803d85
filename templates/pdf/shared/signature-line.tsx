import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import { COLORS, base } from "./styles";

// Lines to sign or fill in by hand, shared by the packets' signature sheet and the
// commissioning certificate.

const s = StyleSheet.create({
  lineRow: { flexDirection: "row", marginTop: 22 },
  line: { flex: 1, marginRight: 14 },
  rule: { borderBottomWidth: 0.8, borderBottomColor: COLORS.ink, height: 14 },
  prefill: { fontSize: 9, paddingBottom: 2 },
});

/** A rule with its caption under it; `prefill` prints a known value on the line (a printed name). */
export function SignatureLine({ caption, flex = 1, prefill }: { caption: string; flex?: number; prefill?: string }) {
  return (
    <View style={[s.line, { flex }]}>
      <View style={s.rule}>{prefill ? <Text style={s.prefill}>{prefill}</Text> : null}</View>
      <Text style={[base.caps, { marginTop: 2 }]}>{caption}</Text>
    </View>
  );
}

/** A row of signature lines, spaced for a hand to write on; `spacePt` overrides the room above the lines. */
export function SignatureRow({ children, spacePt }: { children: ReactNode; spacePt?: number }) {
  return <View style={spacePt === undefined ? s.lineRow : [s.lineRow, { marginTop: spacePt }]}>{children}</View>;
}
