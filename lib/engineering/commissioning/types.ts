import type { CheckResult, NecEdition } from "../types";

/** Which reading of the commissioning record a result belongs to. */
export type CommissioningKind =
  | "grid-profile"
  | "ac-voltage"
  | "string-shutdown"
  | "modules-reporting"
  | "first-power"
  | "rapid-shutdown-voltage"
  | "rapid-shutdown-time";

/**
 * Whether the installer's reading behind a result is in the record: "missing" readings can be
 * saved and filled in later; "invalid" ones (not a number, negative) always fail.
 */
export type ReadingState = "recorded" | "missing" | "invalid";

export interface CommissioningCheck extends CheckResult {
  kind: CommissioningKind;
  reading: ReadingState;
}

/** One string measured with the array shut down. */
export interface ShutdownStringReading {
  id: string;
  devicesInSeries: number; // from the design
  perDeviceV?: number; // voltage each device holds when shut down; default 1 V (common practice)
  wiringLeavesArray?: boolean; // the string's wiring runs outside the array boundary; default true
  measuredV?: number | null;
}

/** Where the rapid shutdown test was read: outside the array boundary (30 V) or inside it (80 V). */
export type ArrayBoundary = "outside" | "inside";

export interface RapidShutdownTestReading {
  boundary?: ArrayBoundary; // default outside
  measuredV?: number | null;
  seconds?: number | null; // from pressing the shutdown switch to reaching measuredV
}

/** What the installer records in the field, beside the facts it is checked against. */
export interface CommissioningRecord {
  edition: NecEdition;
  requiredGridProfile: string | null; // from the utility's interconnection approval
  gridProfileSet?: string | null; // as shown on the inverter
  nominalServiceV: number; // 120, 208, 240, 277 or 480
  acVoltageV?: number | null; // at the point of connection
  strings: ShutdownStringReading[]; // empty for micro-inverter systems
  modulesInstalled: number;
  modulesReporting?: number | null;
  acRatingW: number; // the system's continuous AC output
  firstPowerW?: number | null;
  firstPowerTime?: string | null; // local time of day, "HH:MM" (24-hour)
  rapidShutdownTest?: RapidShutdownTestReading;
}
