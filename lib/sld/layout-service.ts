// Right half of the diagram: the AC output circuit, the AC disconnect (fused
// on a supply-side connection), the rapid shutdown initiator, the service
// panel with busbar, main and PV breaker, the utility meter and the grid.
import type { ConductorRun, Design } from "@/lib/engineering";
import { drawRunLabel, runLabelLines, runLabelWidth } from "./conductor-label";
import { textWidthPt } from "./scene";
import type { SceneBuilder } from "./scene-builder";
import { LINE_GAP, SIZE, wrapWords } from "./style";
import { BOX_GAP, boxLabel, type BoxCounter } from "./run-columns";
import {
  breakerH,
  breakerV,
  fuseH,
  groundSymbol,
  initiatorSymbol,
  junctionBox,
  junctionDot,
  meterSymbol,
  switchH,
  utilitySymbol,
} from "./symbols";

export interface ServiceInput {
  design: Design;
  homeRuns: ConductorRun[];
  /** The AC output's start and the first free column. */
  from: { x: number; y: number };
  startX: number;
  /** Collector body the initiator signals; null for microinverters (the disconnect is the initiator). */
  initiatorTarget: { right: number } | null;
  /** The conductor schedule's run numbers, and the next junction box number. */
  numbers: Map<ConductorRun, number>;
  boxes: BoxCounter;
}

const PANEL_W = 150;
/** The busbar's distance from the panel's left side; the PV breaker sits left of it. */
const BUS_DX = 96;
/** Service conductors run this far above the AC output line. */
export const SERVICE_RISE = 138;

/** Where the service panel was drawn: a battery inverter's output and the point-of-connection note join it here. */
export interface ServicePlace {
  panelX: number;
  panelRight: number;
  busX: number;
  /** The AC output line's y; the panel spans y − 118 to y + 36. */
  y: number;
}

export function layoutService(b: SceneBuilder, input: ServiceInput): ServicePlace {
  const { design, from } = input;
  const y = from.y;
  const runs = input.homeRuns;
  const beforeDisconnect = runs.length > 1 ? runs.slice(0, -1) : runs;
  const afterDisconnect = runs.length > 1 ? runs.slice(-1) : [];

  const columns = { numbers: input.numbers, boxes: input.boxes };
  let x = runColumns(b, design, beforeDisconnect.length ? beforeDisconnect : [undefined], input.startX, y, columns);
  b.line(from.x, y, input.startX, y);
  x = disconnectColumn(b, design, x, y, input.initiatorTarget);
  x = afterDisconnect.length ? runColumns(b, design, afterDisconnect, x, y, columns) : lineTo(b, x, x + 24, y);

  const supplySide = design.service.connection === "supply-side";
  const serviceY = y - SERVICE_RISE;
  let panelX = x;
  if (supplySide) {
    const tapX = x + 16;
    b.line(x, y, tapX, y);
    b.line(tapX, y, tapX, serviceY);
    junctionDot(b, tapX, serviceY);
    b.text(tapX, serviceY - 8, "Supply-side connection (705.11)", { size: SIZE.label });
    panelX = tapX + 40;
    b.line(tapX, serviceY, panelX + BUS_DX, serviceY);
    junctionDot(b, panelX + BUS_DX, serviceY);
  }
  const busX = servicePanel(b, design, panelX, y, serviceY);
  meterAndGrid(b, design, busX, panelX + PANEL_W, serviceY);
  return { panelX, panelRight: panelX + PANEL_W, busX, y };
}

function lineTo(b: SceneBuilder, x1: number, x2: number, y: number): number {
  b.line(x1, y, x2, y);
  return x2;
}

/** One labelled column per run, in series, with a junction box between two runs; returns the x after the last. */
function runColumns(
  b: SceneBuilder,
  design: Design,
  runs: (ConductorRun | undefined)[],
  x: number,
  y: number,
  { numbers, boxes }: Pick<ServiceInput, "numbers" | "boxes">,
): number {
  runs.forEach((run, i) => {
    const lines = runLabelLines(design, run);
    const width = runLabelWidth(lines) + 28;
    b.line(x, y, x + width, y);
    drawRunLabel(b, x + 12, y, lines, run ? numbers.get(run) : undefined);
    x += width;
    if (i < runs.length - 1) {
      b.line(x, y, x + BOX_GAP, y);
      junctionBox(b, x + BOX_GAP / 2, y - 8, y + 8);
      b.text(x + BOX_GAP / 2, y + 17, boxLabel(boxes), { size: SIZE.spec, anchor: "middle", weight: "bold" });
      x += BOX_GAP;
    }
  });
  return x;
}

function disconnectLines(design: Design, isInitiator: boolean): { title: string; lines: string[] } {
  const s = design.service;
  const where = s.pvDisconnectLocation ? wrapWords(s.pvDisconnectLocation, 28) : [];
  const initiator = isInitiator ? ["Also the rapid shutdown", "initiator (690.12)"] : [];
  if (s.connection === "supply-side") {
    return { title: "FUSED PV DISCONNECT", lines: [`${s.pvBreakerA} A fuses`, "Visible blade, lockable", ...where, ...initiator] };
  }
  return { title: "AC DISCONNECT", lines: ["Visible blade, lockable", ...where, ...initiator] };
}

function disconnectColumn(b: SceneBuilder, design: Design, x: number, y: number, initiatorTarget: { right: number } | null): number {
  const text = disconnectLines(design, initiatorTarget === null);
  const initiatorTitle = "RAPID SHUTDOWN INITIATOR";
  const initiatorNote = "690.12, at the service";
  const width =
    Math.max(
      90,
      textWidthPt(text.title, SIZE.title, { weight: "bold" }),
      ...text.lines.map((l) => textWidthPt(l, SIZE.label)),
      initiatorTarget ? textWidthPt(initiatorTitle, SIZE.title, { weight: "bold" }) : 0,
      textWidthPt(initiatorNote, SIZE.label),
    ) + 24;
  const cx = x + width / 2;
  if (design.service.connection === "supply-side") {
    b.line(x, y, cx - 30, y);
    switchH(b, cx - 30, cx + 2, y);
    fuseH(b, cx + 2, cx + 30, y);
    b.line(cx + 30, y, x + width, y);
  } else {
    b.line(x, y, cx - 18, y);
    switchH(b, cx - 18, cx + 18, y);
    b.line(cx + 18, y, x + width, y);
  }
  b.text(cx, y + 22, text.title, { size: SIZE.title, weight: "bold", anchor: "middle" });
  b.textLines(cx, y + 22 + LINE_GAP, text.lines, LINE_GAP, { size: SIZE.label, anchor: "middle", tone: "soft" });

  if (initiatorTarget) {
    // Above the AC line: a switch in its own box, with a dashed control line to the inverter.
    const iy = y - 44;
    initiatorSymbol(b, cx, iy);
    b.line(initiatorTarget.right, iy, cx - 13, iy, { dash: [4, 3], strokeWidth: 0.8 });
    b.text(cx, iy - 22, initiatorTitle, { size: SIZE.title, weight: "bold", anchor: "middle" });
    b.text(cx, iy - 13, initiatorNote, { size: SIZE.label, anchor: "middle", tone: "soft" });
  }
  return x + width;
}

/** The panel box; returns the busbar's x, where the service conductors come down. */
function servicePanel(b: SceneBuilder, design: Design, px: number, y: number, serviceY: number): number {
  const s = design.service;
  const busX = px + BUS_DX;
  const top = y - 118;
  b.rect(px, top, PANEL_W, 154, { strokeWidth: 1.2 });
  b.text(px + 8, top + 14, "SERVICE PANEL", { size: SIZE.title, weight: "bold" });
  b.text(px + 8, top + 14 + LINE_GAP, `${s.voltageV} V, ${s.phase === 3 ? "3-phase" : "1-phase"}`, { size: SIZE.label, tone: "soft" });

  // The busbar is the diagram's one copper accent.
  b.line(busX, y - 74, busX, y + 18, { stroke: "accent", strokeWidth: 3 });
  b.text(busX + 7, y - 34, `${s.busbarA} A`, { size: SIZE.label, mono: true, weight: "bold" });
  b.text(busX + 7, y - 25, "busbar", { size: SIZE.label, tone: "soft" });
  if (s.mainBreakerA === null) {
    b.line(busX, serviceY, busX, y - 74);
    b.text(busX + 10, y - 91, "Main lugs", { size: SIZE.label });
    b.text(busX + 10, y - 82, "only", { size: SIZE.label, tone: "soft" });
  } else {
    b.line(busX, serviceY, busX, y - 102);
    breakerV(b, busX, y - 102, y - 74);
    b.text(busX + 10, y - 91, `${s.mainBreakerA} A`, { size: SIZE.label, mono: true, weight: "bold" });
    b.text(busX + 10, y - 82, "main", { size: SIZE.label, tone: "soft" });
  }

  if (s.connection === "load-side") {
    const bx = px + 44;
    b.line(px, y, bx - 18, y);
    breakerH(b, bx - 18, bx + 18, y);
    b.line(bx + 18, y, busX, y);
    junctionDot(b, busX, y);
    b.text(bx, y - 11, `${s.pvBreakerA} A PV breaker`, { size: SIZE.label, anchor: "middle", weight: "bold" });
    b.text(bx, y + 14, "backfed, 2-pole", { size: SIZE.label, anchor: "middle", tone: "soft" });
    if (s.pvBreakerAtOppositeEnd) b.text(bx, y + 14 + LINE_GAP, "far end from main", { size: SIZE.label, anchor: "middle", tone: "soft" });
  }

  const gx = px + 124;
  b.line(gx, y + 36, gx, y + 40);
  groundSymbol(b, gx, y + 40);
  b.text(gx, y + 66, "Grounding electrode", { size: SIZE.label, anchor: "middle", tone: "soft" });
  b.text(gx, y + 66 + LINE_GAP, "(existing)", { size: SIZE.label, anchor: "middle", tone: "soft" });
  return busX;
}

function meterAndGrid(b: SceneBuilder, design: Design, busX: number, panelRight: number, serviceY: number): void {
  const mx = panelRight + 46;
  const ux = mx + 76;
  b.line(busX, serviceY, mx - 15, serviceY);
  meterSymbol(b, mx, serviceY, 15);
  b.line(mx + 15, serviceY, ux - 15, serviceY);
  utilitySymbol(b, ux, serviceY);
  b.text(mx, serviceY + 30, "UTILITY METER", { size: SIZE.title, weight: "bold", anchor: "middle" });
  b.text(mx, serviceY + 30 + LINE_GAP, "bidirectional", { size: SIZE.label, anchor: "middle", tone: "soft" });
  b.text(ux, serviceY + 30, "UTILITY GRID", { size: SIZE.title, weight: "bold", anchor: "middle" });
  b.text(ux, serviceY + 30 + LINE_GAP, `${design.service.voltageV} V service`, { size: SIZE.label, anchor: "middle", tone: "soft" });
}
