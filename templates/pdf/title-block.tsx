import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import { PACKET_TITLES, type PacketInput } from "@/lib/packets/packet-input";
import { packetDate, projectLabel, revisionLabel, siteAddress } from "@/lib/packets/pdf-facts";
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
  caution: { fontSize: 6.3, color: COLORS.inkSoft, paddingHorizontal: 6, paddingVertical: 3, borderTopWidth: 0.6, borderTopColor: COLORS.rule },
});

function Cell({ label, flex, compact, children }: { label: string; flex: number; compact: boolean; children: ReactNode }) {
  return (
    <View style={compact ? [s.cell, s.compactCell] : [s.cell, { flex }]}>
      <Text style={base.caps}>{label}</Text>
      {children}
    </View>
  );
}

/**
 * Ohmstead's title block: a band across the foot of every sheet. Plan sheets show it as one
 * row; letter pages (compact) as two rows of three cells.
 */
export function TitleBlock({ input, sheet, compact = false }: { input: PacketInput; sheet: SheetInfo; compact?: boolean }) {
  const p = input.preparedBy;
  const person = [p.name, p.licenseNumber ? `License ${p.licenseNumber}` : null].filter(Boolean).join(" · ");
  return (
    <View style={s.block} wrap={false}>
      <View style={s.cells}>
        <Cell label="Project" flex={2.3} compact={compact}>
          <Text style={s.main}>{projectLabel(input)}</Text>
          <Text style={s.value}>{siteAddress(input)}</Text>
        </Cell>
        <Cell label="Authority having jurisdiction" flex={1.7} compact={compact}>
          <Text style={s.main}>{input.jurisdiction.name}</Text>
          <Text style={s.value}>NEC {input.jurisdiction.necEdition} as adopted</Text>
        </Cell>
        <Cell label="Prepared by" flex={2} compact={compact}>
          <Text style={s.main}>{p.organizationName}</Text>
          <Text style={s.value}>{person}</Text>
          {p.phone ? <Text style={s.value}>{p.phone}</Text> : null}
        </Cell>
        <Cell label="Document" flex={1.6} compact={compact}>
          <Text style={s.main}>{PACKET_TITLES[input.kind]}</Text>
          <Text style={s.value}>{sheet.title}</Text>
        </Cell>
        <Cell label="Revision" flex={0.9} compact={compact}>
          <Text style={s.main}>{revisionLabel(input.revision)}</Text>
          <Text style={s.value}>Issued {packetDate(input.generatedAt)}</Text>
        </Cell>
        <View style={compact ? [s.cell, s.compactCell, s.sheetCell] : [s.cell, s.sheetCell, { flex: 0.9 }]}>
          <Text style={s.sheetNumber}>{sheet.number}</Text>
          <Text style={[s.value, base.strong]}>{`Sheet ${sheet.number} of ${sheet.total}`}</Text>
        </View>
      </View>
      <Text style={s.caution}>{SHEET_CAUTION}</Text>
    </View>
  );
}
