// Energy storage in the engine's design: the batteries, how they couple to the PV system, where they
// stand, the backup loads panel a multimode inverter feeds, and how export and import are limited.

/** One battery model as its data sheet states it; the figures are per unit. */
export interface BatteryUnit {
  maker: string;
  model: string;
  usableKwh: number;
  nameplateKwh: number; // the listed energy capacity; the residential siting limits count this figure
  maxContinuousChargeA: number; // at the terminals the battery circuit connects to
  maxContinuousDischargeA: number;
  maxChargeKw: number;
  maxDischargeKw: number;
  nominalVoltageV: number;
  listings?: readonly string[]; // e.g. "UL 9540", "UL 9540A"; undefined = not known
  maxUnitsInParallel?: number; // the maker's limit on units joined on one system
}

/** The places a residential ESS may stand, and the rooms of a dwelling the residential code names. */
export const ESS_LOCATIONS = [
  "garage", // attached or detached garage, or a detached accessory structure
  "outdoor-wall", // outdoors, on the exterior side of an exterior wall or on the ground
  "utility-space", // enclosed utility closet, basement, storage or utility space
  "habitable-space",
  "sleeping-room", // or a closet or space opening directly into one
  "other",
] as const;
export type EssLocation = (typeof ESS_LOCATIONS)[number];

/** A group of identical units standing together in one location. */
export interface BatteryBank {
  id: string;
  unit: BatteryUnit;
  quantity: number;
  location: EssLocation;
}

/** The battery inverter of an AC-coupled system: it has its own output circuit to the panel. */
export interface BatteryInverter {
  maker: string;
  model: string;
  acPowerW: number;
  acOutputCurrentA: number; // continuous, grid-connected
  acVoltageV: number;
  breakerA: number; // the backfed breaker its output lands on
}

/** What the multimode inverter supplies while the grid is down (Article 710). */
export interface StandAloneOutput {
  continuousA: number;
  voltageV: number; // 120 for a single 120 V supply, 240 for 120/240 V
  powerW?: number;
  transferTimeS?: number;
}

/** A load moved to the backup loads panel. */
export interface BackupLoad {
  name: string;
  currentA: number; // the load's running current at its voltage
  voltageV: 120 | 240;
}

/** The panel that keeps running from the multimode inverter while the grid is down. */
export interface BackupLoadsPanel {
  busbarA: number;
  mainBreakerA: number | null; // the device feeding it from the grid side; null for main lugs
  inverterBreakerA: number; // the breaker the multimode inverter's output lands on
  inverterBreakerAtOppositeEnd: boolean;
  otherBreakersA?: number[]; // every other breaker on the bus except the main, for the sum rule
  voltageV: 120 | 240; // 240: a 120/240 V panel
  multiwireBranchCircuits?: boolean; // undefined = not known
  loads?: BackupLoad[];
}

/** A listed power control system limiting the current the sources put on busbars and conductors. */
export interface PowerControlSystem {
  listed: boolean;
  currentSettingA?: number; // the setting that limits the output current; undefined = not set
}

/** The ESS disconnecting means (Article 706). */
export interface EssDisconnect {
  kind: "integral" | "separate";
  withinSight?: boolean; // within sight of the ESS (and, in 2023, within 10 ft); undefined = not known
  lockable?: boolean; // lockable in the open position (110.25)
  location?: string;
}

/**
 * The residential siting limits the AHJ has adopted: per-unit and aggregate kWh by location, null where
 * a location is forbidden and absent where the code says nothing. Defaults to the published model-code values (ess-siting.ts); an AHJ that
 * adopted another edition or amended it passes its own.
 */
export interface EssSitingLimits {
  code: string; // the code and edition results cite: "IRC 2021", or the AHJ's amended code
  clauses: { listing: string; locations: string; ratings: string };
  perUnitKwh: number;
  aggregateKwh: Readonly<Partial<Record<EssLocation, number | null>>>; // absent: the code names no limit there
}
