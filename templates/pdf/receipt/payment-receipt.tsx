import { Document, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ReceiptFacts } from "@/lib/documents/receipt/facts";
import { Field, Section, Table } from "../shared/blocks";
import { LetterPage } from "../shared/letter-page";
import { COLORS, base } from "../shared/styles";

// The payment receipt: what was paid, to which authority's fee, how each fee was worked out,
// how it was paid, and any refunds with the net amount.

const s = StyleSheet.create({
  top: { flexDirection: "row", marginBottom: 12 },
  parties: { flex: 1, marginRight: 16 },
  row: { flexDirection: "row", marginHorizontal: -5 },
  cell: { flex: 1, marginHorizontal: 5 },
  amountBox: { width: 170, backgroundColor: COLORS.paperTint, borderTopWidth: 2, borderTopColor: COLORS.copper, padding: 10 },
  amount: { fontSize: 20, fontWeight: 600, marginTop: 3, color: COLORS.ink },
  amountStatus: { fontSize: 8.5, fontWeight: 600, color: COLORS.copperDark, marginTop: 3 },
  amountNote: { fontSize: 8, color: COLORS.inkSoft, marginTop: 6 },
  amountNet: { fontSize: 11, fontWeight: 600, marginTop: 1 },
  feeName: { fontSize: 8.5, fontWeight: 600 },
  authority: { fontSize: 7.8, color: COLORS.inkSoft, marginTop: 1 },
  working: { fontSize: 7, color: COLORS.inkSoft, marginTop: 1.5, lineHeight: 1.3 },
  sumRow: { flexDirection: "row", justifyContent: "flex-end", paddingVertical: 3, paddingHorizontal: 4 },
  sumLabel: { fontSize: 8.5, marginRight: 12 },
  sumValue: { fontSize: 8.5, width: 90, textAlign: "right" },
  totalRow: { borderTopWidth: 1, borderTopColor: COLORS.ink, paddingTop: 4, marginTop: -0.5 },
  totalText: { fontSize: 10, fontWeight: 700 },
  note: { fontSize: 7.5, lineHeight: 1.35, color: COLORS.inkSoft, marginTop: 4 },
  footer: { flexDirection: "row", justifyContent: "space-between", borderTopWidth: 0.8, borderTopColor: COLORS.rule, paddingTop: 4 },
  footerText: { fontSize: 7, color: COLORS.inkFaint },
});

type FeeLine = ReceiptFacts["lines"][number];
type RefundLine = ReceiptFacts["refunds"][number];

function SumRow({ label, value, total = false }: { label: string; value: string; total?: boolean }) {
  return (
    <View style={total ? [s.sumRow, s.totalRow] : s.sumRow} wrap={false}>
      <Text style={total ? [s.sumLabel, s.totalText] : s.sumLabel}>{label}</Text>
      <Text style={total ? [s.sumValue, base.measure, s.totalText] : [s.sumValue, base.measure]}>{value}</Text>
    </View>
  );
}

function FeeCell({ line }: { line: FeeLine }) {
  return (
    <View>
      <Text style={s.feeName}>{line.name}</Text>
      <Text style={s.authority}>{line.authority}</Text>
      {line.arithmetic.map((a, i) => (
        <Text key={i} style={[s.working, base.measure]}>
          {a}
        </Text>
      ))}
    </View>
  );
}

/** The receipt for one payment, letter portrait; continues onto more pages only for a long list of fees. */
export function PaymentReceipt({ receipt: r }: { receipt: ReceiptFacts }) {
  const { refunded } = r;
  return (
    <Document title={r.documentInfo.title} author={r.documentInfo.author} creator="Ohmstead" producer="Ohmstead">
      <LetterPage
        title="Payment receipt"
        subtitle={r.subtitle}
        footer={({ pageNumber, totalPages }) => (
          <View style={s.footer}>
            <Text style={s.footerText}>{r.footerText}</Text>
            <Text style={s.footerText}>{`Page ${pageNumber} of ${totalPages}`}</Text>
          </View>
        )}
      >
        <View style={s.top} wrap={false}>
          <View style={s.parties}>
            <View style={s.row}>
              <Field label="Receipt number" value={r.receiptNumber} mono style={s.cell} />
              <Field label="Date paid" value={r.datePaid} style={s.cell} />
            </View>
            <View style={s.row}>
              <Field label="Organization" value={r.organization} style={s.cell} />
              <Field label="Paid by" value={r.paidBy} style={s.cell} />
            </View>
            <Field label={r.projectLabel} value={r.projectLine} />
          </View>
          <View style={s.amountBox}>
            <Text style={base.caps}>Amount paid</Text>
            <Text style={[s.amount, base.measure]}>{r.total}</Text>
            <Text style={s.amountStatus}>{r.status}</Text>
            {refunded ? (
              <>
                <Text style={s.amountNote}>{`Refunded ${refunded.total}`}</Text>
                <Text style={s.amountNote}>Net amount paid</Text>
                <Text style={[s.amountNet, base.measure]}>{refunded.net}</Text>
              </>
            ) : null}
          </View>
        </View>
        <Section title="Fees paid">
          <Table
            columns={[
              { header: "Fee, authority and how it was worked out", width: 5, render: (l: FeeLine) => <FeeCell line={l} /> },
              { header: "Amount", width: 1.2, render: (l: FeeLine) => l.amount, mono: true, align: "right" },
            ]}
            rows={r.lines}
            fontSize={8.5}
          />
          <SumRow label="Total paid" value={r.total} total />
        </Section>
        <Section title="Payment">
          <View style={s.row}>
            <Field label="Method" value={r.method} style={s.cell} />
            <Field label="Paid at" value={r.paidAt} style={s.cell} />
          </View>
          <Field label="Processor reference" value={r.processorReference} mono />
        </Section>
        {refunded ? (
          // Refunds are few: the list and the sums under it stay on one page.
          <View wrap={false}>
            <Section title="Refunds">
              <Table
                columns={[
                  { header: "Date", width: 1.4, render: (line: RefundLine) => line.date },
                  { header: "Reason", width: 3.8, render: (line: RefundLine) => line.reason },
                  { header: "Amount", width: 1.2, render: (line: RefundLine) => line.amount, mono: true, align: "right" },
                ]}
                rows={r.refunds}
                fontSize={8.5}
              />
              <SumRow label="Total paid" value={r.total} />
              <SumRow label="Refunded" value={refunded.total} />
              <SumRow label="Net amount paid" value={refunded.net} total />
            </Section>
          </View>
        ) : null}
        <Text style={s.note}>
          Amounts in US dollars. Each fee was worked out from the authority's fee schedule on file for the project, as shown under it.
          Refunds go back to the card that paid. Keep this receipt with the project's records.
        </Text>
      </LetterPage>
    </Document>
  );
}
