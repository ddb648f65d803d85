import { atMost, fmt, makeCheck } from "../check-result";
import { clause, clauses } from "../clauses";
import { microInverters } from "../design-lookup";
import type { ArrayDesign, CheckResult, Design, PvString, Site } from "../types";

// A module-level device in shutdown holds about 1 V (common practice, REFERENCE.md).
export const DEFAULT_SHUTDOWN_V_PER_DEVICE = 1;
// 690.12(B)(1) outside the array boundary and 690.12(B)(2) inside it, within 30 s (REFERENCE.md).
export const OUTSIDE_BOUNDARY_MAX_V = 30;
export const INSIDE_BOUNDARY_MAX_V = 80;

export type RapidShutdownMethod = "micro-inverters" | "module-level-devices" | "listed-system" | "none";

export function rapidShutdownMethod(design: ArrayDesign): RapidShutdownMethod {
  if (design.inverters.length > 0 && microInverters(design).length === design.inverters.length) return "micro-inverters";
  if (design.moduleLevelDevice) return "module-level-devices";
  return design.listedRapidShutdownSystem ? "listed-system" : "none";
}

/** Expected string voltage with the array shut down: one small hold voltage per device in series. */
export function shutdownStringVoltageV(design: ArrayDesign, string: PvString): number {
  const perDeviceV = design.moduleLevelDevice?.shutdownOutputV ?? DEFAULT_SHUTDOWN_V_PER_DEVICE;
  return string.modulesInSeries * perDeviceV;
}

export function checkRapidShutdown(design: Design, site: Site): CheckResult[] {
  const edition = site.necEdition;
  const whole = (status: CheckResult["status"], message: string, fix?: string): CheckResult[] => [
    makeCheck({
      id: "rapid-shutdown",
      title: "Rapid shutdown",
      status,
      value: null,
      limit: status === "fail" ? OUTSIDE_BOUNDARY_MAX_V : null,
      unit: "V",
      clause: clause("rapidShutdown", edition),
      edition,
      message,
      fix,
    }),
  ];
  if (design.mount === "ground") {
    return whole("pass", "Rapid shutdown applies to PV systems on or in buildings; this array is ground-mounted.");
  }
  const method = rapidShutdownMethod(design);
  if (method === "none") {
    const listed = edition === 2017 ? "a listed PV hazard control system" : "a listed PV hazard control system (UL 3741)";
    return whole(
      "fail",
      "Nothing in this design shuts the array down: the strings would stay at full voltage after the shutdown switch is turned off.",
      `Add a module-level shutdown device or optimizer to every module, or use ${listed}.`,
    );
  }
  if (method === "micro-inverters") {
    return whole(
      "pass",
      "Micro-inverters stop when the grid or the shutdown switch opens, and no DC wiring leaves the modules, so the array meets rapid shutdown.",
    );
  }
  if (method === "listed-system") {
    return whole("pass", "The design relies on a listed rapid shutdown system; install it as its listing requires.");
  }
  const perDeviceV = design.moduleLevelDevice?.shutdownOutputV ?? DEFAULT_SHUTDOWN_V_PER_DEVICE;
  return design.strings.map((s) => {
    const v = shutdownStringVoltageV(design, s);
    const outside = atMost(v, OUTSIDE_BOUNDARY_MAX_V);
    const inside = atMost(v, INSIDE_BOUNDARY_MAX_V);
    return makeCheck({
      id: `rapid-shutdown:${s.id}`,
      title: `String ${s.id} voltage after rapid shutdown`,
      status: outside ? "pass" : inside ? "warn" : "fail",
      value: v,
      limit: OUTSIDE_BOUNDARY_MAX_V,
      unit: "V",
      edition,
      clause: `${clauses(edition, "rapidShutdownOutside", "rapidShutdownInside")}; ${perDeviceV} V per device in shutdown`,
      message: `With the array shut down, string ${s.id}'s ${s.modulesInSeries} devices should hold about ${fmt(v)} V: ${
        outside
          ? "within 30 V, so its wiring may leave the array"
          : inside
            ? "within 80 V inside the array but above 30 V for wiring outside it"
            : "above the 80 V allowed even inside the array"
      }.`,
      fix: outside
        ? undefined
        : `Keep at most ${Math.floor(OUTSIDE_BOUNDARY_MAX_V / perDeviceV)} devices in series, or keep this string's wiring within 1 ft of the array.`,
    });
  });
}
