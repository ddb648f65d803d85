// The AC voltage at the point of connection, read once the inverter is
// connected, against the service voltage ranges of ANSI C84.1: outside the
// normal range the inverter may trip often, or refuse to connect.
import { atLeast, atMost, fmt } from "../check-result";
import { ENTER_AGAIN, build, readingState, unrecorded } from "./reading";
import { serviceVoltageRanges } from "./service-voltage";
import type { CommissioningCheck, CommissioningRecord } from "./types";

// The basis the results cite where no NEC clause sets the limit; screens and documents print it.
// ANSI C84.1's Range A and B values are from memory (REFERENCE.md).
export const ANSI_C84_1_BASIS = "ANSI C84.1 Range A and Range B";

/** AC voltage at the point of connection against ANSI C84.1 (from memory): Range A passes, Range B warns, beyond fails. */
export function checkAcVoltage(record: Pick<CommissioningRecord, "edition" | "nominalServiceV" | "acVoltageV">): CommissioningCheck {
  const { rangeA, rangeB, nominalV } = serviceVoltageRanges(record.nominalServiceV);
  const v = record.acVoltageV;
  const state = readingState(v);
  const rangeAText = `${fmt(rangeA.lowV)}–${fmt(rangeA.highV)} V`;
  const rangeBText = `${fmt(rangeB.lowV)}–${fmt(rangeB.highV)} V`;
  const base = {
    id: "ac-voltage",
    title: "AC voltage at the point of connection",
    unit: "V",
    clause: ANSI_C84_1_BASIS,
    edition: record.edition,
  };
  if (state !== "recorded") {
    return unrecorded("ac-voltage", state, base, {
      missing: `Not recorded yet: measure the AC voltage at the point of connection (expected ${rangeAText} on a ${nominalV} V service).`,
      invalid: "The AC voltage reading must be a number of zero or more.",
      fix: ENTER_AGAIN,
    });
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
