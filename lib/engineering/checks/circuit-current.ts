import { atMost, countAgrees, fmt, makeCheck, plural } from "../check-result";
import { clauses } from "../clauses";
import { runInverterUnits, runStrings, usesOptimizers } from "../design-lookup";
import { DesignInputError } from "../errors";
import type { ArrayDesign, CheckResult, ConductorRun, Design, Inverter, PvString, Site } from "../types";

// 690.8(A): a PV source circuit's maximum current is 1.25 × the module Isc (REFERENCE.md, from memory).
export const ISC_MULTIPLIER = 1.25;

/** Maximum current of one string: 1.25 × Isc, or the optimizer's rated output current (a DC-to-DC converter circuit). */
export function stringMaxCurrentA(design: ArrayDesign): number {
  if (usesOptimizers(design)) {
    const outputA = design.moduleLevelDevice?.maxOutputCurrentA;
    if (outputA === undefined || !(outputA > 0)) {
      throw new DesignInputError("moduleLevelDevice.maxOutputCurrentA", "Optimizer strings need the optimizer's maximum output current.");
    }
    return outputA;
  }
  return ISC_MULTIPLIER * design.module.iscA;
}

/**
 * One circuit inside a run: a pair of DC conductors carrying one string (or strings joined in
 * parallel before the run), or one AC output circuit.
 */
export interface RunCircuit {
  strings: PvString[]; // DC circuits
  units: { inverter: Inverter; units: number }[]; // AC circuits
  maxCurrentA: number; // 690.8(A) maximum current of this circuit
}

/**
 * The circuits a run holds. Strings are separate circuits unless the run says they were joined in
 * parallel before it; inverter outputs are one circuit (after a combiner) unless the run says otherwise.
 */
export function runCircuits(design: Design, run: ConductorRun): RunCircuit[] {
  if (run.circuit.kind === "dc-strings") {
    const strings = runStrings(design, run);
    const perStringA = stringMaxCurrentA(design);
    const groups = run.circuit.combined ? [strings] : strings.map((s) => [s]);
    return groups.map((g) => ({ strings: g, units: [], maxCurrentA: g.length * perStringA }));
  }
  const units = runInverterUnits(design, run);
  const groups = run.circuit.combined === false ? units.map((u) => [u]) : [units];
  return groups.map((g) => ({ strings: [], units: g, maxCurrentA: g.reduce((sum, u) => sum + u.units * u.inverter.acOutputCurrentA, 0) }));
}

/** 690.8(A) maximum current in each conductor of a run: that of its largest circuit. */
export function runMaxCurrentA(design: Design, run: ConductorRun): number {
  return Math.max(...runCircuits(design, run).map((c) => c.maxCurrentA));
}

/** Current-carrying conductors per circuit: two for DC and single-phase AC, three for three-phase AC (the neutral of a balanced inverter output is not counted). */
function conductorsPerCircuit(circuit: RunCircuit): number {
  return circuit.units.some((u) => u.inverter.phase === 3) ? 3 : 2;
}

/** The current-carrying conductors a run's own circuits put in its raceway or cable. */
export function circuitConductorCount(design: Design, run: ConductorRun): number {
  return runCircuits(design, run).reduce((n, c) => n + conductorsPerCircuit(c), 0);
}

/** Strings joined at each inverter input (MPPT): a fault in one string draws current from the others. */
export function stringsOnSameInput(design: ArrayDesign, string: PvString): number {
  return design.strings.filter((s) => s.inverterId === string.inverterId && (s.mpptIndex ?? 1) === (string.mpptIndex ?? 1)).length;
}

/** Short-circuit current into each inverter input (MPPT) against the inverter's input limit. */
export function checkInverterInputCurrent(design: ArrayDesign, site: Site): CheckResult[] {
  if (usesOptimizers(design)) return [];
  const groups = new Map<string, PvString[]>();
  for (const s of design.strings) {
    const key = `${s.inverterId}:${s.mpptIndex ?? 1}`;
    groups.set(key, [...(groups.get(key) ?? []), s]);
  }
  const results: CheckResult[] = [];
  for (const [key, strings] of groups) {
    const inverter = design.inverters.find((i) => i.id === strings[0]!.inverterId);
    if (!inverter || inverter.maxInputIscA === undefined) continue;
    const iscA = strings.length * design.module.iscA;
    const ok = atMost(iscA, inverter.maxInputIscA);
    const input = `${inverter.model} input ${key.split(":")[1]}`;
    results.push(
      makeCheck({
        id: `inverter-input-current:${key}`,
        title: `Short-circuit current into ${input}`,
        status: ok ? "pass" : "fail",
        value: iscA,
        limit: inverter.maxInputIscA,
        unit: "A",
        clause: clauses(site.necEdition, "maxCurrent", "listing"),
        edition: site.necEdition,
        message: `${countAgrees(strings.length, "string", "feeds", "feed")} ${fmt(iscA)} A of short-circuit current into ${input}, ${ok ? "within" : "above"} its ${inverter.maxInputIscA} A limit.`,
        fix: ok ? undefined : stringsPerInputFix(Math.floor(inverter.maxInputIscA / design.module.iscA)),
      }),
    );
  }
  return results;
}

function stringsPerInputFix(maxStrings: number): string {
  return maxStrings >= 1
    ? `Put at most ${plural(maxStrings, "string")} on this input.`
    : "One module's short-circuit current is already above this input's limit; choose another inverter.";
}
