// Whether a field record may be completed: judged from its checks' results
// alone, so the screen, the saved record and the documents agree.
import type { CommissioningCheck, CommissioningKind } from "./types";

/** Readings every record needs; the others are needed for each string, unit or device the record lists. */
export const REQUIRED_COMMISSIONING_KINDS: readonly CommissioningKind[] = [
  "grid-profile",
  "ac-voltage",
  "first-power",
  "rapid-shutdown-voltage",
  "rapid-shutdown-time",
];

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
