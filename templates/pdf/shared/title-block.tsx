import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import { COLORS, base } from "./styles";

/** Which sheet of how many, and what it shows. */
export type SheetInfo = { number: number; total: number; title: string };

export const SHEET_CAUTION =
  "Caution: prepared for permit and utility review only. Build to the NEC edition and local amendments the AHJ enforces, the utility's rules and each maker's instructions. " +
  "PV wiring is live whenever light reaches the modules: work by qualified persons only. This document does not replace licensed professional judgement.";

const s = StyleSheet.create({
  block: { borderTopWidth: 1.2, borderTopColor: COLORS.ink },
  cells: { flexDirection: "row", flexWrap: "wrap" },
  cell: { paddingVertical: 4, paddingHorizontal: 6, borderRightWidth: 0.6, borderRightColor: COLORS.rule },
  compactCell: { width: "33.333%", borderBottomWidth: 0.6, borderBottomColor: COLORS.rule },
  value: { fontSize: 8, marginTop: 1.5 },
  main: { fontSize: 8.5, fontWeight: 600, marginTop: 1.5 },
  sheetCell: { backgroundColor: COLORS.copperLight, borderRightWidth: 0, alignItems: "center", justifyContent: "center" },
  sheetNumber: { fontSize: 20, fontWeight: 700, color: COLORS.copperDark, lineHeight: 1 },
  caution: {
    fontSize: 6.3,
    color: COLORS.inkSoft,
    paddingHorizontal: 6,
    paddingVertical: 3,
    borderTopWidth: 0.6,
    borderTopColor: COLORS.rule,
  },
});

function Cell({ label, flex, compact, children }: { label: string; flex: number; compact: boolean; children: ReactNode }) {
  return (
    <View style={compact ? [s.cell, s.compactCell] : [s.cell, { flex }]}>
      <Text style={base.caps}>{label}</Text>
      {children}
    </View>
  );
}

/** One cell of a title band: a caps label, a bold first line and plain lines (text nodes) under it. */
export type TitleCell = { label: string; flex: number; main: string; lines: ReactNode[] };

/**
 * How the last cell counts: a packet names its sheet ("Sheet 2 of 4"); a flowing document
 * numbers its pages ("Page 2 of 3").
 */
export type TitleCount = { sheet: SheetInfo } | { page: number; total: number };

/** `caution` runs under the cells; leave it out where the page prints the cautions in full. */
type TitleBandProps = { cells: TitleCell[]; count: TitleCount; caution?: string; compact?: boolean };

function CountCell({ count, compact }: { count: TitleCount; compact: boolean }) {
  const [number, words] =
    "sheet" in count
      ? [count.sheet.number, `Sheet ${count.sheet.number} of ${count.sheet.total}`]
      : [count.page, `Page ${count.page} of ${count.total}`];
  return (
    <View style={compact ? [s.cell, s.compactCell, s.sheetCell] : [s.cell, s.sheetCell, { flex: 0.9 }]}>
      <Text style={s.sheetNumber}>{number}</Text>
      <Text style={[s.value, base.strong]}>{words}</Text>
    </View>
  );
}

/** The title band from plain fields: packets fill it from their input, other documents from theirs. */
export function TitleBand({ cells, count, caution, compact = false }: TitleBandProps) {
  return (
    <View style={s.block} wrap={false}>
      <View style={s.cells}>
        {cells.map((cell) => (
          <Cell key={cell.label} label={cell.label} flex={cell.flex} compact={compact}>
            <Text style={s.main}>{cell.main}</Text>
            {cell.lines.map((line, i) => (
              <Text key={i} style={s.value}>
                {line}
              </Text>
            ))}
          </Cell>
        ))}
        <CountCell count={count} compact={compact} />
      </View>
      {caution ? <Text style={s.caution}>{caution}</Text> : null}
    </View>
  );
}

/**
 * Ohmstead's title block: a band across the foot of every sheet. Plan sheets show it as one
 * row; letter pages (compact) as two rows of three cells.
 */
export function TitleBlock({ input, sheet, compact = false }: { input: PrintedPacket; sheet: SheetInfo; compact?: boolean }) {
  const p = input.preparedBy;
  const f = input.facts;
  const person = [p.name, p.licenseNumber ? `License ${p.licenseNumber}` : null].filter(Boolean).join(" · ");
  const cells: TitleCell[] = [
    { label: "Project", flex: 2.3, main: f.projectLabel, lines: [f.siteAddress] },
    {
      label: "Authority having jurisdiction",
      flex: 1.7,
      main: input.jurisdiction.name,
      lines: [`NEC ${input.jurisdiction.necEdition} as adopted`],
    },
    { label: "Prepared by", flex: 2, main: p.organizationName, lines: p.phone ? [person, p.phone] : [person] },
    { label: "Document", flex: 1.6, main: f.documentTitle, lines: [sheet.title] },
    { label: "Revision", flex: 0.9, main: f.revisionLabel, lines: [<>Issued {f.issuedDate}</>] },
  ];
  return <TitleBand cells={cells} count={{ sheet }} caution={SHEET_CAUTION} compact={compact} />;
}
