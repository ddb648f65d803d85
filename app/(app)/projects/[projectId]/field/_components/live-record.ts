import {
  checkCommissioning,
  commissioningComplete,
  type CommissioningCheck,
  type CommissioningCompletion,
} from "@/lib/engineering/commissioning";
import { toCommissioningRecord, type CommissioningFacts } from "@/lib/field/commissioning-facts";
import { CommissioningReadings } from "@/lib/schemas/commissioning";
import { toReadingsInput, type FormValues } from "./form-values";

// The record's checks as typed. The page works them out on the server for the saved readings; the form
// loads this module (the readings' schema and the checks) after it is on screen and checks each change.

export type LiveRecord = { errors: Record<string, string>; results: CommissioningCheck[]; completion: CommissioningCompletion };

// Form paths whose reading lives under another name.
const FORM_PATH: Record<string, string> = { gridProfileSet: "gridProfileOther" };

/** The typed values as readings; a field that is not a number is left out of the checks and its problem shown beside it. */
export function liveReadings(values: FormValues): { readings: CommissioningReadings; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const copy = structuredClone(toReadingsInput(values)) as Record<string, unknown>;
  let parsed = CommissioningReadings.safeParse(copy);
  for (let i = 0; i < 3 && !parsed.success; i++) {
    for (const issue of parsed.error.issues) {
      const path = issue.path.map(String);
      const key = path.join(".");
      errors[FORM_PATH[key] ?? key] ??= issue.message;
      let node = copy as Record<string, unknown>;
      for (const part of path.slice(0, -1)) node = node[part] as Record<string, unknown>;
      node[path[path.length - 1]] = "";
    }
    parsed = CommissioningReadings.safeParse(copy);
  }
  return { readings: parsed.success ? parsed.data : CommissioningReadings.parse({}), errors };
}

/** The typed values' problems, the checks of what could be read and how far the record is from complete. */
export function checkLiveRecord(values: FormValues, facts: CommissioningFacts): LiveRecord {
  const live = liveReadings(values);
  const results = checkCommissioning(toCommissioningRecord(facts, live.readings));
  return { errors: live.errors, results, completion: commissioningComplete(results) };
}
