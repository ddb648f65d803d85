import type { EquipmentKind } from "@/lib/domain/stored-values";
import type { EquipmentDto, EquipmentInput } from "@/lib/schemas/equipment";

// What the form asks for each kind, in data-sheet order. Names are paths under `specs`.
export type SpecField =
  | { type: "number"; name: string; label: string; unit: string; hint?: string }
  | { type: "select"; name: string; label: string; options: { value: string; label: string }[] }
  | { type: "text"; name: string; label: string; hint?: string }
  | { type: "checkbox"; name: string; label: string };

const num = (name: string, label: string, unit: string, hint?: string): SpecField => ({ type: "number", name, label, unit, hint });
const OPTIONAL = "Leave blank when the data sheet does not give it";
// Blank stays "not known": the design review then asks for it where a check needs it.
const yesNo = (name: string, label: string): SpecField => ({
  type: "select",
  name,
  label,
  options: [
    { value: "", label: "Not known" },
    { value: "yes", label: "Yes" },
    { value: "no", label: "No" },
  ],
});

export const SPEC_FIELDS: Record<EquipmentKind, SpecField[]> = {
  module: [
    num("powerW", "Pmax", "W"),
    num("vocV", "Voc", "V"),
    num("vmpV", "Vmp", "V"),
    num("iscA", "Isc", "A"),
    num("impA", "Imp", "A"),
    num("vocTempCoeff.value", "Voc temperature coefficient", "", "Negative, e.g. −0.27; blank to use the NEC table instead"),
    {
      type: "select",
      name: "vocTempCoeff.unit",
      label: "Coefficient unit",
      options: [
        { value: "%/C", label: "%/°C" },
        { value: "V/C", label: "V/°C" },
      ],
    },
    num("pmaxTempCoeffPctPerC", "Pmax temperature coefficient", "%/°C", OPTIONAL),
    num("maxSeriesFuseA", "Maximum series fuse", "A", OPTIONAL),
    num("maxSystemVoltageV", "Maximum system voltage", "V", "As listed, e.g. 1000; the review warns while it is blank"),
    num("lengthIn", "Length", "in"),
    num("widthIn", "Width", "in"),
    num("weightLb", "Weight", "lb"),
  ],
  inverter: [
    {
      type: "select",
      name: "inverterKind",
      label: "Type",
      options: [
        { value: "string", label: "String inverter" },
        { value: "micro", label: "Microinverter" },
      ],
    },
    num("acPowerW", "AC rated power", "W"),
    num("acOutputCurrentA", "Maximum continuous output current", "A"),
    num("acVoltageV", "Nominal AC voltage", "V"),
    {
      type: "select",
      name: "phase",
      label: "Phases",
      options: [
        { value: "1", label: "Single phase" },
        { value: "3", label: "Three phase" },
      ],
    },
    num("maxDcInputV", "Maximum DC input voltage", "V"),
    num("mpptMinV", "MPPT window minimum", "V", OPTIONAL),
    num("mpptMaxV", "MPPT window maximum", "V", OPTIONAL),
    num("maxInputIscA", "Maximum input current per MPPT", "A", OPTIONAL),
    num("mpptCount", "Number of MPPTs", "", OPTIONAL),
    num("regulatedStringV", "Regulated string voltage", "V", "Only for inverters fed by optimizers"),
    num("maxStringPowerW", "Maximum power per string", "W", "Only for inverters fed by optimizers"),
    { type: "text", name: "certification", label: "Certification", hint: "e.g. UL 1741 SB; IEEE 1547-2018 Category B" },
    {
      type: "select",
      name: "terminalTempC",
      label: "Terminal temperature rating",
      options: [
        { value: "", label: "Not marked (60 °C up to 100 A)" },
        { value: "60", label: "60 °C" },
        { value: "75", label: "75 °C" },
        { value: "90", label: "90 °C" },
      ],
    },
    yesNo("dcArcFaultProtection", "Listed DC arc-fault protection (690.11)"),
    yesNo("dcGroundFaultProtection", "DC ground-fault protection (690.41(B))"),
    yesNo("dcDisconnect", "Integrated DC disconnect (690.15)"),
    {
      type: "checkbox",
      name: "meetsRapidShutdownWithDevices",
      label: "Meets rapid shutdown (690.12) together with its module-level devices",
    },
    { type: "checkbox", name: "reportsPerModule", label: "Microinverters only: each unit reports to a gateway (module-level monitoring)" },
    {
      type: "select",
      name: "storageRole",
      label: "Battery role",
      options: [
        { value: "none", label: "PV only" },
        { value: "multimode", label: "Multimode (hybrid): charges batteries on its DC side" },
        { value: "battery", label: "Battery inverter (AC-coupled)" },
      ],
    },
    num("backupContinuousA", "Backup output continuous current", "A", "With the grid down; blank when it has no backup output"),
    {
      type: "select",
      name: "backupVoltageV",
      label: "Backup output voltage",
      options: [
        { value: "", label: "No backup output" },
        { value: "240", label: "120/240 V" },
        { value: "120", label: "120 V only" },
      ],
    },
    num("backupPowerW", "Backup output power", "W", OPTIONAL),
    num("transferTimeS", "Transfer time", "s", OPTIONAL),
    yesNo("pcsListed", "Listed power control system (705.13)"),
    yesNo("pcsCurrentLimitSettable", "Power control current limit can be set"),
  ],
  device: [
    {
      type: "select",
      name: "deviceKind",
      label: "Type",
      options: [
        { value: "optimizer", label: "DC optimizer" },
        { value: "shutdown-device", label: "Rapid-shutdown device" },
      ],
    },
    num("ratedInputPowerW", "Rated input power", "W", OPTIONAL),
    num("maxInputV", "Maximum input voltage", "V"),
    num("maxInputIscA", "Maximum input current", "A", OPTIONAL),
    num("maxOutputCurrentA", "Maximum output current", "A", OPTIONAL),
    num("shutdownOutputV", "Voltage held while shut down", "V", "About 1 V per module is usual"),
    num("maxSystemVoltageV", "Maximum system voltage", "V", "The highest string voltage it may sit in"),
    { type: "checkbox", name: "reportsPerModule", label: "Each device reports to the inverter (module-level monitoring)" },
  ],
  battery: [
    num("usableKwh", "Usable energy", "kWh"),
    num("nameplateKwh", "Nameplate energy", "kWh", "The listed energy capacity; the residential siting limits count it"),
    num("maxContinuousChargeA", "Maximum continuous charge current", "A"),
    num("maxContinuousDischargeA", "Maximum continuous discharge current", "A"),
    num("maxChargeKw", "Maximum charge power", "kW"),
    num("maxDischargeKw", "Maximum discharge power", "kW"),
    num("nominalVoltageV", "Nominal voltage", "V"),
    num("maxUnitsInParallel", "Units allowed in parallel", "", OPTIONAL),
  ],
};

const EMPTY_SPECS: Record<EquipmentKind, Record<string, unknown>> = {
  module: { vocTempCoeff: { value: "", unit: "%/C" } },
  inverter: {
    inverterKind: "string",
    phase: "1",
    certification: "",
    meetsRapidShutdownWithDevices: false,
    reportsPerModule: false,
    terminalTempC: "",
    dcArcFaultProtection: "",
    dcGroundFaultProtection: "",
    dcDisconnect: "",
    storageRole: "none",
    backupVoltageV: "",
    pcsListed: "",
    pcsCurrentLimitSettable: "",
  },
  device: { deviceKind: "optimizer", reportsPerModule: false },
  battery: {},
};

/** The form's starting values: blank for a new item, the stored figures for an edit. */
export function formValuesOf(kind: EquipmentKind, item?: EquipmentDto): EquipmentInput {
  if (!item) return { kind, maker: "", model: "", listing: "", specs: EMPTY_SPECS[kind] } as EquipmentInput;
  const specs: Record<string, unknown> = { ...EMPTY_SPECS[kind], ...formOfSpecs(item.specs) };
  return { kind: item.kind, maker: item.maker, model: item.model, listing: item.listing, specs } as EquipmentInput;
}

/** Stored figures as the form's inputs hold them: known yes/no answers as "yes"/"no", numbers as they are. */
function formOfSpecs(specs: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(
    Object.entries(specs).map(([k, v]) => [k, k === "meetsRapidShutdownWithDevices" || typeof v !== "boolean" ? v : v ? "yes" : "no"]),
  );
}
