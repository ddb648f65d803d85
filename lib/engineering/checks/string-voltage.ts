import { atMost, fmt, makeCheck } from "../check-result";
import { clause } from "../clauses";
import { inverterById, usesOptimizers } from "../design-lookup";
import { DesignInputError, requireWholePositive } from "../errors";
import { vocCorrectionFactor } from "../tables/voc-correction";
import type { ArrayDesign, CheckResult, Inverter, PvModule, PvString, Site } from "../types";
import { coefficientPctPerC, vocCoefficientTrusted } from "./data-sheets";

// NEC 690.7: 600 V on one- and two-family dwellings, 1000 V on other buildings (REFERENCE.md).
export const DWELLING_MAX_V = 600;
export const OTHER_BUILDING_MAX_V = 1000;

export interface ColdVoc {
  vocV: number;
  method: "coefficient" | "table";
  factor: number;
  coefficientSetAside?: boolean; // the maker's coefficient was outside the usual range and gave the lower voltage
}

/**
 * 690.7(A) module Voc at the record low: the maker's coefficient when given (690.7(A)(1)), Table 690.7(A)
 * otherwise. A coefficient outside the usual range of crystalline modules is not trusted to lower the
 * result: the higher of the two methods is used, so a unit slip cannot remove the cold correction.
 */
function fromTableAt(module: PvModule, tempC: number): ColdVoc {
  const factor = vocCorrectionFactor(tempC);
  return { vocV: module.vocV * factor, method: "table", factor };
}

export function coldModuleVoc(module: PvModule, recordLowTempC: number): ColdVoc {
  const coeff = module.vocTempCoeff;
  const fromTable = (): ColdVoc => fromTableAt(module, recordLowTempC);
  if (!coeff) return fromTable();
  if (!(coeff.value < 0)) {
    throw new DesignInputError(
      "module.vocTempCoeff",
      "The Voc temperature coefficient must be negative: module voltage rises as it gets colder.",
    );
  }
  const deltaC = recordLowTempC - 25;
  const vocV = module.vocV * (1 + (deltaC * coefficientPctPerC(coeff, module.vocV)) / 100);
  const byCoefficient: ColdVoc = { vocV, method: "coefficient", factor: vocV / module.vocV };
  if (vocCoefficientTrusted(module) || recordLowTempC >= 25) return byCoefficient;
  // Table 690.7(A) stops at −40 °C; colder than that its last factor still sets a floor (the data-sheet check flags the coefficient).
  const table = recordLowTempC < -40 ? { ...fromTableAt(module, -40) } : fromTable();
  return table.vocV > byCoefficient.vocV ? { ...table, coefficientSetAside: true } : byCoefficient;
}

/** The lower of the inverter's maximum DC input and the 690.7 limit for the building. */
export function stringVoltageLimit(inverter: Inverter, site: Site): { limitV: number; why: string } {
  const codeV = site.isDwelling ? DWELLING_MAX_V : OTHER_BUILDING_MAX_V;
  if (inverter.maxDcInputV < codeV) {
    return { limitV: inverter.maxDcInputV, why: `the ${inverter.model}'s ${inverter.maxDcInputV} V maximum input` };
  }
  return site.isDwelling
    ? { limitV: codeV, why: "the 600 V limit for one- and two-family dwellings" }
    : { limitV: codeV, why: "the 1000 V limit for buildings other than dwellings" };
}

function methodText(design: ArrayDesign, cold: ColdVoc): string {
  const c = design.module.vocTempCoeff;
  if (cold.method === "coefficient" && c) return `using the module's ${c.value} ${c.unit === "%/C" ? "%/°C" : "V/°C"} coefficient`;
  if (cold.coefficientSetAside && c) {
    return `using the Table 690.7(A) factor ${cold.factor} (the module's ${c.value} ${c.unit === "%/C" ? "%/°C" : "V/°C"} coefficient is outside the usual range and would give less)`;
  }
  return `using the Table 690.7(A) factor ${cold.factor}`;
}

export function checkStringVoltage(design: ArrayDesign, site: Site, string: PvString): CheckResult[] {
  const n = requireWholePositive(string.modulesInSeries, `strings.${string.id}.modulesInSeries`, "The number of modules in a string");
  const inverter = inverterById(design, string.inverterId);
  if (inverter.kind === "micro") {
    throw new DesignInputError(
      `strings.${string.id}.inverterId`,
      `String ${string.id} is wired to a micro-inverter; micro-inverter designs have no DC strings.`,
    );
  }
  return usesOptimizers(design) ? optimizerString(design, site, string, inverter, n) : seriesString(design, site, string, inverter, n);
}

function seriesString(design: ArrayDesign, site: Site, string: PvString, inverter: Inverter, n: number): CheckResult[] {
  const cold = coldModuleVoc(design.module, site.recordLowTempC);
  const stringV = n * cold.vocV;
  const { limitV, why } = stringVoltageLimit(inverter, site);
  const ok = atMost(stringV, limitV);
  const maxModules = Math.floor(limitV / cold.vocV + 1e-9);
  return [
    makeCheck({
      id: `string-voltage:${string.id}`,
      title: `String ${string.id} maximum voltage`,
      status: ok ? "pass" : "fail",
      value: stringV,
      limit: limitV,
      unit: "V",
      clause: clause("maxVoltage", site.necEdition),
      edition: site.necEdition,
      message: `String ${string.id} (${n} modules) reaches ${fmt(stringV, 1)} V at ${site.recordLowTempC} °C ${methodText(design, cold)}, ${ok ? "within" : "above"} ${why}.`,
      fix: ok ? undefined : `Use at most ${maxModules} modules in this string.`,
    }),
  ];
}

function optimizerString(design: ArrayDesign, site: Site, string: PvString, inverter: Inverter, n: number): CheckResult[] {
  const regulatedV = inverter.regulatedStringV;
  if (regulatedV === undefined || !(regulatedV > 0)) {
    throw new DesignInputError(
      `inverters.${inverter.id}.regulatedStringV`,
      `Optimizer strings need the ${inverter.model}'s fixed string voltage.`,
    );
  }
  const { limitV, why } = stringVoltageLimit(inverter, site);
  const voltageOk = atMost(regulatedV, limitV);
  const results = [
    makeCheck({
      id: `string-voltage:${string.id}`,
      title: `String ${string.id} maximum voltage`,
      status: voltageOk ? "pass" : "fail",
      value: regulatedV,
      limit: limitV,
      unit: "V",
      clause: clause("maxVoltageConverter", site.necEdition),
      edition: site.necEdition,
      message: `String ${string.id} is held by its optimizers at ${regulatedV} V, ${voltageOk ? "within" : "above"} ${why}.`,
      fix: voltageOk ? undefined : "Choose an inverter whose regulated string voltage is within the limit.",
    }),
  ];
  const maxPowerW = inverter.maxStringPowerW;
  if (maxPowerW === undefined) return results;
  const powerW = n * design.module.powerW;
  const powerOk = atMost(powerW, maxPowerW);
  results.push(
    makeCheck({
      id: `string-power:${string.id}`,
      title: `String ${string.id} power`,
      status: powerOk ? "pass" : "fail",
      value: powerW,
      limit: maxPowerW,
      unit: "W",
      clause: clause("listing", site.necEdition),
      edition: site.necEdition,
      message: `String ${string.id} has ${n} modules totalling ${powerW} W, ${powerOk ? "within" : "above"} the ${inverter.model}'s ${maxPowerW} W per-string limit.`,
      fix: powerOk ? undefined : `Use at most ${Math.floor(maxPowerW / design.module.powerW)} modules in this string.`,
    }),
  );
  return results;
}
