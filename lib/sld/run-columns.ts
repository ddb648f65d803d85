// Runs laid out in columns along the source rows: a string (or branch) that
// passes through several runs gets them one after another, left to right, a
// junction box where one run ends and the next begins, and a run shared by
// several rows (circuits in one raceway) gets one label and a raceway mark
// around its wires. Every run is tagged with its conductor schedule number.
import type { ConductorRun, Design } from "@/lib/engineering";
import { drawRunLabel, runLabelLines, runLabelWidth, type RunLabel } from "./conductor-label";
import type { SceneBuilder } from "./scene-builder";
import { SIZE } from "./style";
import { junctionBox, racewayMark } from "./symbols";

/** Where junction boxes get their numbers: JB1, JB2, … in drawing order. */
export interface BoxCounter {
  next: number;
}

export function boxLabel(counter: BoxCounter): string {
  return `JB${counter.next++}`;
}

export interface ColumnPlan {
  /** Column (0-based) of each run. */
  columnOf: Map<ConductorRun, number>;
  starts: number[];
  widths: number[];
  /** The first x after the last column. */
  end: number;
}

const MIN_COLUMN_W = 60;
const COLUMN_PAD = 14;
/** The room between two columns, where the junction box stands. */
export const BOX_GAP = 30;

/**
 * A run's column is one past the column of the run before it, in every row
 * that carries it, so a shared run lines up across its rows.
 */
export function runColumnIndex(rows: ConductorRun[][]): Map<ConductorRun, number> {
  const columnOf = new Map<ConductorRun, number>();
  const runCount = new Set(rows.flat()).size;
  // Longest path through the rows' run orders; the pass limit guards against runs listed in contradictory orders.
  for (let pass = 0; pass <= runCount; pass++) {
    let changed = false;
    for (const runs of rows) {
      let before = -1;
      for (const run of runs) {
        const column = Math.max(columnOf.get(run) ?? 0, before + 1);
        if (column !== columnOf.get(run)) {
          columnOf.set(run, column);
          changed = true;
        }
        before = column;
      }
    }
    if (!changed) break;
  }
  return columnOf;
}

/** Columns from x, each as wide as its widest label (a row with no run gets the "no run" note in the first). */
export function planColumns(rows: ConductorRun[][], labels: Map<ConductorRun, RunLabel>, x: number, emptyLabel?: RunLabel): ColumnPlan {
  const columnOf = runColumnIndex(rows);
  const count = Math.max(1, ...[...columnOf.values()].map((c) => c + 1));
  const widths = Array.from({ length: count }, () => MIN_COLUMN_W);
  for (const [run, column] of columnOf) widths[column] = Math.max(widths[column], runLabelWidth(labels.get(run)!));
  if (emptyLabel && rows.some((r) => r.length === 0)) widths[0] = Math.max(widths[0], runLabelWidth(emptyLabel));
  const starts: number[] = [];
  let at = x;
  widths.forEach((w, i) => {
    starts.push(at);
    at += w + COLUMN_PAD + (i < widths.length - 1 ? BOX_GAP : 0);
  });
  return { columnOf, starts, widths: widths.map((w) => w + COLUMN_PAD), end: at };
}

export function runLabels(design: Design, runs: Iterable<ConductorRun>): Map<ConductorRun, RunLabel> {
  return new Map([...runs].map((run) => [run, runLabelLines(design, run)]));
}

export interface RowOfRuns {
  y: number;
  runs: ConductorRun[];
}

/**
 * Labels, tags, raceway marks and junction boxes for rows whose wires are
 * already drawn straight across the columns.
 */
export function drawRunColumns(
  b: SceneBuilder,
  rows: RowOfRuns[],
  plan: ColumnPlan,
  labels: Map<ConductorRun, RunLabel>,
  numbers: Map<ConductorRun, number>,
  boxes: BoxCounter,
  emptyLabel?: RunLabel,
): void {
  const rowsOf = new Map<ConductorRun, number[]>();
  rows.forEach((row) => row.runs.forEach((run) => rowsOf.set(run, [...(rowsOf.get(run) ?? []), row.y])));

  // Junction boxes: where a row passes from one run to the next, one box per run entered.
  const entering = new Map<ConductorRun, number[]>();
  for (const row of rows) {
    row.runs.forEach((run, i) => {
      if (i > 0) entering.set(run, [...(entering.get(run) ?? []), row.y]);
    });
  }
  for (const [run, ys] of entering) {
    const cx = plan.starts[plan.columnOf.get(run)!] - BOX_GAP / 2;
    const bottom = Math.max(...ys) + 8;
    junctionBox(b, cx, Math.min(...ys) - 8, bottom);
    b.text(cx, bottom + 9, boxLabel(boxes), { size: SIZE.spec, anchor: "middle", weight: "bold" });
  }

  for (const [run, ys] of rowsOf) {
    const column = plan.columnOf.get(run)!;
    const top = Math.min(...ys);
    drawRunLabel(b, plan.starts[column], top, labels.get(run)!, numbers.get(run));
    if (ys.length > 1) racewayMark(b, plan.starts[column] + plan.widths[column] - 7, top - 6, Math.max(...ys) + 6);
  }
  if (emptyLabel) for (const row of rows.filter((r) => r.runs.length === 0)) drawRunLabel(b, plan.starts[0], row.y, emptyLabel);
}
