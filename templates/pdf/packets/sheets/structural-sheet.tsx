import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { PrintedPacket, PrintedStructuralRow as StructuralRow } from "@/lib/documents/packets/printed";
import { Notice, Section, StatusMark, Table } from "../../shared/blocks";
import { PlanSheet } from "../../shared/sheet-page";
import { COLORS, base } from "../../shared/styles";
import type { SheetInfo } from "../../shared/title-block";

const s = StyleSheet.create({
  blank: { borderBottomWidth: 0.8, borderBottomColor: COLORS.ink, height: 12, marginRight: 6 },
  columns: { flexDirection: "row" },
  left: { flex: 1.4, paddingRight: 20 },
  right: { flex: 1 },
  spacingRow: { flexDirection: "row", alignItems: "flex-end", marginBottom: 10 },
  spacingLabel: { width: 140, fontSize: 8.5 },
});

/** Per roof plane: modules, tilt, azimuth, dead load and load per attachment, with room for the spacing. */
export function StructuralSheet({ input, sheet }: { input: PrintedPacket; sheet: SheetInfo }) {
  const { rows, moduleWeight, moduleLength, moduleWidth, expeditedDeadLoadPsf } = input.facts.structural;
  const m = input.equipment.module;
  return (
    <PlanSheet input={input} sheet={sheet} subtitle="Dead load of the array on each roof plane">
      <Notice title="Structural adequacy is not assessed here">
        <Text style={base.paragraph}>
          These figures are the array's own dead load, worked from the makers' weights. Whether the roof framing, the attachments and their
          fastening can carry it together with snow, wind and seismic loads is for a qualified person (a licensed engineer where required)
          and the AHJ to decide. Follow the racking maker's span and attachment tables.
        </Text>
      </Notice>
      <Section title="Roof planes">
        <Table
          columns={[
            { header: "Plane", width: 1.6, render: (r: StructuralRow) => r.label },
            { header: "Modules", width: 0.8, render: (r: StructuralRow) => String(r.moduleCount), mono: true, align: "right" },
            { header: "Tilt", width: 0.7, render: (r: StructuralRow) => r.tilt, mono: true, align: "right" },
            { header: "Azimuth", width: 0.8, render: (r: StructuralRow) => r.azimuth, mono: true, align: "right" },
            { header: "Array area", width: 1, render: (r: StructuralRow) => r.areaFt2, mono: true, align: "right" },
            { header: "Array weight", width: 1, render: (r: StructuralRow) => r.weightLb, mono: true, align: "right" },
            { header: "Dead load", width: 1.1, render: (r: StructuralRow) => r.deadLoad, mono: true, align: "right" },
            { header: "Attachments", width: 0.9, render: (r: StructuralRow) => String(r.attachmentCount), mono: true, align: "right" },
            { header: "Load per attachment", width: 1.2, render: (r: StructuralRow) => r.perAttachment, mono: true, align: "right" },
            { header: "Attachment spacing (in)", width: 1.5, render: () => <View style={s.blank} /> },
            { header: "Result", width: 0.7, render: (r: StructuralRow) => <StatusMark status={r.status} /> },
          ]}
          rows={rows}
          fontSize={8.5}
        />
      </Section>
      <View style={s.columns}>
        <View style={s.left}>
          <Section title="Basis">
            <Text style={base.paragraph}>
              Module: {m.maker} {m.model}, {moduleWeight} lb, {moduleLength} × {moduleWidth} in. Array weight = modules × module weight +
              the racking weight entered for the plane. Dead load = array weight / array area. Load per attachment = array weight /
              attachments on the plane.
            </Text>
            <Text style={base.paragraph}>
              Many AHJs accept arrays up to about {expeditedDeadLoadPsf} lb/ft² without a structural letter; above that, or where the AHJ
              asks, expect an engineer's review. Ask the AHJ what it accepts.
            </Text>
          </Section>
        </View>
        <View style={s.right}>
          <Section title="Attachment spacing, entered by the installer">
            {rows.map((r, i) => (
              <View key={i} style={s.spacingRow} wrap={false}>
                <Text style={s.spacingLabel}>{r.label}: at most</Text>
                <View style={[s.blank, { width: 60 }]} />
                <Text style={{ fontSize: 8.5 }}>in on center, rafters/trusses at</Text>
                <View style={[s.blank, { width: 50, marginLeft: 6 }]} />
                <Text style={{ fontSize: 8.5 }}>in</Text>
              </View>
            ))}
          </Section>
        </View>
      </View>
    </PlanSheet>
  );
}
