import { hasStorage, sizeLabel, type BatteryUnit, type StoredDesign, type StorageSummary } from "@/lib/engineering";
import { LOCATION_WORDS, MODE_WORDS } from "@/lib/sld/storage-words";
import { formatNumber, formatQuantity } from "../text";
import type { EquipmentRow, RatingLine } from "./facts";
import type { PacketInput } from "./input";

/** Words written mid-sentence elsewhere, standing alone in a value cell. */
const asValue = (words: string) => words.charAt(0).toUpperCase() + words.slice(1);

// What the packets print about a design's batteries: the summary sheet's storage lines, the
// interconnection application's storage fields, the equipment rows and the battery data sheet.
// Null for a PV-only design, whose packets print exactly what they printed before storage existed.

export type BatteryDataRow = { name: string; value: string };
export type BatteryDataSheet = { title: string; rows: BatteryDataRow[] };
/** A battery circuit as the summary sheet lists it, tagged as the single-line diagram tags it (B1, B2, …). */
export type BatteryCircuitRow = { tag: string; label: string; conductors: string; ocpd: string };

export type StorageFacts = {
  /** The summary sheet's "Energy storage" table. */
  summaryLines: RatingLine[];
  /** The scope-of-work sentence that replaces "No energy storage". */
  scope: string;
  /** The interconnection application's short answers (section 3) and its storage fields (section 9). */
  brief: { storage: string; export: string; generatorType: string };
  utilityFields: RatingLine[];
  equipmentRows: EquipmentRow[];
  /** The battery inverter among the application's inverters (AC coupling); the hybrid inverter is listed already. */
  inverterLines: { quantity: string; makerModel: string; ratedOutput: string; certification: string }[];
  circuits: BatteryCircuitRow[];
  /** The battery's (and the battery inverter's) data as the maker states them, one table each. */
  dataSheets: BatteryDataSheet[];
};

const COUPLING_WORDS = { dc: "DC-coupled", ac: "AC-coupled" } as const;
const COUNTED_BY = {
  "power-control-system": "the power control system's setting (705.13)",
  "inverter-outputs": "every inverter's output, the storage's included (705.12)",
} as const;

function kwh(value: number | null): string {
  return formatQuantity(value, "kWh");
}

function converterWords(design: StoredDesign): string {
  const s = design.storage;
  if (s.coupling === "ac")
    return s.batteryInverter ? `battery inverter ${s.batteryInverter.maker} ${s.batteryInverter.model}` : "battery inverter";
  const inv = design.inverters.find((i) => i.id === s.multimodeInverterId);
  return inv ? `hybrid (multimode) inverter ${inv.maker} ${inv.model}` : "hybrid (multimode) inverter";
}

function exportWords(design: StoredDesign): string {
  const s = design.storage;
  if (s.operatingMode === "non-export") return "No: non-export";
  if (s.exportLimitKw !== undefined) return `Limited to ${formatQuantity(s.exportLimitKw, "kW")}`;
  if (s.operatingMode === "backup-only") return "PV only: the batteries charge and hold for backup";
  return "Yes, net of on-site use";
}

function controlMethod(design: StoredDesign, summary: StorageSummary): string {
  const pcs = design.storage.pcs;
  if (!pcs) return design.storage.exportLimitKw !== undefined || design.storage.operatingMode === "non-export" ? "Not entered" : "None";
  const setting = pcs.currentSettingA === undefined ? "setting not entered" : `current setting ${formatQuantity(pcs.currentSettingA, "A")}`;
  const counted = summary.powerControlSettingA !== null ? ", counted under NEC 705.13" : "";
  return `${pcs.listed ? "Listed" : "Unlisted"} power control system, ${setting}${counted}`;
}

/** The control method in a form field's few words. */
function shortControlMethod(design: StoredDesign, summary: StorageSummary): string {
  const pcs = design.storage.pcs;
  if (!pcs) return design.storage.exportLimitKw !== undefined || design.storage.operatingMode === "non-export" ? "Not entered" : "None";
  const setting = pcs.currentSettingA === undefined ? "not set" : formatQuantity(pcs.currentSettingA, "A");
  return `${pcs.listed ? "Listed" : "Unlisted"} PCS, ${setting}${summary.powerControlSettingA !== null ? " (705.13)" : ""}`;
}

function locationWords(design: StoredDesign): string {
  return design.storage.banks
    .map((b) => `${LOCATION_WORDS[b.location]}: ${b.quantity} × ${formatQuantity(b.unit.nameplateKwh, "kWh")}`)
    .join("; ");
}

function backupWords(design: StoredDesign): string {
  const s = design.storage;
  if (!s.backupPanel) return "None";
  const out = s.backupOutput ? `, fed by the ${formatQuantity(s.backupOutput.continuousA, "A")} stand-alone output` : "";
  return `${s.backupPanel.busbarA} A busbar${out}; automatic transfer in the inverter`;
}

function unitRows(u: BatteryUnit): BatteryDataRow[] {
  return [
    { name: "Usable energy", value: kwh(u.usableKwh) },
    { name: "Nameplate energy", value: kwh(u.nameplateKwh) },
    { name: "Nominal voltage", value: formatQuantity(u.nominalVoltageV, "V DC") },
    { name: "Maximum continuous charge", value: `${formatQuantity(u.maxContinuousChargeA, "A")}, ${formatQuantity(u.maxChargeKw, "kW")}` },
    {
      name: "Maximum continuous discharge",
      value: `${formatQuantity(u.maxContinuousDischargeA, "A")}, ${formatQuantity(u.maxDischargeKw, "kW")}`,
    },
    { name: "Listing", value: u.listings?.length ? u.listings.join(", ") : "Not entered" },
    { name: "Units in parallel, at most", value: u.maxUnitsInParallel === undefined ? "Not entered" : String(u.maxUnitsInParallel) },
  ];
}

function dataSheets(design: StoredDesign): BatteryDataSheet[] {
  const seen = new Set<string>();
  const sheets: BatteryDataSheet[] = [];
  for (const bank of design.storage.banks) {
    const key = `${bank.unit.maker} ${bank.unit.model}`;
    if (seen.has(key)) continue;
    seen.add(key);
    sheets.push({ title: `Battery: ${key}`, rows: unitRows(bank.unit) });
  }
  const bi = design.storage.batteryInverter;
  if (bi) {
    sheets.push({
      title: `Battery inverter: ${bi.maker} ${bi.model}`,
      rows: [
        { name: "Rated AC power", value: formatQuantity(bi.acPowerW / 1000, "kW") },
        { name: "Continuous output current", value: formatQuantity(bi.acOutputCurrentA, "A") },
        { name: "Nominal AC voltage", value: formatQuantity(bi.acVoltageV, "V") },
        { name: "Breaker it lands on", value: formatQuantity(bi.breakerA, "A") },
      ],
    });
  }
  const out = design.storage.backupOutput;
  if (out) {
    sheets.push({
      title: "Stand-alone (backup) output",
      rows: [
        { name: "Continuous current", value: formatQuantity(out.continuousA, "A") },
        { name: "Voltage", value: out.voltageV === 120 ? "120 V (single supply)" : "120/240 V" },
        { name: "Power", value: out.powerW === undefined ? "Not entered" : formatQuantity(out.powerW / 1000, "kW") },
        { name: "Transfer time", value: out.transferTimeS === undefined ? "Not entered" : formatQuantity(out.transferTimeS, "s") },
      ],
    });
  }
  return sheets;
}

function equipmentRows(design: StoredDesign): EquipmentRow[] {
  const rows: EquipmentRow[] = design.storage.banks.map((b) => ({
    item: "Battery",
    quantity: b.quantity,
    maker: b.unit.maker,
    model: b.unit.model,
    rating: `${formatNumber(b.unit.nameplateKwh)} kWh (${formatNumber(b.unit.usableKwh)} usable), ${formatNumber(b.unit.maxDischargeKw)} kW, ${formatNumber(b.unit.nominalVoltageV)} V DC`,
    listing: b.unit.listings?.join("; ") || "—",
  }));
  const bi = design.storage.batteryInverter;
  if (bi) {
    rows.push({
      item: "Battery inverter",
      quantity: 1,
      maker: bi.maker,
      model: bi.model,
      rating: `${formatNumber(bi.acPowerW)} W AC, ${bi.acOutputCurrentA} A, ${bi.acVoltageV} V`,
      listing: "—",
    });
  }
  return rows;
}

/** The storage facts of a packet, or null where the design has no storage (or the review has no storage summary). */
export function storageFacts(input: Pick<PacketInput, "design" | "review">): StorageFacts | null {
  const design = input.design;
  const summary = input.review.storage;
  if (!hasStorage(design) || !summary) return null;
  const s = design.storage;
  const coupled = `${COUPLING_WORDS[s.coupling]} through the ${converterWords(design)}`;
  const usable = kwh(summary.totalUsableKwh);
  const discharge = formatQuantity(summary.maxDischargeKw, "kW");
  const counted =
    summary.pointOfConnectionA === null || summary.countedBy === null
      ? "Not computed: see the calculation sheets"
      : `${formatQuantity(summary.pointOfConnectionA, "A")}, ${COUNTED_BY[summary.countedBy]}`;
  const exportLimit = exportWords(design);
  const method = controlMethod(design, summary);
  const units = `${summary.units} battery unit${summary.units === 1 ? "" : "s"}`;
  return {
    summaryLines: [
      { name: "Batteries", value: s.banks.map((b) => `${b.quantity} × ${b.unit.maker} ${b.unit.model}`).join(", ") },
      { name: "Usable energy", value: usable },
      { name: "Nameplate energy", value: kwh(summary.totalNameplateKwh) },
      { name: "Discharge power", value: discharge },
      { name: "Coupling", value: coupled },
      { name: "Operating mode", value: asValue(MODE_WORDS[s.operatingMode]) },
      { name: "Location", value: locationWords(design) },
      { name: "Backup loads panel", value: backupWords(design) },
      { name: "Export", value: exportLimit },
      { name: "Export control", value: method },
      ...(s.importLimitKw !== undefined ? [{ name: "Import limit", value: formatQuantity(s.importLimitKw, "kW") }] : []),
      { name: "Source current at the main panel", value: counted },
    ],
    scope: `Add ${units} (${usable} usable, ${discharge} discharge) in the ${[...new Set(s.banks.map((b) => LOCATION_WORDS[b.location]))].join(" and ")}, ${coupled}, operating in ${MODE_WORDS[s.operatingMode]} mode${s.backupPanel ? ", with a backup loads panel" : ""} (NEC 706).`,
    brief: {
      generatorType: "Photovoltaic with energy storage, inverter-based",
      storage: `${usable}, ${discharge}, ${COUPLING_WORDS[s.coupling]}`,
      export: exportLimit,
    },
    utilityFields: [
      { name: "Storage usable energy", value: usable },
      { name: "Storage discharge power", value: discharge },
      { name: "Coupling", value: COUPLING_WORDS[s.coupling] },
      { name: "Operating mode", value: asValue(MODE_WORDS[s.operatingMode]) },
      { name: "Export", value: exportLimit },
      { name: "Export limit control method", value: shortControlMethod(design, summary) },
      ...(s.importLimitKw !== undefined ? [{ name: "Import limit", value: formatQuantity(s.importLimitKw, "kW") }] : []),
      { name: "Backup loads panel", value: s.backupPanel ? `Yes, ${s.backupPanel.busbarA} A panel` : "None" },
    ],
    equipmentRows: equipmentRows(design),
    inverterLines: s.batteryInverter
      ? [
          {
            quantity: "1",
            makerModel: `${s.batteryInverter.maker} ${s.batteryInverter.model}`,
            ratedOutput: `${formatNumber(s.batteryInverter.acPowerW)} W, ${s.batteryInverter.acOutputCurrentA} A at ${s.batteryInverter.acVoltageV} V`,
            certification: "Battery inverter: as its maker states",
          },
        ]
      : [],
    circuits: (s.circuits ?? []).map((c, i) => ({
      tag: `B${i + 1}`,
      label: c.label,
      conductors: `${sizeLabel(c.conductor.size)} ${c.conductor.material} ${c.conductor.insulation ?? ""}, ${c.conductor.insulationTempC} °C`,
      ocpd: c.ocpdA ? `${c.ocpdA} A` : "—",
    })),
    dataSheets: dataSheets(design),
  };
}
