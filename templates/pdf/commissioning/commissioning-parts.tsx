import { Document, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import type { Style } from "@react-pdf/types";
import type { CompletionSummary, PrintedCommissioning } from "@/lib/documents/commissioning/facts";
import { Field, Notice } from "../shared/blocks";
import { LetterPage } from "../shared/letter-page";
import { StatusBadge } from "../shared/status-glyph";
import { COLORS, STATUS_COLORS } from "../shared/styles";
import { TitleBand, type TitleCell } from "../shared/title-block";

// Pieces the certificate of completion and the commissioning report share: the document
// and page around them, the commissioning result and the cautions.

const s = StyleSheet.create({
  panel: { flexDirection: "row", borderWidth: 1.2, borderLeftWidth: 5, padding: 8, marginBottom: 10 },
  panelMark: { width: 86, paddingRight: 8 },
  panelBody: { flex: 1 },
  panelSentence: { fontSize: 9.5, fontWeight: 600, marginBottom: 2 },
  listLine: { fontSize: 8, lineHeight: 1.35, color: COLORS.inkSoft, marginTop: 1.5 },
  listLabel: { fontWeight: 600, color: COLORS.ink },
  cautionColumns: { flexDirection: "row" },
  cautionColumn: { flex: 1, marginRight: 12 },
  cautionItem: { flexDirection: "row", marginBottom: 3 },
  cautionMark: { width: 12 },
  cautionText: { flex: 1, lineHeight: 1.35 },
});

function bandCells(input: PrintedCommissioning, documentLine: string): TitleCell[] {
  const org = input.organization;
  const person = [input.installer?.name, org.licenseNumber ? `License ${org.licenseNumber}` : null].filter(Boolean).join(" · ");
  return [
    { label: "Project", flex: 2.3, main: input.facts.projectLabel, lines: [input.project.address] },
    {
      label: "Authority having jurisdiction",
      flex: 1.7,
      main: input.project.jurisdictionName ?? "Not set",
      lines: [`NEC ${input.record.edition} as adopted`],
    },
    { label: "Installer", flex: 2, main: org.name, lines: [person, org.phone].filter((l): l is string => Boolean(l)) },
    { label: "Document", flex: 1.6, main: input.facts.title, lines: [documentLine] },
    {
      label: "Commissioning",
      flex: 0.9,
      main: input.completion.complete ? "Complete" : "Open",
      lines: [`Printed ${input.facts.printedDate}`],
    },
  ];
}

/** The PDF document with its metadata, and one flowing letter page with the title band at its foot. */
export function CommissioningDocument({
  input,
  subtitle,
  documentLine,
  bandCaution = true,
  children,
}: {
  input: PrintedCommissioning;
  subtitle: string;
  documentLine: string;
  /** Repeat the short caution in the band (a one-page document that prints the cautions in full can leave it out). */
  bandCaution?: boolean;
  children: ReactNode;
}) {
  const { title } = input.facts;
  return (
    <Document title={`${title}, ${input.facts.projectLabel}`} author={input.organization.name} creator="Ohmstead" producer="Ohmstead">
      <LetterPage
        title={title}
        subtitle={subtitle}
        footer={({ pageNumber, totalPages }) => (
          <TitleBand
            cells={bandCells(input, documentLine)}
            count={{ page: pageNumber, total: totalPages }}
            caution={bandCaution ? input.facts.bandCaution : undefined}
            compact
          />
        )}
      >
        {children}
      </LetterPage>
    </Document>
  );
}

function TitleList({ label, titles }: { label: string; titles: string[] }) {
  if (titles.length === 0) return null;
  return (
    <Text style={s.listLine}>
      <Text style={s.listLabel}>{`${label}: `}</Text>
      {titles.join("; ")}.
    </Text>
  );
}

/** The commissioning result: a mark and word, one sentence, and the readings holding it open. */
export function CompletionPanel({
  input,
  summary = input.facts.summary,
  details,
  footnote,
  listReview = true,
}: {
  input: PrintedCommissioning;
  summary?: CompletionSummary;
  details?: ReactNode;
  footnote?: string;
  /** List the readings to review (the report does; the certificate leaves them to the report). */
  listReview?: boolean;
}) {
  const color = STATUS_COLORS[summary.status];
  return (
    <View style={[s.panel, { borderColor: color }]} wrap={false}>
      <View style={s.panelMark}>
        <StatusBadge status={summary.status} fontSize={10} label={summary.word} />
      </View>
      <View style={s.panelBody}>
        <Text style={s.panelSentence}>{summary.sentence}</Text>
        <TitleList label="Failing" titles={summary.failing} />
        <TitleList label="Not recorded yet" titles={summary.notRecorded} />
        <TitleList label="Waiting" titles={summary.waiting} />
        {listReview ? <TitleList label="To review" titles={summary.toReview} /> : null}
        {details}
        {footnote ? <Text style={[s.listLine, { marginTop: 4 }]}>{footnote}</Text> : null}
      </View>
    </View>
  );
}

/** The cautions in full, boxed; `columns` 2 sets them side by side to save height. */
export function CautionNotice({
  cautions,
  fontSize = 8,
  columns = 1,
}: {
  cautions: readonly string[];
  fontSize?: number;
  columns?: 1 | 2;
}) {
  const items = cautions.map((text, i) => ({ text, n: i + 1 }));
  const per = Math.ceil(items.length / columns);
  const groups = Array.from({ length: columns }, (_, c) => items.slice(c * per, (c + 1) * per));
  return (
    <Notice title="Cautions">
      <View style={s.cautionColumns}>
        {groups.map((group, c) => (
          <View key={c} style={[s.cautionColumn, c === groups.length - 1 ? { marginRight: 0 } : {}]}>
            {group.map(({ text, n }) => (
              <View key={n} style={s.cautionItem} wrap={false}>
                <Text style={[s.cautionMark, { fontSize }]}>{n}.</Text>
                <Text style={[s.cautionText, { fontSize }]}>{text}</Text>
              </View>
            ))}
          </View>
        ))}
      </View>
    </Notice>
  );
}

/** The equipment line both documents print: modules, inverters and the rapid shutdown equipment. */
export function EquipmentRow({
  system,
  rowStyle,
  cellStyle,
}: {
  system: PrintedCommissioning["system"];
  rowStyle: Style;
  cellStyle: Style;
}) {
  return (
    <View style={rowStyle}>
      <Field label="Modules" value={system.moduleSummary} style={cellStyle} />
      <Field label="Inverters" value={system.inverterSummary} style={cellStyle} />
      <Field label="Rapid shutdown equipment" value={system.shutdownSummary ?? "None listed separately"} style={cellStyle} />
    </View>
  );
}
