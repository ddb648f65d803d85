import { atLeast, fmt, makeCheck } from "../check-result";
import { clause, clauses } from "../clauses";
import { type StoredDesign, storageConverter } from "../storage";
import type { CheckResult, Site } from "../types";
import { CONTINUOUS_MULTIPLIER } from "./conductor-ampacity";
import { requiredOcpdA } from "./ocpd";

/**
 * The ESS disconnecting means (2017 706.7, 2020 on 706.15): one for the ESS, built into it, within sight
 * of it, or lockable open where it is out of sight (110.25). Its marking asks for the nominal voltage, and
 * outside one- and two-family dwellings the available fault current too (the dwelling exception from memory).
 */
export function checkEssDisconnect(design: StoredDesign, site: Site): CheckResult[] {
  const edition = site.necEdition;
  const d = design.storage.disconnect;
  const base = { id: "ess-disconnect", title: "Energy storage disconnect", unit: "", value: null, limit: null, edition };
  const results: CheckResult[] = [];
  if (!d) {
    results.push(
      makeCheck({
        ...base,
        status: "warn",
        clause: clause("essDisconnect", edition),
        message: "The energy storage system's disconnecting means is not entered.",
        fix: "Enter the ESS disconnect: built into the listed equipment, or a separate switch within sight of the batteries or lockable open.",
        field: "storage.disconnect.kind",
      }),
    );
  } else if (d.kind === "integral") {
    results.push(
      makeCheck({
        ...base,
        status: "pass",
        clause: clause("essDisconnectLocation", edition),
        message: "The disconnecting means is built into the listed energy storage equipment.",
      }),
    );
  } else {
    const ok = d.withinSight === true || d.lockable === true;
    const unknown = !ok && (d.withinSight === undefined || d.lockable === undefined);
    results.push(
      makeCheck({
        ...base,
        status: ok ? "pass" : unknown ? "warn" : "fail",
        clause: clause("essDisconnectLocation", edition),
        message: ok
          ? d.withinSight
            ? "The ESS disconnect is within sight of the batteries."
            : "The ESS disconnect is out of sight of the batteries and lockable in the open position; its location is marked at the batteries."
          : unknown
            ? "Whether the ESS disconnect is within sight of the batteries, or lockable open, is not entered."
            : "The ESS disconnect is neither within sight of the batteries nor lockable in the open position.",
        fix: ok ? undefined : "Place the disconnect within sight of the batteries, or use one that locks in the open position.",
        field: unknown ? (d.withinSight === undefined ? "storage.disconnect.withinSight" : "storage.disconnect.lockable") : undefined,
      }),
    );
  }
  if (!site.isDwelling && design.storage.availableFaultCurrentA === undefined) {
    results.push(
      makeCheck({
        ...base,
        id: "ess-disconnect-marking",
        title: "Energy storage disconnect marking",
        status: "warn",
        clause: clause("essDisconnectLabel", edition),
        message: "The ESS disconnect's marking needs the available fault current from the storage system, which is not entered.",
        fix: "Enter the available fault current from the maker's data.",
        field: "storage.availableFaultCurrentA",
      }),
    );
  }
  return results;
}

/**
 * An AC-coupled battery inverter lands on its own breaker, sized like any inverter output circuit:
 * 125 % of its continuous output, up to a standard rating (2017 690.9(B), 2020 on 705.30(B)).
 */
export function checkBatteryInverterBreaker(design: StoredDesign, site: Site): CheckResult[] {
  const b = design.storage.batteryInverter;
  if (design.storage.coupling !== "ac" || !b) return [];
  const edition = site.necEdition;
  const outputA = storageConverter(design).continuousA;
  const minimumA = CONTINUOUS_MULTIPLIER * outputA;
  const ok = atLeast(b.breakerA, minimumA);
  return [
    makeCheck({
      id: "battery-inverter-breaker",
      title: "Battery inverter breaker size",
      status: ok ? "pass" : "fail",
      value: b.breakerA,
      limit: minimumA,
      unit: "A",
      clause: clauses(edition, "acOcpd", "standardRatings"),
      edition,
      message: `The battery inverter puts out ${fmt(outputA)} A continuous, so its breaker must be at least 1.25 × ${fmt(outputA)} A = ${fmt(minimumA)} A; the ${b.breakerA} A breaker ${ok ? "is large enough" : "is too small"}.`,
      fix: ok ? undefined : `Use a ${requiredOcpdA(outputA, { edition })} A breaker.`,
    }),
  ];
}
