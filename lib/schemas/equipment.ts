import { z } from "zod";
import { EQUIPMENT_KINDS, type EquipmentKind } from "@/lib/domain/stored-values";
import { blankToUndefined, numberField, optionalNumberField, optionalText, requiredText, safeString, toNumber, whenValid } from "./fields";

// Catalog items as the office enters them from data sheets.

export const TempCoefficientSchema = z
  .object({
    value: z.preprocess(toNumber, z.number({ error: "Enter the coefficient as a number" })),
    unit: z.enum(["%/C", "V/C"], { error: "Choose %/°C or V/°C" }),
  })
  .refine((c) => c.value < 0, { path: ["value"], message: "Voc falls as modules warm, so the coefficient is negative (e.g. −0.27 %/°C)" })
  .refine((c) => c.value > (c.unit === "%/C" ? -2 : -1), {
    path: ["value"],
    message: "That coefficient is too large; check the unit (%/°C or V/°C)",
  });

export const ModuleSpecs = z
  .object({
    powerW: numberField("Pmax", { min: 10, max: 1000, unit: "W" }),
    vocV: numberField("Voc", { min: 1, max: 150, unit: "V" }),
    vmpV: numberField("Vmp", { min: 1, max: 150, unit: "V" }),
    iscA: numberField("Isc", { min: 0.1, max: 30, unit: "A" }),
    impA: numberField("Imp", { min: 0.1, max: 30, unit: "A" }),
    // A form sends the unit even when the value is left blank: that means no coefficient.
    vocTempCoeff: z.preprocess(
      (v) => (v && typeof v === "object" && blankToUndefined((v as { value?: unknown }).value) === undefined ? undefined : v),
      TempCoefficientSchema.optional(),
    ),
    pmaxTempCoeffPctPerC: optionalNumberField("Pmax coefficient", { min: -2, max: 0, unit: "%/°C" }),
    maxSeriesFuseA: optionalNumberField("Maximum series fuse", { min: 1, max: 60, unit: "A" }),
    maxSystemVoltageV: optionalNumberField("Maximum system voltage", { min: 100, max: 1500, unit: "V" }),
    lengthIn: numberField("Length", { min: 10, max: 120, unit: "in" }),
    widthIn: numberField("Width", { min: 10, max: 80, unit: "in" }),
    weightLb: numberField("Weight", { min: 5, max: 120, unit: "lb" }),
  })
  .refine((s) => s.vmpV < s.vocV, { path: ["vmpV"], message: "Vmp must be lower than Voc", when: whenValid("vmpV", "vocV") })
  .refine((s) => s.impA < s.iscA, { path: ["impA"], message: "Imp must be lower than Isc", when: whenValid("impA", "iscA") })
  // Pmax is Vmp × Imp at STC; a wider gap than a few percent is a typing error.
  .refine((s) => Math.abs(s.vmpV * s.impA - s.powerW) <= s.powerW * 0.05, {
    path: ["powerW"],
    message: "Pmax should be close to Vmp × Imp; check the three values",
    when: whenValid("powerW", "vmpV", "impA"),
  });
export type ModuleSpecs = z.output<typeof ModuleSpecs>;

const booleanish = z.preprocess(
  (v) => (v === "true" || v === "on" ? true : v === "false" || v === "" || v === undefined ? false : v),
  z.boolean({ error: "Answer yes or no" }),
);
/** A data-sheet yes or no that may be unknown: blank stays unknown, and the review then asks for it. */
const yesNoUnknown = z.preprocess(
  (v) => (v === "yes" || v === "true" ? true : v === "no" || v === "false" ? false : v === "" || v === null ? undefined : v),
  z.boolean({ error: "Answer yes, no, or leave it blank" }).optional(),
);
const terminalRating = z.preprocess(
  (v) => (v === "" || v === null ? undefined : typeof v === "string" ? Number(v) : v),
  z.union([z.literal(60), z.literal(75), z.literal(90)], { error: "Terminal ratings are 60, 75 or 90 °C" }).optional(),
);

export const InverterSpecs = z
  .object({
    inverterKind: z.enum(["string", "micro"], { error: "Choose string or micro" }),
    acPowerW: numberField("AC rated power", { min: 100, max: 100_000, unit: "W" }),
    acOutputCurrentA: numberField("Maximum continuous output current", { min: 0.1, max: 400, unit: "A" }),
    acVoltageV: numberField("Nominal AC voltage", { min: 100, max: 600, unit: "V" }),
    phase: z.preprocess(toNumber, z.union([z.literal(1), z.literal(3)], { error: "Phases must be 1 or 3" })),
    maxDcInputV: numberField("Maximum DC input voltage", { min: 20, max: 1500, unit: "V" }),
    mpptMinV: optionalNumberField("MPPT window minimum", { min: 10, max: 1500, unit: "V" }),
    mpptMaxV: optionalNumberField("MPPT window maximum", { min: 10, max: 1500, unit: "V" }),
    maxInputIscA: optionalNumberField("Maximum input current per MPPT", { min: 0.1, max: 100, unit: "A" }),
    mpptCount: optionalNumberField("Number of MPPTs", { min: 1, max: 12, unit: "" }),
    regulatedStringV: optionalNumberField("Regulated string voltage", { min: 100, max: 1000, unit: "V" }),
    maxStringPowerW: optionalNumberField("Maximum power per string", { min: 100, max: 20_000, unit: "W" }),
    certification: optionalText(120),
    meetsRapidShutdownWithDevices: booleanish.default(false),
    // Module-level monitoring: each microinverter reports to a gateway, so the crew can count them found and reporting.
    reportsPerModule: booleanish.optional(),
    // What the plan review asks of the inverter's listing; blank means not known yet.
    terminalTempC: terminalRating,
    dcArcFaultProtection: yesNoUnknown,
    dcGroundFaultProtection: yesNoUnknown,
    dcDisconnect: yesNoUnknown,
    // Storage: a multimode (hybrid) inverter charges batteries from its DC side; a battery inverter couples them on the AC side.
    storageRole: z.enum(["none", "multimode", "battery"], { error: "Choose PV only, multimode or battery inverter" }).optional(), // blank: PV only
    // What it supplies with the grid down (Article 710), from the data sheet's backup or stand-alone output.
    backupContinuousA: optionalNumberField("Backup output continuous current", { min: 0.1, max: 400, unit: "A" }),
    backupVoltageV: z.preprocess(
      (v) => (v === "" || v === null ? undefined : typeof v === "string" ? Number(v) : v),
      z.union([z.literal(120), z.literal(240)], { error: "The backup output is 120 V or 120/240 V (240)" }).optional(),
    ),
    backupPowerW: optionalNumberField("Backup output power", { min: 100, max: 100_000, unit: "W" }),
    transferTimeS: optionalNumberField("Transfer time", { min: 0, max: 600, unit: "s" }),
    // A power control system (705.13) built in: listed as one, and whether its current limit can be set.
    pcsListed: yesNoUnknown,
    pcsCurrentLimitSettable: yesNoUnknown,
  })
  .refine((s) => s.mpptMinV === undefined || s.mpptMaxV === undefined || s.mpptMinV < s.mpptMaxV, {
    path: ["mpptMaxV"],
    message: "The MPPT window maximum must be above its minimum",
    when: whenValid("mpptMinV", "mpptMaxV"),
  })
  .refine((s) => s.mpptMaxV === undefined || s.mpptMaxV <= s.maxDcInputV, {
    path: ["mpptMaxV"],
    message: "The MPPT window cannot reach above the maximum DC input voltage",
    when: whenValid("mpptMaxV", "maxDcInputV"),
  })
  .refine((s) => s.regulatedStringV === undefined || s.regulatedStringV <= s.maxDcInputV, {
    path: ["regulatedStringV"],
    message: "The regulated string voltage cannot exceed the maximum DC input voltage",
    when: whenValid("regulatedStringV", "maxDcInputV"),
  })
  .refine((s) => (s.regulatedStringV === undefined) === (s.maxStringPowerW === undefined), {
    path: ["maxStringPowerW"],
    message: "Inverters for optimizer strings need both the regulated string voltage and the maximum power per string",
    when: whenValid("regulatedStringV", "maxStringPowerW"),
  })
  // The rated power has to fit through the rated current at nominal voltage (√3 for three phases);
  // a current far below that is usually a misplaced decimal point.
  .refine((s) => s.acOutputCurrentA * s.acVoltageV * (s.phase === 3 ? Math.sqrt(3) : 1) >= s.acPowerW * 0.95, {
    path: ["acOutputCurrentA"],
    message: "The output current is too low for the rated power at the nominal voltage",
    when: whenValid("acOutputCurrentA", "acVoltageV", "phase", "acPowerW"),
  });
export type InverterSpecs = z.output<typeof InverterSpecs>;

export const DeviceSpecs = z.object({
  deviceKind: z.enum(["optimizer", "shutdown-device"], { error: "Choose optimizer or shutdown device" }),
  ratedInputPowerW: optionalNumberField("Rated input power", { min: 10, max: 2000, unit: "W" }),
  maxInputV: numberField("Maximum input voltage", { min: 10, max: 200, unit: "V" }),
  maxInputIscA: optionalNumberField("Maximum input current", { min: 0.1, max: 30, unit: "A" }),
  maxOutputCurrentA: optionalNumberField("Maximum output current", { min: 0.1, max: 30, unit: "A" }),
  shutdownOutputV: optionalNumberField("Voltage held while shut down", { min: 0, max: 30, unit: "V" }),
  // Module-level monitoring: each device reports to the inverter, so the crew can count them paired and reporting.
  reportsPerModule: booleanish.optional(),
  maxSystemVoltageV: optionalNumberField("Maximum system voltage", { min: 50, max: 1500, unit: "V" }),
});
export type DeviceSpecs = z.output<typeof DeviceSpecs>;

/** A battery unit as its data sheet states it; the residential siting limits count the nameplate energy. */
export const BatterySpecs = z
  .object({
    usableKwh: numberField("Usable energy", { min: 0.1, max: 200, unit: "kWh" }),
    nameplateKwh: numberField("Nameplate energy", { min: 0.1, max: 200, unit: "kWh" }),
    maxContinuousChargeA: numberField("Maximum continuous charge current", { min: 0.1, max: 1000, unit: "A" }),
    maxContinuousDischargeA: numberField("Maximum continuous discharge current", { min: 0.1, max: 1000, unit: "A" }),
    maxChargeKw: numberField("Maximum charge power", { min: 0.1, max: 200, unit: "kW" }),
    maxDischargeKw: numberField("Maximum discharge power", { min: 0.1, max: 200, unit: "kW" }),
    nominalVoltageV: numberField("Nominal voltage", { min: 12, max: 1500, unit: "V" }),
    maxUnitsInParallel: optionalNumberField("Units allowed in parallel", { min: 1, max: 40, unit: "" }).refine(
      (v) => v === undefined || Number.isInteger(v),
      "Units allowed in parallel must be a whole number",
    ),
  })
  .refine((s) => s.usableKwh <= s.nameplateKwh, {
    path: ["usableKwh"],
    message: "The usable energy cannot exceed the nameplate energy",
    when: whenValid("usableKwh", "nameplateKwh"),
  });
export type BatterySpecs = z.output<typeof BatterySpecs>;

/** A battery's listings as the engine reads them: the catalog's listing text split at commas and semicolons ("UL 9540, UL 9540A"). */
export function listingsOf(listing: string): string[] {
  return listing
    .split(/[;,]/)
    .map((l) => l.trim())
    .filter(Boolean);
}

export const EQUIPMENT_KIND_LABELS: Record<EquipmentKind, string> = {
  module: "PV module",
  inverter: "Inverter",
  device: "Module-level device",
  battery: "Battery",
};

const common = { maker: requiredText("maker", 80), model: requiredText("model", 80), listing: optionalText(120) };

/** One catalog item; the kind decides which specification schema applies. */
export const EquipmentInput = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("module"), ...common, specs: ModuleSpecs }),
    z.object({ kind: z.literal("inverter"), ...common, specs: InverterSpecs }),
    z.object({ kind: z.literal("device"), ...common, specs: DeviceSpecs }),
    z.object({ kind: z.literal("battery"), ...common, specs: BatterySpecs }),
  ],
  { error: `Choose a kind: ${EQUIPMENT_KINDS.join(", ")}` },
);
export type EquipmentInput = z.input<typeof EquipmentInput>;
export type EquipmentValues = z.output<typeof EquipmentInput>;

/** An edit: the item's id beside its fields, so field errors keep the form's own paths. */
export const UpdateEquipmentInput = z.object({ equipmentId: safeString().uuid("Unknown catalog item") }).and(EquipmentInput);

/** A catalog item as the app shows it and the design review reads it. */
export type EquipmentDto =
  | ({ kind: "module"; specs: ModuleSpecs } & EquipmentCommon)
  | ({ kind: "inverter"; specs: InverterSpecs } & EquipmentCommon)
  | ({ kind: "device"; specs: DeviceSpecs } & EquipmentCommon)
  | ({ kind: "battery"; specs: BatterySpecs } & EquipmentCommon);
export type EquipmentCommon = {
  id: string;
  maker: string;
  model: string;
  listing: string;
  isArchived: boolean;
  datasheet: { fileName: string; sizeBytes: number; uploadedAt: string } | null;
};

const kindFilter = z.union([z.enum(EQUIPMENT_KINDS), z.literal("")], { error: `kind must be one of: ${EQUIPMENT_KINDS.join(", ")}` });

/** Query of GET /api/v1/equipment. */
export const EquipmentListQuery = z.object({
  kind: kindFilter.default("").transform((v) => v || undefined),
  includeArchived: z
    .enum(["true", "false"], { error: "includeArchived must be true or false" })
    .default("false")
    .transform((v) => v === "true"),
});

export const SetArchivedInput = z.object({
  equipmentId: safeString().uuid("Unknown catalog item"),
  isArchived: z.boolean({ error: "isArchived must be true or false" }),
});

/** Data sheets: PDFs only, small enough to merge into a permit packet. */
export const DATASHEET_MAX_BYTES = 20 * 1024 * 1024;
export const DatasheetFileName = safeString()
  .trim()
  .min(1, "The file needs a name")
  .max(200, "The file name is longer than 200 characters")
  .refine((name) => /\.pdf$/i.test(name), "Data sheets must be PDF files (.pdf)");
