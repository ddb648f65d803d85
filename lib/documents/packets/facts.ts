import { article, roofPlaneLoad, type CheckResult, type WarningLabel } from "@/lib/engineering";
import { totalInverterOutputA } from "@/lib/engineering/design-lookup";
import { type ConductorRow, conductorSchedule as scheduleOf } from "@/lib/design/conductor-schedule";
import { formatNumber, formatQuantity } from "../text";
import type { PacketInput } from "./input";
import { storageFacts } from "./storage-facts";

// The words and figures the packet sheets print, computed once from the packet input so
// the templates only lay them out and the tests can check the same strings.

export function revisionLabel(revision: number): string {
  return `Rev ${revision}`;
}

export function projectLabel(input: PacketInput): string {
  return `Project ${input.project.number} · ${input.project.customerName}`;
}

export function siteAddress(input: PacketInput): string {
  const p = input.project;
  return `${p.street}, ${p.city}, ${p.state} ${p.postalCode}`;
}

type InverterItem = PacketInput["equipment"]["inverters"][number]["item"];

/** Inverter lines of the same catalog item counted together (branch circuits often share a model). */
export function inverterCounts(input: PacketInput): { item: InverterItem; quantity: number }[] {
  const byId = new Map<string, { item: InverterItem; quantity: number }>();
  for (const line of input.equipment.inverters) {
    const seen = byId.get(line.item.id);
    if (seen) seen.quantity += line.quantity;
    else byId.set(line.item.id, { item: line.item, quantity: line.quantity });
  }
  return [...byId.values()];
}

const inverterKindWords = { string: "string inverter", micro: "microinverter" } as const;

/** The scope of work on the cover sheet, in our own words, from the design. */
export function scopeOfWork(input: PacketInput): string[] {
  const { ratings } = input.review.summary;
  const m = input.equipment.module;
  const dc = formatNumber(ratings.dcKw);
  const planes = input.designInput.array.roofPlanes;
  const mount =
    input.designInput.array.mount === "ground"
      ? "a ground-mounted array"
      : `${planes.length} roof ${planes.length === 1 ? "plane" : "planes"}`;
  const inverters = inverterCounts(input)
    .map(
      ({ item, quantity }) =>
        `${quantity} × ${item.maker} ${item.model} ${inverterKindWords[item.specs.inverterKind]}${quantity === 1 ? "" : "s"}`,
    )
    .join(" and ");
  const s = input.designInput.service;
  const connection =
    s.connection === "load-side"
      ? `on the load side of the existing ${s.busbarA} A service panel through a ${s.pvBreakerA} A PV breaker`
      : `on the supply side of the service through a ${s.pvBreakerA} A fused PV disconnect`;
  const lines = [
    `Install ${article(dc)} ${dc} kW DC / ${formatNumber(ratings.acKw)} kW AC grid-tied PV system at ${siteAddress(input)}.`,
    `${ratings.moduleCount} ${m.maker} ${m.model} modules (${m.specs.powerW} W each) on ${mount}, feeding ${inverters}.`,
    `Connect ${connection}, at ${s.voltageV} V ${s.phase === "3" ? "three-phase" : "single-phase"}.`,
  ];
  const device = input.equipment.device;
  if (device) {
    const role = device.specs.deviceKind === "optimizer" ? "DC optimizers" : "rapid shutdown devices";
    lines.push(`Fit ${device.maker} ${device.model} ${role} behind each module for rapid shutdown (NEC 690.12).`);
  } else if (input.equipment.inverters.every((l) => l.item.specs.inverterKind === "micro")) {
    lines.push("Rapid shutdown (NEC 690.12) by the microinverters: no DC wiring leaves the array.");
  }
  lines.push(
    storageFacts(input)?.scope ??
      "No energy storage. The system exports surplus energy to the utility under its interconnection agreement.",
  );
  return lines;
}

/** General notes on the cover sheet: our own wording of the usual plan-set notes. */
export function generalNotes(input: PacketInput): string[] {
  const edition = input.jurisdiction.necEdition;
  return [
    `All work to follow the ${edition} NEC and the local amendments adopted by ${input.jurisdiction.name}, the utility's interconnection requirements and each maker's installation instructions.`,
    "Equipment shall be listed for its use: modules to UL 61730 (or UL 1703), inverters to UL 1741 with the grid-support settings the utility requires, racking to UL 2703, rapid shutdown equipment to UL 1741 PVRSE or as a UL 3741 system.",
    "Conductors exposed to sunlight shall be rated for it (PV wire, or USE-2 where allowed); conductors in raceways shall be rated for wet locations (THWN-2 or equal).",
    "Terminations are rated 75 °C unless marked otherwise; conductors were sized at that rating.",
    "Warning labels shall be permanent, weather-resistant and placed as shown on the label sheet, in the letter size and colours the AHJ requires.",
    "The PV source circuits are energized whenever light reaches the modules, and inverters can hold a charge after shutdown: work on them de-energized, under lockout, by qualified persons only.",
    "Roof attachments to be fastened into structural members as the racking maker specifies; the AHJ decides whether a structural review is needed.",
    "The utility must grant permission to operate (PTO) before the system is switched on, other than for commissioning tests the utility allows.",
  ];
}

export type RatingLine = { name: string; value: string };

/** The system's headline ratings, as the summary sheet and the application print them. */
export function ratingLines(input: PacketInput): RatingLine[] {
  const { summary } = input.review;
  const s = input.designInput.service;
  const lines: RatingLine[] = [
    { name: "DC rating (STC)", value: formatQuantity(summary.ratings.dcKw, "kW") },
    { name: "AC rating (inverter output)", value: formatQuantity(summary.ratings.acKw, "kW") },
    { name: "DC to AC ratio", value: formatQuantity(summary.ratings.dcToAcRatio, "") },
    { name: "Modules", value: String(summary.ratings.moduleCount) },
    { name: "Highest DC voltage", value: formatQuantity(summary.maxDcVoltageV, "V") },
    { name: "Highest DC circuit current", value: formatQuantity(summary.maxDcCircuitCurrentA, "A") },
    { name: "Inverter output current", value: formatQuantity(totalInverterOutputA(input.design), "A") },
    {
      name: "Service",
      value: `${s.voltageV} V, ${s.phase === "3" ? "three" : "single"} phase, ${s.busbarA} A busbar${s.mainBreakerA ? `, ${s.mainBreakerA} A main` : ", no main breaker"}`,
    },
    {
      name: "Point of connection",
      value: s.connection === "load-side" ? `Load side, ${s.pvBreakerA} A PV breaker` : `Supply side, ${s.pvBreakerA} A PV disconnect`,
    },
    { name: "Largest PV breaker the busbar allows", value: formatQuantity(summary.largestPvBreakerA, "A") },
  ];
  if (summary.annualProductionKwh !== null)
    lines.push({ name: "Estimated annual energy", value: formatQuantity(summary.annualProductionKwh, "kWh") });
  return lines;
}

/** Listing and certification in one line, each standard once ("UL 1741 SB; IEEE 1547-2018 Category B"). */
export function listingText(...parts: (string | undefined | null)[]): string {
  const unique = [
    ...new Set(
      parts
        .flatMap((p) => (p ?? "").split(";"))
        .map((p) => p.trim())
        .filter(Boolean),
    ),
  ];
  return unique.join("; ") || "—";
}

export type EquipmentRow = { item: string; quantity: number; maker: string; model: string; rating: string; listing: string };

/** One row per catalog item the design uses, with the count installed. */
export function equipmentSchedule(input: PacketInput): EquipmentRow[] {
  const { module, device } = input.equipment;
  const moduleCount = input.review.summary.ratings.moduleCount;
  const rows: EquipmentRow[] = [
    {
      item: "PV module",
      quantity: moduleCount,
      maker: module.maker,
      model: module.model,
      rating: `${module.specs.powerW} W, Voc ${module.specs.vocV} V, Isc ${module.specs.iscA} A`,
      listing: listingText(module.listing),
    },
  ];
  for (const { item, quantity } of inverterCounts(input)) {
    const s = item.specs;
    rows.push({
      item: s.inverterKind === "micro" ? "Microinverter" : "Inverter",
      quantity,
      maker: item.maker,
      model: item.model,
      rating: `${formatNumber(s.acPowerW)} W AC, ${s.acOutputCurrentA} A, ${s.acVoltageV} V`,
      listing: listingText(item.listing, s.certification),
    });
  }
  if (device) {
    rows.push({
      item: device.specs.deviceKind === "optimizer" ? "DC optimizer" : "Rapid shutdown device",
      quantity: moduleCount,
      maker: device.maker,
      model: device.model,
      rating: `${device.specs.maxInputV} V max input${device.specs.maxInputIscA ? `, ${device.specs.maxInputIscA} A` : ""}`,
      listing: listingText(device.listing),
    });
  }
  rows.push(...(storageFacts(input)?.equipmentRows ?? []));
  return rows;
}

export type { ConductorRow } from "@/lib/design/conductor-schedule";

/** The conductor runs as the summary sheet lists them: one row per raceway, with its circuits and conductor count. */
export function conductorSchedule(input: PacketInput): ConductorRow[] {
  return scheduleOf(
    input.designInput,
    input.design,
    input.equipment.inverters.map((l) => ({ lineId: l.lineId, quantity: l.quantity, model: l.item.model })),
  );
}

// Names and units for the computed values a label carries (WarningLabel.values keys).
const LABEL_VALUE_NAMES: Record<string, { name: string; unit: string }> = {
  maxDcVoltageV: { name: "Highest DC voltage", unit: "V" },
  maxDcCircuitCurrentA: { name: "Highest DC circuit current", unit: "A" },
  inverterOutputA: { name: "Rated AC output current", unit: "A" },
  acVoltageV: { name: "Nominal AC voltage", unit: "V" },
  pvBreakerA: { name: "PV breaker", unit: "A" },
  busbarA: { name: "Busbar rating", unit: "A" },
  essVoltageV: { name: "Nominal ESS voltage", unit: "V DC" },
  faultCurrentA: { name: "Available fault current", unit: "A" },
  powerControlSettingA: { name: "Power control setting", unit: "A" },
  sourceA: { name: "Backup source current", unit: "A" },
  inverterBreakerA: { name: "Inverter breaker", unit: "A" },
};

/** Each computed value of a label with its name and unit, e.g. "Highest DC voltage: 463.34 V". */
export function labelValueLines(label: WarningLabel): { name: string; value: string }[] {
  return Object.entries(label.values).map(([key, value]) => {
    const known = LABEL_VALUE_NAMES[key];
    const unit = known?.unit ?? (/V$/.test(key) ? "V" : /A$/.test(key) ? "A" : "");
    return { name: known?.name ?? key, value: formatQuantity(value, unit) };
  });
}

export type StructuralRow = {
  label: string;
  moduleCount: number;
  tilt: string;
  azimuth: string;
  areaFt2: string;
  weightLb: string;
  deadLoad: CheckResult | null;
  attachmentCount: number;
  perAttachment: CheckResult | null;
};

/** Per roof plane: geometry from the editor, loads from the review's roof checks. */
export function structuralRows(input: PacketInput): StructuralRow[] {
  const byId = new Map(input.review.checks.map((c) => [c.id, c]));
  return input.designInput.array.roofPlanes.map((p) => {
    const plane = input.design.roofPlanes.find((e) => e.id === p.lineId);
    const load = plane ? roofPlaneLoad(input.design, plane) : null;
    return {
      label: p.label,
      moduleCount: p.moduleCount,
      tilt: `${formatNumber(p.tiltDeg)}°`,
      azimuth: `${formatNumber(p.azimuthDeg)}°`,
      areaFt2: load ? formatQuantity(load.arrayAreaFt2, "ft²") : "—",
      weightLb: load ? formatQuantity(load.totalWeightLb, "lb") : "—",
      deadLoad: byId.get(`roof-dead-load:${p.lineId}`) ?? null,
      attachmentCount: p.attachmentCount,
      perAttachment: byId.get(`roof-attachment-load:${p.lineId}`) ?? null,
    };
  });
}

/** Where the PV system disconnect is, as entered in the design. */
export function disconnectLocation(input: PacketInput): string {
  return input.designInput.service.pvDisconnectLocation || "Not entered: see the site plan";
}
