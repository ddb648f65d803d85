// Left half of the diagram: the array rows, the run labels beside them, the
// inverters and, where several sources meet, the AC combiner. Rows are
// placed first (top to bottom), then columns are sized from their texts so
// no label can run into its neighbour.
import type { Design } from "@/lib/engineering";
import {
  arrayHeaderHeight,
  arrayHeaderLines,
  arrayHeaderWidth,
  chainWidth,
  drawArrayBox,
  drawChain,
  rowCount,
  rowDevice,
  rowLabel,
  ROW_ABOVE,
  ROW_BELOW,
  ROW_H,
} from "./array-rows";
import type { CircuitModel, SourceGroup, SourceRow } from "./circuit-model";
import {
  COMBINER_W,
  INVERTER_BOX_W,
  MIN_BODY_H,
  captionHeight,
  captionWidth,
  combinerCaption,
  drawCaption,
  drawCombiner,
  drawInverter,
  inverterCaption,
  type Caption,
} from "./collectors";
import { NO_RUN_LABEL as NO_RUN } from "./conductor-label";
import { drawRunColumns, planColumns, runLabels, type BoxCounter } from "./run-columns";
import { textWidthPt } from "./scene";
import type { SceneBuilder } from "./scene-builder";
import { SIZE } from "./style";

type Row = SourceRow;
type StringGroup = Extract<SourceGroup, { kind: "string-inverter" }>;
type Span = { top: number; bottom: number };

export interface SourcesLayout {
  /** Where the AC output leaves the last collector; null when the design has no sources. */
  output: { x: number; y: number } | null;
  /** The first free x to the right. */
  nextX: number;
  /** The last collector's body, for the rapid shutdown control line. */
  collector: Span & { right: number };
  /** Each string inverter's body by inverter id, where a battery or a backup output joins a hybrid inverter. */
  inverterBodies: Map<string, Span & { left: number; right: number }>;
}

const GROUP_GAP = 30;
const ROW_X = 10;

function expand(span: Span, minHeight: number): Span {
  const grow = Math.max(0, minHeight - (span.bottom - span.top)) / 2;
  return { top: span.top - grow, bottom: span.bottom + grow };
}

export function layoutSources(b: SceneBuilder, design: Design, model: CircuitModel, boxes: BoxCounter): SourcesLayout {
  const headerLines = arrayHeaderLines(design, model);
  const stringGroups = model.groups.filter((g): g is StringGroup => g.kind === "string-inverter");
  const captions = new Map<SourceGroup, Caption>(
    stringGroups.map((g, i) => [g, inverterCaption(g.inverter, stringGroups.length > 1 ? i + 1 : null)]),
  );

  // Rows, top to bottom; a string inverter's caption sits under its body.
  const rowY = new Map<Row, number>();
  const bodies = new Map<SourceGroup, Span>();
  let y = arrayHeaderHeight(headerLines) + ROW_ABOVE;
  let lastRowY = y;
  for (const group of model.groups) {
    group.rows.forEach((row, i) => rowY.set(row, y + i * ROW_H));
    lastRowY = y + Math.max(group.rows.length - 1, 0) * ROW_H;
    let bottom = lastRowY + ROW_BELOW;
    const caption = captions.get(group);
    if (caption) {
      const body = expand({ top: y - ROW_ABOVE, bottom }, MIN_BODY_H);
      bodies.set(group, body);
      bottom = body.bottom + captionHeight(caption);
    }
    y = bottom + GROUP_GAP + ROW_ABOVE;
  }
  const rows = model.groups.flatMap((g) => g.rows as Row[]);
  if (rows.length === 0 && stringGroups.length === 0)
    return { output: null, nextX: 0, collector: { top: 0, bottom: 0, right: 0 }, inverterBodies: new Map() };

  // Columns, left to right: the array, the runs along the rows, the inverters.
  const arrayInner = Math.max(
    arrayHeaderWidth(headerLines),
    ...rows.map((r) => Math.max(textWidthPt(rowLabel(r), SIZE.label), chainWidth(rowCount(r), rowDevice(design, r)))),
  );
  const arrayRight = ROW_X + arrayInner + 12;
  const labels = runLabels(
    design,
    rows.flatMap((r) => r.runs),
  );
  const plan = planColumns(
    rows.map((r) => r.runs),
    labels,
    arrayRight + 16,
    NO_RUN,
  );
  const invX = plan.end;
  const invRight = stringGroups.length ? invX + Math.max(INVERTER_BOX_W, ...[...captions.values()].map(captionWidth)) + 20 : invX;

  drawArrayBox(b, 0, 0, arrayRight, lastRowY + ROW_BELOW + 6, headerLines);
  for (const row of rows) b.text(ROW_X, rowY.get(row)! - 24, rowLabel(row), { size: SIZE.label });

  // Feeds into the combiner (each string inverter's output runs, then each branch) decide where rows end.
  const outputLabels = runLabels(
    design,
    stringGroups.flatMap((g) => g.outputRuns),
  );
  const feedPlan =
    model.hasCombiner && stringGroups.length
      ? planColumns(
          stringGroups.map((g) => g.outputRuns),
          outputLabels,
          invRight,
          NO_RUN,
        )
      : null;
  const combX = feedPlan ? feedPlan.end : invRight;

  // Every string keeps its own wire to its own inverter input; branches run on to the combiner.
  for (const row of rows) {
    const ry = rowY.get(row)!;
    const end = drawChain(b, ROW_X, ry, rowCount(row), rowDevice(design, row));
    b.line(end, ry, row.kind === "string" ? invX : combX, ry);
  }
  drawRunColumns(
    b,
    rows.map((r) => ({ y: rowY.get(r)!, runs: r.runs })),
    plan,
    labels,
    model.numbers,
    boxes,
    NO_RUN,
  );

  const inverterOut = new Map<SourceGroup, { x: number; y: number }>();
  const inverterBodies: SourcesLayout["inverterBodies"] = new Map();
  for (const group of stringGroups) {
    const body = bodies.get(group)!;
    inverterBodies.set(group.inverter.id, { ...body, left: invX, right: invX + INVERTER_BOX_W });
    inverterOut.set(
      group,
      drawInverter(
        b,
        invX,
        body.top,
        body.bottom - body.top,
        group.rows.map((r) => rowY.get(r)!),
      ),
    );
    drawCaption(b, invX, body.bottom, captions.get(group)!);
  }

  if (!model.hasCombiner) {
    const group = stringGroups[0];
    const body = bodies.get(group)!;
    return { output: inverterOut.get(group)!, nextX: invRight, collector: { ...body, right: invX + INVERTER_BOX_W }, inverterBodies };
  }

  // Feeds into the combiner: each string inverter's output, each microinverter branch.
  const feeds: { y: number; ocpdA?: number }[] = [];
  stringGroups.forEach((g) => {
    const out = inverterOut.get(g)!;
    b.line(out.x, out.y, combX, out.y);
    feeds.push({ y: out.y, ocpdA: g.outputRuns[g.outputRuns.length - 1]?.ocpdA });
  });
  if (feedPlan)
    drawRunColumns(
      b,
      stringGroups.map((g) => ({ y: inverterOut.get(g)!.y, runs: g.outputRuns })),
      feedPlan,
      outputLabels,
      model.numbers,
      boxes,
      NO_RUN,
    );
  const branches = model.groups.flatMap((g) => (g.kind === "micro" ? g.rows : []));
  for (const row of branches) feeds.push({ y: rowY.get(row)!, ocpdA: row.runs.find((r) => r.ocpdA)?.ocpdA });
  const body = expand(
    { top: Math.min(...feeds.map((f) => f.y)) - ROW_ABOVE, bottom: Math.max(...feeds.map((f) => f.y)) + ROW_BELOW },
    MIN_BODY_H,
  );
  const outY = (body.top + body.bottom) / 2;
  const output = drawCombiner(b, combX, body.top, body.bottom - body.top, feeds, outY);
  const microUnits = branches.reduce((sum, r) => sum + r.units, 0);
  const microW = branches.reduce((sum, r) => sum + r.units * (r.inverter?.acPowerW ?? 0), 0);
  const caption = combinerCaption(feeds.length, microUnits, microW);
  drawCaption(b, combX, body.bottom, caption);
  return {
    output,
    nextX: combX + Math.max(COMBINER_W, captionWidth(caption)) + 20,
    collector: { ...body, right: output.x },
    inverterBodies,
  };
}
