import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { CheckResult } from "@/lib/engineering";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import { StatusMark } from "../../shared/blocks";
import { PlanSheet } from "../../shared/sheet-page";
import { COLORS, base } from "../../shared/styles";
import type { SheetInfo } from "../../shared/title-block";
import { CALC_COLUMNS as W, CALC_FONT_PT, CALC_TITLE_PT } from "./calculation-columns";

const s = StyleSheet.create({
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
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: COLORS.rule },
  cell: { paddingVertical: 3.5, paddingHorizontal: 4, fontSize: CALC_FONT_PT, lineHeight: 1.25 },
  title: { fontSize: CALC_TITLE_PT, fontWeight: 600 },
  message: { color: COLORS.inkSoft },
  fix: { color: COLORS.copperDark },
  figure: { fontSize: 7.5, textAlign: "right" },
  intro: { fontSize: 7.5, color: COLORS.inkSoft, marginBottom: 6 },
});

const COLUMNS: [keyof typeof W, string][] = [
  ["index", "#"],
  ["check", "Check and finding"],
  ["inputs", "Inputs"],
  ["method", "Method"],
  ["result", "Result"],
  ["limit", "Limit"],
  ["clause", "Code reference"],
  ["status", "Status"],
];

function CheckRow({ check, index, input }: { check: CheckResult; index: number; input: PrintedPacket }) {
  const { inputs, method, result, limit } = input.facts.checks[check.id]!;
  return (
    <View style={s.row} wrap={false}>
      <Text style={[s.cell, { width: W.index }, base.faint]}>{index}</Text>
      <View style={[s.cell, { width: W.check }]}>
        <Text style={s.title}>{check.title}</Text>
        <Text style={s.message}>{check.message}</Text>
        {check.fix ? <Text style={s.fix}>Suggested: {check.fix}</Text> : null}
      </View>
      <View style={[s.cell, { width: W.inputs }]}>
        {inputs.length ? inputs.map((line, i) => <Text key={i}>{line}</Text>) : <Text style={base.faint}>—</Text>}
      </View>
      <Text style={[s.cell, { width: W.method }]}>{method}</Text>
      <Text style={[s.cell, s.figure, base.measure, { width: W.result }]}>{result}</Text>
      <Text style={[s.cell, s.figure, base.measure, { width: W.limit }]}>{limit}</Text>
      <View style={[s.cell, { width: W.clause }]}>
        <Text>{check.clause}</Text>
        <Text style={base.faint}>Edition: NEC {check.edition}</Text>
      </View>
      <View style={[s.cell, { width: W.status }]}>
        <StatusMark status={check.status} />
      </View>
    </View>
  );
}

/** One calculation sheet: its share of the review's checks, numbered across all calculation sheets. */
export function CalculationSheet({
  input,
  sheet,
  checks,
  firstIndex,
}: {
  input: PrintedPacket;
  sheet: SheetInfo;
  checks: CheckResult[];
  firstIndex: number;
}) {
  const j = input.jurisdiction;
  return (
    <PlanSheet
      input={input}
      sheet={sheet}
      subtitle={`Every check of the design review, NEC ${input.review.edition}; record low ${j.recordLowTempC} °C, high design ${j.highDesignTempC} °C`}
    >
      <Text style={s.intro}>
        Result and limit are the review's own figures. “Review” marks a result a plan reviewer should look at; “Fail” marks one that does
        not meet the limit. Code arithmetic only: the AHJ's reading of the code governs.
      </Text>
      <View style={s.head}>
        {COLUMNS.map(([key, header]) => (
          <Text key={key} style={[s.headCell, { width: W[key], textAlign: key === "result" || key === "limit" ? "right" : "left" }]}>
            {header}
          </Text>
        ))}
      </View>
      {checks.map((check, i) => (
        <CheckRow key={check.id} check={check} index={firstIndex + i} input={input} />
      ))}
    </PlanSheet>
  );
}
