import { fmt, makeCheck } from "../check-result";
import { DESIGN_GUIDELINE, clause } from "../clauses";
import type { ArrayDesign, CheckResult, CheckStatus, Inverter, PvModule, Site, TempCoefficient } from "../types";

// Plausibility of the data-sheet figures the review computes with. The ranges are common practice for
// crystalline silicon modules and grid-tied inverters, not code limits: a figure outside them is most
// often a unit slip (−0.0027 typed for −0.27 %/°C), which would quietly remove a safety margin.

type Band = { min: number; max: number };
// Voc temperature coefficients of crystalline modules, %/°C: about −0.2 to −0.5 (common practice).
export const VOC_COEFF_TYPICAL_PCT: Band = { min: -0.5, max: -0.2 };
// Outside this the figure cannot be a crystalline module's Voc coefficient in the stated unit (common practice).
export const VOC_COEFF_PLAUSIBLE_PCT: Band = { min: -0.7, max: -0.1 };
// Pmax temperature coefficients, %/°C (common practice).
export const PMAX_COEFF_PLAUSIBLE_PCT: Band = { min: -0.7, max: -0.15 };
// Vmp / Voc and Imp / Isc of crystalline modules at STC (common practice).
export const VMP_TO_VOC: Band = { min: 0.7, max: 0.95 };
export const IMP_TO_ISC: Band = { min: 0.85, max: 0.995 };
// Pmax within 5 % of Vmp × Imp (common practice; data sheets round each figure).
export const PMAX_PRODUCT_TOLERANCE = 0.05;
// Voltage a module-level device holds while shut down: about 1 V is common practice; 0.1–3 V covers the devices sold.
export const SHUTDOWN_HOLD_V: Band = { min: 0.1, max: 3 };
// Rated output current at least 95 % of the rated power over the nominal voltage (common practice).
export const INVERTER_CURRENT_TOLERANCE = 0.05;

const within = (v: number, b: Band) => v >= b.min - 1e-9 && v <= b.max + 1e-9;

/** A temperature coefficient in %/°C: V/°C figures are divided by the STC voltage they belong to. */
export function coefficientPctPerC(c: TempCoefficient, stcV: number): number {
  return c.unit === "%/C" ? c.value : (c.value / stcV) * 100;
}

/** Whether the review may use the module's Voc coefficient to set the cold voltage: only inside the typical band. */
export function vocCoefficientTrusted(module: PvModule): boolean {
  return module.vocTempCoeff !== undefined && within(coefficientPctPerC(module.vocTempCoeff, module.vocV), VOC_COEFF_TYPICAL_PCT);
}

const unitText = (c: TempCoefficient) => `${c.value} ${c.unit === "%/C" ? "%/°C" : "V/°C"}`;

function moduleProblems(m: PvModule, site: Site): CheckResult[] {
  const out: CheckResult[] = [];
  const edition = site.necEdition;
  const problem = (
    key: string,
    title: string,
    status: CheckStatus,
    value: number | null,
    message: string,
    fix: string,
    basis = DESIGN_GUIDELINE,
  ) =>
    out.push(
      makeCheck({
        id: `data-sheet:module.${key}`,
        title,
        status,
        value,
        limit: null,
        unit: "",
        clause: basis,
        edition,
        message,
        fix,
        field: `module.${key}`,
      }),
    );

  if (m.vocTempCoeff) {
    const pct = coefficientPctPerC(m.vocTempCoeff, m.vocV);
    if (!within(pct, VOC_COEFF_TYPICAL_PCT)) {
      const plausible = within(pct, VOC_COEFF_PLAUSIBLE_PCT);
      const asV = m.vocTempCoeff.unit === "V/C" ? ` (${fmt(pct, 3)} %/°C of the ${m.vocV} V Voc)` : "";
      problem(
        "vocTempCoeff",
        `${m.model} Voc temperature coefficient`,
        plausible ? "warn" : "fail",
        pct,
        `The module's Voc temperature coefficient, ${unitText(m.vocTempCoeff)}${asV}, is ${plausible ? "outside" : "far outside"} the usual −0.2 to −0.5 %/°C of crystalline modules${plausible ? "" : ": most likely a unit slip"}. The cold string voltage uses the higher of that figure and the Table 690.7(A) factor.`,
        `Check the data sheet's Voc coefficient and its unit (%/°C, or V/°C: about Voc × −0.002 to −0.005).`,
        `${DESIGN_GUIDELINE}; ${clause("maxVoltage", edition)}`,
      );
    }
  }
  if (m.pmaxTempCoeffPctPerC !== undefined && !within(m.pmaxTempCoeffPctPerC, PMAX_COEFF_PLAUSIBLE_PCT)) {
    problem(
      "pmaxTempCoeffPctPerC",
      `${m.model} Pmax temperature coefficient`,
      "warn",
      m.pmaxTempCoeffPctPerC,
      `The module's Pmax coefficient, ${m.pmaxTempCoeffPctPerC} %/°C, is outside the usual −0.15 to −0.7 %/°C; the hot-day voltage check leans on it.`,
      "Check the data sheet's Pmax coefficient and its unit (%/°C).",
    );
  }
  if (m.vmpTempCoeff) {
    const pct = coefficientPctPerC(m.vmpTempCoeff, m.vmpV);
    if (!within(pct, PMAX_COEFF_PLAUSIBLE_PCT)) {
      problem(
        "vmpTempCoeff",
        `${m.model} Vmp temperature coefficient`,
        "warn",
        pct,
        `The module's Vmp coefficient, ${unitText(m.vmpTempCoeff)}, is outside the usual −0.15 to −0.7 %/°C; the hot-day voltage check leans on it.`,
        "Check the data sheet's Vmp coefficient and its unit.",
      );
    }
  }
  const product = m.vmpV * m.impA;
  if (Math.abs(product - m.powerW) > PMAX_PRODUCT_TOLERANCE * m.powerW) {
    problem(
      "powerW",
      `${m.model} Pmax, Vmp and Imp`,
      "warn",
      m.powerW,
      `Vmp × Imp = ${fmt(product, 1)} W is not within 5 % of the ${m.powerW} W Pmax; one of the three figures is likely mistyped.`,
      "Check Pmax, Vmp and Imp against the data sheet.",
    );
  }
  if (!within(m.vmpV / m.vocV, VMP_TO_VOC)) {
    problem(
      "vmpV",
      `${m.model} Vmp against Voc`,
      "warn",
      m.vmpV,
      `Vmp ${m.vmpV} V is ${fmt((m.vmpV / m.vocV) * 100, 1)} % of Voc ${m.vocV} V; crystalline modules work at about 70 to 95 % of Voc.`,
      "Check Voc and Vmp against the data sheet.",
    );
  }
  if (!within(m.impA / m.iscA, IMP_TO_ISC)) {
    problem(
      "impA",
      `${m.model} Imp against Isc`,
      "warn",
      m.impA,
      `Imp ${m.impA} A is ${fmt((m.impA / m.iscA) * 100, 1)} % of Isc ${m.iscA} A; crystalline modules work at about 85 to 99.5 % of Isc.`,
      "Check Isc and Imp against the data sheet.",
    );
  }
  return out;
}

function inverterProblems(inv: Inverter, site: Site): CheckResult[] {
  const out: CheckResult[] = [];
  const edition = site.necEdition;
  const neededA = inv.acPowerW / (inv.acVoltageV * (inv.phase === 3 ? Math.sqrt(3) : 1));
  if (inv.acOutputCurrentA < neededA * (1 - INVERTER_CURRENT_TOLERANCE)) {
    // A current below what the rated power needs understates the breaker and conductors sized from it.
    out.push(
      makeCheck({
        id: `data-sheet:inverters.${inv.id}.acOutputCurrentA`,
        title: `${inv.model} output current`,
        status: "fail",
        value: inv.acOutputCurrentA,
        limit: neededA,
        unit: "A",
        clause: `${DESIGN_GUIDELINE}; ${clause("acCurrent", edition)}`,
        edition,
        message: `The ${inv.model}'s ${inv.acOutputCurrentA} A output current cannot carry its ${inv.acPowerW} W at ${inv.acVoltageV} V${inv.phase === 3 ? " three-phase" : ""}, which needs ${fmt(neededA)} A; the breaker and conductors are sized from this figure.`,
        fix: "Enter the maximum continuous output current from the data sheet.",
        field: `inverters.${inv.id}.acOutputCurrentA`,
      }),
    );
  }
  const window = (key: string, message: string) =>
    out.push(
      makeCheck({
        id: `data-sheet:inverters.${inv.id}.${key}`,
        title: `${inv.model} MPPT window`,
        status: "warn",
        value: null,
        limit: null,
        unit: "",
        clause: DESIGN_GUIDELINE,
        edition,
        message,
        fix: "Check the MPPT window and the maximum DC input voltage against the data sheet.",
        field: `inverters.${inv.id}.${key}`,
      }),
    );
  if (inv.mpptMinV !== undefined && inv.mpptMaxV !== undefined && inv.mpptMinV >= inv.mpptMaxV)
    window("mpptMaxV", `The ${inv.model}'s MPPT maximum ${inv.mpptMaxV} V is not above its minimum ${inv.mpptMinV} V.`);
  if (inv.mpptMaxV !== undefined && inv.mpptMaxV > inv.maxDcInputV)
    window("mpptMaxV", `The ${inv.model}'s MPPT maximum ${inv.mpptMaxV} V is above its ${inv.maxDcInputV} V maximum DC input.`);
  return out;
}

function deviceProblems(design: ArrayDesign, site: Site): CheckResult[] {
  const d = design.moduleLevelDevice;
  if (d?.shutdownOutputV === undefined || within(d.shutdownOutputV, SHUTDOWN_HOLD_V)) return [];
  // The rapid shutdown check and the field record's expected string voltage are built from this figure.
  return [
    makeCheck({
      id: "data-sheet:moduleLevelDevice.shutdownOutputV",
      title: `${d.model} voltage while shut down`,
      status: "warn",
      value: d.shutdownOutputV,
      limit: null,
      unit: "V",
      clause: `${DESIGN_GUIDELINE}; ${clause("rapidShutdown", site.necEdition)}`,
      edition: site.necEdition,
      message: `The ${d.model} is entered as holding ${d.shutdownOutputV} V while shut down; such devices hold about 0.1 to 3 V, most about 1 V.`,
      fix: "Check the device's shutdown output voltage on its data sheet.",
      field: "moduleLevelDevice.shutdownOutputV",
    }),
  ];
}

/** Each data-sheet figure the review leans on, against the range it can plausibly take; one passing result when all are plausible. */
export function checkDataSheets(design: ArrayDesign, site: Site): CheckResult[] {
  const problems = [
    ...moduleProblems(design.module, site),
    ...design.inverters.flatMap((i) => inverterProblems(i, site)),
    ...deviceProblems(design, site),
  ];
  if (problems.length > 0) return problems;
  return [
    makeCheck({
      id: "data-sheet",
      title: "Data-sheet figures",
      status: "pass",
      value: null,
      limit: null,
      unit: "",
      clause: DESIGN_GUIDELINE,
      edition: site.necEdition,
      message:
        "The module's and inverters' figures the review uses (coefficients, Voc and Vmp, Isc and Imp, output current) are within their usual ranges.",
    }),
  ];
}
