// Each string's voltage with the array shut down: the module-level devices
// in series each hold a small voltage, so the string should read their
// count times that voltage, give or take a tolerance either way.
import { atLeast, atMost, fmt, plural } from "../check-result";
import { clause } from "../clauses";
import { requirePositive, requireWholePositive } from "../errors";
import {
  DEFAULT_SHUTDOWN_V_PER_DEVICE,
  INSIDE_BOUNDARY_MAX_V,
  OUTSIDE_BOUNDARY_MAX_V,
  shutdownStringVoltageV,
} from "../checks/rapid-shutdown";
import type { Design, NecEdition } from "../types";
import { ENTER_AGAIN, build, readingState, unrecorded } from "./reading";
import type { CommissioningCheck, ShutdownStringReading } from "./types";

// The window is expected ± max(1 V, 10 % of expected) (common practice: a device holds about
// 1 V ± 0.1 V when shut down, from memory), so 15 devices read 13.5–16.5 V and 14.6 V is normal.
export const SHUTDOWN_TOLERANCE_MIN_V = 1;
export const SHUTDOWN_TOLERANCE_FRACTION = 0.1;

export interface ShutdownWindow {
  expectedV: number;
  lowV: number;
  highV: number;
}

/** Expected shut-down string voltage, devices × volts each (default 1 V), with the tolerance both ways. */
export function shutdownWindow(devicesInSeries: number, perDeviceV: number = DEFAULT_SHUTDOWN_V_PER_DEVICE): ShutdownWindow {
  requireWholePositive(devicesInSeries, "strings", "The number of devices in series");
  requirePositive(perDeviceV, "strings", "The voltage each device holds when shut down");
  const expectedV = devicesInSeries * perDeviceV;
  const tolerance = Math.max(SHUTDOWN_TOLERANCE_MIN_V, SHUTDOWN_TOLERANCE_FRACTION * expectedV);
  return { expectedV, lowV: Math.max(0, expectedV - tolerance), highV: expectedV + tolerance };
}

/** One empty reading per string of a design, with the shut-down voltage the design expects. */
export function shutdownReadingsFromDesign(design: Design): ShutdownStringReading[] {
  return design.strings.map((s) => ({
    id: s.id,
    devicesInSeries: s.modulesInSeries,
    perDeviceV: shutdownStringVoltageV(design, s) / s.modulesInSeries,
    wiringLeavesArray: true,
    measuredV: null,
  }));
}

/** A string's voltage with the array shut down, against the design's window and the 690.12 limit where its wiring runs. */
export function checkShutdownString(s: ShutdownStringReading, edition: NecEdition): CommissioningCheck {
  const perDeviceV = s.perDeviceV ?? DEFAULT_SHUTDOWN_V_PER_DEVICE;
  const { expectedV, lowV, highV } = shutdownWindow(s.devicesInSeries, perDeviceV);
  const outside = s.wiringLeavesArray ?? true;
  const codeLimitV = outside ? OUTSIDE_BOUNDARY_MAX_V : INSIDE_BOUNDARY_MAX_V;
  const where = outside ? "wiring that leaves the array" : "wiring kept within the array";
  const devices = plural(s.devicesInSeries, "device");
  const windowText = `${fmt(lowV)}–${fmt(highV)} V`;
  const base = {
    id: `string-shutdown:${s.id}`,
    title: `String ${s.id} voltage with the array shut down`,
    unit: "V",
    clause: `${clause(outside ? "rapidShutdownOutside" : "rapidShutdownInside", edition)}; ${devices} × ${fmt(perDeviceV)} V`,
    edition,
  };
  const state = readingState(s.measuredV);
  if (state !== "recorded") {
    return unrecorded("string-shutdown", state, base, {
      missing: `Not recorded yet: with the array shut down, string ${s.id}'s ${devices} should read about ${fmt(expectedV)} V (${windowText}).`,
      invalid: `String ${s.id}'s reading must be a number of zero or more.`,
      fix: ENTER_AGAIN,
    });
  }
  const v = s.measuredV as number;
  const overCode = !atMost(v, codeLimitV);
  const inWindow = atLeast(v, lowV) && atMost(v, highV);
  const said = `String ${s.id} read ${fmt(v)} V with the array shut down`;
  return build("string-shutdown", "recorded", {
    ...base,
    status: inWindow ? "pass" : "fail",
    value: v,
    limit: overCode ? codeLimitV : v < lowV ? lowV : highV,
    message: overCode
      ? `${said}: above the ${codeLimitV} V allowed on ${where}. At least one device may not have shut down.`
      : inWindow
        ? `${said}: as expected for ${devices} (${windowText}).`
        : v < lowV
          ? `${said}: less than the ${windowText} expected for ${devices}. The string may be open, a device bypassed, or the meter on another string.`
          : `${said}: more than the ${windowText} expected for ${devices}, though within ${codeLimitV} V. A device may not have shut down fully, or the string has more devices than the design.`,
    fix: overCode
      ? "Do not touch the string's conductors. Confirm the shutdown switch is off, find the device that did not shut down, and replace it."
      : inWindow
        ? undefined
        : "Check the meter leads are on this string and count its devices against the design; check the device's shut-down voltage in its data sheet, then measure again.",
  });
}
