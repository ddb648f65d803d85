import { atLeast, atMost, fmt, plural } from "../check-result";
import { clause } from "../clauses";
import { requirePositive, requireWholePositive } from "../errors";
import { INSIDE_BOUNDARY_MAX_V, OUTSIDE_BOUNDARY_MAX_V } from "../checks/rapid-shutdown";
import type { NecEdition } from "../types";
import { ENTER_AGAIN, build, countState, readingState, unrecorded, type Reading } from "./reading";
import { serviceVoltageRanges } from "./service-voltage";
import type { ArrayBoundary, CommissioningCheck, CommissioningRecord, RapidShutdownTestReading, ReadingState } from "./types";

// Bases the results cite where no NEC clause sets the limit; screens and documents print them.
// ANSI C84.1's Range A and B values are from memory (REFERENCE.md).
export const ANSI_C84_1_BASIS = "ANSI C84.1 Range A and Range B";
export const MODULE_COUNT_BASIS = "the design's module count";
// 690.12(B): the reduced voltage must be reached within 30 s (REFERENCE.md).
export const RAPID_SHUTDOWN_MAX_SECONDS = 30;
// First power: at most 5 % over the AC rating (meter error); below 10 % of it at midday warns (common practice).
export const FIRST_POWER_MAX_FRACTION = 1.05;
export const MIDDAY_LOW_FRACTION = 0.1;
export const MIDDAY_START_MINUTES = 10 * 60;
export const MIDDAY_END_MINUTES = 14 * 60;

/** AC voltage at the point of connection against ANSI C84.1 (from memory): Range A passes, Range B warns, beyond fails. */
export function checkAcVoltage(record: Pick<CommissioningRecord, "edition" | "nominalServiceV" | "acVoltageV">): CommissioningCheck {
  const { rangeA, rangeB, nominalV } = serviceVoltageRanges(record.nominalServiceV);
  const v = record.acVoltageV;
  const state = readingState(v);
  const rangeAText = `${fmt(rangeA.lowV)}–${fmt(rangeA.highV)} V`;
  const rangeBText = `${fmt(rangeB.lowV)}–${fmt(rangeB.highV)} V`;
  const base = { id: "ac-voltage", title: "AC voltage at the point of connection", unit: "V", clause: ANSI_C84_1_BASIS, edition: record.edition };
  if (state !== "recorded") {
    return unrecorded("ac-voltage", state, base, { missing: `Not recorded yet: measure the AC voltage at the point of connection (expected ${rangeAText} on a ${nominalV} V service).`, invalid: "The AC voltage reading must be a number of zero or more.", fix: ENTER_AGAIN });
  }
  const reading = v as number;
  const high = reading > nominalV;
  const inA = atLeast(reading, rangeA.lowV) && atMost(reading, rangeA.highV);
  const inB = atLeast(reading, rangeB.lowV) && atMost(reading, rangeB.highV);
  const limit = inA ? (high ? rangeA.highV : rangeA.lowV) : inB ? (high ? rangeA.highV : rangeA.lowV) : high ? rangeB.highV : rangeB.lowV;
  const said = `${fmt(reading)} V on a ${nominalV} V service`;
  return build("ac-voltage", "recorded", {
    ...base,
    status: inA ? "pass" : inB ? "warn" : "fail",
    value: reading,
    limit,
    message: inA
      ? `${said} is within the normal range (${rangeAText}).`
      : inB
        ? `${said} is outside the normal range (${rangeAText}) but within the occasional range (${rangeBText}); the inverter may trip more often.`
        : `${said} is outside even the occasional range (${rangeBText}); the inverter may refuse to connect or trip.`,
    fix: inA
      ? undefined
      : inB
        ? "Measure again under load; if it stays outside the normal range, tell the utility."
        : "Check the meter and the nominal voltage entered, measure again, and report the service voltage to the utility before going further.",
  });
}

/** Every module installed reports in the monitoring (common practice); asked only where the system has module-level monitoring. */
export function checkModulesReporting(record: Pick<CommissioningRecord, "edition" | "modulesInstalled" | "modulesReporting">): CommissioningCheck {
  const installed = requireWholePositive(record.modulesInstalled, "modulesInstalled", "The number of modules installed");
  const base = { id: "modules-reporting", title: "Modules reporting", unit: "modules", clause: MODULE_COUNT_BASIS, edition: record.edition };
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

/** Minutes after midnight for "HH:MM" (24-hour), or null if it is not a time of day. */
export function parseTimeOfDay(text: string): number | null {
  const m = /^([01]?\d|2[0-3]):([0-5]\d)$/.exec(text.trim());
  return m ? Number(m[1]) * 60 + Number(m[2]) : null;
}

/** First power against the AC rating: above zero, at most 1.05 × the rating; very low at midday warns (common practice). */
export function checkFirstPower(record: Pick<CommissioningRecord, "edition" | "acRatingW" | "firstPowerW" | "firstPowerTime">): CommissioningCheck {
  const ratingW = requirePositive(record.acRatingW, "acRatingW", "The system's AC rating");
  const maxW = FIRST_POWER_MAX_FRACTION * ratingW;
  const base = { id: "first-power", title: "First power reading", unit: "W", clause: `the system's AC rating (${fmt(ratingW)} W)`, edition: record.edition };
  const w = record.firstPowerW;
  const time = record.firstPowerTime?.trim() ?? "";
  const powerState: ReadingState = w === null || w === undefined ? "missing" : Number.isFinite(w) ? "recorded" : "invalid";
  const minutes = time === "" ? null : parseTimeOfDay(time);
  const timeState: ReadingState = time === "" ? "missing" : minutes === null ? "invalid" : "recorded";
  if (powerState === "invalid" || timeState === "invalid") {
    return build("first-power", "invalid", {
      ...base,
      status: "fail",
      value: null,
      limit: maxW,
      message: powerState === "invalid" ? "The first power reading must be a number of watts." : `"${time}" is not a time of day; use HH:MM, 24-hour.`,
      fix: "Enter the power in watts and the time as HH:MM.",
    });
  }
  if (powerState === "missing" || timeState === "missing") {
    return build("first-power", "missing", {
      ...base,
      status: "warn",
      value: powerState === "recorded" ? (w as number) : null,
      limit: maxW,
      message: `Not recorded yet: enter the first power reading in watts and the time of day it was read.`,
    });
  }
  const watts = w as number;
  const at = `${fmt(watts)} W at ${time}`;
  if (!(watts > 0) || !atMost(watts, maxW)) {
    const tooHigh = watts > 0;
    return build("first-power", "recorded", {
      ...base,
      status: "fail",
      value: watts,
      limit: tooHigh ? maxW : 0,
      message: tooHigh
        ? `${at} is more than the system can make (${fmt(maxW)} W, 1.05 × its ${fmt(ratingW)} W rating).`
        : `${at}: the system is not sending power to the grid.`,
      fix: tooHigh
        ? "Check the reading is in watts, not kilowatts, and that it is this system's meter."
        : "Check the AC disconnect and the PV breaker are on and the inverter has finished its start-up wait, then read again.",
    });
  }
  const midday = (minutes as number) >= MIDDAY_START_MINUTES && (minutes as number) <= MIDDAY_END_MINUTES;
  const low = midday && watts < MIDDAY_LOW_FRACTION * ratingW;
  return build("first-power", "recorded", {
    ...base,
    status: low ? "warn" : "pass",
    value: watts,
    limit: low ? MIDDAY_LOW_FRACTION * ratingW : maxW,
    message: low
      ? `${at} is under 10 % of the ${fmt(ratingW)} W rating at midday.`
      : `${at} is plausible for a ${fmt(ratingW)} W system.`,
    fix: low ? "If the sky is clear, check for strings not producing, shading or a setting that limits output." : undefined,
  });
}

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
