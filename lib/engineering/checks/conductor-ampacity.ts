import { atLeast, fmt, makeCheck } from "../check-result";
import { type ClauseId, clauses } from "../clauses";
import { isDcRun, runInverterUnits } from "../design-lookup";
import { DesignInputError } from "../errors";
import { tableAmpacityA } from "../tables/ampacity";
import { CONDUCTOR_SIZES, type ConductorSize, sizeLabel } from "../tables/conductor-sizes";
import type { CheckResult, ConductorRun, ConductorSpec, Design, NecEdition, Site, TerminalTempC } from "../types";
import { runMaxCurrentA } from "./circuit-current";
import { type ConditionsOfUse, conditionsOfUse } from "./conditions-of-use";

// 690.8(B)(1) / 705.28(B)(1): 125 % of the maximum current before conditions of use (REFERENCE.md, from memory).
export const CONTINUOUS_MULTIPLIER = 1.25;
export const DEFAULT_TERMINAL_TEMP_C: TerminalTempC = 75;

export interface ConductorEvaluation {
  maxCurrentA: number;
  requiredUnconditionedA: number;
  terminalColumnC: TerminalTempC;
  terminalAmpacityA: number;
  correctedAmpacityA: number;
  usableAmpacityA: number; // what an OCPD must protect: the lower of the two
  passesTerminal: boolean;
  passesConditions: boolean;
}

export function evaluateConductor(
  conductor: ConductorSpec,
  terminalTempC: TerminalTempC,
  maxCurrentA: number,
  conditions: ConditionsOfUse,
  edition: NecEdition,
): ConductorEvaluation {
  // 110.14(C): the termination rating caps the column even for 90 °C insulation.
  const terminalColumnC = Math.min(terminalTempC, conductor.insulationTempC) as TerminalTempC;
  const terminalAmpacityA = tableAmpacityA(conductor.size, conductor.material, terminalColumnC, edition);
  const insulationAmpacityA = tableAmpacityA(conductor.size, conductor.material, conductor.insulationTempC, edition);
  const correctedAmpacityA = insulationAmpacityA * conditions.correctionFactor * conditions.adjustmentFactor;
  const requiredUnconditionedA = CONTINUOUS_MULTIPLIER * maxCurrentA;
  return {
    maxCurrentA,
    requiredUnconditionedA,
    terminalColumnC,
    terminalAmpacityA,
    correctedAmpacityA,
    usableAmpacityA: Math.min(terminalAmpacityA, correctedAmpacityA),
    passesTerminal: atLeast(terminalAmpacityA, requiredUnconditionedA),
    passesConditions: atLeast(correctedAmpacityA, maxCurrentA),
  };
}

/** The smallest size of the same material and insulation that passes both tests, or null if none in the table does. */
export function smallestPassingSize(
  conductor: ConductorSpec,
  terminalTempC: TerminalTempC,
  maxCurrentA: number,
  conditions: ConditionsOfUse,
  edition: NecEdition,
): ConductorSize | null {
  for (const size of CONDUCTOR_SIZES) {
    let e: ConductorEvaluation;
    try {
      e = evaluateConductor({ ...conductor, size }, terminalTempC, maxCurrentA, conditions, edition);
    } catch (err) {
      if (err instanceof DesignInputError) continue; // e.g. 14 AWG aluminum is not listed
      throw err;
    }
    if (e.passesTerminal && e.passesConditions) return size;
  }
  return null;
}

export function defaultCurrentCarrying(design: Design, run: ConductorRun): number {
  if (isDcRun(run)) return 2;
  return runInverterUnits(design, run).some((u) => u.inverter.phase === 3) ? 3 : 2;
}

export function evaluateRun(design: Design, site: Site, run: ConductorRun): { evaluation: ConductorEvaluation; conditions: ConditionsOfUse } {
  const conditions = conditionsOfUse(run, site, defaultCurrentCarrying(design, run));
  const terminal = run.terminalTempC ?? DEFAULT_TERMINAL_TEMP_C;
  return { evaluation: evaluateConductor(run.conductor, terminal, runMaxCurrentA(design, run), conditions, site.necEdition), conditions };
}

function conductorName(c: ConductorSpec): string {
  return `${sizeLabel(c.size)} ${c.material === "Cu" ? "copper" : "aluminum"}`;
}

export function checkConductorAmpacity(design: Design, site: Site, run: ConductorRun): CheckResult[] {
  const edition = site.necEdition;
  const { evaluation: e, conditions: c } = evaluateRun(design, site, run);
  const sizing: ClauseId = isDcRun(run) ? "conductorSizing" : "acConductorSizing";
  const terminal = run.terminalTempC ?? DEFAULT_TERMINAL_TEMP_C;
  const smallest = e.passesTerminal && e.passesConditions ? null : smallestPassingSize(run.conductor, terminal, e.maxCurrentA, c, edition);
  const fix = smallest ? `Use ${conductorName({ ...run.conductor, size: smallest })} or larger.` : "No conductor in the table is large enough; split the circuit or lower its current.";
  const name = `Run "${run.label}" (${conductorName(run.conductor)})`;

  const conditionIds: ClauseId[] = [sizing, "tempCorrection"];
  if (c.rooftopAdderC > 0) conditionIds.push("rooftopAdder");
  if (c.adjustmentFactor < 1) conditionIds.push("cccAdjustment");
  const why = [`${fmt(c.effectiveAmbientC, 1)} °C${c.rooftopAdderC > 0 ? ` (${fmt(c.ambientC, 1)} °C air plus ${c.rooftopAdderC} °C on the roof)` : ""} × ${c.correctionFactor}`];
  if (c.adjustmentFactor < 1) why.push(`${c.currentCarryingConductors} current-carrying conductors together × ${c.adjustmentFactor}`);

  return [
    makeCheck({
      id: `ampacity-terminal:${run.id}`,
      title: `Run "${run.label}" ampacity at its terminals`,
      status: e.passesTerminal ? "pass" : "fail",
      value: e.terminalAmpacityA,
      limit: e.requiredUnconditionedA,
      unit: "A",
      clause: clauses(edition, sizing, "terminals", "ampacityTable"),
      edition,
      message: `${name} is good for ${e.terminalAmpacityA} A at its ${e.terminalColumnC} °C terminals; it must carry 1.25 × ${fmt(e.maxCurrentA)} A = ${fmt(e.requiredUnconditionedA)} A.`,
      fix: e.passesTerminal ? undefined : fix,
    }),
    makeCheck({
      id: `ampacity-conditions:${run.id}`,
      title: `Run "${run.label}" ampacity where installed`,
      status: e.passesConditions ? "pass" : "fail",
      value: e.correctedAmpacityA,
      limit: e.maxCurrentA,
      unit: "A",
      clause: clauses(edition, ...conditionIds),
      edition,
      message: `${name} carries ${fmt(e.correctedAmpacityA)} A after correction for ${why.join(" and ")}; the circuit's maximum current is ${fmt(e.maxCurrentA)} A.`,
      fix: e.passesConditions ? undefined : fix,
    }),
  ];
}
