import {
  sizeLabel,
  type ConductorRun,
  type Design,
  type Inverter,
  type ModuleLevelDevice,
  type PvModule,
  type PvString,
  type Site,
} from "@/lib/engineering";
import type { DesignDocument } from "./document";
import { storageToDocument } from "./document-storage";
import type { DesignProblem } from "./to-engine";

type Doc = DesignDocument;
export type DocumentFromEngine = { ok: true; document: Doc } | { ok: false; problems: DesignProblem[] };

// The engine holds one module and one device without ids; the document names them.
export const MODULE_ID = "module-1";
export const DEVICE_ID = "device-1";

/** One document string: engine strings "S1.1", "S1.2", … that differ only in their number. */
type StringLine = { id: string; first: PvString; parallel: number; ids: string[] };

const sameJson = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * The engine's input as a design document, so a saved design can be exported and
 * posted back to POST /api/v1/design-review for the same review. Every figure the
 * engine reads is written out, defaults included.
 */
export function engineToDocument(design: Design, site: Site): DocumentFromEngine {
  const problems: DesignProblem[] = [];
  const lines = stringLines(design.strings);
  const document: Doc = {
    codeEdition: String(site.necEdition) as Doc["codeEdition"],
    site: {
      recordLowC: site.recordLowTempC,
      highAmbientC: site.highDesignTempC,
      isDwelling: site.isDwelling,
      peakSunHours: site.peakSunHours,
      ...(site.essSiting
        ? {
            essSiting: {
              code: site.essSiting.code,
              perUnitKwh: site.essSiting.perUnitKwh,
              garageKwh: site.essSiting.aggregateKwh.garage ?? undefined,
              outdoorWallKwh: site.essSiting.aggregateKwh["outdoor-wall"] ?? undefined,
              utilitySpaceKwh: site.essSiting.aggregateKwh["utility-space"] ?? undefined,
            },
          }
        : {}),
    },
    mount: design.mount,
    listedRapidShutdownSystem: design.listedRapidShutdownSystem,
    modules: [fromModule(design.module)],
    inverters: design.inverters.map(fromInverter),
    optimizers: design.moduleLevelDevice ? [fromDevice(design.moduleLevelDevice)] : [],
    strings: lines.map(({ id, first, parallel }) => ({
      id,
      inverterId: first.inverterId,
      moduleId: MODULE_ID,
      optimizerId: design.moduleLevelDevice ? DEVICE_ID : undefined,
      mpptIndex: first.mpptIndex,
      modulesInSeries: first.modulesInSeries,
      parallel,
    })),
    service: fromService(design.service),
    runs: design.runs.map((run, i) =>
      fromRun(design, site, run, lines, (message) => problems.push({ path: `runs.${i}.circuit`, message })),
    ),
    roofPlanes: design.roofPlanes.map((p) => ({
      id: p.id,
      label: p.label,
      moduleCount: p.moduleCount,
      attachmentCount: p.attachmentCount,
      rackingWeightLb: p.rackingWeightLb,
    })),
    attachmentRatedLoadLb: design.attachmentRatedLoadLb,
    cellTempRiseC: design.cellTempRiseC,
    paths: design.paths?.map((p) => ({ id: p.id, label: p.label, runIds: p.runIds })),
    pvDisconnect: design.pvDisconnect,
    rapidShutdownInitiator: design.rapidShutdownInitiator,
    groundingElectrodeConductor: design.groundingElectrodeConductor && {
      ...design.groundingElectrodeConductor,
      size: sizeLabel(design.groundingElectrodeConductor.size),
    },
    acCombiner: design.acCombiner && {
      busbarA: design.acCombiner.busbarA,
      breakersA: design.acCombiner.breakersA && [...design.acCombiner.breakersA],
    },
    ...(design.storage ? { storage: storageToDocument(design.storage) } : {}),
  };
  return problems.length > 0 ? { ok: false, problems } : { ok: true, document };
}

/** Groups consecutive engine strings "X.1" … "X.n" of one inverter input and length back into one line with parallel n. */
function stringLines(strings: PvString[]): StringLine[] {
  const ids = new Set(strings.map((s) => s.id));
  const sameLine = (a: PvString, b: PvString) =>
    a.inverterId === b.inverterId && a.mpptIndex === b.mpptIndex && a.modulesInSeries === b.modulesInSeries;
  const lines: StringLine[] = [];
  for (let i = 0; i < strings.length;) {
    const first = strings[i]!;
    const base = /^(.+)\.1$/.exec(first.id)?.[1];
    let n = 1;
    if (base !== undefined && !ids.has(base)) {
      while (i + n < strings.length && strings[i + n]!.id === `${base}.${n + 1}` && sameLine(strings[i + n]!, first)) n++;
    }
    lines.push({ id: n > 1 ? base! : first.id, first, parallel: n, ids: strings.slice(i, i + n).map((s) => s.id) });
    i += n;
  }
  return lines;
}

function fromModule(m: PvModule): Doc["modules"][number] {
  const voc = m.vocTempCoeff;
  const vmp = m.vmpTempCoeff;
  return {
    id: MODULE_ID,
    maker: m.maker,
    model: m.model,
    pmaxW: m.powerW,
    vocV: m.vocV,
    vmpV: m.vmpV,
    iscA: m.iscA,
    impA: m.impA,
    vocTempCoeffPctPerC: voc?.unit === "%/C" ? voc.value : undefined,
    vocTempCoeffVPerC: voc?.unit === "V/C" ? voc.value : undefined,
    vmpTempCoeffPctPerC: vmp?.unit === "%/C" ? vmp.value : undefined,
    vmpTempCoeffVPerC: vmp?.unit === "V/C" ? vmp.value : undefined,
    pmaxTempCoeffPctPerC: m.pmaxTempCoeffPctPerC,
    maxSeriesFuseA: m.maxSeriesFuseA,
    maxSystemVoltageV: m.maxSystemVoltageV,
    weightLb: m.weightLb,
    // For readers of the document; lengthIn and widthIn, when both are given, are what the review uses.
    areaFt2: Math.round(((m.lengthIn * m.widthIn) / 144) * 100) / 100,
    lengthIn: m.lengthIn,
    widthIn: m.widthIn,
  };
}

function fromInverter(inv: Inverter): Doc["inverters"][number] {
  return {
    id: inv.id,
    maker: inv.maker,
    model: inv.model,
    kind: inv.kind,
    quantity: inv.quantity,
    acRatedW: inv.acPowerW,
    acMaxContinuousA: inv.acOutputCurrentA,
    acNominalV: inv.acVoltageV,
    phases: inv.phase,
    maxDcInputV: inv.maxDcInputV,
    mpptMinV: inv.mpptMinV,
    mpptMaxV: inv.mpptMaxV,
    maxInputCurrentA: inv.maxInputIscA,
    regulatedStringV: inv.regulatedStringV,
    maxStringPowerW: inv.maxStringPowerW,
    terminalC: inv.terminalTempC,
    dcArcFaultProtection: inv.dcArcFaultProtection,
    dcGroundFaultProtection: inv.dcGroundFaultProtection,
    dcDisconnect: inv.dcDisconnect,
  };
}

function fromDevice(d: ModuleLevelDevice): Doc["optimizers"][number] {
  return {
    id: DEVICE_ID,
    kind: d.kind,
    maker: d.maker,
    model: d.model,
    maxInputV: d.maxInputV,
    maxInputCurrentA: d.maxInputIscA,
    maxOutputCurrentA: d.maxOutputCurrentA,
    shutdownOutputV: d.shutdownOutputV,
    maxSystemVoltageV: d.maxSystemVoltageV,
  };
}

function fromService(s: Design["service"]): Doc["service"] {
  return {
    nominalV: s.voltageV,
    phases: s.phase,
    busbarA: s.busbarA,
    mainBreakerA: s.mainBreakerA,
    connection: s.connection,
    pvBreakerA: s.pvBreakerA,
    pvBreakerOppositeEnd: s.pvBreakerAtOppositeEnd,
    otherBreakersA: s.otherBreakersA,
    serviceConductorAmpacityA: s.serviceConductorAmpacityA,
    serviceConductor: s.serviceConductor && { size: sizeLabel(s.serviceConductor.size), material: s.serviceConductor.material },
    panelFeed: s.panelFeed,
    loadSideAt: s.loadSideAt,
    feeder: s.feeder,
    supplySideConductors: s.supplySideConductors && { ...s.supplySideConductors, size: sizeLabel(s.supplySideConductors.size) },
    serviceLocation: s.serviceLocation,
    pvDisconnectLocation: s.pvDisconnectLocation,
  };
}

type CircuitFields = Pick<Doc["runs"][number], "circuit" | "stringId" | "stringIds" | "inverterId" | "combined">;

/** The document names string lines, one inverter's strings, or all of them; other sets cannot be written. */
function fromCircuit(design: Design, run: ConductorRun, lines: StringLine[]): CircuitFields | null {
  if (run.circuit.kind === "dc-strings") {
    const ids = run.circuit.stringIds;
    const combined = run.circuit.combined ?? false;
    // Whole string lines, in order: one line is stringId, several are stringIds.
    const picked: StringLine[] = [];
    for (let at = 0; at < ids.length;) {
      const line = lines.find((l) => l.ids[0] === ids[at] && sameJson(l.ids, ids.slice(at, at + l.ids.length)));
      if (!line) break;
      picked.push(line);
      at += line.ids.length;
    }
    if (picked.reduce((n, l) => n + l.ids.length, 0) === ids.length) {
      return picked.length === 1
        ? { circuit: "dc-string", stringId: picked[0]!.id, combined }
        : { circuit: "dc-string", stringIds: picked.map((l) => l.id), combined };
    }
    if (
      sameJson(
        ids,
        design.strings.map((s) => s.id),
      )
    )
      return { circuit: "dc-output", combined };
    const inverter = design.inverters.find((inv) =>
      sameJson(
        ids,
        design.strings.filter((s) => s.inverterId === inv.id).map((s) => s.id),
      ),
    );
    return inverter ? { circuit: "dc-output", inverterId: inverter.id, combined } : null;
  }
  const sources = run.circuit.sources;
  const combined = run.circuit.combined ?? true;
  if (sources.some((s) => s.units !== undefined)) return null;
  if (
    sameJson(
      sources.map((s) => s.inverterId),
      design.inverters.map((i) => i.id),
    )
  )
    return { circuit: "ac-output", combined };
  return sources.length === 1 ? { circuit: "ac-output", inverterId: sources[0]!.inverterId, combined } : null;
}

function fromRun(
  design: Design,
  site: Site,
  run: ConductorRun,
  lines: StringLine[],
  report: (message: string) => void,
): Doc["runs"][number] {
  const circuit = fromCircuit(design, run, lines);
  if (!circuit)
    report(
      `Run "${run.label}" carries strings or inverter units a design document cannot name: whole strings, one inverter's strings or output, or all of them`,
    );
  const { conductor: c, raceway, egc } = run;
  return {
    id: run.id,
    label: run.label,
    ...(circuit ?? { circuit: "dc-string" }),
    lengthFt: run.lengthFt,
    material: c.material,
    size: sizeLabel(c.size),
    stranded: (c.stranding ?? "stranded") === "stranded",
    insulation: c.insulation,
    insulationC: c.insulationTempC,
    terminalC: run.terminalTempC,
    ambientC: run.ambientTempC ?? site.highDesignTempC,
    aboveRoofIn: run.roofClearanceIn,
    currentCarrying: run.currentCarryingConductors,
    conduit: raceway && {
      type: raceway.type,
      tradeSize: raceway.tradeSize,
      wires: raceway.wires?.map((w) => ({ size: sizeLabel(w.size), count: w.count, insulation: w.insulation, areaIn2: w.areaIn2 })),
    },
    ocpdA: run.ocpdA,
    ocpdIsFuse: run.ocpdIsFuse,
    egc: egc && { size: sizeLabel(egc.size), material: egc.material },
    conductorTempC: run.conductorTempC,
    wireAreaIn2: run.wireAreaIn2,
    mcCable: run.mcCable,
    insideBuilding: run.insideBuilding,
  };
}
