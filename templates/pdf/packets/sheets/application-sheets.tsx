import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import { Field, Notice, Section, Table } from "../../shared/blocks";
import { FormSheet } from "../../shared/sheet-page";
import { base } from "../../shared/styles";
import type { SheetInfo } from "../../shared/title-block";

const s = StyleSheet.create({
  row: { flexDirection: "row", marginHorizontal: -5 },
  cell: { flex: 1, marginHorizontal: 5 },
  wide: { flex: 2, marginHorizontal: 5 },
  note: { fontSize: 8, lineHeight: 1.35 },
});

type Sheet = { input: PrintedPacket; sheet: SheetInfo };
type InverterLine = PrintedPacket["facts"]["inverterLines"][number];

const notEntered = "Not entered";
const phaseWords = (phase: string) => (phase === "3" ? "Three-phase" : "Single-phase");

/** Page 1: who asks, where, and on which utility account. */
export function ApplicationSheet({ input, sheet }: Sheet) {
  const p = input.project;
  const by = input.preparedBy;
  return (
    <FormSheet input={input} sheet={sheet} subtitle={input.utility ? `To ${input.utility.name}` : undefined}>
      <Text style={[base.paragraph, { fontSize: 8.5 }]}>
        Request to connect an inverter-based photovoltaic system in parallel with the utility's distribution system, prepared from the
        system design of this revision.
      </Text>
      <Section title="1  Customer and service location">
        <View style={s.row}>
          <Field label="Customer (account holder)" value={p.customerName} style={s.wide} />
          <Field label="Phone" value={p.customerPhone ?? notEntered} style={s.cell} />
        </View>
        <View style={s.row}>
          <Field label="Service address" value={input.facts.siteAddress} style={s.wide} />
          <Field label="Email" value={p.customerEmail ?? notEntered} style={s.cell} />
        </View>
        <View style={s.row}>
          <Field label="Utility account number" value={p.utilityAccountNumber ?? notEntered} mono style={s.cell} />
          <Field label="Meter number" value={p.meterNumber ?? notEntered} mono style={s.cell} />
          <Field label="Utility" value={input.utility?.name ?? notEntered} style={s.cell} />
        </View>
      </Section>
      <Section title="2  Installer">
        <View style={s.row}>
          <Field label="Company" value={by.organizationName} style={s.wide} />
          <Field label="Contractor license" value={by.licenseNumber ?? notEntered} style={s.cell} />
        </View>
        <View style={s.row}>
          <Field label="Contact person" value={by.name} style={s.wide} />
          <Field label="Phone" value={by.phone ?? notEntered} style={s.cell} />
        </View>
      </Section>
      <Section title="3  Request in brief">
        <View style={s.row}>
          <Field label="Generator type" value={input.facts.storage?.brief.generatorType ?? "Photovoltaic, inverter-based"} style={s.cell} />
          <Field label="DC rating (STC)" value={input.facts.ratings.dcKw} mono style={s.cell} />
          <Field label="AC rating" value={input.facts.ratings.acKw} mono style={s.cell} />
        </View>
        <View style={s.row}>
          <Field label="Energy storage" value={input.facts.storage?.brief.storage ?? "None"} style={s.cell} />
          <Field label="Export to the grid" value={input.facts.storage?.brief.export ?? "Yes, net of on-site use"} style={s.cell} />
          <Field label="Project reference" value={`Project ${p.number}, ${input.jurisdiction.name}`} style={s.cell} />
        </View>
      </Section>
      <Text style={[s.note, base.soft]}>
        The generating facility, its certification and its connection are described on the next sheet; the single-line diagram follows.
        Tariff or billing elections are made as the utility's own process provides.
      </Text>
    </FormSheet>
  );
}

/** Page 2: equipment, ratings, certification with the required grid profile, connection, storage and export. */
export function FacilitySheet({ input, sheet, singleLineSheet }: Sheet & { singleLineSheet: number }) {
  const s2 = input.designInput.service;
  const m = input.equipment.module;
  const { ratings } = input.review.summary;
  const inverterPhase = input.equipment.inverters[0]?.item.specs.phase === 3 ? "3" : "1";
  return (
    <FormSheet input={input} sheet={sheet}>
      <Section title="4  Inverters">
        <Table
          columns={[
            { header: "Qty", width: 0.5, render: (l: InverterLine) => l.quantity, mono: true, align: "right" },
            { header: "Maker and model", width: 2.2, render: (l: InverterLine) => l.makerModel },
            { header: "Rated output", width: 1.8, render: (l: InverterLine) => l.ratedOutput },
            { header: "Certification", width: 2.6, render: (l: InverterLine) => l.certification },
          ]}
          rows={input.facts.inverterLines}
          fontSize={8}
        />
      </Section>
      <Section title="5  PV array">
        <View style={s.row}>
          <Field label="Module maker and model" value={`${m.maker} ${m.model}`} style={s.wide} />
          <Field label="Module count" value={String(ratings.moduleCount)} mono style={s.cell} />
          <Field label="Module rating" value={`${m.specs.powerW} W (STC)`} mono style={s.cell} />
        </View>
        {input.equipment.device ? (
          <Field
            label="Module-level device"
            value={`${input.equipment.device.maker} ${input.equipment.device.model} (${input.equipment.device.listing || "listing not entered"})`}
          />
        ) : null}
      </Section>
      <Section title="6  Ratings">
        <View style={s.row}>
          <Field label="DC rating (STC)" value={input.facts.ratings.dcKw} mono style={s.cell} />
          <Field label="AC rating" value={input.facts.ratings.acKw} mono style={s.cell} />
          <Field label="AC output current" value={input.facts.ratings.inverterOutputA} mono style={s.cell} />
        </View>
        <View style={s.row}>
          <Field label="Phase" value={phaseWords(inverterPhase)} style={s.cell} />
          <Field label="Nominal AC voltage" value={`${s2.voltageV} V`} mono style={s.cell} />
          <Field label="Highest DC voltage" value={input.facts.ratings.maxDcVoltage} mono style={s.cell} />
        </View>
      </Section>
      <Section title="7  Certification and grid profile">
        <Field
          label="Grid profiles the utility accepts"
          value={
            input.utility?.acceptedGridProfiles.length
              ? input.utility.acceptedGridProfiles.join("; ")
              : "Ask the utility: no profile on file"
          }
        />
        <Text style={s.note}>
          Certification as the inverter maker states it (above); UL 1741 with IEEE 1547.1 testing is the usual basis. The installer sets a
          grid profile the utility accepts at commissioning and records it in the commissioning report; the utility's settings win over any
          default.
        </Text>
      </Section>
      <Section title="8  Connection and disconnect">
        <View style={s.row}>
          <Field
            label="Point of connection"
            value={
              s2.connection === "load-side" ? `Load side, ${s2.pvBreakerA} A PV breaker` : `Supply side, ${s2.pvBreakerA} A PV disconnect`
            }
            style={s.cell}
          />
          <Field
            label="Service panel"
            value={`${s2.busbarA} A busbar${s2.mainBreakerA ? `, ${s2.mainBreakerA} A main` : ""}`}
            style={s.cell}
          />
        </View>
        <View style={s.row}>
          <Field label="PV system disconnect location" value={input.facts.disconnectLocation} style={s.cell} />
          <Field label="Service equipment location" value={s2.serviceLocation || notEntered} style={s.cell} />
        </View>
      </Section>
      <Section title="9  Storage and export">
        {input.facts.storage ? (
          <StorageFields fields={input.facts.storage.utilityFields} />
        ) : (
          <View style={s.row}>
            <Field label="Energy storage" value="None" style={s.cell} />
            <Field label="Export" value="Yes: surplus energy flows to the grid (net)" style={s.cell} />
          </View>
        )}
      </Section>
      {input.facts.storage ? (
        // Storage fills the page: the attachments take one plain line instead of a box.
        <Text style={[s.note, base.soft]}>
          Attached: the single-line diagram on sheet {singleLineSheet}. Equipment and battery data sheets and the site plan on request.
        </Text>
      ) : (
        <Notice title="Attached">
          <Text style={s.note}>
            Single-line diagram on sheet {singleLineSheet}. Equipment data sheets and the site plan on request or as the utility's process
            asks.
          </Text>
        </Notice>
      )}
    </FormSheet>
  );
}

/** The storage fields a utility asks for, four to a row. */
function StorageFields({ fields }: { fields: { name: string; value: string }[] }) {
  const rows = Array.from({ length: Math.ceil(fields.length / 4) }, (_, i) => fields.slice(i * 4, i * 4 + 4));
  return (
    <>
      {rows.map((row) => (
        <View key={row[0]!.name} style={s.row}>
          {row.map((f) => (
            <Field key={f.name} label={f.name} value={f.value} style={s.cell} />
          ))}
          {row.length < 4 ? <View style={{ flex: 4 - row.length, marginHorizontal: 5 }} /> : null}
        </View>
      ))}
    </>
  );
}
