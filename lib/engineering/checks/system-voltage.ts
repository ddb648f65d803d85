import { atMost, fmt, makeCheck } from "../check-result";
import { clauses } from "../clauses";
import { inverterById, usesOptimizers } from "../design-lookup";
import type { ArrayDesign, CheckResult, PvString, Site } from "../types";
import { coldModuleVoc } from "./string-voltage";

/** The highest voltage a string reaches: N × cold Voc (690.7(A)), or the regulated voltage of an optimizer string (690.7(B)). */
export function stringMaxVoltageV(design: ArrayDesign, site: Site, string: PvString): number | null {
  if (usesOptimizers(design)) return inverterById(design, string.inverterId).regulatedStringV ?? null;
  return string.modulesInSeries * coldModuleVoc(design.module, site.recordLowTempC).vocV;
}

/**
 * Modules and module-level devices are listed for a maximum system voltage: the highest string voltage
 * they sit in must not exceed it (690.7, 110.3(B)). An unknown rating is a warning that names the field.
 */
export function checkSystemVoltageRatings(design: ArrayDesign, site: Site): CheckResult[] {
  const edition = site.necEdition;
  const voltages = design.strings
    .map((s) => ({ s, v: stringMaxVoltageV(design, site, s) }))
    .filter((x): x is { s: PvString; v: number } => x.v !== null);
  if (voltages.length === 0) return [];
  const worst = voltages.reduce((a, b) => (b.v > a.v ? b : a));
  const items = [
    {
      key: "module",
      what: `the ${design.module.model} modules`,
      ratingV: design.module.maxSystemVoltageV,
      field: "module.maxSystemVoltageV",
    },
    ...(design.moduleLevelDevice
      ? [
          {
            key: "device",
            what: `the ${design.moduleLevelDevice.model} devices`,
            ratingV: design.moduleLevelDevice.maxSystemVoltageV,
            field: "moduleLevelDevice.maxSystemVoltageV",
          },
        ]
      : []),
  ];
  return items.map(({ key, what, ratingV, field }) => {
    const base = {
      id: `system-voltage:${key}`,
      title: `Maximum system voltage of ${what}`,
      unit: "V",
      clause: clauses(edition, "maxVoltage", "listing"),
      edition,
    };
    if (ratingV === undefined) {
      return makeCheck({
        ...base,
        status: "warn",
        value: worst.v,
        limit: null,
        field,
        message: `String ${worst.s.id} reaches ${fmt(worst.v, 1)} V, but the maximum system voltage of ${what} is not entered, so it cannot be checked.`,
        fix: "Enter the maximum system voltage from the data sheet (often 600 V, 1000 V or 1500 V).",
      });
    }
    const ok = atMost(worst.v, ratingV);
    return makeCheck({
      ...base,
      status: ok ? "pass" : "fail",
      value: worst.v,
      limit: ratingV,
      message: `The highest string voltage, ${fmt(worst.v, 1)} V on string ${worst.s.id}, is ${ok ? "within" : "above"} the ${ratingV} V maximum system voltage of ${what}.`,
      fix: ok ? undefined : `Shorten the strings or choose equipment listed for at least ${Math.ceil(worst.v)} V.`,
    });
  });
}
