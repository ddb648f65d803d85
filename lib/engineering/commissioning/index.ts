// Commissioning checks for the installer's field record: pure functions, no I/O.
import { checkAcVoltage, checkFirstPower, checkModulesReporting, checkRapidShutdownTest } from "./checks";
import { checkDevicePairing } from "./device-pairing";
import { checkGridProfile } from "./grid-profile";
import { checkInsulation } from "./insulation-resistance";
import { checkActivation, checkInverterSerial } from "./inverter-activation";
import { checkShutdownString } from "./shutdown-string";
import { checkPolarity } from "./string-polarity";
import { checkStringVoc } from "./string-voc";
import type { CommissioningCheck, CommissioningKind, CommissioningRecord } from "./types";

export * from "./types";
export * from "./service-voltage";
export * from "./checks";
export * from "./device-pairing";
export * from "./grid-profile";
export * from "./insulation-resistance";
export * from "./inverter-activation";
export * from "./shutdown-string";
export * from "./string-polarity";
export * from "./string-voc";

/**
 * Every check of a record, in the order the crew works: the strings tested before anything is
 * energized, then at the inverter its serial against the activation card, activation, the grid
 * profile, the devices found, the strings with the array shut down; then the AC side, first power,
 * modules reporting (with module-level monitoring only) and the rapid shutdown test.
 */
export function checkCommissioning(record: CommissioningRecord): CommissioningCheck[] {
  const { edition } = record;
  return [
    ...(record.stringTests ?? []).flatMap((s) => [checkPolarity(s, edition), ...(s.vocApplies ? [checkStringVoc(s, record.vocTemperature, edition)] : []), checkInsulation(s, edition)]),
    ...(record.inverters ?? []).flatMap((unit) => [checkInverterSerial(unit, edition), checkActivation(unit, edition)]),
    checkGridProfile(record),
    ...(record.pairing ? checkDevicePairing(record.pairing, edition) : []),
    ...record.strings.map((s) => checkShutdownString(s, edition)),
    checkAcVoltage(record),
    checkFirstPower(record),
    ...(record.moduleMonitoring ? [checkModulesReporting(record)] : []),
    ...checkRapidShutdownTest(record.rapidShutdownTest, edition),
  ];
}

/** Readings every record needs; the others are needed for each string, unit or device the record lists. */
export const REQUIRED_COMMISSIONING_KINDS: readonly CommissioningKind[] = ["grid-profile", "ac-voltage", "first-power", "rapid-shutdown-voltage", "rapid-shutdown-time"];

export interface CommissioningCompletion {
  complete: boolean;
  failing: string[]; // ids of failing results
  missing: string[]; // ids of readings not recorded, and required kinds with no result
  waiting: string[]; // ids of readings recorded but not through yet (devices still being found)
}

/** Complete only when nothing fails, nothing waits and every required reading is present; otherwise the record stays open. */
export function commissioningComplete(results: readonly CommissioningCheck[]): CommissioningCompletion {
  const failing = results.filter((r) => r.status === "fail").map((r) => r.id);
  const missing = results.filter((r) => r.reading === "missing").map((r) => r.id);
  const waiting = results.filter((r) => r.waiting && r.status !== "fail").map((r) => r.id);
  for (const kind of REQUIRED_COMMISSIONING_KINDS) {
    if (!results.some((r) => r.kind === kind)) missing.push(kind);
  }
  return { complete: failing.length === 0 && missing.length === 0 && waiting.length === 0, failing, missing, waiting };
}
