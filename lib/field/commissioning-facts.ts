import {
  shutdownReadingsFromDesign,
  type CommissioningRecord,
  type DevicePairingReading,
  type InverterUnitReading,
  type ShutdownStringReading,
  type StringTestReading,
} from "@/lib/engineering/commissioning";
import type { Design, NecEdition } from "@/lib/engineering";
import { CommissioningReadings } from "@/lib/schemas/commissioning";

/** What a commissioning record is checked against: taken from the approved design, its catalog items, the AHJ and the utility. */
export type CommissioningFacts = {
  edition: NecEdition;
  acceptedGridProfiles: string[];
  nominalServiceV: number;
  /** Strings of string inverters, tested before anything is energized. */
  stringTests: Omit<StringTestReading, "polarity" | "vocV" | "insulationMohm">[];
  /** String inverter units, each with a serial and an activation card. */
  inverters: Omit<InverterUnitReading, "serial" | "cardSerial" | "activated">[];
  /** Module-level devices that report, counted as the inverter finds them; null without module-level monitoring. */
  pairing: { word: string; installed: number; strings: { id: string; installed: number }[] } | null;
  /** Strings held at a safe voltage by module-level devices while the array is shut down. */
  strings: Omit<ShutdownStringReading, "measuredV">[];
  moduleMonitoring: boolean;
  modulesInstalled: number;
  acRatingW: number;
  /** The design's batteries as the storage part reads them; null (or absent, in records made before storage) without batteries. */
  storage?: StorageFacts | null;
};

/** What the storage part of a record is checked against, from the design. */
export type StorageFacts = {
  hasBackupPanel: boolean;
  transferTimeS: number | null;
  pcsSettingA: number | null;
  exportLimitKw: number | null;
  /** For the crew: what the batteries are and where they stand. */
  summary: string;
};

function storageFacts(design: Design): StorageFacts | null {
  const s = design.storage;
  if (!s) return null;
  const units = s.banks.map((b) => `${b.quantity} × ${b.unit.maker} ${b.unit.model}`).join(", ");
  return {
    hasBackupPanel: s.backupPanel !== undefined,
    transferTimeS: s.backupOutput?.transferTimeS ?? null,
    pcsSettingA: s.pcs?.listed && s.pcs.currentSettingA !== undefined ? s.pcs.currentSettingA : null,
    // Non-export is a limit of zero, whether or not the design also states one.
    exportLimitKw: s.exportLimitKw ?? (s.operatingMode === "non-export" ? 0 : null),
    summary: `${units}, ${s.coupling === "dc" ? "DC-coupled through the hybrid inverter" : "AC-coupled through the battery inverter"}`,
  };
}

export type CommissioningFactsInput = {
  design: Design;
  edition: NecEdition;
  acceptedGridProfiles: readonly string[];
  moduleCount: number;
  acKw: number;
  /** Module-level monitoring, from the catalog: the devices (or microinverters) report one by one. */
  moduleMonitoring: boolean;
};

type CatalogSpecs = { specs: { reportsPerModule?: boolean } };
/** The catalog items a design uses, as far as monitoring goes. */
export type MonitoringItems = { inverters: { item: CatalogSpecs & { specs: { inverterKind: string } } }[]; device: CatalogSpecs | null };

/** Module-level monitoring, from the catalog items a design uses: its module-level device reports, or every microinverter does. */
export function moduleMonitoringOf(equipment: MonitoringItems): boolean {
  const micros = equipment.inverters.filter((l) => l.item.specs.inverterKind === "micro");
  if (micros.length > 0) return micros.every((l) => l.item.specs.reportsPerModule === true);
  return equipment.device?.specs.reportsPerModule === true;
}

const DEVICE_WORDS = { micro: "microinverters", optimizer: "optimizers", "shutdown-device": "shutdown devices" } as const;

/** One line per string inverter unit: "Inverter", or numbered when there are several, with its maker and model. */
function inverterUnits(design: Design): CommissioningFacts["inverters"] {
  const units = design.inverters
    .filter((i) => i.kind === "string")
    .flatMap((i) => Array.from({ length: i.quantity }, (_, k) => ({ inverter: i, id: i.quantity === 1 ? i.id : `${i.id}.${k + 1}` })));
  return units.map(({ inverter, id }, n) => ({
    id,
    label: `Inverter${units.length > 1 ? ` ${n + 1}` : ""}`,
    model: `${inverter.maker} ${inverter.model}`,
  }));
}

function pairingFacts(design: Design, moduleCount: number, moduleMonitoring: boolean): CommissioningFacts["pairing"] {
  if (!moduleMonitoring) return null;
  const micros = design.inverters.filter((i) => i.kind === "micro");
  if (micros.length > 0) return { word: DEVICE_WORDS.micro, installed: micros.reduce((sum, i) => sum + i.quantity, 0), strings: [] };
  if (!design.moduleLevelDevice) return null;
  return {
    word: DEVICE_WORDS[design.moduleLevelDevice.kind],
    installed: moduleCount,
    strings: design.strings.map((s) => ({ id: s.id, installed: s.modulesInSeries })),
  };
}

export function commissioningFacts({
  design,
  edition,
  acceptedGridProfiles,
  moduleCount,
  acKw,
  moduleMonitoring,
}: CommissioningFactsInput): CommissioningFacts {
  const stringInverterIds = new Set(design.inverters.filter((i) => i.kind === "string").map((i) => i.id));
  // Optimizers hold each module low until the inverter runs, so their strings show no Voc to test.
  const vocApplies = design.moduleLevelDevice?.kind !== "optimizer";
  // A shut-down reading is only expected where module-level devices hold the string at a known voltage.
  const strings = design.moduleLevelDevice ? shutdownReadingsFromDesign(design).map(({ measuredV: _omit, ...s }) => s) : [];
  return {
    edition,
    acceptedGridProfiles: acceptedGridProfiles.map((p) => p.trim()).filter(Boolean),
    nominalServiceV: design.service.voltageV,
    stringTests: design.strings
      .filter((s) => stringInverterIds.has(s.inverterId))
      .map((s) => ({
        id: s.id,
        modulesInSeries: s.modulesInSeries,
        moduleVocV: design.module.vocV,
        ...(design.module.vocTempCoeff ? { vocTempCoeff: design.module.vocTempCoeff } : {}),
        vocApplies,
      })),
    inverters: inverterUnits(design),
    pairing: pairingFacts(design, moduleCount, moduleMonitoring),
    strings,
    moduleMonitoring,
    modulesInstalled: moduleCount,
    acRatingW: Math.round(acKw * 1000),
    storage: storageFacts(design),
  };
}

/** An empty set of readings with one line per string and per inverter unit of the design. */
export function emptyReadings(facts: CommissioningFacts): CommissioningReadings {
  const stringIds = [...new Set([...facts.stringTests.map((s) => s.id), ...facts.strings.map((s) => s.id)])];
  return CommissioningReadings.parse({ strings: stringIds.map((id) => ({ id })), inverters: facts.inverters.map((u) => ({ id: u.id })) });
}

/**
 * The readings laid over the facts. String and inverter readings are matched by id, so a design
 * changed after a visit keeps the readings of strings and units that still exist and asks for the new ones.
 */
export function toCommissioningRecord(facts: CommissioningFacts, readings: CommissioningReadings): CommissioningRecord {
  const byString = new Map(readings.strings.map((s) => [s.id, s]));
  const byUnit = new Map(readings.inverters.map((u) => [u.id, u]));
  const pairing: DevicePairingReading | null = facts.pairing
    ? {
        ...facts.pairing,
        found: readings.devicesFound,
        strings: facts.pairing.strings.map((s) => ({ ...s, found: byString.get(s.id)?.devicesFound ?? null })),
      }
    : null;
  return {
    edition: facts.edition,
    stringTests: facts.stringTests.map((s) => {
      const r = byString.get(s.id);
      return { ...s, polarity: r?.polarity ?? null, vocV: r?.vocV ?? null, insulationMohm: r?.insulationMohm ?? null };
    }),
    vocTemperature: readings.vocTemperature,
    inverters: facts.inverters.map((u) => {
      const r = byUnit.get(u.id);
      return { ...u, serial: r?.serial ?? null, cardSerial: r?.cardSerial ?? null, activated: r?.activated ?? false };
    }),
    acceptedGridProfiles: facts.acceptedGridProfiles,
    gridProfileSet: readings.gridProfileSet,
    pairing,
    strings: facts.strings.map((s) => ({ ...s, measuredV: byString.get(s.id)?.measuredV ?? null })),
    nominalServiceV: facts.nominalServiceV,
    acVoltageV: readings.acVoltageV,
    moduleMonitoring: facts.moduleMonitoring,
    modulesInstalled: facts.modulesInstalled,
    modulesReporting: readings.modulesReporting,
    acRatingW: facts.acRatingW,
    firstPowerW: readings.firstPowerW,
    firstPowerTime: readings.firstPowerTime,
    rapidShutdownTest: {
      boundary: readings.rapidShutdown.boundary,
      measuredV: readings.rapidShutdown.measuredV,
      seconds: readings.rapidShutdown.seconds,
    },
    storage: facts.storage
      ? {
          hasBackupPanel: facts.storage.hasBackupPanel,
          transferTimeS: facts.storage.transferTimeS,
          pcsSettingA: facts.storage.pcsSettingA,
          exportLimitKw: facts.storage.exportLimitKw,
          stateOfChargePct: readings.storage.stateOfChargePct,
          backupTest: {
            gridOpened: readings.storage.gridOpened,
            panelCarried: readings.storage.panelCarried,
            transferSeconds: readings.storage.transferSeconds,
          },
          pcsSettingReadA: readings.storage.pcsSettingA,
          exportLimitReadKw: readings.storage.exportLimitKw,
        }
      : null,
  };
}
