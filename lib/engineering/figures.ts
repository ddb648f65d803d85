import { round, worstStatus } from "./check-result";
import { evaluateLoadSideRules } from "./checks/busbar-rules";
import { circuitConductorCount, runCircuits, stringMaxCurrentA } from "./checks/circuit-current";
import { evaluateRun } from "./checks/conductor-ampacity";
import { racewayFill, runRacewayWires } from "./checks/conduit-fill";
import { egcBasisA, egcRequirement } from "./checks/egc";
import { requiredOcpdA } from "./checks/ocpd";
import { governingLoadSideRule } from "./checks/point-of-connection";
import { rapidShutdownMethod, shutdownStringVoltageV } from "./checks/rapid-shutdown";
import { coldModuleVoc } from "./checks/string-voltage";
import { runVoltageDrop } from "./checks/voltage-drop";
import { countedSourceCurrent } from "./storage";
import type { StorageFigures } from "./storage-review";
import { unlessInputError as figure } from "./errors";
import { sizeLabel } from "./tables/conductor-sizes";
import type { CheckResult, CheckStatus, ConductorRun, Design, PvString, Site } from "./types";

// Every figure the review computed, per string, per inverter output, per run and at the point of
// connection, kept with its result: the design-review API, the calculation sheet and the review screen
// print these rather than working them out again, so they cannot drift from the checks. A figure the
// engine cannot compute for this input is null; a check has already said why.

export type StringFigures = {
  id: string;
  moduleVocColdV: number | null;
  stringVocColdV: number | null;
  maxCircuitCurrentA: number | null;
  minOcpdA: number | null;
  shutdownStringV: number | null;
};
export type InverterOutputFigures = { inverterId: string; continuousA: number; minOcpdA: number | null };
export type ConnectionFigures = {
  method: "load-side" | "supply-side";
  rule: "100%" | "120%" | "sum" | "service-rating" | "feeder" | null;
  status: CheckStatus;
};
export type RunFigures = {
  id: string;
  circuits: number | null; // separate circuits sharing the run's raceway or cable
  currentCarrying: number | null; // current-carrying conductors the ampacity is adjusted for
  terminalC: number | null; // the terminal temperature the conductors are sized at
  terminalSource: "run" | "equipment" | "code" | null; // where that rating comes from: entered on the run, marked on the equipment, or 110.14(C) by default
  designCurrentA: number | null; // per circuit
  requiredAmpacityA: number | null;
  correctedAmpacityA: number | null;
  voltageDropV: number | null;
  voltageDropPct: number | null;
  minEgc: string | null;
  egcDeviceA: number | null; // the overcurrent device the EGC is sized for (Table 250.122)
  egcDeviceAssumed: boolean | null; // no device on the run: the one 690.45 assumes
  fillPct: number | null; // null without a raceway
  status: CheckStatus;
};
export type ReviewFigures = {
  strings: StringFigures[];
  inverterOutputs: InverterOutputFigures[];
  pointOfConnection: ConnectionFigures;
  runs: RunFigures[];
  storage?: StorageFigures; // present only for a design with storage (storage-review.ts)
};

const RUN_CHECKS = [
  "current-carrying-count",
  "ampacity-terminal",
  "ampacity-conditions",
  "ocpd-rating",
  "ocpd-protects",
  "egc",
  "voltage-drop",
  "conduit-fill",
  "wiring-exposed",
  "wiring-inside",
  "egc-protection",
  "input:run",
];
const CONNECTION_CHECKS = [
  "pv-breaker-size",
  "point-of-connection",
  "feeder-connection",
  "feeder-taps",
  "supply-side-conductors",
  "supply-side-ocpd-location",
  "ac-combiner-busbar",
  "input:point-of-connection",
];

/** Whether a check is about this run (its id names the run). */
export function isCheckOfRun(check: Pick<CheckResult, "id">, runId: string): boolean {
  return RUN_CHECKS.some((prefix) => check.id === `${prefix}:${runId}` || check.id === `${prefix}:run:${runId}`);
}

/** Whether a check is about the point of connection. */
export function isConnectionCheck(check: Pick<CheckResult, "id">): boolean {
  return CONNECTION_CHECKS.includes(check.id);
}

function stringFigures(design: Design, site: Site, s: PvString): StringFigures {
  const moduleVocV = figure(() => coldModuleVoc(design.module, site.recordLowTempC).vocV);
  // Optimizers hold the string at the inverter's fixed voltage (690.7(B)); otherwise N × the module's cold Voc (690.7(A)).
  const optimized = design.moduleLevelDevice?.kind === "optimizer";
  const stringV = optimized
    ? (design.inverters.find((i) => i.id === s.inverterId)?.regulatedStringV ?? null)
    : moduleVocV === null
      ? null
      : s.modulesInSeries * moduleVocV;
  const maxA = figure(() => stringMaxCurrentA(design));
  return {
    id: s.id,
    moduleVocColdV: moduleVocV === null ? null : round(moduleVocV),
    stringVocColdV: stringV === null ? null : round(stringV),
    maxCircuitCurrentA: maxA === null ? null : round(maxA),
    minOcpdA: maxA === null ? null : figure(() => requiredOcpdA(maxA, { fuse: true, edition: site.necEdition })),
    shutdownStringV: rapidShutdownMethod(design) === "module-level-devices" ? round(shutdownStringVoltageV(design, s)) : null,
  };
}

function runFigures(design: Design, site: Site, run: ConductorRun, checks: CheckResult[]): RunFigures {
  const evaluated = figure(() => evaluateRun(design, site, run));
  const e = evaluated?.evaluation ?? null;
  const drop = figure(() => runVoltageDrop(design, run));
  const egcBasis = figure(() => egcBasisA(design, run, site.necEdition));
  const raceway = run.raceway;
  return {
    id: run.id,
    circuits: figure(() => runCircuits(design, run).length),
    currentCarrying: evaluated ? evaluated.conditions.currentCarryingConductors : figure(() => circuitConductorCount(design, run)),
    terminalC: evaluated ? evaluated.terminal.tempC : null,
    terminalSource: evaluated ? evaluated.terminal.source : null,
    designCurrentA: e && round(e.maxCurrentA),
    requiredAmpacityA: e && round(e.requiredUnconditionedA),
    correctedAmpacityA: e && round(e.correctedAmpacityA),
    voltageDropV: drop && round(drop.dropV),
    voltageDropPct: drop && round(drop.percent),
    minEgc: figure(() => sizeLabel(egcRequirement(design, site, run, run.egc?.material ?? "Cu").required)),
    egcDeviceA: egcBasis?.ocpdA ?? null,
    egcDeviceAssumed: egcBasis?.assumed ?? null,
    fillPct: raceway
      ? figure(() =>
          round(racewayFill({ type: raceway.type, tradeSize: raceway.tradeSize, wires: runRacewayWires(design, run) }).fillPercent),
        )
      : null,
    status: worstStatus(checks.filter((c) => isCheckOfRun(c, run.id)).map((c) => c.status)),
  };
}

function connectionFigures(design: Design, site: Site, checks: CheckResult[]): ConnectionFigures {
  const s = design.service;
  const rule =
    s.connection === "supply-side"
      ? "service-rating"
      : s.loadSideAt === "feeder"
        ? "feeder"
        : (governingLoadSideRule(
            evaluateLoadSideRules(s, countedSourceCurrent(design, site.necEdition).currentA, { isDwelling: site.isDwelling }),
          )?.rule ?? null);
  return { method: s.connection, rule, status: worstStatus(checks.filter(isConnectionCheck).map((c) => c.status)) };
}

/** The figures behind a review's checks, computed once beside them. */
export function reviewFigures(design: Design, site: Site, checks: CheckResult[]): ReviewFigures {
  return {
    strings: design.strings.map((s) => stringFigures(design, site, s)),
    inverterOutputs: design.inverters.map((inv) => {
      const continuousA = inv.quantity * inv.acOutputCurrentA;
      return {
        inverterId: inv.id,
        continuousA: round(continuousA),
        minOcpdA: figure(() => requiredOcpdA(continuousA, { edition: site.necEdition })),
      };
    }),
    pointOfConnection: connectionFigures(design, site, checks),
    runs: design.runs.map((run) => runFigures(design, site, run, checks)),
  };
}
