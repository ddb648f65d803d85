import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { PrintedCommissioning, ReadingRow } from "@/lib/documents/commissioning/facts";
import { Field, Section } from "../shared/blocks";
import { CautionNotice, CommissioningDocument, CompletionPanel, EquipmentRow } from "./commissioning-parts";
import { StatusBadge } from "../shared/status-glyph";
import { COLORS, base } from "../shared/styles";

// The commissioning report: the installer's readings at start-up, each beside what was
// expected, the result and its basis, with the project and system it belongs to.

const s = StyleSheet.create({
  row: { flexDirection: "row", marginHorizontal: -5 },
  cell: { flex: 1, marginHorizontal: 5 },
  wide: { flex: 2, marginHorizontal: 5 },
  narrow: { flex: 0.6, marginHorizontal: 5 },
  // The gap after the table sits outside it: a margin of the table's own would carry its repeated head onto a page with no rows.
  afterTable: { height: 12 },
  intro: { fontSize: 8.5, lineHeight: 1.35, marginBottom: 8 },
  legend: { fontSize: 7.5, lineHeight: 1.3, color: COLORS.inkSoft, marginBottom: 5 },
  head: { flexDirection: "row", backgroundColor: COLORS.paperTint, borderTopWidth: 1, borderBottomWidth: 1, borderColor: COLORS.ink },
  headCell: {
    paddingVertical: 3,
    paddingHorizontal: 4,
    fontSize: 6.8,
    fontWeight: 600,
    textTransform: "uppercase",
    letterSpacing: 0.4,
    color: COLORS.inkSoft,
  },
  tableRow: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: COLORS.rule },
  cellPad: { paddingVertical: 3.5, paddingHorizontal: 4, fontSize: 7.5, lineHeight: 1.3 },
  title: { fontSize: 7.8, fontWeight: 600 },
  finding: { color: COLORS.inkSoft, marginTop: 1 },
  fix: { color: COLORS.copperDark, marginTop: 1 },
  figure: { fontSize: 7.5 },
});

// Column widths in points; the letter page gives 540.
const W = { index: 18, check: 208, reading: 78, expected: 92, result: 56, basis: 88 } as const;
const COLUMNS: [keyof typeof W, string][] = [
  ["index", "#"],
  ["check", "What was checked, and the finding"],
  ["reading", "Reading"],
  ["expected", "Expected"],
  ["result", "Result"],
  ["basis", "Basis"],
];

function TableHead() {
  return (
    <View style={s.head} wrap={false}>
      {COLUMNS.map(([key, header]) => (
        <Text key={key} style={[s.headCell, { width: W[key] }]}>
          {header}
        </Text>
      ))}
    </View>
  );
}

function ReadingLine({ row, index }: { row: ReadingRow; index: number }) {
  const { check } = row;
  const unread = check.reading !== "recorded";
  return (
    <View style={s.tableRow} wrap={false}>
      <Text style={[s.cellPad, base.faint, { width: W.index }]}>{index}</Text>
      <View style={[s.cellPad, { width: W.check }]}>
        <Text style={s.title}>{check.title}</Text>
        {row.finding ? <Text style={s.finding}>{row.finding}</Text> : null}
        {row.fix ? <Text style={s.fix}>To do: {row.fix}</Text> : null}
      </View>
      <Text style={[s.cellPad, s.figure, unread ? base.faint : check.kind === "grid-profile" ? {} : base.measure, { width: W.reading }]}>
        {row.reading}
      </Text>
      <Text style={[s.cellPad, { width: W.expected }]}>{row.expected}</Text>
      <View style={[s.cellPad, { width: W.result }]}>
        <StatusBadge status={check.status} fontSize={7} />
      </View>
      <View style={[s.cellPad, { width: W.basis }]}>
        <Text>{check.clause}</Text>
      </View>
    </View>
  );
}

/** The commissioning report, letter portrait, as many pages as the readings need. */
export function CommissioningReport({ input }: { input: PrintedCommissioning }) {
  const p = input.project;
  const sys = input.system;
  const { ratings, rows } = input.facts;
  const account = [p.utilityAccountNumber, p.meterNumber ? `meter ${p.meterNumber}` : null].filter(Boolean).join(" · ");
  return (
    <CommissioningDocument input={input} subtitle={`Grid-tied PV system · Project ${p.number}`} documentLine="Readings and results">
      <Text style={s.intro}>
        The installer's readings at start-up, each beside what the approved design, the NEC {input.record.edition} and the utility's
        requirements lead one to expect. A reading not yet taken can be added later; the record is complete only when every reading is in,
        none fails and none is still waiting.
      </Text>
      <Section title="1  Project and system">
        <View style={s.row}>
          <Field label="Project number" value={String(p.number)} mono style={s.narrow} />
          <Field label="Customer" value={p.customerName} style={s.cell} />
          <Field label="Site address" value={p.address} style={s.wide} />
        </View>
        <View style={s.row}>
          <Field label="Authority having jurisdiction" value={p.jurisdictionName ?? "Not set"} style={s.cell} />
          <Field label="Utility" value={p.utilityName ?? "Not set"} style={s.cell} />
          <Field label="Utility account and meter" value={account || "Not entered"} mono style={s.cell} />
        </View>
        <View style={s.row}>
          <Field label="DC rating (STC)" value={ratings.dc} mono style={s.cell} />
          <Field label="AC rating" value={ratings.ac} mono style={s.cell} />
          <Field label="Service" value={`${input.record.nominalServiceV} V nominal`} mono style={s.cell} />
        </View>
        <EquipmentRow system={sys} rowStyle={s.row} cellStyle={s.cell} />
      </Section>
      <Section title="2  Commissioning result">
        <CompletionPanel input={input} />
        <View style={s.row}>
          <Field
            label="Readings by"
            value={input.installer ? `${input.installer.name} (${input.installer.email})` : "Not assigned"}
            style={s.wide}
          />
          <Field label="Last recorded" value={input.facts.lastRecorded} style={s.cell} />
          <Field label="Marked complete" value={input.facts.markedComplete} style={s.cell} />
        </View>
      </Section>
      <Text style={base.sectionTitle} minPresenceAhead={90}>
        3 Readings
      </Text>
      <Text style={s.legend}>
        Pass: within what was expected. Review: recorded outside the usual range, not recorded yet, or waiting (devices still being found).
        Fail: must be put right before the record can be completed. Times are local to the organization's time zone; the first power time is
        as entered on site.
      </Text>
      <View>
        <View fixed>
          <TableHead />
        </View>
        {rows.map((row, i) => (
          <ReadingLine key={row.check.id} row={row} index={i + 1} />
        ))}
      </View>
      <View style={s.afterTable} />
      <CautionNotice cautions={input.facts.cautions} />
    </CommissioningDocument>
  );
}
