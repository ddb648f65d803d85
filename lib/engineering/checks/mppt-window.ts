import { atLeast, atMost, fmt, makeCheck } from "../check-result";
import { INVERTER_DATA_SHEET } from "../clauses";
import { inverterById, microInverters, usesOptimizers } from "../design-lookup";
import type { ArrayDesign, CheckResult, Inverter, PvModule, PvString, Site } from "../types";

// Cell temperature above the high design ambient (common practice; flush roof arrays run hotter than open racks).
export const CELL_TEMP_RISE_C = { roof: 25, ground: 20 } as const;

export function cellTempC(design: ArrayDesign, site: Site): number {
  return site.highDesignTempC + (design.cellTempRiseC ?? CELL_TEMP_RISE_C[design.mount ?? "roof"]);
}

/**
 * Module Vmp at a cell temperature. Uses the Vmp coefficient, else the Pmax coefficient as a
 * stand-in (common practice: Vmp falls about as fast as power); null when neither is given.
 */
export function hotModuleVmpV(module: PvModule, cellTemperatureC: number): number | null {
  const deltaC = cellTemperatureC - 25;
  const c = module.vmpTempCoeff;
  if (c) return c.unit === "%/C" ? module.vmpV * (1 + (deltaC * c.value) / 100) : module.vmpV + deltaC * c.value;
  if (module.pmaxTempCoeffPctPerC !== undefined) return module.vmpV * (1 + (deltaC * module.pmaxTempCoeffPctPerC) / 100);
  return null;
}

export function checkMpptWindow(design: ArrayDesign, site: Site, string: PvString): CheckResult[] {
  if (usesOptimizers(design)) return []; // the optimizers hold the string at a fixed voltage
  const inverter = inverterById(design, string.inverterId);
  return windowChecks(design, site, inverter, string.modulesInSeries, `String ${string.id}`, string.id);
}

/** Micro-inverters track one module each: the same test with a "string" of one. */
export function checkMicroMpptWindow(design: ArrayDesign, site: Site): CheckResult[] {
  return microInverters(design).flatMap((i) => windowChecks(design, site, i, 1, `Each module on the ${i.model}`, i.id));
}

function windowChecks(design: ArrayDesign, site: Site, inverter: Inverter, n: number, who: string, key: string): CheckResult[] {
  const results: CheckResult[] = [];
  const edition = site.necEdition;
  const clauseText = `${INVERTER_DATA_SHEET}: MPPT range`;
  const tCell = cellTempC(design, site);
  if (inverter.mpptMinV !== undefined) {
    const vmpHot = hotModuleVmpV(design.module, tCell);
    if (vmpHot === null) {
      results.push(
        makeCheck({
          id: `mppt-min:${key}`,
          title: `${who} voltage on a hot day`,
          status: "warn",
          value: null,
          limit: inverter.mpptMinV,
          unit: "V",
          clause: clauseText,
          edition,
          message: `${who} could not be checked against the ${inverter.model}'s ${inverter.mpptMinV} V MPPT minimum because the module's Vmp or Pmax temperature coefficient is missing.`,
          fix: "Enter the module's Vmp or Pmax temperature coefficient from its data sheet.",
        }),
      );
    } else {
      const stringV = n * vmpHot;
      const ok = atLeast(stringV, inverter.mpptMinV);
      results.push(
        makeCheck({
          id: `mppt-min:${key}`,
          title: `${who} voltage on a hot day`,
          status: ok ? "pass" : "warn",
          value: stringV,
          limit: inverter.mpptMinV,
          unit: "V",
          clause: clauseText,
          edition,
          message: `${who} works at about ${fmt(stringV, 1)} V with cells at ${fmt(tCell, 1)} °C (${site.highDesignTempC} °C air plus the usual rise), ${ok ? "at or above" : "below"} the ${inverter.model}'s ${inverter.mpptMinV} V MPPT minimum${ok ? "" : ", so it will lose energy on hot days"}.`,
          fix: ok
            ? undefined
            : n > 1
              ? `Use at least ${Math.ceil(inverter.mpptMinV / vmpHot - 1e-9)} modules in this string.`
              : "Choose a micro-inverter whose MPPT range suits this module.",
        }),
      );
    }
  }
  if (inverter.mpptMaxV !== undefined) {
    const stcV = n * design.module.vmpV;
    const ok = atMost(stcV, inverter.mpptMaxV);
    results.push(
      makeCheck({
        id: `mppt-max:${key}`,
        title: `${who} working voltage`,
        status: ok ? "pass" : "warn",
        value: stcV,
        limit: inverter.mpptMaxV,
        unit: "V",
        clause: clauseText,
        edition,
        message: `${who} works at ${fmt(stcV, 1)} V at standard test conditions, ${ok ? "within" : "above"} the ${inverter.model}'s ${inverter.mpptMaxV} V MPPT maximum.`,
        fix: ok
          ? undefined
          : n > 1
            ? `Use at most ${Math.floor(inverter.mpptMaxV / design.module.vmpV + 1e-9)} modules in this string.`
            : "Choose a micro-inverter whose MPPT range suits this module.",
      }),
    );
  }
  return results;
}
