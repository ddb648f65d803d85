import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ConductorRow, EquipmentRow, RatingLine } from "@/lib/documents/packets/facts";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import type { BatteryCircuitRow } from "@/lib/documents/packets/storage-facts";
import { NameValueTable, Section, StatusMark, Table } from "../../shared/blocks";
import { PlanSheet } from "../../shared/sheet-page";
import { base } from "../../shared/styles";
import type { SheetInfo } from "../../shared/title-block";

const s = StyleSheet.create({
  columns: { flexDirection: "row" },
  left: { width: 300, paddingRight: 20 },
  right: { flex: 1 },
  review: { flexDirection: "row", alignItems: "center", marginTop: 4 },
});

/** Ratings, site conditions, the equipment schedule with listings, and the conductor schedule. */
export function SystemSummarySheet({ input, sheet }: { input: PrintedPacket; sheet: SheetInfo }) {
  const { summary } = input.review;
  const j = input.jurisdiction;
  const conditions: RatingLine[] = [
    { name: "Record low temperature", value: `${j.recordLowTempC} °C` },
    { name: "High design temperature", value: `${j.highDesignTempC} °C` },
    { name: "Mounting", value: input.designInput.array.mount === "ground" ? "Ground" : "Roof" },
    { name: "Building", value: input.site.isDwelling ? "One- or two-family dwelling" : "Other building" },
    { name: "Code edition of the review", value: `NEC ${input.review.edition}` },
  ];
  const valueTable = (rows: RatingLine[]) => <NameValueTable rows={rows} />;
  return (
    <PlanSheet input={input} sheet={sheet} subtitle="Figures from the design review of this revision">
      <View style={s.columns}>
        <View style={s.left}>
          <Section title="System ratings">{valueTable(input.facts.ratingLines)}</Section>
          <Section title="Site conditions">{valueTable(conditions)}</Section>
          <Section title="Design review">
            <Text style={base.paragraph}>
              {summary.pass} checks pass, {summary.warn} need review, {summary.fail} fail. Every check is listed on the calculation sheets.
            </Text>
            <View style={s.review}>
              <Text style={[base.soft, { marginRight: 6 }]}>Overall result:</Text>
              <StatusMark status={summary.status} />
            </View>
          </Section>
        </View>
        <View style={s.right}>
          <Section title="Equipment schedule">
            <Table
              columns={[
                { header: "Item", width: 1.3, render: (r: EquipmentRow) => r.item },
                { header: "Qty", width: 0.5, render: (r: EquipmentRow) => String(r.quantity), mono: true, align: "right" },
                { header: "Maker", width: 1.2, render: (r: EquipmentRow) => r.maker },
                { header: "Model", width: 1.6, render: (r: EquipmentRow) => r.model },
                { header: "Rating", width: 2.4, render: (r: EquipmentRow) => r.rating },
                { header: "Listing and certification", width: 2.6, render: (r: EquipmentRow) => r.listing },
              ]}
              rows={input.facts.equipmentSchedule}
              fontSize={8}
            />
          </Section>
          <Section title="Conductor schedule">
            <Table
              columns={[
                { header: "No.", width: 0.35, render: (r: ConductorRow) => r.number, mono: true, align: "right" },
                { header: "Run", width: 2, render: (r: ConductorRow) => r.label },
                { header: "Carries", width: 1.4, render: (r: ConductorRow) => r.carries },
                { header: "Conductors", width: 2.6, render: (r: ConductorRow) => r.conductors },
                { header: "Raceway", width: 1.5, render: (r: ConductorRow) => r.raceway },
                { header: "EGC", width: 1.1, render: (r: ConductorRow) => r.egc },
                { header: "Length", width: 0.8, render: (r: ConductorRow) => r.lengthFt, mono: true, align: "right" },
                { header: "Protection", width: 1, render: (r: ConductorRow) => r.ocpd },
              ]}
              rows={input.facts.conductorSchedule}
              fontSize={8}
            />
          </Section>
          {input.facts.storage ? (
            <View style={s.columns}>
              <View style={[s.left, { width: 330 }]}>
                <Section title="Energy storage">{valueTable(input.facts.storage.summaryLines)}</Section>
              </View>
              <View style={s.right}>
                <Section title="Battery circuits">
                  <Table
                    columns={[
                      { header: "No.", width: 0.4, render: (r: BatteryCircuitRow) => r.tag, mono: true },
                      { header: "Circuit", width: 2, render: (r: BatteryCircuitRow) => r.label },
                      { header: "Conductors", width: 2, render: (r: BatteryCircuitRow) => r.conductors },
                      { header: "Protection", width: 0.9, render: (r: BatteryCircuitRow) => r.ocpd },
                    ]}
                    rows={input.facts.storage.circuits}
                    fontSize={8}
                  />
                </Section>
              </View>
            </View>
          ) : null}
        </View>
      </View>
    </PlanSheet>
  );
}
