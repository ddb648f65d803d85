import type {
  ArrayDesign,
  ConductorRun,
  EssSitingLimits,
  Design,
  Inverter,
  ModuleLevelDevice,
  NecEdition,
  PvModule,
  PvString,
  RacewayType,
  Site,
  TradeSize,
} from "@/lib/engineering";
import type { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { storageFromInput } from "./storage-to-engine";

export type SiteConditions = {
  recordLowTempC: number;
  highDesignTempC: number;
  necEdition: NecEdition;
  essSiting?: EssSitingLimits; // the AHJ's adopted residential ESS limits; absent: the published ones
};

/** A design entry that points at something missing; path is the form field to fix. */
export type DesignProblem = { path: string; message: string };

export type EngineInput = { ok: true; design: Design; site: Site } | { ok: false; problems: DesignProblem[] };

const expandStringIds = (lineId: string, parallel: number) =>
  parallel === 1 ? [lineId] : Array.from({ length: parallel }, (_, k) => `${lineId}.${k + 1}`);
const yesNo = (v: string | undefined) => (v === "yes" ? true : v === "no" ? false : undefined);

type ModuleItem = Extract<EquipmentDto, { kind: "module" }>;
type InverterItem = Extract<EquipmentDto, { kind: "inverter" }>;
type DeviceItem = Extract<EquipmentDto, { kind: "device" }>;

/** A catalog module as the engine reads it. */
export function moduleFromCatalog(item: ModuleItem): PvModule {
  const m = item.specs;
  return {
    maker: item.maker,
    model: item.model,
    powerW: m.powerW,
    vocV: m.vocV,
    vmpV: m.vmpV,
    iscA: m.iscA,
    impA: m.impA,
    vocTempCoeff: m.vocTempCoeff,
    pmaxTempCoeffPctPerC: m.pmaxTempCoeffPctPerC,
    maxSeriesFuseA: m.maxSeriesFuseA,
    maxSystemVoltageV: m.maxSystemVoltageV,
    lengthIn: m.lengthIn,
    widthIn: m.widthIn,
    weightLb: m.weightLb,
  };
}

/** A catalog inverter on an inverter line of the design. */
export function inverterFromCatalog(lineId: string, quantity: number, item: InverterItem): Inverter {
  const s = item.specs;
  return {
    id: lineId,
    maker: item.maker,
    model: item.model,
    kind: s.inverterKind,
    quantity,
    acPowerW: s.acPowerW,
    acOutputCurrentA: s.acOutputCurrentA,
    acVoltageV: s.acVoltageV,
    phase: s.phase,
    maxDcInputV: s.maxDcInputV,
    mpptMinV: s.mpptMinV,
    mpptMaxV: s.mpptMaxV,
    maxInputIscA: s.maxInputIscA,
    regulatedStringV: s.regulatedStringV,
    maxStringPowerW: s.maxStringPowerW,
    terminalTempC: s.terminalTempC,
    dcArcFaultProtection: s.dcArcFaultProtection,
    dcGroundFaultProtection: s.dcGroundFaultProtection,
    dcDisconnect: s.dcDisconnect,
  };
}

/** A catalog module-level device. */
export function deviceFromCatalog(item: DeviceItem): ModuleLevelDevice {
  const s = item.specs;
  return {
    kind: s.deviceKind,
    maker: item.maker,
    model: item.model,
    maxInputV: s.maxInputV,
    maxInputIscA: s.maxInputIscA,
    maxOutputCurrentA: s.maxOutputCurrentA,
    shutdownOutputV: s.shutdownOutputV,
    maxSystemVoltageV: s.maxSystemVoltageV,
  };
}

type Equipment = { moduleId: string; inverters: { lineId: string; equipmentId: string; quantity: number }[]; deviceId: string | null };

/** The catalog items an equipment step names, or the problems with it. */
export function equipmentFromCatalog(
  equipment: Equipment,
  catalog: EquipmentDto[],
): { module: PvModule | null; inverters: Inverter[]; device: ModuleLevelDevice | undefined; problems: DesignProblem[] } {
  const problems: DesignProblem[] = [];
  const byId = new Map(catalog.map((item) => [item.id, item]));
  const moduleItem = byId.get(equipment.moduleId);
  if (moduleItem?.kind !== "module") problems.push({ path: "equipment.moduleId", message: "Choose a PV module from the catalog" });
  const inverters: Inverter[] = [];
  equipment.inverters.forEach((line, i) => {
    const item = byId.get(line.equipmentId);
    if (item?.kind !== "inverter")
      return problems.push({
        path: `equipment.inverters.${i}.equipmentId`,
        message: `Inverter line ${line.lineId}: choose an inverter from the catalog`,
      });
    inverters.push(inverterFromCatalog(line.lineId, line.quantity, item));
  });
  let device: ModuleLevelDevice | undefined;
  if (equipment.deviceId) {
    const item = byId.get(equipment.deviceId);
    if (item?.kind !== "device")
      problems.push({ path: "equipment.deviceId", message: "Choose a module-level device from the catalog, or none" });
    else device = deviceFromCatalog(item);
  }
  return { module: moduleItem?.kind === "module" ? moduleFromCatalog(moduleItem) : null, inverters, device, problems };
}

type StringLine = DesignInput["array"]["strings"][number];

/** The engine's strings of the editor's string lines; parallel copies are numbered "S1.1", "S1.2", …. */
export function stringsOfLines(
  lines: StringLine[],
  inverterLineIds: Set<string>,
): { strings: PvString[]; idsByLine: Map<string, string[]>; problems: DesignProblem[] } {
  const strings: PvString[] = [];
  const idsByLine = new Map<string, string[]>();
  const problems: DesignProblem[] = [];
  lines.forEach((line, i) => {
    if (!line.inverterLineId || !inverterLineIds.has(line.inverterLineId))
      return problems.push({ path: `array.strings.${i}.inverterLineId`, message: `String ${line.lineId}: choose the inverter it feeds` });
    const ids = expandStringIds(line.lineId, line.parallelCount);
    idsByLine.set(line.lineId, ids);
    ids.forEach((id) =>
      strings.push({ id, inverterId: line.inverterLineId!, mpptIndex: line.mpptIndex, modulesInSeries: line.modulesInSeries }),
    );
  });
  return { strings, idsByLine, problems };
}

/** The equipment and strings alone, for the checks that need nothing more. */
export function toArrayDesign(
  equipment: Equipment,
  lines: StringLine[],
  mount: "roof" | "ground" | undefined,
  listed: boolean | undefined,
  catalog: EquipmentDto[],
): ArrayDesign | null {
  const eq = equipmentFromCatalog(equipment, catalog);
  if (!eq.module || eq.inverters.length === 0) return null;
  const { strings } = stringsOfLines(lines, new Set(eq.inverters.map((i) => i.id)));
  return {
    module: eq.module,
    inverters: eq.inverters,
    moduleLevelDevice: eq.device,
    strings,
    mount,
    listedRapidShutdownSystem: listed ?? false,
  };
}

type RunInput = DesignInput["runs"][number];

function runOf(
  run: RunInput,
  i: number,
  strings: PvString[],
  idsByLine: Map<string, string[]>,
  inverterLineIds: Set<string>,
  problems: DesignProblem[],
): ConductorRun | null {
  const [kind, ref] = run.circuit.split(":") as ["dc" | "ac", string];
  const combined = run.arrangement === "combined" ? true : run.arrangement === "separate" ? false : undefined;
  let circuit: ConductorRun["circuit"] | null = null;
  if (kind === "dc") {
    const ids = ref === "all" ? strings.map((s) => s.id) : idsByLine.get(ref);
    if (ids?.length) circuit = { kind: "dc-strings", stringIds: ids, combined: combined ?? false };
  } else {
    const lines = ref === "all" ? [...inverterLineIds] : inverterLineIds.has(ref) ? [ref] : [];
    if (lines.length) circuit = { kind: "ac-output", sources: lines.map((inverterId) => ({ inverterId })), combined: combined ?? true };
  }
  if (!circuit) {
    problems.push({
      path: `runs.${i}.circuit`,
      message: `Run "${run.label}": choose a string or an inverter output that exists in this design`,
    });
    return null;
  }
  const egcSize = run.egcSize || undefined;
  const conduit = run.racewayType === "EMT" || run.racewayType === "PVC-40";
  return {
    id: run.lineId,
    label: run.label,
    circuit,
    lengthFt: run.lengthFt,
    conductor: {
      size: run.size,
      material: run.material,
      stranding: run.stranding,
      insulationTempC: Number(run.insulationTempC) as 75 | 90,
      insulation: run.insulation,
    },
    terminalTempC: run.terminalTempC ? (Number(run.terminalTempC) as 60 | 75 | 90) : undefined,
    currentCarryingConductors: run.currentCarryingConductors,
    ambientTempC: run.ambientTempC,
    roofClearanceIn: run.onRoof ? (run.roofClearanceIn ?? 0) : undefined,
    ocpdA: run.ocpdA,
    egc: egcSize ? { size: egcSize, material: run.material } : undefined,
    raceway: conduit && run.tradeSize ? { type: run.racewayType as RacewayType, tradeSize: run.tradeSize as TradeSize } : undefined,
    mcCable: run.racewayType === "MC" || undefined,
    wireAreaIn2: run.wireAreaIn2,
    insideBuilding: run.route === "inside" ? true : run.route === "outdoors" ? false : undefined,
  };
}

function serviceOf(s: DesignInput["service"]): Design["service"] {
  const feeder =
    s.loadSideAt === "feeder" || s.loadSideAt === "feed-through"
      ? {
          ampacityA: s.feederAmpacityA,
          ocpdA: s.feederOcpdA,
          loadSideOcpdA: s.feederLoadSideOcpdA,
          tapAmpacityA: s.feederTapAmpacityA,
          atOppositeEnd: s.feederAtOppositeEnd ?? false,
        }
      : undefined;
  return {
    voltageV: Number(s.voltageV),
    phase: Number(s.phase) as 1 | 3,
    busbarA: s.busbarA,
    mainBreakerA: s.mainBreakerA ?? null,
    connection: s.connection,
    pvBreakerA: s.pvBreakerA,
    pvBreakerAtOppositeEnd: s.pvBreakerAtOppositeEnd ?? false,
    otherBreakersA: s.otherBreakersA,
    serviceLocation: s.serviceLocation || undefined,
    pvDisconnectLocation: s.pvDisconnectLocation || undefined,
    panelFeed: s.panelFeed,
    loadSideAt: s.connection === "load-side" ? s.loadSideAt : undefined,
    feeder,
    supplySideConductors: s.supplyConductorSize
      ? { size: s.supplyConductorSize, material: s.supplyConductorMaterial || "Cu", lengthToOcpdFt: s.supplyTapLengthFt }
      : undefined,
    serviceConductor: s.serviceConductorSize ? { size: s.serviceConductorSize, material: s.serviceConductorMaterial || "Cu" } : undefined,
  };
}

/**
 * Turns the editor's design (catalog ids, strings with a parallel count, runs
 * naming what they carry) into the review engine's plain input.
 */
export function toEngineInput(input: DesignInput, catalog: EquipmentDto[], conditions: SiteConditions): EngineInput {
  const eq = equipmentFromCatalog(input.equipment, catalog);
  const problems = [...eq.problems];
  const inverterLineIds = new Set(input.equipment.inverters.map((l) => l.lineId));
  const lines = stringsOfLines(input.array.strings, inverterLineIds);
  problems.push(...lines.problems);
  const runs = input.runs
    .map((run, i) => runOf(run, i, lines.strings, lines.idsByLine, inverterLineIds, problems))
    .filter((r): r is ConductorRun => r !== null);
  const stored = storageFromInput(input.storage, catalog, eq.inverters, input.equipment.inverters);
  problems.push(...stored.problems);
  if (problems.length || !eq.module) return { ok: false, problems };

  const s = input.service;
  const design: Design = {
    module: eq.module,
    inverters: eq.inverters,
    moduleLevelDevice: eq.device,
    listedRapidShutdownSystem: input.equipment.listedRapidShutdownSystem ?? false,
    mount: input.array.mount,
    strings: lines.strings,
    service: serviceOf(s),
    runs,
    roofPlanes: input.array.roofPlanes.map((p) => ({
      id: p.lineId,
      label: p.label,
      moduleCount: p.moduleCount,
      attachmentCount: p.attachmentCount,
      rackingWeightLb: p.rackingWeightLb,
    })),
    pvDisconnect: s.pvDisconnectKind
      ? {
          kind: s.pvDisconnectKind,
          ratingA: s.pvDisconnectRatingA,
          voltageRatingV: s.pvDisconnectVoltageV,
          readilyAccessible: yesNo(s.pvDisconnectAccessible),
        }
      : undefined,
    rapidShutdownInitiator: s.rsdInitiatorKind
      ? { kind: s.rsdInitiatorKind, outsideReadilyAccessible: yesNo(s.rsdInitiatorOutside) }
      : undefined,
    groundingElectrodeConductor: s.gecSize
      ? { size: s.gecSize, material: s.gecMaterial || "Cu", electrode: s.gecElectrode || "other" }
      : undefined,
    acCombiner: s.combinerBusbarA !== undefined ? { busbarA: s.combinerBusbarA } : undefined,
    ...(stored.storage ? { storage: stored.storage } : {}),
  };
  const site: Site = { ...conditions, isDwelling: input.site.isDwelling ?? true, peakSunHours: input.site.peakSunHours };
  return { ok: true, design, site };
}
