// Insulation resistance of each string to ground before it is connected:
// a low value means damaged insulation, water in a connector or a ground
// fault, a shock and fire hazard once the string is energized.
import { atLeast, fmt } from "../check-result";
import { requirePositive } from "../errors";
import type { NecEdition } from "../types";
import { build, readingState, unrecorded } from "./reading";
import type { CommissioningCheck, StringTestReading } from "./types";

export const INSULATION_BASIS = "IEC 62446-1 insulation resistance test";

/**
 * Test voltage and minimum insulation resistance by the string's voltage, as in IEC 62446-1's
 * table for PV arrays (from memory). Partly confirmed: a test-instrument maker's manual quotes
 * 1 MΩ as the minimum above 120 V (IEC 61557-2, IEC 62446-1), and IEC 60364-6's low-voltage
 * table has the same three rows (up to 50 V: 250 V / 0.5 MΩ; to 500 V: 500 V / 1 MΩ; over 500 V:
 * 1000 V / 1 MΩ).
 */
export const INSULATION_ROWS = [
  { upToV: 120, testV: 250, minMohm: 0.5 },
  { upToV: 500, testV: 500, minMohm: 1 },
  { upToV: Infinity, testV: 1000, minMohm: 1 },
] as const;

/** The row for a string whose open-circuit voltage at STC is `stringVocV`. */
export function insulationRequirement(stringVocV: number): { testV: number; minMohm: number } {
  requirePositive(stringVocV, "strings", "The string's Voc");
  const row = INSULATION_ROWS.find((r) => stringVocV <= r.upToV)!;
  return { testV: row.testV, minMohm: row.minMohm };
}

export function checkInsulation(s: StringTestReading, edition: NecEdition): CommissioningCheck {
  const { testV, minMohm } = insulationRequirement(s.modulesInSeries * s.moduleVocV);
  const base = {
    id: `string-insulation:${s.id}`,
    title: `String ${s.id} insulation resistance`,
    unit: "MΩ",
    clause: INSULATION_BASIS,
    edition,
  };
  const state = readingState(s.insulationMohm);
  if (state !== "recorded") {
    return unrecorded("string-insulation", state, base, {
      missing: `Not recorded yet: test string ${s.id}'s conductors to ground at ${testV} V before connecting it; at least ${fmt(minMohm)} MΩ is expected.`,
      invalid: `String ${s.id}'s insulation resistance must be a number of megohms, zero or more.`,
      fix: "Enter the lowest reading, in MΩ.",
      limit: minMohm,
    });
  }
  const r = s.insulationMohm as number;
  const ok = atLeast(r, minMohm);
  return build("string-insulation", "recorded", {
    ...base,
    status: ok ? "pass" : "fail",
    value: r,
    limit: minMohm,
    message: ok
      ? `String ${s.id} measured ${fmt(r)} MΩ to ground, at least the ${fmt(minMohm)} MΩ expected at a ${testV} V test.`
      : `String ${s.id} measured ${fmt(r)} MΩ to ground, below the ${fmt(minMohm)} MΩ minimum: its insulation may be damaged or wet, or a conductor touches ground.`,
    fix: ok
      ? undefined
      : "Do not connect the string. With it isolated, look for damaged insulation, pinched conductors and wet or unmated connectors, let wet parts dry, and test again.",
  });
}
