import { Document, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { SigningRecordFacts } from "@/lib/documents/signing/facts";
import { Field, Section } from "../shared/blocks";
import { LetterPage } from "../shared/letter-page";
import { COLORS } from "../shared/styles";

// The page appended to a signed document: who signed, when, from where, and the fingerprints that let
// anyone check the pages were not changed afterwards.

const s = StyleSheet.create({
  intro: { fontSize: 9, lineHeight: 1.4, marginBottom: 10 },
  hash: { fontSize: 7.5 },
  signer: { marginBottom: 10, paddingTop: 6, borderTopWidth: 0.8, borderTopColor: COLORS.rule },
  heading: { fontSize: 10, fontWeight: 700, marginBottom: 4 },
  footer: { fontSize: 7, color: COLORS.inkFaint },
});

export function SigningRecord({ facts }: { facts: SigningRecordFacts }) {
  return (
    <Document title={facts.title}>
      <LetterPage title={facts.title} footer={() => <Text style={s.footer}>{facts.title}</Text>}>
        <Text style={s.intro}>{facts.intro}</Text>
        <Section title="Fingerprints">
          {facts.fingerprints.map((f) => (
            <Field key={f.label} label={f.label} value={f.value} mono style={s.hash} />
          ))}
        </Section>
        <Section title="Signers">
          {facts.signers.map((signer) => (
            <View key={signer.heading} style={s.signer} wrap={false}>
              <Text style={s.heading}>{signer.heading}</Text>
              {signer.rows.map((row) => (
                <Field key={row.label} label={row.label} value={row.value} />
              ))}
            </View>
          ))}
        </Section>
      </LetterPage>
    </Document>
  );
}
