import { Document, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { AgentAuthorizationFacts } from "@/lib/documents/agent-authorization/facts";
import { Field, Notice, Section } from "../shared/blocks";
import { LetterPage } from "../shared/letter-page";
import { SIGNATURE_FIELDS, SignatureLine, SignatureRow, signedDateField } from "../shared/signature-line";
import { COLORS } from "../shared/styles";

// The letter by which the owner lets the installer act as their agent with the AHJ and the utility:
// who is who, what the agent may do, what it may not, and a signature block per owner.

const s = StyleSheet.create({
  dated: { fontSize: 8.5, color: COLORS.inkSoft, marginBottom: 8 },
  row: { flexDirection: "row", marginHorizontal: -5 },
  cell: { flex: 1, marginHorizontal: 5 },
  lead: { fontSize: 9.5, lineHeight: 1.4, marginBottom: 4 },
  item: { fontSize: 9.5, lineHeight: 1.4, marginBottom: 3, marginLeft: 12 },
  caution: { fontSize: 8, lineHeight: 1.35, marginBottom: 2 },
  blocks: { flexDirection: "row", marginHorizontal: -4 },
  block: { flex: 1, marginHorizontal: 4, marginTop: 4, padding: 8, borderWidth: 0.8, borderColor: COLORS.rule },
  blockTitle: { fontSize: 9.5, fontWeight: 700 },
  footer: { fontSize: 7, color: COLORS.inkFaint },
});

function OwnerBlock({ title, printedName, field }: { title: string; printedName: string; field: string }) {
  return (
    <View style={s.block} wrap={false}>
      <Text style={s.blockTitle}>{title}</Text>
      <SignatureRow>
        <SignatureLine caption="Printed name" prefill={printedName} />
        <SignatureLine caption="Date" flex={0.5} field={signedDateField(field)} />
      </SignatureRow>
      <SignatureRow>
        <SignatureLine caption="Signature" field={field} />
      </SignatureRow>
    </View>
  );
}

export function AgentAuthorizationLetter({ facts }: { facts: AgentAuthorizationFacts }) {
  return (
    <Document title={facts.title}>
      <LetterPage
        title={facts.title}
        subtitle={facts.subtitle}
        footer={() => <Text style={s.footer}>{`${facts.title} · ${facts.subtitle}`}</Text>}
      >
        <Text style={s.dated}>{facts.dated}</Text>
        <Section title="1  Owner and site">
          <View style={s.row}>
            {facts.owner.slice(0, 2).map((f) => (
              <Field key={f.label} label={f.label} value={f.value} style={s.cell} />
            ))}
          </View>
          <View style={s.row}>
            {facts.owner.slice(2).map((f) => (
              <Field key={f.label} label={f.label} value={f.value} style={s.cell} />
            ))}
          </View>
        </Section>
        <Section title="2  Agent">
          <View style={s.row}>
            {facts.agent.map((f) => (
              <Field key={f.label} label={f.label} value={f.value} style={s.cell} />
            ))}
          </View>
        </Section>
        <Section title="3  What I authorize">
          <Text style={s.lead}>I authorize the agent named above, and its staff,</Text>
          {facts.grants.map((g) => (
            <Text key={g} style={s.item}>
              {`–  ${g}`}
            </Text>
          ))}
          {facts.limits.map((l) => (
            <Text key={l} style={s.lead}>
              {l}
            </Text>
          ))}
        </Section>
        <Notice title="Before you sign">
          {facts.cautions.map((c) => (
            <Text key={c} style={s.caution}>
              {c}
            </Text>
          ))}
        </Notice>
        <Section title="4  Signatures">
          {/* Side by side: with a second owner the letter still fits one page. */}
          <View style={s.blocks} wrap={false}>
            <OwnerBlock title={facts.ownerBlock.title} printedName={facts.ownerBlock.printedName} field={SIGNATURE_FIELDS.customer} />
            {facts.secondOwnerBlock ? (
              <OwnerBlock
                title={facts.secondOwnerBlock.title}
                printedName={facts.secondOwnerBlock.printedName}
                field={SIGNATURE_FIELDS.secondOwner}
              />
            ) : (
              <View style={{ flex: 1, marginHorizontal: 4 }} />
            )}
          </View>
        </Section>
      </LetterPage>
    </Document>
  );
}
