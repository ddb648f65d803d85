import type { CheckResult, NecEdition, TempCoefficient } from "../types";

/** Which reading of the commissioning record a result belongs to. */
export type CommissioningKind =
  | "string-polarity"
  | "string-voc"
  | "string-insulation"
  | "inverter-serial"
  | "inverter-activation"
  | "grid-profile"
  | "device-pairing"
  | "string-shutdown"
  | "ac-voltage"
  | "first-power"
  | "modules-reporting"
  | "rapid-shutdown-voltage"
  | "rapid-shutdown-time"
  | "storage-charge"
  | "storage-backup"
  | "storage-transfer-time"
  | "storage-power-control"
  | "storage-export-limit";

/**
 * Whether the installer's reading behind a result is in the record: "missing" readings can be
 * saved and filled in later; "invalid" ones (not a number, negative) always fail.
 */
export type ReadingState = "recorded" | "missing" | "invalid";

export interface CommissioningCheck extends CheckResult {
  kind: CommissioningKind;
  reading: ReadingState;
  /** A recorded reading that is not a pass yet but no fault either (devices still pairing): the record stays open. */
  waiting?: boolean;
}

/** One string measured with the array shut down. */
export interface ShutdownStringReading {
  id: string;
  devicesInSeries: number; // from the design
  perDeviceV?: number; // voltage each device holds when shut down; default 1 V (common practice)
  wiringLeavesArray?: boolean; // the string's wiring runs outside the array boundary; default true
  measuredV?: number | null;
}

export type Polarity = "correct" | "reversed";

/** Where the temperature for the string Voc test was read: on the back of a module, or in the shade nearby. */
export type VocTemperatureSource = "module" | "ambient";

/** The tests of one string before anything is energized: polarity, open-circuit voltage, insulation resistance. */
export interface StringTestReading {
  id: string;
  modulesInSeries: number; // from the design
  moduleVocV: number; // module data sheet, at STC
  vocTempCoeff?: TempCoefficient; // module data sheet; without it a typical crystalline coefficient is assumed
  /** False where module-level devices hold the string low until the inverter runs (optimizers): no Voc test then. */
  vocApplies: boolean;
  polarity?: Polarity | null;
  vocV?: number | null;
  insulationMohm?: number | null; // the lower of + and − to ground, or both shorted to ground
}

export interface VocTemperature {
  tempC?: number | null;
  source: VocTemperatureSource;
}

/** One inverter unit as delivered: the serial on its label, the serial on the activation card that came with it. */
export interface InverterUnitReading {
  id: string;
  label: string; // "Inverter", or "Inverter 2" where there are several
  model?: string; // maker and model, e.g. "Quillon QS-7600"
  serial?: string | null;
  cardSerial?: string | null;
  activated?: boolean | null;
}

/** Module-level devices that report to the inverter or a gateway: how many it found, overall and per string. */
export interface DevicePairingReading {
  word: string; // plural noun for the devices, e.g. "optimizers", "microinverters"
  installed: number;
  found?: number | null;
  strings: { id: string; installed: number; found?: number | null }[];
}

/** Where the rapid shutdown test was read: outside the array boundary (30 V) or inside it (80 V). */
export type ArrayBoundary = "outside" | "inside";

export interface RapidShutdownTestReading {
  boundary?: ArrayBoundary; // default outside
  measuredV?: number | null;
  seconds?: number | null; // from pressing the shutdown switch to reaching measuredV
}

/** The storage part of a record: the design's facts (backup panel, transfer time, settings) and what the crew read. */
export interface StorageCommissioningReading {
  hasBackupPanel: boolean; // the design feeds a backup loads panel: the backup test applies
  transferTimeS?: number | null; // the inverter's stated transfer time, where the design has it
  pcsSettingA?: number | null; // a listed power control system's designed current setting
  exportLimitKw?: number | null; // the designed export limit (0 for non-export)
  stateOfChargePct?: number | null;
  backupTest?: { gridOpened?: boolean | null; panelCarried?: boolean | null; transferSeconds?: number | null };
  pcsSettingReadA?: number | null;
  exportLimitReadKw?: number | null;
}

/** What the installer records in the field, beside the facts it is checked against, in the order of the work. */
export interface CommissioningRecord {
  edition: NecEdition;
  stringTests?: StringTestReading[]; // DC strings of string inverters; empty for microinverters
  vocTemperature?: VocTemperature;
  inverters?: InverterUnitReading[]; // string inverter units; microinverters ship without activation cards
  acceptedGridProfiles: string[]; // from the utility's interconnection requirements
  gridProfileSet?: string | null; // as chosen on the inverter
  pairing?: DevicePairingReading | null; // only where module-level devices report
  strings: ShutdownStringReading[]; // only where module-level devices hold strings at a safe voltage
  nominalServiceV: number; // 120, 208, 240, 277 or 480
  acVoltageV?: number | null; // at the point of connection
  /** Module-level monitoring (a catalog fact): only then must every module report. */
  moduleMonitoring: boolean;
  modulesInstalled: number;
  modulesReporting?: number | null;
  acRatingW: number; // the system's continuous AC output
  firstPowerW?: number | null;
  firstPowerTime?: string | null; // local time of day, "HH:MM" (24-hour)
  rapidShutdownTest?: RapidShutdownTestReading;
  storage?: StorageCommissioningReading | null; // only for a design with batteries
}
