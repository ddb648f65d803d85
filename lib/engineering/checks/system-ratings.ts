import { atMost, fmt, makeCheck } from "../check-result";
import { DESIGN_GUIDELINE, DESIGN_CONSISTENCY } from "../clauses";
import { totalModuleCount } from "../design-lookup";
import { requirePositive } from "../errors";
import type { CheckResult, Design, Site } from "../types";

export interface SystemRatings {
  moduleCount: number;
  dcKw: number; // at STC
  acKw: number; // continuous inverter output
  dcToAcRatio: number;
}

// Above about 1.5 the inverter clips a noticeable share of the energy (common practice).
export const DC_TO_AC_WARN_ABOVE = 1.5;

export function systemRatings(design: Design): SystemRatings {
  const moduleCount = requirePositive(totalModuleCount(design), "roofPlanes", "The number of modules");
  const dcKw = (moduleCount * design.module.powerW) / 1000;
  const acKw = design.inverters.reduce((sum, i) => sum + i.quantity * i.acPowerW, 0) / 1000;
  requirePositive(acKw, "inverters", "The inverters' total AC power");
  return { moduleCount, dcKw, acKw, dcToAcRatio: dcKw / acKw };
}

export function checkDcToAcRatio(design: Design, site: Site): CheckResult[] {
  const r = systemRatings(design);
  const ok = atMost(r.dcToAcRatio, DC_TO_AC_WARN_ABOVE);
  return [
    makeCheck({
      id: "dc-ac-ratio",
      title: "DC to AC ratio",
      status: ok ? "pass" : "warn",
      value: r.dcToAcRatio,
      limit: DC_TO_AC_WARN_ABOVE,
      unit: "",
      clause: DESIGN_GUIDELINE,
      edition: site.necEdition,
      message: `${r.moduleCount} modules make ${fmt(r.dcKw, 3)} kW DC for ${fmt(r.acKw, 3)} kW of inverter output, a ratio of ${fmt(r.dcToAcRatio)}${ok ? "." : "; the inverters will clip a noticeable share of the energy."}`,
      fix: ok ? undefined : "Add inverter capacity or remove modules; check the inverter maker's DC to AC limit.",
    }),
  ];
}

/** Every module on the roof should be in a string (string inverters) or on a micro-inverter input. */
export function checkModuleCount(design: Design, site: Site): CheckResult[] {
  if (design.strings.length === 0) return [];
  const inStrings = design.strings.reduce((sum, s) => sum + s.modulesInSeries, 0);
  const onRoof = totalModuleCount(design);
  const ok = inStrings === onRoof;
  return [
    makeCheck({
      id: "module-count",
      title: "Modules in strings",
      status: ok ? "pass" : "fail",
      value: inStrings,
      limit: onRoof,
      unit: "modules",
      clause: DESIGN_CONSISTENCY,
      edition: site.necEdition,
      message: ok
        ? `The strings hold all ${onRoof} modules on the roof planes.`
        : `The strings hold ${inStrings} modules but the roof planes hold ${onRoof}.`,
      fix: ok ? undefined : "Make the string lengths add up to the modules placed on the roof.",
    }),
  ];
}
