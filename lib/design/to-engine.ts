import type { ConductorRun, Design, Inverter, ModuleLevelDevice, NecEdition, PvModule, PvString, RacewayType, Site, TradeSize } from "@/lib/engineering";
import type { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";

export type SiteConditions = { recordLowTempC: number; highDesignTempC: number; necEdition: NecEdition };

/** A design entry that points at something missing; path is the form field to fix. */
export type DesignProblem = { path: string; message: string };

export type EngineInput = { ok: true; design: Design; site: Site } | { ok: false; problems: DesignProblem[] };

const expandStringIds = (lineId: string, parallel: number) => (parallel === 1 ? [lineId] : Array.from({ length: parallel }, (_, k) => `${lineId}.${k + 1}`));

/**
 * Turns the editor's design (catalog ids, strings with a parallel count, runs
 * naming what they carry) into the review engine's plain input.
 */
export function toEngineInput(input: DesignInput, catalog: EquipmentDto[], conditions: SiteConditions): EngineInput {
  const problems: DesignProblem[] = [];
  const byId = new Map(catalog.map((item) => [item.id, item]));

  const moduleItem = byId.get(input.equipment.moduleId);
  if (moduleItem?.kind !== "module") problems.push({ path: "equipment.moduleId", message: "Choose a PV module from the catalog" });

  const inverters: Inverter[] = [];
  input.equipment.inverters.forEach((line, i) => {
    const item = byId.get(line.equipmentId);
    if (item?.kind !== "inverter") return problems.push({ path: `equipment.inverters.${i}.equipmentId`, message: "Choose an inverter from the catalog" });
    const s = item.specs;
    inverters.push({
      id: line.lineId, maker: item.maker, model: item.model, kind: s.inverterKind, quantity: line.quantity,
      acPowerW: s.acPowerW, acOutputCurrentA: s.acOutputCurrentA, acVoltageV: s.acVoltageV, phase: s.phase, maxDcInputV: s.maxDcInputV,
      mpptMinV: s.mpptMinV, mpptMaxV: s.mpptMaxV, maxInputIscA: s.maxInputIscA, regulatedStringV: s.regulatedStringV, maxStringPowerW: s.maxStringPowerW,
    });
  });

  let moduleLevelDevice: ModuleLevelDevice | undefined;
  if (input.equipment.deviceId) {
    const item = byId.get(input.equipment.deviceId);
    if (item?.kind !== "device") problems.push({ path: "equipment.deviceId", message: "Choose a module-level device from the catalog, or none" });
    else moduleLevelDevice = { kind: item.specs.deviceKind, maker: item.maker, model: item.model, maxInputV: item.specs.maxInputV, maxInputIscA: item.specs.maxInputIscA, maxOutputCurrentA: item.specs.maxOutputCurrentA, shutdownOutputV: item.specs.shutdownOutputV };
  }

  const inverterLineIds = new Set(input.equipment.inverters.map((l) => l.lineId));
  const strings: PvString[] = [];
  const stringIdsByLine = new Map<string, string[]>();
  input.array.strings.forEach((line, i) => {
    if (!line.inverterLineId || !inverterLineIds.has(line.inverterLineId)) return problems.push({ path: `array.strings.${i}.inverterLineId`, message: "Choose the inverter this string feeds" });
    const ids = expandStringIds(line.lineId, line.parallelCount);
    stringIdsByLine.set(line.lineId, ids);
    ids.forEach((id) => strings.push({ id, inverterId: line.inverterLineId!, mpptIndex: line.mpptIndex, modulesInSeries: line.modulesInSeries }));
  });

  const runs: ConductorRun[] = [];
  input.runs.forEach((run, i) => {
    const [kind, ref] = run.circuit.split(":") as ["dc" | "ac", string];
    let circuit: ConductorRun["circuit"] | null = null;
    if (kind === "dc") {
      const ids = ref === "all" ? strings.map((s) => s.id) : stringIdsByLine.get(ref);
      if (ids?.length) circuit = { kind: "dc-strings", stringIds: ids };
    } else {
      const lines = ref === "all" ? [...inverterLineIds] : inverterLineIds.has(ref) ? [ref] : [];
      if (lines.length) circuit = { kind: "ac-output", sources: lines.map((inverterId) => ({ inverterId })) };
    }
    if (!circuit) return problems.push({ path: `runs.${i}.circuit`, message: "Choose a string or an inverter output that exists in this design" });
    const egcSize = run.egcSize || undefined;
    const hasRaceway = run.racewayType !== "none" && run.tradeSize;
    runs.push({
      id: run.lineId,
      label: run.label,
      circuit,
      lengthFt: run.lengthFt,
      conductor: { size: run.size, material: run.material, stranding: run.stranding, insulationTempC: Number(run.insulationTempC) as 75 | 90, insulation: run.insulation || undefined },
      terminalTempC: Number(run.terminalTempC) as 60 | 75 | 90,
      currentCarryingConductors: run.currentCarryingConductors,
      ambientTempC: run.ambientTempC,
      roofClearanceIn: run.onRoof ? (run.roofClearanceIn ?? 0) : undefined,
      ocpdA: run.ocpdA,
      egc: egcSize ? { size: egcSize, material: run.material } : undefined,
      raceway: hasRaceway
        ? { type: run.racewayType as RacewayType, tradeSize: run.tradeSize as TradeSize, wires: [{ size: run.size, count: run.currentCarryingConductors }, ...(egcSize ? [{ size: egcSize, count: 1 }] : [])] }
        : undefined,
    });
  });

  if (problems.length || moduleItem?.kind !== "module") return { ok: false, problems };
  const m = moduleItem.specs;
  const pvModule: PvModule = {
    maker: moduleItem.maker, model: moduleItem.model, powerW: m.powerW, vocV: m.vocV, vmpV: m.vmpV, iscA: m.iscA, impA: m.impA,
    vocTempCoeff: m.vocTempCoeff, pmaxTempCoeffPctPerC: m.pmaxTempCoeffPctPerC, maxSeriesFuseA: m.maxSeriesFuseA, lengthIn: m.lengthIn, widthIn: m.widthIn, weightLb: m.weightLb,
  };
  const s = input.service;
  const design: Design = {
    module: pvModule,
    inverters,
    moduleLevelDevice,
    listedRapidShutdownSystem: input.equipment.listedRapidShutdownSystem ?? false,
    mount: input.array.mount,
    strings,
    service: {
      voltageV: Number(s.voltageV), phase: Number(s.phase) as 1 | 3, busbarA: s.busbarA, mainBreakerA: s.mainBreakerA ?? null, connection: s.connection,
      pvBreakerA: s.pvBreakerA, pvBreakerAtOppositeEnd: s.pvBreakerAtOppositeEnd ?? false, otherBreakersA: s.otherBreakersA,
      serviceLocation: s.serviceLocation || undefined, pvDisconnectLocation: s.pvDisconnectLocation || undefined,
    },
    runs,
    roofPlanes: input.array.roofPlanes.map((p) => ({ id: p.lineId, label: p.label, moduleCount: p.moduleCount, attachmentCount: p.attachmentCount, rackingWeightLb: p.rackingWeightLb })),
  };
  const site: Site = { ...conditions, isDwelling: input.site.isDwelling ?? true, peakSunHours: input.site.peakSunHours };
  return { ok: true, design, site };
}
