// Reads the design's strings, inverters and runs into the pieces the diagram
// draws: source rows (strings or microinverter branches) gathered into
// groups, the feeds a combiner joins, and the home runs to the service.
import type { ConductorRun, Design, Inverter, PvString } from "@/lib/engineering";

export interface StringRow {
  kind: "string";
  string: PvString;
  run?: ConductorRun;
}

export interface BranchRow {
  kind: "branch";
  index: number; // 1-based, as the crew numbers branches
  units: number;
  inverter?: Inverter;
  run?: ConductorRun;
}

export type SourceGroup =
  | { kind: "string-inverter"; inverter: Inverter; rows: StringRow[]; outputRun?: ConductorRun }
  | { kind: "micro"; rows: BranchRow[] };

export interface CircuitModel {
  groups: SourceGroup[];
  /** Runs from the last collector (inverter or combiner) to the service, in order. */
  homeRuns: ConductorRun[];
  /** A combiner joins the microinverter branches, or the outputs of several string inverters. */
  hasCombiner: boolean;
}

const unitsOf = (design: Design, run: ConductorRun): number =>
  run.circuit.kind === "ac-output"
    ? run.circuit.sources.reduce((sum, s) => sum + (s.units ?? design.inverters.find((i) => i.id === s.inverterId)?.quantity ?? 0), 0)
    : 0;

export function readCircuits(design: Design): CircuitModel {
  const acRuns = design.runs.filter((r) => r.circuit.kind === "ac-output");
  const totalUnits = design.inverters.reduce((sum, i) => sum + i.quantity, 0);
  const isHome = (r: ConductorRun) => unitsOf(design, r) >= totalUnits;
  let homeRuns = acRuns.filter(isHome);
  const sourceRuns = acRuns.filter((r) => !isHome(r));
  const micros = design.inverters.filter((i) => i.kind === "micro");

  let branchRuns = sourceRuns.filter((r) => sourcesOf(r).every((id) => micros.some((m) => m.id === id)));
  // A lone branch carries every unit, so it looks like a home run: the first such run is the branch.
  if (micros.length > 0 && branchRuns.length === 0 && homeRuns.length > 0) {
    branchRuns = [homeRuns[0]];
    homeRuns = homeRuns.slice(1);
  }

  const groups: SourceGroup[] = design.inverters
    .filter((i) => i.kind === "string")
    .map((inverter) => ({
      kind: "string-inverter" as const,
      inverter,
      rows: stringRows(design, inverter),
      outputRun: sourceRuns.find((r) => sourcesOf(r).length === 1 && sourcesOf(r)[0] === inverter.id),
    }));
  if (micros.length > 0) groups.push({ kind: "micro", rows: branchRows(design, branchRuns, micros) });

  return { groups, homeRuns, hasCombiner: groups.length > 1 || micros.length > 0 };
}

function sourcesOf(run: ConductorRun): string[] {
  return run.circuit.kind === "ac-output" ? run.circuit.sources.map((s) => s.inverterId) : [];
}

// Strings that share a run sit next to each other so their wires can join.
function stringRows(design: Design, inverter: Inverter): StringRow[] {
  const rows = design.strings
    .filter((s) => s.inverterId === inverter.id)
    .map((string) => ({ kind: "string" as const, string, run: design.runs.find((r) => r.circuit.kind === "dc-strings" && r.circuit.stringIds.includes(string.id)) }));
  const firstIndex = (row: StringRow) => rows.findIndex((other) => other.run !== undefined && other.run === row.run);
  return rows.map((row, i) => ({ row, key: row.run ? firstIndex(row) : i, i })).sort((a, b) => a.key - b.key || a.i - b.i).map((x) => x.row);
}

function branchRows(design: Design, branchRuns: ConductorRun[], micros: Inverter[]): BranchRow[] {
  if (branchRuns.length > 0) {
    return branchRuns.map((run, i) => ({
      kind: "branch",
      index: i + 1,
      units: unitsOf(design, run),
      inverter: micros.find((m) => m.id === sourcesOf(run)[0]),
      run,
    }));
  }
  // No branch runs entered yet: one row per microinverter line.
  return micros.map((inverter, i) => ({ kind: "branch", index: i + 1, units: inverter.quantity, inverter }));
}
