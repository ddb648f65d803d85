import { DesignInputError } from "./errors";
import type { ArrayDesign, ConductorRun, Design, Inverter, PvString } from "./types";

export function inverterById(design: ArrayDesign, inverterId: string): Inverter {
  const inverter = design.inverters.find((i) => i.id === inverterId);
  if (!inverter) throw new DesignInputError("inverterId", `No inverter with id "${inverterId}" is in the design.`);
  return inverter;
}

export function stringById(design: ArrayDesign, stringId: string): PvString {
  const found = design.strings.find((s) => s.id === stringId);
  if (!found) throw new DesignInputError("stringId", `No string with id "${stringId}" is in the design.`);
  return found;
}

export function usesOptimizers(design: ArrayDesign): boolean {
  return design.moduleLevelDevice?.kind === "optimizer";
}

export function microInverters(design: ArrayDesign): Inverter[] {
  return design.inverters.filter((i) => i.kind === "micro");
}

export function totalModuleCount(design: Design): number {
  return design.roofPlanes.reduce((sum, plane) => sum + plane.moduleCount, 0);
}

/** Total continuous output current of every inverter unit in the design. */
export function totalInverterOutputA(design: Pick<Design, "inverters">): number {
  return design.inverters.reduce((sum, i) => sum + i.quantity * i.acOutputCurrentA, 0);
}

export function isDcRun(run: ConductorRun): boolean {
  return run.circuit.kind === "dc-strings";
}

/** The strings a DC run carries in parallel; an AC run carries none. */
export function runStrings(design: Design, run: ConductorRun): PvString[] {
  if (run.circuit.kind !== "dc-strings") return [];
  if (run.circuit.stringIds.length === 0) {
    throw new DesignInputError(`runs.${run.id}.circuit`, `Run "${run.label}" carries no strings; pick at least one.`);
  }
  return run.circuit.stringIds.map((id) => stringById(design, id));
}

/** The inverter units whose output an AC run carries, with their count. */
export function runInverterUnits(design: Design, run: ConductorRun): { inverter: Inverter; units: number }[] {
  if (run.circuit.kind !== "ac-output") return [];
  if (run.circuit.sources.length === 0) {
    throw new DesignInputError(`runs.${run.id}.circuit`, `Run "${run.label}" carries no inverter output; pick at least one inverter.`);
  }
  return run.circuit.sources.map((s) => {
    const inverter = inverterById(design, s.inverterId);
    const units = s.units ?? inverter.quantity;
    if (!Number.isInteger(units) || units < 1) {
      throw new DesignInputError(`runs.${run.id}.circuit`, `Run "${run.label}" must carry at least one whole inverter unit.`);
    }
    return { inverter, units };
  });
}

/** The DC runs that carry a string. */
export function runsCarryingString(design: Design, stringId: string): ConductorRun[] {
  return design.runs.filter((r) => r.circuit.kind === "dc-strings" && r.circuit.stringIds.includes(stringId));
}
