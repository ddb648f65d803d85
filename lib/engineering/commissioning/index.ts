// Commissioning checks for the installer's field record: pure functions, no I/O.
import { checkAcVoltage, checkFirstPower, checkGridProfile, checkModulesReporting, checkRapidShutdownTest, checkShutdownString } from "./checks";
import type { CommissioningCheck, CommissioningKind, CommissioningRecord } from "./types";

export * from "./types";
export * from "./service-voltage";
export * from "./checks";

/** Every check of a record, with a result (possibly "not recorded yet") for each reading. */
export function checkCommissioning(record: CommissioningRecord): CommissioningCheck[] {
  return [
    checkGridProfile(record),
    checkAcVoltage(record),
    ...record.strings.map((s) => checkShutdownString(s, record.edition)),
    checkModulesReporting(record),
    checkFirstPower(record),
    ...checkRapidShutdownTest(record.rapidShutdownTest, record.edition),
  ];
}

/** Readings every record needs; string readings are needed for each string the record lists. */
export const REQUIRED_COMMISSIONING_KINDS: readonly CommissioningKind[] = [
  "grid-profile",
  "ac-voltage",
  "modules-reporting",
  "first-power",
  "rapid-shutdown-voltage",
  "rapid-shutdown-time",
];

export interface CommissioningCompletion {
  complete: boolean;
  failing: string[]; // ids of failing results
  missing: string[]; // ids of readings not recorded, and required kinds with no result
}

/** Complete only when nothing fails and every required reading is present; otherwise the record stays open. */
export function commissioningComplete(results: readonly CommissioningCheck[]): CommissioningCompletion {
  const failing = results.filter((r) => r.status === "fail").map((r) => r.id);
  const missing = results.filter((r) => r.reading === "missing").map((r) => r.id);
  for (const kind of REQUIRED_COMMISSIONING_KINDS) {
    if (!results.some((r) => r.kind === kind)) missing.push(kind);
  }
  return { complete: failing.length === 0 && missing.length === 0, failing, missing };
}
