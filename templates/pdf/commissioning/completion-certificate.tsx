import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { PrintedCommissioning } from "@/lib/documents/commissioning/facts";
import { Field, Section } from "../shared/blocks";
import { CautionNotice, CommissioningDocument, CompletionPanel, EquipmentRow } from "./commissioning-parts";
import { SIGNATURE_FIELDS, SignatureLine, SignatureRow, signedDateField, signedNameField } from "../shared/signature-line";
import { COLORS } from "../shared/styles";

// The certificate of completion: the project and system filled in from the commissioning
// record, a statement for the installer to sign, and the customer's acknowledgement. The
// installer prints it, signs it and uploads the signed copy.

const s = StyleSheet.create({
  row: { flexDirection: "row", marginHorizontal: -5 },
  cell: { flex: 1, marginHorizontal: 5 },
  wide: { flex: 2, marginHorizontal: 5 },
  readings: { fontSize: 8, lineHeight: 1.35, marginTop: 4, color: COLORS.ink },
  readingLabel: { fontWeight: 600 },
  statement: { fontSize: 8, lineHeight: 1.35, marginBottom: 2 },
  signatures: { flexDirection: "row", marginHorizontal: -5 },
  block: { flex: 1, marginHorizontal: 5, padding: 8, paddingTop: 7, borderWidth: 0.8, borderColor: COLORS.rule },
  blockTitle: { fontSize: 9.5, fontWeight: 700, marginBottom: 2 },
  blockText: { fontSize: 7.5, lineHeight: 1.35, color: COLORS.inkSoft },
});

// Room above each signature line: a little under the packets' signature sheet, to keep the certificate on one page.
const LINE_SPACE_PT = 14;

/** What the customer acknowledges by signing. */
export const CUSTOMER_ACKNOWLEDGEMENT =
  "The installer has shown me the system, its rapid shutdown switch and its disconnects, and given me the operating instructions and the manufacturers' documents. " +
  "I understand the system may not run in parallel with the grid before the utility grants permission to operate.";

/** The certificate of completion, one letter page. */
export function CompletionCertificate({ input }: { input: PrintedCommissioning }) {
  const p = input.project;
  const sys = input.system;
  // The key readings go in one paragraph, to keep the certificate on one page.
  const { ratings, summary, readings, certificateFootnote: footnote } = input.facts;
  const org = input.organization;
  return (
    <CommissioningDocument
      input={input}
      subtitle={`Grid-tied PV system · Project ${p.number}`}
      documentLine="For signature and upload"
      bandCaution={false}
    >
      <Section title="1  Installation and system">
        <View style={s.row}>
          <Field label="Customer" value={p.customerName} style={s.cell} />
          <Field label="Site address" value={p.address} style={s.wide} />
        </View>
        <View style={s.row}>
          <Field
            label={`Authority having jurisdiction · NEC ${input.record.edition}`}
            value={p.jurisdictionName ?? "Not set"}
            style={s.cell}
          />
          <Field label="Utility" value={p.utilityName ?? "Not set"} style={s.cell} />
          <Field label="Ratings" value={`${ratings.dc} DC (STC) · ${ratings.ac} AC`} mono style={s.cell} />
        </View>
        <EquipmentRow system={sys} rowStyle={s.row} cellStyle={s.cell} />
      </Section>
      <Section title="2  Commissioning result">
        <CompletionPanel
          input={input}
          summary={summary}
          footnote={footnote}
          listReview={false}
          details={
            <Text style={s.readings}>
              {readings.map((r, i) => (
                <Text key={r.label}>
                  {i > 0 ? " · " : ""}
                  <Text style={s.readingLabel}>{r.label}: </Text>
                  {r.value}
                </Text>
              ))}
            </Text>
          }
        />
      </Section>
      <Section title="3  Statement and signatures">
        <Text style={s.statement}>{input.facts.installerStatement}</Text>
        <View style={s.signatures} wrap={false}>
          <View style={s.block}>
            <Text style={s.blockTitle}>Installer</Text>
            <Text style={s.blockText}>{`For ${org.name}${org.licenseNumber ? `, contractor license ${org.licenseNumber}` : ""}`}</Text>
            <SignatureRow spacePt={LINE_SPACE_PT}>
              <SignatureLine caption="Printed name" flex={1.6} field={signedNameField(SIGNATURE_FIELDS.installer)} />
              <SignatureLine caption="License no." />
            </SignatureRow>
            <SignatureRow spacePt={LINE_SPACE_PT}>
              <SignatureLine caption="Signature" flex={1.6} field={SIGNATURE_FIELDS.installer} />
              <SignatureLine caption="Date" field={signedDateField(SIGNATURE_FIELDS.installer)} />
            </SignatureRow>
          </View>
          <View style={s.block}>
            <Text style={s.blockTitle}>Customer's acknowledgement</Text>
            <Text style={s.blockText}>{CUSTOMER_ACKNOWLEDGEMENT}</Text>
            <SignatureRow spacePt={LINE_SPACE_PT}>
              <SignatureLine caption="Printed name" field={signedNameField(SIGNATURE_FIELDS.customer)} />
            </SignatureRow>
            <SignatureRow spacePt={LINE_SPACE_PT}>
              <SignatureLine caption="Signature" flex={1.6} field={SIGNATURE_FIELDS.customer} />
              <SignatureLine caption="Date" field={signedDateField(SIGNATURE_FIELDS.customer)} />
            </SignatureRow>
          </View>
        </View>
      </Section>
      <CautionNotice cautions={input.facts.cautions} fontSize={6.5} columns={2} />
    </CommissioningDocument>
  );
}
