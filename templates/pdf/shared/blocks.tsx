import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import type { CheckStatus } from "@/lib/engineering";
import { COLORS, STATUS_COLORS, STATUS_WORDS, base, type PdfStyle as Style } from "./styles";

// Building blocks shared by the sheets: sections, labelled fields, boxed notices and tables.

const s = StyleSheet.create({
  section: { marginBottom: 10 },
  field: { marginBottom: 6, paddingBottom: 2, borderBottomWidth: 0.6, borderBottomColor: COLORS.rule },
  fieldValue: { fontSize: 9.5, marginTop: 1.5 },
  notice: { borderWidth: 1.5, padding: 7, marginBottom: 10 },
  noticeTitle: { fontSize: 9, fontWeight: 700, marginBottom: 3, textTransform: "uppercase", letterSpacing: 0.5 },
  headRow: { flexDirection: "row", backgroundColor: COLORS.paperTint, borderTopWidth: 1, borderBottomWidth: 1, borderColor: COLORS.ink },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: COLORS.rule },
  cell: { paddingVertical: 3, paddingHorizontal: 4 },
  headCell: { fontSize: 6.8, fontWeight: 600, textTransform: "uppercase", letterSpacing: 0.4, color: COLORS.inkSoft },
  status: { fontSize: 7, fontWeight: 700, textTransform: "uppercase", letterSpacing: 0.4 },
  listItem: { flexDirection: "row", marginBottom: 3 },
  listMark: { width: 14 },
  listText: { flex: 1, fontSize: 8.5, lineHeight: 1.35 },
});

export function Section({ title, children, style }: { title: string; children: ReactNode; style?: Style }) {
  return (
    <View style={style ? [s.section, style] : s.section}>
      <Text style={base.sectionTitle}>{title}</Text>
      {children}
    </View>
  );
}

/** A labelled value, as a filled-in form field. */
export function Field({ label, value, mono = false, style }: { label: string; value: string; mono?: boolean; style?: Style }) {
  return (
    <View style={style ? [s.field, style] : s.field} wrap={false}>
      <Text style={base.caps}>{label}</Text>
      <Text style={mono ? [s.fieldValue, base.measure] : s.fieldValue}>{value}</Text>
    </View>
  );
}

/** A boxed notice: copper for information, the fail colour only for a review override. */
export function Notice({ title, tone = "info", children }: { title: string; tone?: "info" | "override"; children: ReactNode }) {
  const color = tone === "override" ? COLORS.fail : COLORS.copper;
  return (
    <View style={[s.notice, { borderColor: color }]} wrap={false}>
      <Text style={[s.noticeTitle, { color }]}>{title}</Text>
      {children}
    </View>
  );
}

export function NumberedList({ items, fontSize = 8.5 }: { items: string[]; fontSize?: number }) {
  return (
    <View>
      {items.map((item, i) => (
        <View key={i} style={s.listItem} wrap={false}>
          <Text style={[s.listMark, { fontSize }]}>{i + 1}.</Text>
          <Text style={[s.listText, { fontSize }]}>{item}</Text>
        </View>
      ))}
    </View>
  );
}

export function StatusMark({ status }: { status: CheckStatus }) {
  return <Text style={[s.status, { color: STATUS_COLORS[status] }]}>{STATUS_WORDS[status]}</Text>;
}

export type Column<Row> = { header: string; width: number; render: (row: Row) => ReactNode; mono?: boolean; align?: "left" | "right" };

/** A ruled table; column widths are flex weights. Rows never split across a page. */
export function Table<Row>({ columns, rows, fontSize = 7.5 }: { columns: Column<Row>[]; rows: Row[]; fontSize?: number }) {
  const cell = (c: Column<Row>): Style[] => [s.cell, { flex: c.width, textAlign: c.align ?? "left" }];
  return (
    <View>
      <View style={s.headRow} wrap={false}>
        {columns.map((c) => (
          <Text key={c.header} style={[...cell(c), s.headCell]}>
            {c.header}
          </Text>
        ))}
      </View>
      {rows.map((row, i) => (
        <View key={i} style={s.row} wrap={false}>
          {columns.map((c) => {
            const content = c.render(row);
            return typeof content === "string" || typeof content === "number" ? (
              <Text key={c.header} style={[...cell(c), { fontSize }, ...(c.mono ? [base.measure] : [])]}>
                {content}
              </Text>
            ) : (
              <View key={c.header} style={cell(c)}>
                {content}
              </View>
            );
          })}
        </View>
      ))}
    </View>
  );
}

type NameValue = { name: string; value: string };

/** Two columns, an item's name and its value (measured, in the monospace face). */
export function NameValueTable({ rows, valueWidth = 2.4 }: { rows: NameValue[]; valueWidth?: number }) {
  return (
    <Table
      columns={[
        { header: "Item", width: 3, render: (r: NameValue) => r.name },
        { header: "Value", width: valueWidth, render: (r: NameValue) => r.value, mono: true },
      ]}
      rows={rows}
      fontSize={8}
    />
  );
}
