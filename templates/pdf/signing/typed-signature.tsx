import { Document, Page, StyleSheet, Text } from "@react-pdf/renderer";

// A typed name drawn as a signature: a small page the signer's block takes as a picture, so the name is
// set in the documents' own fonts whatever its letters.

const s = StyleSheet.create({
  page: { padding: 2, justifyContent: "flex-end" },
  name: { fontSize: 16, fontWeight: 600, color: "#1f2a44" },
});

export function TypedSignature({ name, width, height }: { name: string; width: number; height: number }) {
  return (
    <Document>
      <Page size={[width, height]} style={s.page}>
        <Text style={s.name}>{name}</Text>
      </Page>
    </Document>
  );
}
