// Every module installed must report in the monitoring before the record is
// complete: a silent module is a connector, device or communication fault.
// Asked only where the system has module-level monitoring.
import { plural } from "../check-result";
import { requireWholePositive } from "../errors";
import { build, countState, unrecorded } from "./reading";
import type { CommissioningCheck, CommissioningRecord, ReadingState } from "./types";

// The basis the results cite; screens and documents print it.
export const MODULE_COUNT_BASIS = "the design's module count";

/** Every module installed reports in the monitoring (common practice); asked only where the system has module-level monitoring. */
export function checkModulesReporting(
  record: Pick<CommissioningRecord, "edition" | "modulesInstalled" | "modulesReporting">,
): CommissioningCheck {
  const installed = requireWholePositive(record.modulesInstalled, "modulesInstalled", "The number of modules installed");
  const base = {
    id: "modules-reporting",
    title: "Modules reporting",
    unit: "modules",
    clause: MODULE_COUNT_BASIS,
    edition: record.edition,
  };
  const n = record.modulesReporting;
  const state: ReadingState = countState(n);
  if (state !== "recorded") {
    return unrecorded("modules-reporting", state, base, {
      missing: `Not recorded yet: count the modules reporting in the monitoring app (${installed} installed).`,
      invalid: "The number of modules reporting must be a whole number of zero or more.",
      fix: "Enter the count shown in the monitoring app.",
      limit: installed,
    });
  }
  const reporting = n as number;
  const ok = reporting === installed;
  return build("modules-reporting", "recorded", {
    ...base,
    status: ok ? "pass" : "fail",
    value: reporting,
    limit: installed,
    message: ok
      ? `All ${plural(installed, "module")} installed are reporting.`
      : reporting < installed
        ? `${reporting} of ${plural(installed, "module")} are reporting; all must report before the record can be completed.`
        : `${reporting} modules are reporting but ${installed} are recorded as installed.`,
    fix: ok
      ? undefined
      : reporting < installed
        ? "Find the modules not reporting (connector, device or communication) and fix them; the record can be saved and finished later."
        : "Check the installed count and the monitoring system's device list; remove devices that belong to another site.",
  });
}
