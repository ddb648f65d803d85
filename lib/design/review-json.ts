import {
  circuitConductorCount,
  coldModuleVoc,
  egcRequirement,
  evaluateLoadSideRules,
  evaluateRun,
  racewayFill,
  rapidShutdownMethod,
  requiredOcpdA,
  runCircuits,
  runRacewayWires,
  unlessInputError,
  runVoltageDrop,
  shutdownStringVoltageV,
  sizeLabel,
  stringMaxCurrentA,
  type CheckResult,
  type CheckStatus,
  type ConductorRun,
  type Design,
  type PvString,
  type ReviewResult,
  type Site,
} from "@/lib/engineering";
import { round, worstStatus } from "@/lib/engineering/check-result";
import { governingLoadSideRule } from "@/lib/engineering/checks/point-of-connection";
import { totalInverterOutputA } from "@/lib/engineering/design-lookup";

/** The review as the JSON API answers it; figures are rounded as the checks round theirs (two decimals). */
export type ReviewJson = {
  status: CheckStatus;
  ratings: { dcKw: number; acKw: number; dcAcRatio: number; annualKwh?: number };
  strings: { id: string; moduleVocColdV: number | null; stringVocColdV: number | null; maxCircuitCurrentA: number | null; minOcpdA: number | null; shutdownStringV?: number }[];
  inverterOutputs: { inverterId: string; continuousA: number; minOcpdA: number | null }[];
  pointOfConnection: { method: "load-side" | "supply-side"; rule: "100%" | "120%" | "sum" | "service-rating" | "feeder" | null; maxPvBreakerA: number | null; status: CheckStatus };
  runs: {
    id: string;
    circuits: number | null; // separate circuits sharing the run's raceway or cable
    currentCarrying: number | null; // current-carrying conductors the ampacity is adjusted for
    terminalC: number | null; // the terminal temperature the conductors are sized at
    designCurrentA: number | null; // per circuit
    requiredAmpacityA: number | null;
    correctedAmpacityA: number | null;
    voltageDropV: number | null;
    voltageDropPct: number | null;
    minEgc: string | null;
    fillPct?: number | null;
    status: CheckStatus;
  }[];
  checks: { id: string; subject: string; codeRef: string; status: CheckStatus; value: number | null; limit: number | null; unit: string; message: string; fix?: string; field?: string }[];
  labels: { codeRef: string; title: string; text: string; prescribedWording: boolean; explanation: string; placement: string; values: Record<string, number> }[];
};

// Checks that compare against roof planes; a document without roof planes has nothing for them to read.
const ROOF_CHECK = /^(roof-dead-load|roof-attachment-load|input:roof):|^module-count$/;
const RUN_CHECKS = [
  "current-carrying-count", "ampacity-terminal", "ampacity-conditions", "ocpd-rating", "ocpd-protects", "egc", "voltage-drop", "conduit-fill",
  "wiring-exposed", "wiring-inside", "egc-protection", "input:run",
];
const CONNECTION_CHECKS = [
  "pv-breaker-size", "point-of-connection", "feeder-connection", "feeder-taps", "supply-side-conductors", "supply-side-ocpd-location", "ac-combiner-busbar",
  "input:point-of-connection",
];

// A figure the engine cannot compute for this input is null; the engine has already reported why as a failed check.
const figure = unlessInputError;

/**
 * Shapes the engine's result as the API's review. Per-string and per-run figures come
 * from the same engine functions the checks use, so they equal the checks' numbers.
 */
export function toReviewJson(design: Design, site: Site, result: ReviewResult, { roofPlanesGiven }: { roofPlanesGiven: boolean }): ReviewJson {
  const kept = result.checks.filter((c) => roofPlanesGiven || !ROOF_CHECK.test(c.id));
  const { ratings, annualProductionKwh } = result.summary;
  return {
    status: worstStatus(kept.map((c) => c.status)),
    ratings: { dcKw: ratings.dcKw, acKw: ratings.acKw, dcAcRatio: ratings.dcToAcRatio, ...(annualProductionKwh === null ? {} : { annualKwh: annualProductionKwh }) },
    strings: design.strings.map((s) => stringFigures(design, site, s)),
    inverterOutputs: design.inverters.map((inv) => {
      const continuousA = inv.quantity * inv.acOutputCurrentA;
      return { inverterId: inv.id, continuousA: round(continuousA), minOcpdA: figure(() => requiredOcpdA(continuousA, { edition: site.necEdition })) };
    }),
    pointOfConnection: pointOfConnection(design, site, result, kept),
    runs: design.runs.map((run) => runFigures(design, site, run, kept)),
    checks: kept.map(toCheckJson),
    labels: result.labels.map((l) => ({ codeRef: l.clause, title: l.title, text: l.text, prescribedWording: l.prescribed, explanation: l.explanation, placement: l.placement, values: l.values })),
  };
}

function toCheckJson(c: CheckResult): ReviewJson["checks"][number] {
  return {
    id: c.id, subject: c.title, codeRef: c.clause, status: c.status, value: c.value, limit: c.limit, unit: c.unit, message: c.message,
    ...(c.fix === undefined ? {} : { fix: c.fix }),
    ...(c.field === undefined ? {} : { field: c.field }),
  };
}

function stringFigures(design: Design, site: Site, s: PvString): ReviewJson["strings"][number] {
  const moduleVocV = figure(() => coldModuleVoc(design.module, site.recordLowTempC).vocV);
  // Optimizers hold the string at the inverter's fixed voltage (690.7(B)); otherwise N × the module's cold Voc (690.7(A)).
  const optimized = design.moduleLevelDevice?.kind === "optimizer";
  const stringV = optimized ? (design.inverters.find((i) => i.id === s.inverterId)?.regulatedStringV ?? null) : moduleVocV === null ? null : s.modulesInSeries * moduleVocV;
  const maxA = figure(() => stringMaxCurrentA(design));
  return {
    id: s.id,
    moduleVocColdV: moduleVocV === null ? null : round(moduleVocV),
    stringVocColdV: stringV === null ? null : round(stringV),
    maxCircuitCurrentA: maxA === null ? null : round(maxA),
    minOcpdA: maxA === null ? null : figure(() => requiredOcpdA(maxA, { fuse: true, edition: site.necEdition })),
    ...(rapidShutdownMethod(design) === "module-level-devices" ? { shutdownStringV: round(shutdownStringVoltageV(design, s)) } : {}),
  };
}

function pointOfConnection(design: Design, site: Site, result: ReviewResult, checks: CheckResult[]): ReviewJson["pointOfConnection"] {
  const s = design.service;
  const rule =
    s.connection === "supply-side" ? "service-rating"
    : s.loadSideAt === "feeder" ? "feeder"
    : (governingLoadSideRule(evaluateLoadSideRules(s, totalInverterOutputA(design), { isDwelling: site.isDwelling }))?.rule ?? null);
  const status = worstStatus(checks.filter((c) => CONNECTION_CHECKS.includes(c.id)).map((c) => c.status));
  return { method: s.connection, rule, maxPvBreakerA: result.summary.largestPvBreakerA, status };
}

function isCheckOfRun(check: CheckResult, runId: string): boolean {
  return RUN_CHECKS.some((prefix) => check.id === `${prefix}:${runId}` || check.id === `${prefix}:run:${runId}`);
}

function runFigures(design: Design, site: Site, run: ConductorRun, checks: CheckResult[]): ReviewJson["runs"][number] {
  const evaluated = figure(() => evaluateRun(design, site, run));
  const e = evaluated?.evaluation ?? null;
  const drop = figure(() => runVoltageDrop(design, run));
  const minEgc = figure(() => sizeLabel(egcRequirement(design, site, run, run.egc?.material ?? "Cu").required));
  const raceway = run.raceway;
  return {
    id: run.id,
    circuits: figure(() => runCircuits(design, run).length),
    currentCarrying: evaluated ? evaluated.conditions.currentCarryingConductors : figure(() => circuitConductorCount(design, run)),
    terminalC: evaluated ? evaluated.terminal.tempC : null,
    designCurrentA: e && round(e.maxCurrentA),
    requiredAmpacityA: e && round(e.requiredUnconditionedA),
    correctedAmpacityA: e && round(e.correctedAmpacityA),
    voltageDropV: drop && round(drop.dropV),
    voltageDropPct: drop && round(drop.percent),
    minEgc,
    ...(raceway ? { fillPct: figure(() => round(racewayFill({ type: raceway.type, tradeSize: raceway.tradeSize, wires: runRacewayWires(design, run) }).fillPercent)) } : {}),
    status: worstStatus(checks.filter((c) => isCheckOfRun(c, run.id)).map((c) => c.status)),
  };
}
