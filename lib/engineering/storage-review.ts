import { round, worstStatus } from "./check-result";
import { backupPanelOutcome, backupSourceA, checkBackupPanel } from "./checks/backup-panel";
import { checkStorageCircuit, storageCircuitFigures } from "./checks/ess-circuits";
import { checkBatteryInverterBreaker, checkEssDisconnect } from "./checks/ess-disconnect";
import { checkEssSiting, essSiting, kwhByLocation } from "./checks/ess-siting";
import { unlessInputError as figure } from "./errors";
import {
  type CountedSourceCurrent,
  type StoredDesign,
  countedSourceCurrent,
  powerControlSettingA,
  storageConverter,
  totalUnits,
  validateStorage,
} from "./storage";
import type { StorageLabelFacts } from "./labels";
import type { CheckResult, CheckStatus, EssLocation, OperatingMode, Site, StorageCoupling, TerminalTempC } from "./types";

// The storage part of a review: its checks, its summary and its figures. Present only for a design with storage,
// so a PV-only design's review stays exactly as it was.

type Attempt = (what: string, key: string, fn: () => CheckResult[]) => void;

/** Runs the storage checks; entries no check can read fail once, by name, and the rest of storage is skipped. */
export function storageChecks(design: StoredDesign, site: Site, attempt: Attempt): void {
  let valid = true;
  attempt("the storage entries", "storage", () => {
    try {
      validateStorage(design);
    } catch (err) {
      valid = false;
      throw err;
    }
    return [];
  });
  if (!valid) return;
  attempt("the battery location and size", "ess-siting", () => checkEssSiting(design, site));
  attempt("the energy storage disconnect", "ess-disconnect", () => [
    ...checkEssDisconnect(design, site),
    ...checkBatteryInverterBreaker(design, site),
  ]);
  for (const c of design.storage.circuits ?? []) {
    attempt(`battery circuit "${c.label}"`, `ess-circuit:${c.id}`, () => checkStorageCircuit(design, site, c));
  }
  attempt("the backup loads panel", "backup-panel", () => checkBackupPanel(design, site));
}

export interface StorageSummary {
  coupling: StorageCoupling;
  operatingMode: OperatingMode;
  units: number;
  totalUsableKwh: number;
  totalNameplateKwh: number;
  maxDischargeKw: number | null; // the batteries' discharge power, limited by the inverter they discharge through
  pointOfConnectionA: number | null; // the source current 705.12 counts at the main panel
  countedBy: CountedSourceCurrent["by"] | null;
  powerControlSettingA: number | null; // only where the edition recognizes a listed power control system
  exportLimitKw: number | null;
  importLimitKw: number | null;
  backupPanel: boolean;
}

export function storageSummary(design: StoredDesign, site: Site): StorageSummary {
  const s = design.storage;
  const sum = (f: (b: StoredDesign["storage"]["banks"][number]) => number) => s.banks.reduce((t, b) => t + b.quantity * f(b), 0);
  const converter = figure(() => storageConverter(design));
  const counted = figure(() => countedSourceCurrent(design, site.necEdition));
  const dischargeKw = sum((b) => b.unit.maxDischargeKw);
  return {
    coupling: s.coupling,
    operatingMode: s.operatingMode,
    units: totalUnits(s),
    totalUsableKwh: round(
      sum((b) => b.unit.usableKwh),
      3,
    ),
    totalNameplateKwh: round(
      sum((b) => b.unit.nameplateKwh),
      3,
    ),
    maxDischargeKw: converter === null ? null : round(Math.min(dischargeKw, converter.acPowerW / 1000), 3),
    pointOfConnectionA: counted && round(counted.currentA),
    countedBy: counted?.by ?? null,
    powerControlSettingA: powerControlSettingA(design, site.necEdition),
    exportLimitKw: s.exportLimitKw ?? null,
    importLimitKw: s.importLimitKw ?? null,
    backupPanel: s.backupPanel !== undefined,
  };
}

export type StorageCircuitFigure = {
  id: string;
  continuousA: number | null;
  requiredAmpacityA: number | null;
  minOcpdA: number | null;
  terminalC: TerminalTempC | null;
  ampacityA: number | null;
  status: CheckStatus;
};
// limitKwh: 0 where the location is forbidden, null where the adopted code sets no limit (or outside dwellings).
export type StorageLocationFigure = { location: EssLocation; nameplateKwh: number; limitKwh: number | null; status: CheckStatus };

const limitFigure = (limit: number | null | undefined): number | null => (limit === null ? 0 : (limit ?? null));
export type StorageFigures = {
  pointOfConnection: { currentA: number; by: CountedSourceCurrent["by"]; inverterOutputsA: number } | null;
  circuits: StorageCircuitFigure[];
  locations: StorageLocationFigure[];
  backupPanel: { rule: "100%" | "120%" | "sum" | null; sourceA: number; status: CheckStatus } | null;
};

const statusOf = (checks: CheckResult[], match: (id: string) => boolean): CheckStatus =>
  worstStatus(checks.filter((c) => match(c.id)).map((c) => c.status));

export function storageFigures(design: StoredDesign, site: Site, checks: CheckResult[]): StorageFigures {
  const counted = figure(() => countedSourceCurrent(design, site.necEdition));
  const limits = essSiting(site);
  const backup = figure(() => backupPanelOutcome(design));
  return {
    pointOfConnection: counted && { ...counted, currentA: round(counted.currentA), inverterOutputsA: round(counted.inverterOutputsA) },
    circuits: (design.storage.circuits ?? []).map((c) => {
      const f = figure(() => storageCircuitFigures(design, site, c));
      return {
        id: c.id,
        continuousA: f && round(f.continuousA),
        requiredAmpacityA: f && round(f.requiredAmpacityA),
        minOcpdA: f?.minOcpdA ?? null,
        terminalC: f?.terminalC ?? null,
        ampacityA: f?.ampacityA ?? null,
        status: statusOf(checks, (id) => id === `ess-conductor:${c.id}` || id === `ess-ocpd:${c.id}` || id === `input:ess-circuit:${c.id}`),
      };
    }),
    locations: [...kwhByLocation(design)].map(([location, kwh]) => ({
      location,
      nameplateKwh: round(kwh, 3),
      limitKwh: site.isDwelling ? limitFigure(limits.aggregateKwh[location]) : null,
      status: statusOf(checks, (id) => id === `ess-location:${location}`),
    })),
    backupPanel: backup && {
      rule: backup.rule,
      sourceA: round(backup.sourceA),
      status: statusOf(checks, (id) => id.startsWith("backup-") || id === "input:backup-panel"),
    },
  };
}

/** The facts the storage labels print; a figure the entries do not allow yet leaves its label out or general. */
export function storageLabelFacts(design: StoredDesign, site: Site): StorageLabelFacts | null {
  return figure(() => {
    validateStorage(design); // entries that failed review print no storage labels
    return labelFacts(design, site);
  });
}

function labelFacts(design: StoredDesign, site: Site): StorageLabelFacts {
  const s = design.storage;
  const d = s.disconnect;
  const counted = figure(() => countedSourceCurrent(design, site.necEdition));
  const sourceA = s.backupPanel ? figure(() => backupSourceA(design)) : null;
  return {
    essVoltageV: Math.max(...s.banks.map((b) => b.unit.nominalVoltageV)),
    faultCurrentA: s.availableFaultCurrentA,
    disconnectLocation: d?.location,
    disconnectOutOfSight: d?.kind === "separate" && d.withinSight === false,
    powerControlSettingA: counted?.by === "power-control-system" ? counted.currentA : null,
    single120Supply: s.backupOutput?.voltageV === 120 && s.backupPanel?.voltageV === 240,
    backupPanel: s.backupPanel && sourceA !== null ? { inverterBreakerA: s.backupPanel.inverterBreakerA, sourceA: round(sourceA) } : null,
    batteryInverter:
      s.coupling === "ac" && s.batteryInverter
        ? { outputA: s.batteryInverter.acOutputCurrentA, breakerA: s.batteryInverter.breakerA }
        : undefined,
  };
}
