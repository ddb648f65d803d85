import { Document, Page, StyleSheet, Text } from "@react-pdf/renderer";

// A typed name drawn as a signature: a small page the signer's block takes as a picture, so the name is
// set in the documents' own fonts whatever its letters.

const s = StyleSheet.create({
  page: { padding: 2, justifyContent: "flex-end" },
  name: { fontWeight: 600, color: "#1f2a44" },
  filled: { fontWeight: 400, color: "#1f1c17" },
});

// Inter's semi-bold letters are at most about 0.9 em wide (W, M) and average near 0.56 em on names; sizing at
// 0.75 em a letter keeps even a run of wide capitals on one line (a wrapped line would not fit the block).
const EM_PER_LETTER = 0.75;

/** The largest size, up to `largest` pt, at which the text fits the block on one line. */
export function typedSignatureSize(name: string, width: number, height: number, largest = 16): number {
  return Math.max(4, Math.min(largest, (height - 4) * 0.75, (width - 4) / (Math.max(1, name.length) * EM_PER_LETTER)));
}

export function TypedSignature({ name, width, height }: { name: string; width: number; height: number }) {
  // One line that always fits: a name wrapping onto a page this small would never finish laying out.
  return (
    <Document>
      <Page size={[width, height]} style={s.page} wrap={false}>
        <Text style={[s.name, { fontSize: typedSignatureSize(name, width, height) }]}>{name}</Text>
      </Page>
    </Document>
  );
}

/** A line the signing fills in beside the signature (the day signed, a printed name), in the documents' text face. */
export function FilledLine({ text, width, height }: { text: string; width: number; height: number }) {
  return (
    <Document>
      <Page size={[width, height]} style={s.page} wrap={false}>
        <Text style={[s.filled, { fontSize: typedSignatureSize(text, width, height, 9) }]}>{text}</Text>
      </Page>
    </Document>
  );
}
