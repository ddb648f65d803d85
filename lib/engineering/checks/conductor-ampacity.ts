import { atLeast, fmt, makeCheck } from "../check-result";
import { DESIGN_CONSISTENCY, type ClauseId, clauses } from "../clauses";
import { isDcRun, runInverterUnits, runStrings } from "../design-lookup";
import { DesignInputError, requireWholePositive } from "../errors";
import { tableAmpacityA } from "../tables/ampacity";
import { CONDUCTOR_SIZES, type ConductorSize, sizeLabel } from "../tables/conductor-sizes";
import type { CheckResult, ConductorRun, ConductorSpec, Design, Inverter, NecEdition, Site, TerminalTempC } from "../types";
import { circuitConductorCount, runCircuits, runMaxCurrentA } from "./circuit-current";
import { type ConditionsOfUse, conditionsOfUse } from "./conditions-of-use";

// 690.8(B)(1) / 705.28(B)(1): 125 % of the maximum current before conditions of use (REFERENCE.md, from memory).
export const CONTINUOUS_MULTIPLIER = 1.25;
// 110.14(C)(1): terminations of circuits rated 100 A or less are 60 °C unless the equipment is marked
// otherwise; above 100 A, 75 °C (from memory).
export const SMALL_CIRCUIT_LIMIT_A = 100;

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

/** The inverters whose terminals a run lands on: those its strings feed, or those whose output it carries. */
function runInverters(design: Design, run: ConductorRun): Inverter[] {
  const ids = new Set(
    isDcRun(run) ? runStrings(design, run).map((s) => s.inverterId) : runInverterUnits(design, run).map((u) => u.inverter.id),
  );
  return design.inverters.filter((i) => ids.has(i.id));
}

export type TerminalBasis = { tempC: TerminalTempC; source: "run" | "equipment" | "code" };

/**
 * The terminal temperature a run is sized at: the rating entered for the run; else the marked rating of
 * the inverter terminals it lands on; else 110.14(C)(1): 60 °C for circuits of 100 A or less, 75 °C above.
 */
export function terminalBasis(design: Design, run: ConductorRun, maxCurrentA: number): TerminalBasis {
  if (run.terminalTempC !== undefined) return { tempC: run.terminalTempC, source: "run" };
  const marked = runInverters(design, run).map((i) => i.terminalTempC);
  if (marked.length > 0 && marked.every((t) => t !== undefined))
    return { tempC: Math.min(...(marked as number[])) as TerminalTempC, source: "equipment" };
  const circuitRatingA = run.ocpdA ?? (isDcRun(run) ? CONTINUOUS_MULTIPLIER * maxCurrentA : design.service.pvBreakerA);
  return { tempC: circuitRatingA > SMALL_CIRCUIT_LIMIT_A ? 75 : 60, source: "code" };
}

export function evaluateRun(
  design: Design,
  site: Site,
  run: ConductorRun,
): { evaluation: ConductorEvaluation; conditions: ConditionsOfUse; terminal: TerminalBasis } {
  const conditions = conditionsOfUse(run, site, circuitConductorCount(design, run));
  const maxCurrentA = runMaxCurrentA(design, run);
  const terminal = terminalBasis(design, run, maxCurrentA);
  return { evaluation: evaluateConductor(run.conductor, terminal.tempC, maxCurrentA, conditions, site.necEdition), conditions, terminal };
}

export function conductorName(c: ConductorSpec): string {
  return `${sizeLabel(c.size)} ${c.material === "Cu" ? "copper" : "aluminum"}`;
}

function terminalWords(t: TerminalBasis): string {
  if (t.source === "run") return `its ${t.tempC} °C terminals`;
  if (t.source === "equipment")
    return `the inverter's ${t.tempC} °C terminals (as marked; every other termination must be rated at least as high)`;
  return `${t.tempC} °C terminals (no terminal rating is entered, so 110.14(C)(1) applies: 60 °C up to 100 A, 75 °C above)`;
}

export function checkConductorAmpacity(design: Design, site: Site, run: ConductorRun): CheckResult[] {
  const edition = site.necEdition;
  const { evaluation: e, conditions: c, terminal } = evaluateRun(design, site, run);
  const sizing: ClauseId = isDcRun(run) ? "conductorSizing" : "acConductorSizing";
  const smallest =
    e.passesTerminal && e.passesConditions ? null : smallestPassingSize(run.conductor, terminal.tempC, e.maxCurrentA, c, edition);
  const fix = smallest
    ? `Use ${conductorName({ ...run.conductor, size: smallest })} or larger.`
    : "No conductor in the table is large enough; split the circuit or lower its current.";
  const name = `Run "${run.label}" (${conductorName(run.conductor)})`;
  const circuits = runCircuits(design, run).length;
  const each = circuits > 1 ? `each of its ${circuits} circuits` : "the circuit";

  const conditionIds: ClauseId[] = [sizing, "tempCorrection"];
  if (c.rooftopAdderC > 0) conditionIds.push("rooftopAdder");
  if (c.adjustmentFactor < 1) conditionIds.push("cccAdjustment");
  const why = [
    `${fmt(c.effectiveAmbientC, 1)} °C${c.rooftopAdderC > 0 ? ` (${fmt(c.ambientC, 1)} °C air plus ${c.rooftopAdderC} °C on the roof)` : ""} × ${c.correctionFactor}`,
  ];
  if (c.adjustmentFactor < 1) why.push(`${c.currentCarryingConductors} current-carrying conductors together × ${c.adjustmentFactor}`);
  const terminalClauses: ClauseId[] = [sizing, terminal.source === "code" ? "terminals60" : "terminals", "ampacityTable"];

  return [
    makeCheck({
      id: `ampacity-terminal:${run.id}`,
      title: `Run "${run.label}" ampacity at its terminals`,
      status: e.passesTerminal ? "pass" : "fail",
      value: e.terminalAmpacityA,
      limit: e.requiredUnconditionedA,
      unit: "A",
      clause: clauses(edition, ...terminalClauses),
      edition,
      message: `${name} is good for ${e.terminalAmpacityA} A at ${terminalWords(terminal)}; ${each} must carry 1.25 × ${fmt(e.maxCurrentA)} A = ${fmt(e.requiredUnconditionedA)} A.`,
      fix: e.passesTerminal ? undefined : fix,
      field: terminal.source === "code" && !e.passesTerminal ? `runs.${run.id}.terminalTempC` : undefined,
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
      message: `${name} carries ${fmt(e.correctedAmpacityA)} A after correction for ${why.join(" and ")}; the maximum current of ${each} is ${fmt(e.maxCurrentA)} A.`,
      fix: e.passesConditions ? undefined : fix,
    }),
  ];
}

/**
 * Table 310.15(C)(1) counts the current-carrying conductors in the raceway. A run's own circuits set
 * the least it can hold (two per string circuit); an entered count below that understates the
 * adjustment, so it fails, and the review computes with the counted number instead.
 */
export function checkCurrentCarryingCount(design: Design, site: Site, run: ConductorRun): CheckResult[] {
  const entered = run.currentCarryingConductors;
  if (entered === undefined) return [];
  requireWholePositive(entered, `runs.${run.id}.currentCarryingConductors`, "The number of current-carrying conductors");
  const counted = circuitConductorCount(design, run);
  if (entered >= counted) return [];
  const circuits = runCircuits(design, run).length;
  return [
    makeCheck({
      id: `current-carrying-count:${run.id}`,
      title: `Run "${run.label}" current-carrying conductors`,
      status: "fail",
      value: entered,
      limit: counted,
      unit: "conductors",
      clause: `${clauses(site.necEdition, "cccAdjustment")}; ${DESIGN_CONSISTENCY}`,
      edition: site.necEdition,
      message: `Run "${run.label}" holds ${circuits} ${circuits === 1 ? "circuit" : "separate circuits"}, ${counted} current-carrying conductors, but ${entered} ${entered === 1 ? "is" : "are"} entered; the review adjusts the ampacity for ${counted}.`,
      fix: `Enter ${counted} current-carrying conductors, or leave the count blank to use the circuits' own count.`,
      field: `runs.${run.id}.currentCarryingConductors`,
    }),
  ];
}
