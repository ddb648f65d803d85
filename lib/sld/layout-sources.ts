// Left half of the diagram: the array rows, the run labels beside them, the
// inverters and, where several sources meet, the AC combiner. Rows are
// placed first (top to bottom), then columns are sized from their texts so
// no label can run into its neighbour.
import type { Design } from "@/lib/engineering";
import { arrayHeaderHeight, arrayHeaderLines, arrayHeaderWidth, chainWidth, drawArrayBox, drawChain, rowCount, rowDevice, rowLabel, ROW_ABOVE, ROW_BELOW, ROW_H } from "./array-rows";
import type { BranchRow, CircuitModel, SourceGroup, StringRow } from "./circuit-model";
import { COMBINER_W, INVERTER_BOX_W, MIN_BODY_H, captionHeight, captionWidth, combinerCaption, drawCaption, drawCombiner, drawInverter, inverterCaption, type Caption } from "./collectors";
import { drawRunLabel, runLabelLines, runLabelWidth } from "./conductor-label";
import { textWidthPt } from "./scene";
import type { SceneBuilder } from "./scene-builder";
import { SIZE } from "./style";
import { junctionDot } from "./symbols";

type Row = StringRow | BranchRow;
type StringGroup = Extract<SourceGroup, { kind: "string-inverter" }>;
type Span = { top: number; bottom: number };

export interface SourcesLayout {
  /** Where the AC output leaves the last collector; null when the design has no sources. */
  output: { x: number; y: number } | null;
  /** The first free x to the right. */
  nextX: number;
  /** The last collector's body, for the rapid shutdown control line. */
  collector: Span & { right: number };
}

const GROUP_GAP = 30;
const ROW_X = 10;

function expand(span: Span, minHeight: number): Span {
  const grow = Math.max(0, minHeight - (span.bottom - span.top)) / 2;
  return { top: span.top - grow, bottom: span.bottom + grow };
}

export function layoutSources(b: SceneBuilder, design: Design, model: CircuitModel): SourcesLayout {
  const headerLines = arrayHeaderLines(design, model);
  const stringGroups = model.groups.filter((g): g is StringGroup => g.kind === "string-inverter");
  const captions = new Map<SourceGroup, Caption>(stringGroups.map((g, i) => [g, inverterCaption(g.inverter, stringGroups.length > 1 ? i + 1 : null)]));

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
  if (rows.length === 0 && stringGroups.length === 0) return { output: null, nextX: 0, collector: { top: 0, bottom: 0, right: 0 } };

  // Columns, left to right.
  const arrayInner = Math.max(arrayHeaderWidth(headerLines), ...rows.map((r) => Math.max(textWidthPt(rowLabel(r), SIZE.label), chainWidth(rowCount(r), rowDevice(design, r)))));
  const arrayRight = ROW_X + arrayInner + 12;
  const labelled = rows.filter((r, i) => !r.run || rows.findIndex((o) => o.run === r.run) === i);
  const runLabels = new Map(labelled.map((r) => [r, runLabelLines(design, r.run)]));
  const labelX = arrayRight + 16;
  const invX = labelX + Math.max(60, ...[...runLabels.values()].map(runLabelWidth)) + 14;
  const invRight = stringGroups.length ? invX + Math.max(INVERTER_BOX_W, ...[...captions.values()].map(captionWidth)) + 20 : invX;

  drawArrayBox(b, 0, 0, arrayRight, lastRowY + ROW_BELOW + 6, headerLines);
  for (const row of rows) b.text(ROW_X, rowY.get(row)! - 24, rowLabel(row), { size: SIZE.label });

  // String rows end at their inverter; strings sharing a run join first.
  const inverterOut = new Map<SourceGroup, { x: number; y: number }>();
  for (const group of stringGroups) {
    const inputs: number[] = [];
    for (const row of group.rows) {
      const ry = rowY.get(row)!;
      const end = drawChain(b, ROW_X, ry, rowCount(row), rowDevice(design, row));
      const head = group.rows.find((o) => o.run !== undefined && o.run === row.run) ?? row;
      if (head === row) {
        b.line(end, ry, invX, ry);
        inputs.push(ry);
        drawRunLabel(b, labelX, ry, runLabels.get(row)!);
      } else {
        joinToHead(b, end, ry, arrayRight + 8, rowY.get(head)!);
      }
    }
    const body = bodies.get(group)!;
    inverterOut.set(group, drawInverter(b, invX, body.top, body.bottom - body.top, inputs));
    drawCaption(b, invX, body.bottom, captions.get(group)!);
  }

  if (!model.hasCombiner) {
    const group = stringGroups[0];
    const body = bodies.get(group)!;
    return { output: inverterOut.get(group)!, nextX: invRight, collector: { ...body, right: invX + INVERTER_BOX_W } };
  }

  // Feeds into the combiner: each string inverter's output, each microinverter branch.
  const feedLabels = stringGroups.map((g) => runLabelLines(design, g.outputRun));
  const feedLabelX = invRight;
  const combX = stringGroups.length ? feedLabelX + Math.max(...feedLabels.map(runLabelWidth)) + 14 : invRight;
  const feeds: { y: number; ocpdA?: number }[] = [];
  stringGroups.forEach((g, i) => {
    const out = inverterOut.get(g)!;
    b.line(out.x, out.y, combX, out.y);
    drawRunLabel(b, feedLabelX, out.y, feedLabels[i]);
    feeds.push({ y: out.y, ocpdA: g.outputRun?.ocpdA });
  });
  const branches = model.groups.flatMap((g) => (g.kind === "micro" ? g.rows : []));
  for (const row of branches) {
    const ry = rowY.get(row)!;
    const end = drawChain(b, ROW_X, ry, row.units, "micro");
    b.line(end, ry, combX, ry);
    drawRunLabel(b, labelX, ry, runLabels.get(row)!);
    feeds.push({ y: ry, ocpdA: row.run?.ocpdA });
  }
  const body = expand({ top: Math.min(...feeds.map((f) => f.y)) - ROW_ABOVE, bottom: Math.max(...feeds.map((f) => f.y)) + ROW_BELOW }, MIN_BODY_H);
  const outY = (body.top + body.bottom) / 2;
  const output = drawCombiner(b, combX, body.top, body.bottom - body.top, feeds, outY);
  const microUnits = branches.reduce((sum, r) => sum + r.units, 0);
  const microW = branches.reduce((sum, r) => sum + r.units * (r.inverter?.acPowerW ?? 0), 0);
  const caption = combinerCaption(feeds.length, microUnits, microW);
  drawCaption(b, combX, body.bottom, caption);
  return { output, nextX: combX + Math.max(COMBINER_W, captionWidth(caption)) + 20, collector: { ...body, right: output.x } };
}

// A string whose run it shares with the string above: wire to a junction, then up.
function joinToHead(b: SceneBuilder, fromX: number, y: number, joinX: number, headY: number): void {
  b.line(fromX, y, joinX, y);
  b.line(joinX, y, joinX, headY);
  junctionDot(b, joinX, headY);
  junctionDot(b, joinX, y);
}
