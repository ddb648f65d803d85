import { atMost, fmt, makeCheck, plural } from "../check-result";
import { clauses } from "../clauses";
import { runInverterUnits, runStrings, usesOptimizers } from "../design-lookup";
import { DesignInputError } from "../errors";
import type { CheckResult, ConductorRun, Design, PvString, Site } from "../types";

// 690.8(A): a PV source circuit's maximum current is 1.25 × the module Isc (REFERENCE.md, from memory).
export const ISC_MULTIPLIER = 1.25;

/** Maximum current of one string: 1.25 × Isc, or the optimizer's rated output current (a DC-to-DC converter circuit). */
export function stringMaxCurrentA(design: Design): number {
  if (usesOptimizers(design)) {
    const outputA = design.moduleLevelDevice?.maxOutputCurrentA;
    if (outputA === undefined || !(outputA > 0)) {
      throw new DesignInputError("moduleLevelDevice.maxOutputCurrentA", "Optimizer strings need the optimizer's maximum output current.");
    }
    return outputA;
  }
  return ISC_MULTIPLIER * design.module.iscA;
}

/** 690.8(A) maximum current of the circuit a run carries (DC: strings in parallel; AC: continuous output of the inverters). */
export function runMaxCurrentA(design: Design, run: ConductorRun): number {
  if (run.circuit.kind === "dc-strings") return runStrings(design, run).length * stringMaxCurrentA(design);
  return runInverterUnits(design, run).reduce((sum, u) => sum + u.units * u.inverter.acOutputCurrentA, 0);
}

/** Short-circuit current into each inverter input (MPPT) against the inverter's input limit. */
export function checkInverterInputCurrent(design: Design, site: Site): CheckResult[] {
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
        message: ok
          ? `${plural(strings.length, "string")} feed ${fmt(iscA)} A of short-circuit current into ${input}, within its ${inverter.maxInputIscA} A limit.`
          : `${plural(strings.length, "string")} feed ${fmt(iscA)} A of short-circuit current into ${input}, above its ${inverter.maxInputIscA} A limit.`,
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
