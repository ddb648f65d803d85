import { atMost, fmt, makeCheck, withArticle } from "../check-result";
import { DESIGN_GUIDELINE, clause } from "../clauses";
import { inverterById, usesOptimizers } from "../design-lookup";
import { DesignInputError, requireNonNegative } from "../errors";
import { CONDUCTOR_SIZES, sizeIndex, sizeLabel } from "../tables/conductor-sizes";
import { resistanceOhmPerKft } from "../tables/conductor-resistance";
import type { CheckResult, CheckStatus, ConductorRun, ConductorSize, Design, Site, VoltageDropPath } from "../types";
import { type RunCircuit, runCircuits } from "./circuit-current";
import { egcRequirement } from "./egc";

export type VoltageDropSystem = "dc" | "1-phase" | "3-phase";

// Warn above 2 % on a PV circuit (common practice); fail above 5 % in total, the NEC informational-note figure for feeder plus branch.
export const VOLTAGE_DROP_WARN_PERCENT = 2;
export const VOLTAGE_DROP_FAIL_PERCENT = 5;

/** Chapter 9 Table 8 method: DC and single phase 2 × L × R × I / 1000; three phase √3 × L × R × I / 1000 (L one way, ft). */
export function voltageDropV(system: VoltageDropSystem, lengthFt: number, ohmPerKft: number, currentA: number): number {
  const multiplier = system === "3-phase" ? Math.sqrt(3) : 2;
  return (multiplier * lengthFt * ohmPerKft * currentA) / 1000;
}

export function voltageDropStatus(percent: number): CheckStatus {
  if (!atMost(percent, VOLTAGE_DROP_FAIL_PERCENT)) return "fail";
  return atMost(percent, VOLTAGE_DROP_WARN_PERCENT) ? "pass" : "warn";
}

/** Working voltage and current of one circuit: Vmp and Imp for strings, regulated voltage for optimizer strings, rated output for AC. */
export function circuitOperatingPoint(
  design: Design,
  run: ConductorRun,
  circuit: RunCircuit,
): { voltageV: number; currentA: number; system: VoltageDropSystem } {
  if (circuit.units.length > 0) {
    const units = circuit.units;
    const { acVoltageV, phase } = units[0]!.inverter;
    if (units.some((u) => u.inverter.acVoltageV !== acVoltageV || u.inverter.phase !== phase)) {
      throw new DesignInputError(`runs.${run.id}.circuit`, `Run "${run.label}" joins inverters of different voltage or phase.`);
    }
    const currentA = units.reduce((sum, u) => sum + u.units * u.inverter.acOutputCurrentA, 0);
    return { voltageV: acVoltageV, currentA, system: phase === 3 ? "3-phase" : "1-phase" };
  }
  const strings = circuit.strings;
  const n = strings[0]!.modulesInSeries;
  if (usesOptimizers(design)) {
    const voltageV = inverterById(design, strings[0]!.inverterId).regulatedStringV ?? 0;
    if (!(voltageV > 0)) throw new DesignInputError(`runs.${run.id}`, "Optimizer strings need the inverter's regulated string voltage.");
    const perStringA = Math.min((n * design.module.powerW) / voltageV, design.moduleLevelDevice?.maxOutputCurrentA ?? Infinity);
    return { voltageV, currentA: strings.length * perStringA, system: "dc" };
  }
  if (strings.some((s) => s.modulesInSeries !== n)) {
    throw new DesignInputError(`runs.${run.id}.circuit`, `Strings in parallel on run "${run.label}" must have the same number of modules.`);
  }
  return { voltageV: n * design.module.vmpV, currentA: strings.length * design.module.impA, system: "dc" };
}

/** The drop of the run's worst circuit: each circuit in a shared raceway has its own conductors and its own current. */
export function runVoltageDrop(design: Design, run: ConductorRun, size = run.conductor.size): { dropV: number; percent: number } {
  const lengthFt = requireNonNegative(run.lengthFt, `runs.${run.id}.lengthFt`, `The length of run "${run.label}"`);
  const ohmPerKft = resistanceOhmPerKft(size, run.conductor.material, run.conductor.stranding, run.conductorTempC);
  const drops = runCircuits(design, run).map((circuit) => {
    const { voltageV, currentA, system } = circuitOperatingPoint(design, run, circuit);
    const dropV = voltageDropV(system, lengthFt, ohmPerKft, currentA);
    return { dropV, percent: (dropV / voltageV) * 100 };
  });
  return drops.reduce((worst, d) => (d.percent > worst.percent ? d : worst));
}

/** The suggested larger size, with the EGC 250.122(B) then asks for where it grows with the conductors. */
function largerSizeFix(design: Design, site: Site, run: ConductorRun, size: ConductorSize): string {
  const upsized = { ...run, conductor: { ...run.conductor, size } };
  let egcNote = "";
  if (run.egc) {
    try {
      const needed = egcRequirement(design, site, upsized, run.egc.material).required;
      if (sizeIndex(needed) > sizeIndex(run.egc.size))
        egcNote = ` with ${withArticle(sizeLabel(needed))} grounding conductor (250.122(B) grows it with the conductors)`;
    } catch (err) {
      if (!(err instanceof DesignInputError)) throw err;
    }
  }
  return `Use ${sizeLabel(size)} conductors${egcNote} to stay within 2 %.`;
}

export function checkRunVoltageDrop(design: Design, site: Site, run: ConductorRun): CheckResult[] {
  const { dropV, percent } = runVoltageDrop(design, run);
  const status = voltageDropStatus(percent);
  const better =
    status === "pass"
      ? undefined
      : CONDUCTOR_SIZES.slice(sizeIndex(run.conductor.size) + 1).find((size) => {
          try {
            return atMost(runVoltageDrop(design, run, size).percent, VOLTAGE_DROP_WARN_PERCENT);
          } catch (err) {
            if (err instanceof DesignInputError) return false; // a size the resistance table lacks for this stranding
            throw err;
          }
        });
  return [
    makeCheck({
      id: `voltage-drop:${run.id}`,
      title: `Run "${run.label}" voltage drop`,
      status,
      value: percent,
      limit: VOLTAGE_DROP_WARN_PERCENT,
      unit: "%",
      clause: `${clause("voltageDrop", site.necEdition)}; ${DESIGN_GUIDELINE} 2 %`,
      edition: site.necEdition,
      message: `Run "${run.label}" (${run.lengthFt} ft one way, ${sizeLabel(run.conductor.size)}) loses ${fmt(dropV)} V, ${fmt(percent)} % of its working voltage.`,
      fix: status === "pass" ? undefined : better ? largerSizeFix(design, site, run, better) : "Shorten the run or split the circuit.",
    }),
  ];
}

/** Drops along a path add up: array to inverter, inverter to panel. */
export function checkPathVoltageDrop(design: Design, site: Site, path: VoltageDropPath): CheckResult[] {
  const runs = path.runIds.map((id) => {
    const run = design.runs.find((r) => r.id === id);
    if (!run) throw new DesignInputError(`paths.${path.id}`, `Path "${path.label}" names a run "${id}" that is not in the design.`);
    return run;
  });
  const percent = runs.reduce((sum, run) => sum + runVoltageDrop(design, run).percent, 0);
  const status = voltageDropStatus(percent);
  return [
    makeCheck({
      id: `voltage-drop-path:${path.id}`,
      title: `Voltage drop from end to end: ${path.label}`,
      status,
      value: percent,
      limit: VOLTAGE_DROP_FAIL_PERCENT,
      unit: "%",
      clause: `${clause("voltageDrop", site.necEdition)}; ${DESIGN_GUIDELINE} 2 %, 5 % in total`,
      edition: site.necEdition,
      message: `Along "${path.label}" (${runs.length} runs) the drops add up to ${fmt(percent)} %; we flag above 2 % and fail above 5 %.`,
      fix: status === "pass" ? undefined : "Use larger conductors on the longest runs.",
    }),
  ];
}
