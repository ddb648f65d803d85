import { StyleSheet, Text, TextInput, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import { COLORS, base } from "./styles";

// Lines to sign or fill in by hand, shared by the packets' signature sheet and the
// commissioning certificate.

/** The names of the signature fields over the signature lines; signing (lib/documents/signing) finds them by name. */
export const SIGNATURE_FIELDS = {
  customer: "signature.customer",
  secondOwner: "signature.second-owner",
  installer: "signature.installer",
} as const;

/** The lines signing fills in beside a signature: the day it was signed, and the printed name where the document left it blank. */
export const signedDateField = (signatureField: string) => `${signatureField}.date`;
export const signedNameField = (signatureField: string) => `${signatureField}.name`;

/** Height of the space a signature takes over its line, in points. */
export const SIGNATURE_FIELD_HEIGHT_PT = 30;

const s = StyleSheet.create({
  lineRow: { flexDirection: "row", marginTop: 22 },
  line: { flex: 1, marginRight: 14 },
  rule: { borderBottomWidth: 0.8, borderBottomColor: COLORS.ink, height: 14, position: "relative" },
  // The room a hand writes in: over the rule and a little above it.
  field: { position: "absolute", left: 0, right: 0, bottom: 0, height: SIGNATURE_FIELD_HEIGHT_PT, borderWidth: 0 },
  prefill: { fontSize: 9, paddingBottom: 2 },
});

/**
 * A rule with its caption under it; `prefill` prints a known value on the line (a printed name). A
 * signature line names its `field`: an empty PDF form field over the line marks where an electronic
 * signature goes (lib/documents/signing finds it by that name); on paper nothing shows.
 */
export function SignatureLine({ caption, flex = 1, prefill, field }: { caption: string; flex?: number; prefill?: string; field?: string }) {
  return (
    <View style={[s.line, { flex }]}>
      <View style={s.rule}>
        {prefill ? <Text style={s.prefill}>{prefill}</Text> : null}
        {field ? <TextInput name={field} style={s.field} /> : null}
      </View>
      <Text style={[base.caps, { marginTop: 2 }]}>{caption}</Text>
    </View>
  );
}

/** A row of signature lines, spaced for a hand to write on; `spacePt` overrides the room above the lines. */
export function SignatureRow({ children, spacePt }: { children: ReactNode; spacePt?: number }) {
  return <View style={spacePt === undefined ? s.lineRow : [s.lineRow, { marginTop: spacePt }]}>{children}</View>;
}
