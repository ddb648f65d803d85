import {
  DWELLING_MAX_V,
  DesignInputError,
  OTHER_BUILDING_MAX_V,
  requiredOcpdA,
  type CircuitRef,
  type ConductorRun,
  type Design,
  type Inverter,
  type ModuleLevelDevice,
  type NecEdition,
  type PvModule,
  type PvString,
  type RoofPlane,
  type ServicePanel,
  type Site,
  type TempCoefficient,
} from "@/lib/engineering";
import { type DesignDocument, sizeFromLabel } from "./document";
import { essSitingOf } from "@/lib/authorities/ess-siting";
import { storageFromDocument } from "./document-storage";
import type { DesignProblem } from "./to-engine";

type Doc = DesignDocument;
type Report = (path: string, message: string) => void;

/** Where the engine's single module and device came from, to point engine errors back at the document. */
export type DocumentSources = { moduleIndex: number; deviceIndex: number | null; roofPlanesGiven: boolean; batteryIds?: string[] };

export type EngineFromDocument =
  { ok: true; design: Design; site: Site; sources: DocumentSources } | { ok: false; problems: DesignProblem[] };

// Only the roof-load checks read a module's size and weight. Without roof planes those
// checks are left out of the review (see review-json.ts), so any positive stand-in will do.
const UNUSED_FIGURE = 1;
/** The plane made up to carry the module count when a document gives no roof planes. */
export const WHOLE_ARRAY_PLANE_ID = "whole-array";

/** Parallel copies of a string are named "S1.1", "S1.2", … as the design editor names them, so check ids read the same either way. */
export function parallelStringIds(lineId: string, parallel: number): string[] {
  return parallel === 1 ? [lineId] : Array.from({ length: parallel }, (_, k) => `${lineId}.${k + 1}`);
}

/**
 * A parsed design document as the review engine's input. Problems zod cannot see
 * (unknown or repeated ids, mixed module models, a string on a micro-inverter)
 * come back with the JSON path of the field to fix.
 */
export function documentToEngine(doc: Doc): EngineFromDocument {
  const problems: DesignProblem[] = [];
  const report: Report = (path, message) => problems.push({ path, message });
  for (const key of ["modules", "inverters", "optimizers", "runs", "roofPlanes", "paths"] as const) uniqueIds(doc[key] ?? [], key, report);

  const site = toSite(doc, report);
  const inverters = doc.inverters.map((inv, i) => toInverter(inv, i, site.isDwelling, report));
  const moduleIndex = chooseModule(doc, report);
  const deviceIndex = chooseDevice(doc, report);
  const strings = toStrings(doc, report);
  const runs = doc.runs.map((run, i) => toRun(doc, run, i, strings, report));
  checkPaths(doc, report);
  const roofPlanesGiven = doc.roofPlanes !== undefined;
  const needsRoofData = roofPlanesGiven && doc.mount !== "ground";
  const pvModule = moduleIndex === null ? null : toModule(doc.modules[moduleIndex]!, moduleIndex, needsRoofData, report);
  const service = toService(doc.service, inverters, report);
  const storage = storageFromDocument(doc, report);
  if (problems.length > 0 || moduleIndex === null || pvModule === null) return { ok: false, problems };

  const design: Design = {
    module: pvModule,
    inverters,
    moduleLevelDevice: deviceIndex === null ? undefined : toDevice(doc.optimizers[deviceIndex]!),
    listedRapidShutdownSystem: doc.listedRapidShutdownSystem,
    mount: doc.mount,
    strings: strings.list,
    service,
    runs,
    paths: doc.paths?.map((p) => ({ id: p.id, label: p.label || p.id, runIds: p.runIds })),
    roofPlanes: toRoofPlanes(doc, strings.list, inverters),
    cellTempRiseC: doc.cellTempRiseC,
    attachmentRatedLoadLb: doc.attachmentRatedLoadLb,
    pvDisconnect: doc.pvDisconnect,
    rapidShutdownInitiator: doc.rapidShutdownInitiator,
    groundingElectrodeConductor: doc.groundingElectrodeConductor && {
      ...doc.groundingElectrodeConductor,
      size: sizeFromLabel(doc.groundingElectrodeConductor.size),
    },
    acCombiner: doc.acCombiner,
    ...(storage ? { storage } : {}),
  };
  const batteryIds = doc.storage?.batteries.map((b) => b.id);
  return { ok: true, design, site, sources: { moduleIndex, deviceIndex, roofPlanesGiven, ...(batteryIds ? { batteryIds } : {}) } };
}

function uniqueIds(items: readonly { id: string }[], key: string, report: Report) {
  const seen = new Set<string>();
  items.forEach((item, i) => {
    if (seen.has(item.id)) report(`${key}[${i}].id`, `Another entry of ${key} already uses the id "${item.id}"`);
    seen.add(item.id);
  });
}

function toSite(doc: Doc, report: Report): Site {
  const s = doc.site;
  if (s.recordLowC > s.highAmbientC) report("site.recordLowC", "The record low is above the high ambient temperature; check the two");
  return {
    recordLowTempC: s.recordLowC,
    highDesignTempC: s.highAmbientC,
    necEdition: Number(doc.codeEdition) as NecEdition,
    isDwelling: s.isDwelling ?? true,
    peakSunHours: s.peakSunHours,
    ...(s.essSiting ? { essSiting: essSitingFromDocument(s.essSiting) } : {}),
  };
}

/** The AHJ's adopted residential ESS limits as the document gives them; a figure left out keeps the published one. */
function essSitingFromDocument(e: NonNullable<Doc["site"]["essSiting"]>) {
  return essSitingOf({
    essCode: e.code || null,
    essPerUnitKwh: e.perUnitKwh ?? null,
    essGarageKwh: e.garageKwh ?? null,
    essOutdoorKwh: e.outdoorWallKwh ?? null,
    essUtilitySpaceKwh: e.utilitySpaceKwh ?? null,
  })!;
}

/** The engine reviews one module model: the one every string names, or the only one listed when there are no strings. */
function chooseModule(doc: Doc, report: Report): number | null {
  if (doc.strings.length === 0) {
    if (doc.modules.length === 1) return 0;
    report("modules", "Without strings the review cannot tell which module the design uses; list exactly one");
    return null;
  }
  let chosen: number | null = null;
  doc.strings.forEach((s, i) => {
    const index = doc.modules.findIndex((m) => m.id === s.moduleId);
    if (index < 0) return report(`strings[${i}].moduleId`, `No module with id "${s.moduleId}" is in modules`);
    if (chosen === null) chosen = index;
    else if (index !== chosen)
      report(
        `strings[${i}].moduleId`,
        `The review takes one module model per design; this string uses "${s.moduleId}", an earlier one "${doc.modules[chosen]!.id}"`,
      );
  });
  return chosen;
}

/** Likewise one module-level device, or none, for every string. */
function chooseDevice(doc: Doc, report: Report): number | null {
  if (doc.strings.length === 0) {
    if (doc.optimizers.length > 1)
      report("optimizers", "Without strings the review cannot tell which module-level device the design uses; list at most one");
    return doc.optimizers.length === 1 ? 0 : null;
  }
  const first = doc.strings[0]!;
  doc.strings.forEach((s, i) => {
    if (s.optimizerId !== undefined && !doc.optimizers.some((o) => o.id === s.optimizerId)) {
      return report(`strings[${i}].optimizerId`, `No module-level device with id "${s.optimizerId}" is in optimizers`);
    }
    if (s.optimizerId !== first.optimizerId)
      report(
        `strings[${i}].optimizerId`,
        `The review takes one module-level device, or none, for every string; this string differs from "${first.id}"`,
      );
  });
  const index = doc.optimizers.findIndex((o) => o.id === first.optimizerId);
  return index < 0 ? null : index;
}

function toModule(m: Doc["modules"][number], index: number, needsRoofData: boolean, report: Report): PvModule {
  const at = `modules[${index}]`;
  if (m.vocTempCoeffPctPerC !== undefined && m.vocTempCoeffVPerC !== undefined)
    report(`${at}.vocTempCoeffVPerC`, "Give the Voc coefficient in %/°C or in V/°C, not both");
  if (m.vmpTempCoeffPctPerC !== undefined && m.vmpTempCoeffVPerC !== undefined)
    report(`${at}.vmpTempCoeffVPerC`, "Give the Vmp coefficient in %/°C or in V/°C, not both");
  if (m.vmpV > m.vocV) report(`${at}.vmpV`, "Vmp must not exceed Voc; check the data sheet entries");
  if (m.impA > m.iscA) report(`${at}.impA`, "Imp must not exceed Isc; check the data sheet entries");
  if ((m.lengthIn === undefined) !== (m.widthIn === undefined))
    report(`${at}.${m.lengthIn === undefined ? "lengthIn" : "widthIn"}`, "Give both lengthIn and widthIn, or areaFt2 alone");
  // The roof load reads only the area, so a square of the same area stands in for the outline.
  const side = m.areaFt2 === undefined ? undefined : Math.sqrt(m.areaFt2) * 12;
  const lengthIn = m.lengthIn !== undefined && m.widthIn !== undefined ? m.lengthIn : side;
  const widthIn = m.lengthIn !== undefined && m.widthIn !== undefined ? m.widthIn : side;
  if (needsRoofData && lengthIn === undefined)
    report(`${at}.areaFt2`, "The roof load needs the module's area (areaFt2, or lengthIn and widthIn)");
  if (needsRoofData && m.weightLb === undefined) report(`${at}.weightLb`, "The roof load needs the module's weight");
  return {
    maker: m.maker ?? "",
    model: m.model || `module ${m.id}`,
    powerW: m.pmaxW,
    vocV: m.vocV,
    vmpV: m.vmpV,
    iscA: m.iscA,
    impA: m.impA,
    vocTempCoeff: coefficient(m.vocTempCoeffPctPerC, m.vocTempCoeffVPerC),
    vmpTempCoeff: coefficient(m.vmpTempCoeffPctPerC, m.vmpTempCoeffVPerC),
    pmaxTempCoeffPctPerC: m.pmaxTempCoeffPctPerC,
    maxSeriesFuseA: m.maxSeriesFuseA,
    maxSystemVoltageV: m.maxSystemVoltageV,
    lengthIn: lengthIn ?? UNUSED_FIGURE,
    widthIn: widthIn ?? UNUSED_FIGURE,
    weightLb: m.weightLb ?? UNUSED_FIGURE,
  };
}

function coefficient(pctPerC: number | undefined, vPerC: number | undefined): TempCoefficient | undefined {
  if (pctPerC !== undefined) return { value: pctPerC, unit: "%/C" };
  return vPerC === undefined ? undefined : { value: vPerC, unit: "V/C" };
}

function toInverter(inv: Doc["inverters"][number], index: number, isDwelling: boolean, report: Report): Inverter {
  if (inv.maxDcInputV === undefined && inv.kind === "micro")
    report(`inverters[${index}].maxDcInputV`, "Micro-inverters need maxDcInputV: each module's cold Voc is checked against it");
  return {
    id: inv.id,
    maker: inv.maker ?? "",
    model: inv.model || `inverter ${inv.id}`,
    kind: inv.kind,
    quantity: inv.quantity ?? 1,
    acPowerW: inv.acRatedW,
    acOutputCurrentA: inv.acMaxContinuousA,
    acVoltageV: inv.acNominalV,
    phase: inv.phases,
    // Without the inverter's own limit a string is held to the 690.7 limit alone.
    maxDcInputV: inv.maxDcInputV ?? (isDwelling ? DWELLING_MAX_V : OTHER_BUILDING_MAX_V),
    mpptMinV: inv.mpptMinV,
    mpptMaxV: inv.mpptMaxV,
    maxInputIscA: inv.maxInputCurrentA,
    regulatedStringV: inv.regulatedStringV,
    maxStringPowerW: inv.maxStringPowerW,
    terminalTempC: inv.terminalC,
    dcArcFaultProtection: inv.dcArcFaultProtection,
    dcGroundFaultProtection: inv.dcGroundFaultProtection,
    dcDisconnect: inv.dcDisconnect,
  };
}

function toDevice(o: Doc["optimizers"][number]): ModuleLevelDevice {
  return {
    kind: o.kind ?? "optimizer",
    maker: o.maker ?? "",
    model: o.model || `device ${o.id}`,
    maxInputV: o.maxInputV,
    maxInputIscA: o.maxInputCurrentA,
    maxOutputCurrentA: o.maxOutputCurrentA,
    shutdownOutputV: o.shutdownOutputV,
    maxSystemVoltageV: o.maxSystemVoltageV,
  };
}

type Strings = { list: PvString[]; idsByLine: Map<string, string[]> };

function toStrings(doc: Doc, report: Report): Strings {
  const list: PvString[] = [];
  const idsByLine = new Map<string, string[]>();
  const taken = new Set<string>();
  doc.strings.forEach((s, i) => {
    const inverter = doc.inverters.find((inv) => inv.id === s.inverterId);
    if (!inverter) return report(`strings[${i}].inverterId`, `No inverter with id "${s.inverterId}" is in inverters`);
    if (inverter.kind === "micro") {
      return report(
        `strings[${i}].inverterId`,
        `"${s.inverterId}" is a micro-inverter: each module has its own, so there are no DC strings; leave them out (the module count comes from roofPlanes or the micro-inverters' quantity)`,
      );
    }
    const ids = parallelStringIds(s.id, s.parallel);
    const clash = ids.find((id) => taken.has(id));
    if (clash)
      return report(
        `strings[${i}].id`,
        `Another string already uses the id "${clash}"${s.parallel > 1 ? ` (parallel copies are numbered "${s.id}.1", "${s.id}.2", …)` : ""}`,
      );
    ids.forEach((id) => taken.add(id));
    idsByLine.set(s.id, ids);
    for (const id of ids) list.push({ id, inverterId: s.inverterId, mpptIndex: s.mpptIndex, modulesInSeries: s.modulesInSeries });
  });
  return { list, idsByLine };
}

function toCircuit(doc: Doc, run: Doc["runs"][number], at: string, strings: Strings, report: Report): CircuitRef | null {
  if (run.circuit === "dc-string") {
    if (run.inverterId !== undefined)
      report(`${at}.inverterId`, "A dc-string run carries the string named by stringId; leave inverterId out");
    if (run.stringId !== undefined && run.stringIds !== undefined)
      report(`${at}.stringIds`, "Give stringId for one string or stringIds for several, not both");
    const lines = run.stringIds ?? (run.stringId === undefined ? [] : [run.stringId]);
    if (lines.length === 0) report(`${at}.stringId`, "Name the string this run carries (stringId), or the strings sharing it (stringIds)");
    const ids: string[] = [];
    lines.forEach((line, j) => {
      const found = strings.idsByLine.get(line);
      if (!found) report(run.stringIds ? `${at}.stringIds[${j}]` : `${at}.stringId`, `No string with id "${line}" is in strings`);
      else ids.push(...found);
    });
    return ids.length > 0 ? { kind: "dc-strings", stringIds: ids, combined: run.combined ?? false } : null;
  }
  if (run.stringId !== undefined || run.stringIds !== undefined)
    report(
      `${at}.${run.stringId !== undefined ? "stringId" : "stringIds"}`,
      `Only dc-string runs name strings; a ${run.circuit} run names an inverter, or none for all of them`,
    );
  if (run.inverterId !== undefined && !doc.inverters.some((i) => i.id === run.inverterId)) {
    report(`${at}.inverterId`, `No inverter with id "${run.inverterId}" is in inverters`);
    return null;
  }
  if (run.circuit === "ac-output") {
    const ids = run.inverterId === undefined ? doc.inverters.map((i) => i.id) : [run.inverterId];
    return { kind: "ac-output", sources: ids.map((inverterId) => ({ inverterId })), combined: run.combined ?? true };
  }
  const stringIds = strings.list.filter((s) => run.inverterId === undefined || s.inverterId === run.inverterId).map((s) => s.id);
  if (stringIds.length === 0) {
    report(
      run.inverterId === undefined ? `${at}.circuit` : `${at}.inverterId`,
      run.inverterId === undefined
        ? "A dc-output run carries strings, but the design has none"
        : `No string feeds inverter "${run.inverterId}"`,
    );
    return null;
  }
  return { kind: "dc-strings", stringIds, combined: run.combined ?? true };
}

function toRun(doc: Doc, run: Doc["runs"][number], index: number, strings: Strings, report: Report): ConductorRun {
  const at = `runs[${index}]`;
  const circuit = toCircuit(doc, run, at, strings, report);
  if (run.insulationC === 60)
    report(`${at}.insulationC`, "The review's correction tables cover 75 °C and 90 °C insulation; 60 °C insulation cannot be checked");
  if (run.mcCable && run.conduit) report(`${at}.mcCable`, "A run is in a conduit or in Type MC cable, not both");
  const size = sizeFromLabel(run.size);
  const egc = run.egc ? { size: sizeFromLabel(run.egc.size), material: run.egc.material ?? run.material } : undefined;
  const c = run.conduit;
  return {
    id: run.id,
    label: run.label || run.id,
    circuit: circuit ?? { kind: "dc-strings", stringIds: [] },
    lengthFt: run.lengthFt,
    conductor: {
      size,
      material: run.material,
      stranding: run.stranded ? "stranded" : "solid",
      insulationTempC: run.insulationC as 75 | 90,
      insulation: run.insulation || undefined,
    },
    terminalTempC: run.terminalC,
    currentCarryingConductors: run.currentCarrying,
    ambientTempC: run.ambientC,
    roofClearanceIn: run.aboveRoofIn,
    ocpdA: run.ocpdA,
    ocpdIsFuse: run.ocpdIsFuse,
    egc,
    conductorTempC: run.conductorTempC,
    raceway: c && {
      type: c.type,
      tradeSize: c.tradeSize,
      wires: c.wires?.map((w) => ({
        size: sizeFromLabel(w.size),
        count: w.count,
        insulation: w.insulation || undefined,
        areaIn2: w.areaIn2,
      })),
    },
    wireAreaIn2: run.wireAreaIn2,
    mcCable: run.mcCable,
    insideBuilding: run.insideBuilding,
  };
}

function checkPaths(doc: Doc, report: Report) {
  const runIds = new Set(doc.runs.map((r) => r.id));
  doc.paths?.forEach((p, i) =>
    p.runIds.forEach((id, j) => runIds.has(id) || report(`paths[${i}].runIds[${j}]`, `No run with id "${id}" is in runs`)),
  );
}

function toService(s: Doc["service"], inverters: Inverter[], report: Report): ServicePanel {
  let pvBreakerA = s.pvBreakerA;
  if (pvBreakerA === undefined) {
    // Not given: the smallest standard breaker the inverters' output needs (705.30(B) / 690.9(B)).
    try {
      pvBreakerA = requiredOcpdA(inverters.reduce((sum, i) => sum + i.quantity * i.acOutputCurrentA, 0));
    } catch (err) {
      if (!(err instanceof DesignInputError)) throw err;
      report("service.pvBreakerA", `Give the PV breaker rating: ${err.message}`);
    }
  }
  return {
    voltageV: s.nominalV,
    phase: s.phases,
    busbarA: s.busbarA,
    mainBreakerA: s.mainBreakerA,
    connection: s.connection,
    pvBreakerA: pvBreakerA ?? UNUSED_FIGURE,
    pvBreakerAtOppositeEnd: s.pvBreakerOppositeEnd ?? false,
    otherBreakersA: s.otherBreakersA,
    serviceConductorAmpacityA: s.serviceConductorAmpacityA,
    serviceConductor: s.serviceConductor && { size: sizeFromLabel(s.serviceConductor.size), material: s.serviceConductor.material },
    panelFeed: s.panelFeed,
    loadSideAt: s.loadSideAt,
    feeder: s.feeder,
    supplySideConductors: s.supplySideConductors && { ...s.supplySideConductors, size: sizeFromLabel(s.supplySideConductors.size) },
    serviceLocation: s.serviceLocation || undefined,
    pvDisconnectLocation: s.pvDisconnectLocation || undefined,
  };
}

/** The document's roof planes, or one made-up plane holding every module so the ratings still count them. */
function toRoofPlanes(doc: Doc, strings: PvString[], inverters: Inverter[]): RoofPlane[] {
  if (doc.roofPlanes)
    return doc.roofPlanes.map((p) => ({
      id: p.id,
      label: p.label || p.id,
      moduleCount: p.moduleCount,
      attachmentCount: p.attachmentCount,
      rackingWeightLb: p.rackingWeightLb,
    }));
  const inStrings = strings.reduce((n, s) => n + s.modulesInSeries, 0);
  const onMicros = inverters.filter((i) => i.kind === "micro").reduce((n, i) => n + i.quantity, 0);
  return [{ id: WHOLE_ARRAY_PLANE_ID, label: "Whole array", moduleCount: inStrings || onMicros, attachmentCount: 1, rackingWeightLb: 0 }];
}
