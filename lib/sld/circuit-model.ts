// Reads the design's strings, inverters and runs into the pieces the diagram
// draws: source rows (strings or microinverter branches) gathered into
// groups, each with every run it passes through in order, the feeds a
// combiner joins, and the home runs to the service. Every run keeps the
// number the conductor schedule gives it (its place in the design's list).
import type { ConductorRun, Design, Inverter, PvString } from "@/lib/engineering";

export interface StringRow {
  kind: "string";
  string: PvString;
  /** The DC runs the string passes through, array first, in schedule order. */
  runs: ConductorRun[];
}

export interface BranchRow {
  kind: "branch";
  index: number; // 1-based, as the crew numbers branches
  units: number;
  inverter?: Inverter;
  /** The AC runs of the branch circuit, roof first, in schedule order. */
  runs: ConductorRun[];
}

export type SourceRow = StringRow | BranchRow;

export type SourceGroup =
  { kind: "string-inverter"; inverter: Inverter; rows: StringRow[]; outputRuns: ConductorRun[] } | { kind: "micro"; rows: BranchRow[] };

export interface CircuitModel {
  groups: SourceGroup[];
  /** Runs from the last collector (inverter or combiner) to the service, in order. */
  homeRuns: ConductorRun[];
  /** A combiner joins the microinverter branches, or the outputs of several string inverters. */
  hasCombiner: boolean;
  /** The conductor schedule's number of each run: 1 for the first run of the design, and so on. */
  numbers: Map<ConductorRun, number>;
  /** Runs the drawing cannot place (they name no string or inverter it draws); listed beside it so none is lost. */
  unplaced: ConductorRun[];
}

const unitsOf = (design: Design, run: ConductorRun): number =>
  run.circuit.kind === "ac-output"
    ? run.circuit.sources.reduce((sum, s) => sum + (s.units ?? design.inverters.find((i) => i.id === s.inverterId)?.quantity ?? 0), 0)
    : 0;

function sourcesOf(run: ConductorRun): string[] {
  return run.circuit.kind === "ac-output" ? run.circuit.sources.map((s) => s.inverterId) : [];
}

const sourceKey = (run: ConductorRun) => [...sourcesOf(run)].sort().join("|");

export function readCircuits(design: Design): CircuitModel {
  const numbers = new Map(design.runs.map((run, i) => [run, i + 1]));
  const acRuns = design.runs.filter((r) => r.circuit.kind === "ac-output");
  const totalUnits = design.inverters.reduce((sum, i) => sum + i.quantity, 0);
  const isHome = (r: ConductorRun) => totalUnits > 0 && unitsOf(design, r) >= totalUnits;
  let homeRuns = acRuns.filter(isHome);
  const sourceRuns = acRuns.filter((r) => !isHome(r));
  const micros = design.inverters.filter((i) => i.kind === "micro");
  const isMicro = (id: string) => micros.some((m) => m.id === id);

  let branchRuns = sourceRuns.filter((r) => sourcesOf(r).length > 0 && sourcesOf(r).every(isMicro));
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
      outputRuns: sourceRuns.filter((r) => sourcesOf(r).length === 1 && sourcesOf(r)[0] === inverter.id),
    }));
  if (micros.length > 0) groups.push({ kind: "micro", rows: branchRows(design, branchRuns, micros) });

  const placed = new Set<ConductorRun>(homeRuns);
  for (const group of groups) {
    for (const row of group.rows) row.runs.forEach((r) => placed.add(r));
    if (group.kind === "string-inverter") group.outputRuns.forEach((r) => placed.add(r));
  }
  const hasCombiner = groups.length > 1 || micros.length > 0;
  // With one string inverter and no combiner its output runs are the home runs.
  if (!hasCombiner) {
    for (const group of groups) if (group.kind === "string-inverter") group.outputRuns.forEach((r) => placed.delete(r));
  }
  const unplaced = design.runs.filter((r) => !placed.has(r));
  return { groups, homeRuns, hasCombiner, numbers, unplaced };
}

// Strings that share a run sit next to each other so the run can gather them.
function stringRows(design: Design, inverter: Inverter): StringRow[] {
  const rows: StringRow[] = design.strings
    .filter((s) => s.inverterId === inverter.id)
    .map((string) => ({
      kind: "string",
      string,
      runs: design.runs.filter((r) => r.circuit.kind === "dc-strings" && r.circuit.stringIds.includes(string.id)),
    }));
  const lastRun = (row: StringRow) => row.runs[row.runs.length - 1];
  const firstSharing = (row: StringRow) => rows.findIndex((other) => lastRun(other) !== undefined && lastRun(other) === lastRun(row));
  return rows
    .map((row, i) => ({ row, key: lastRun(row) ? firstSharing(row) : i, i }))
    .sort((a, b) => a.key - b.key || a.i - b.i)
    .map((x) => x.row);
}

// Runs naming the same microinverters carry the same branch circuit one after another.
function branchRows(design: Design, branchRuns: ConductorRun[], micros: Inverter[]): BranchRow[] {
  if (branchRuns.length > 0) {
    const circuits = new Map<string, ConductorRun[]>();
    for (const run of branchRuns) circuits.set(sourceKey(run), [...(circuits.get(sourceKey(run)) ?? []), run]);
    return [...circuits.values()].map((runs, i) => ({
      kind: "branch",
      index: i + 1,
      units: unitsOf(design, runs[0]),
      inverter: micros.find((m) => m.id === sourcesOf(runs[0])[0]),
      runs,
    }));
  }
  // No branch runs entered yet: one row per microinverter line.
  return micros.map((inverter, i) => ({ kind: "branch", index: i + 1, units: inverter.quantity, inverter, runs: [] }));
}
