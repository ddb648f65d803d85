import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { BatteryDataRow } from "@/lib/documents/packets/storage-facts";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import type { RatingLine } from "@/lib/documents/packets/facts";
import { NameValueTable, Notice, Section } from "../../shared/blocks";
import { PlanSheet } from "../../shared/sheet-page";
import type { SheetInfo } from "../../shared/title-block";

const s = StyleSheet.create({
  columns: { flexDirection: "row", flexWrap: "wrap", marginRight: -18 },
  column: { width: "33.333%", paddingRight: 18 },
  note: { fontSize: 8, lineHeight: 1.35 },
});

const valueTable = (rows: (BatteryDataRow | RatingLine)[]) => <NameValueTable rows={rows} valueWidth={3.5} />;

/** The batteries' and the storage converter's data as the design carries them, with the storage in brief. */
export function StorageDataSheet({ input, sheet }: { input: PrintedPacket; sheet: SheetInfo }) {
  const storage = input.facts.storage;
  if (!storage) return null;
  return (
    <PlanSheet input={input} sheet={sheet} subtitle="Energy storage equipment data, from the maker's figures in the design">
      <View style={s.columns}>
        <View style={s.column}>
          <Section title="Energy storage in brief">{valueTable(storage.summaryLines)}</Section>
        </View>
        {storage.dataSheets.map((d) => (
          <View key={d.title} style={s.column} wrap={false}>
            <Section title={d.title}>{valueTable(d.rows)}</Section>
          </View>
        ))}
      </View>
      <Notice title="Stored energy">
        <Text style={s.note}>
          A battery stays energized when the array and the grid are off, and its disconnect leaves the battery itself charged. Install,
          commission and service it as the manufacturer's instructions and NEC Article 706 require, by qualified persons under local codes
          and licensed practice. The maker's full data sheets and the UL 9540 listing are attached where the catalog holds them.
        </Text>
      </Notice>
    </PlanSheet>
  );
}
