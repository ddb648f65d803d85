import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import { Field, Notice, NumberedList, Section, Table } from "../../shared/blocks";
import { PlanSheet } from "../../shared/sheet-page";
import { COLORS, base } from "../../shared/styles";
import type { SheetInfo } from "../../shared/title-block";

const s = StyleSheet.create({
  columns: { flexDirection: "row", flexGrow: 1 },
  column: { flex: 1, paddingRight: 18 },
  lastColumn: { flex: 0.9 },
  pair: { flexDirection: "row" },
  half: { flex: 1, marginRight: 10 },
  scope: { fontSize: 10, marginBottom: 5, lineHeight: 1.4 },
  stamp: { height: 120, borderWidth: 0.8, borderColor: COLORS.rule, borderStyle: "dashed", padding: 6, marginTop: 4 },
});

function overrideLead(failCount: number, byName: string): string {
  const state =
    failCount > 0
      ? `The design review had ${failCount} failing ${failCount === 1 ? "check" : "checks"} when this packet was generated.`
      : "This packet was generated under an override of the design review.";
  return `${state} ${byName} chose to issue it anyway, for this reason:`;
}

/** Sheet 1 of the permit packet: project data, scope of work, notes, sheet index and revision. */
export function CoverSheet({ input, sheet, sheets }: { input: PrintedPacket; sheet: SheetInfo; sheets: SheetInfo[] }) {
  const p = input.project;
  const j = input.jurisdiction;
  return (
    <PlanSheet input={input} sheet={sheet} subtitle={`Grid-tied photovoltaic system · ${input.facts.siteAddress}`}>
      <View style={s.columns}>
        <View style={s.column}>
          <Section title="Project data">
            <View style={s.pair}>
              <Field label="Customer" value={p.customerName} style={s.half} />
              <Field label="Project number" value={String(p.number)} style={s.half} />
            </View>
            <Field label="Site address" value={input.facts.siteAddress} />
            <Field label="Authority having jurisdiction" value={`${j.name} (${j.state})`} />
            <View style={s.pair}>
              <Field label="Code basis" value={`NEC ${j.necEdition}, with local amendments`} style={s.half} />
              <Field
                label="Design temperatures"
                value={`Record low ${j.recordLowTempC} °C · high ${j.highDesignTempC} °C`}
                style={s.half}
              />
            </View>
            <Field label="Serving utility" value={input.utility?.name ?? "Not set"} />
            <Field
              label="Prepared by"
              value={[
                input.preparedBy.organizationName,
                input.preparedBy.name,
                input.preparedBy.licenseNumber ? `License ${input.preparedBy.licenseNumber}` : null,
              ]
                .filter(Boolean)
                .join(" · ")}
            />
          </Section>
          <Section title="Scope of work">
            {input.facts.scopeOfWork.map((line, i) => (
              <Text key={i} style={s.scope}>
                {line}
              </Text>
            ))}
          </Section>
        </View>
        <View style={s.column}>
          <Section title="General notes">
            <NumberedList items={input.facts.generalNotes} fontSize={9.5} />
          </Section>
        </View>
        <View style={s.lastColumn}>
          {input.override ? (
            <Notice title="Generated with failing checks" tone="override">
              <Text style={base.paragraph}>{overrideLead(input.review.summary.fail, input.override.byName)}</Text>
              <Text style={[base.paragraph, base.strong]}>“{input.override.reason}”</Text>
            </Notice>
          ) : null}
          <Section title="Sheet index">
            <Table
              columns={[
                { header: "Sheet", width: 1, render: (r: SheetInfo) => String(r.number) },
                { header: "Contents", width: 6, render: (r: SheetInfo) => r.title },
              ]}
              rows={sheets}
              fontSize={9}
            />
            {input.datasheets.length > 0 ? (
              <View style={{ marginTop: 6 }}>
                <Text style={base.caps}>Appended after the last sheet</Text>
                {input.datasheets.map((d, i) => (
                  <Text key={i} style={{ fontSize: 8.5, marginTop: 2 }}>
                    Data sheet: {d.title}
                  </Text>
                ))}
              </View>
            ) : null}
          </Section>
          <Section title={`Revision ${input.revision}`}>
            {input.revision > 1 && input.changes.length > 0 ? (
              <>
                <Text style={[base.paragraph, base.soft]}>Changes since Rev {input.revision - 1}:</Text>
                <NumberedList items={input.changes} fontSize={9} />
              </>
            ) : (
              <Text style={base.soft}>{input.revision > 1 ? `No changes recorded since Rev ${input.revision - 1}.` : "First issue."}</Text>
            )}
          </Section>
          <Text style={base.caps}>Reviewer's stamp</Text>
          <View style={s.stamp} />
        </View>
      </View>
    </PlanSheet>
  );
}
