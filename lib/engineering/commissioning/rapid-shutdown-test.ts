// The rapid shutdown test: with the shutdown switch pressed, the voltage the
// conductors fall to and the seconds it takes, against 690.12's limits for
// where the reading was taken (outside or inside the array boundary).
import { atMost, fmt } from "../check-result";
import { clause } from "../clauses";
import { INSIDE_BOUNDARY_MAX_V, OUTSIDE_BOUNDARY_MAX_V } from "../checks/rapid-shutdown";
import type { NecEdition } from "../types";
import { build, readingState, unrecorded, type Reading } from "./reading";
import type { ArrayBoundary, CommissioningCheck, RapidShutdownTestReading } from "./types";

// 690.12(B): the reduced voltage must be reached within 30 s (REFERENCE.md).
export const RAPID_SHUTDOWN_MAX_SECONDS = 30;

/** The rapid shutdown test: voltage reached and seconds to reach it, against 690.12 (REFERENCE.md). */
export function checkRapidShutdownTest(test: RapidShutdownTestReading | undefined, edition: NecEdition): CommissioningCheck[] {
  const boundary: ArrayBoundary = test?.boundary ?? "outside";
  const limitV = boundary === "outside" ? OUTSIDE_BOUNDARY_MAX_V : INSIDE_BOUNDARY_MAX_V;
  const cite = clause(boundary === "outside" ? "rapidShutdownOutside" : "rapidShutdownInside", edition);
  const where = boundary === "outside" ? "outside the array boundary" : "inside the array boundary";
  const one = (
    kind: "rapid-shutdown-voltage" | "rapid-shutdown-time",
    value: Reading,
    limit: number,
    unit: string,
    what: string,
  ): CommissioningCheck => {
    const base = { id: kind, title: `Rapid shutdown test: ${what}`, unit, clause: cite, edition };
    const state = readingState(value);
    if (state !== "recorded") {
      return unrecorded(kind, state, base, {
        missing: `Not recorded yet: the ${what} in the rapid shutdown test.`,
        invalid: `The ${what} must be a number of zero or more.`,
        fix: `Enter the ${what} in ${unit === "V" ? "volts" : "seconds"}.`,
        limit,
      });
    }
    const v = value as number;
    const ok = atMost(v, limit);
    const volts = unit === "V";
    return build(kind, "recorded", {
      ...base,
      status: ok ? "pass" : "fail",
      value: v,
      limit,
      message: volts
        ? `After shutdown the conductors ${where} read ${fmt(v)} V: ${ok ? "within" : "above"} the ${limit} V allowed.`
        : `The voltage fell in ${fmt(v)} s: ${ok ? "within" : "longer than"} the ${limit} s allowed.`,
      fix: ok
        ? undefined
        : volts
          ? "Keep clear of the conductors; check every device has shut down and the shutdown switch controls this system, then test again."
          : "Check the shutdown switch and devices against the maker's instructions, then test again.",
    });
  };
  return [
    one("rapid-shutdown-voltage", test?.measuredV, limitV, "V", "voltage reached"),
    one("rapid-shutdown-time", test?.seconds, RAPID_SHUTDOWN_MAX_SECONDS, "s", "time to reach it"),
  ];
}
