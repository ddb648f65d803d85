// Collects primitives while the layout places them; paths stay as points
// until the end so the whole drawing can be moved once its extent is known.
import type { SldFill, SldPrimitive, SldText, SldTone } from "./scene";

export type PathSegment =
  | { op: "M" | "L"; x: number; y: number }
  | { op: "C"; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { op: "A"; r: number; sweep: 0 | 1; x: number; y: number }
  | { op: "Z" };

type DraftPath = Omit<Extract<SldPrimitive, { kind: "path" }>, "d"> & { segments: PathSegment[] };
type Draft = Exclude<SldPrimitive, { kind: "path" }> | DraftPath;

export interface StrokeOptions {
  stroke?: SldTone;
  strokeWidth?: number;
  dash?: number[];
}
export interface ShapeOptions extends StrokeOptions {
  fill?: SldFill;
}
export type TextOptions = Partial<Pick<SldText, "size" | "anchor" | "weight" | "mono" | "tone">>;

const round = (n: number) => Math.round(n * 100) / 100;

function stroked(o: StrokeOptions) {
  return { stroke: o.stroke ?? "ink", strokeWidth: o.strokeWidth ?? 1, ...(o.dash ? { dash: o.dash } : {}) };
}

export class SceneBuilder {
  private readonly drafts: Draft[] = [];

  line(x1: number, y1: number, x2: number, y2: number, o: StrokeOptions = {}): void {
    this.drafts.push({ kind: "line", x1, y1, x2, y2, ...stroked(o) });
  }

  /** Connected straight segments through the points, as one path. */
  polyline(points: [number, number][], o: StrokeOptions = {}): void {
    this.path(
      points.map(([x, y], i) => ({ op: i === 0 ? "M" : "L", x, y })),
      { ...o, fill: "none" },
    );
  }

  rect(x: number, y: number, width: number, height: number, o: ShapeOptions = {}): void {
    this.drafts.push({ kind: "rect", x, y, width, height, fill: o.fill ?? "none", ...stroked(o) });
  }

  circle(cx: number, cy: number, r: number, o: ShapeOptions = {}): void {
    this.drafts.push({ kind: "circle", cx, cy, r, fill: o.fill ?? "none", ...stroked(o) });
  }

  path(segments: PathSegment[], o: ShapeOptions = {}): void {
    this.drafts.push({ kind: "path", segments, fill: o.fill ?? "none", ...stroked(o) });
  }

  text(x: number, y: number, text: string, o: TextOptions = {}): void {
    this.drafts.push({
      kind: "text",
      x,
      y,
      text,
      size: o.size ?? 7,
      anchor: o.anchor ?? "start",
      weight: o.weight ?? "normal",
      tone: o.tone ?? "ink",
      ...(o.mono ? { mono: true } : {}),
    });
  }

  /** Lines of text going down from a first baseline; returns the last baseline. */
  textLines(x: number, firstBaseline: number, lines: string[], lineHeight: number, o: TextOptions = {}): number {
    lines.forEach((line, i) => this.text(x, firstBaseline + i * lineHeight, line, o));
    return firstBaseline + (lines.length - 1) * lineHeight;
  }

  /** The primitives, moved by (dx, dy) and rounded to 1/100 pt. */
  build(dx = 0, dy = 0): SldPrimitive[] {
    return this.drafts.map((d) => moved(d, dx, dy));
  }
}

function moved(d: Draft, dx: number, dy: number): SldPrimitive {
  switch (d.kind) {
    case "line":
      return { ...d, x1: round(d.x1 + dx), y1: round(d.y1 + dy), x2: round(d.x2 + dx), y2: round(d.y2 + dy) };
    case "rect":
      return { ...d, x: round(d.x + dx), y: round(d.y + dy), width: round(d.width), height: round(d.height) };
    case "circle":
      return { ...d, cx: round(d.cx + dx), cy: round(d.cy + dy), r: round(d.r) };
    case "text":
      return { ...d, x: round(d.x + dx), y: round(d.y + dy) };
    case "path": {
      const { segments, ...rest } = d;
      return { ...rest, d: segments.map((s) => segmentData(s, dx, dy)).join(" ") };
    }
  }
}

function segmentData(s: PathSegment, dx: number, dy: number): string {
  const p = (x: number, y: number) => `${round(x + dx)} ${round(y + dy)}`;
  switch (s.op) {
    case "M":
    case "L":
      return `${s.op} ${p(s.x, s.y)}`;
    case "C":
      return `C ${p(s.x1, s.y1)} ${p(s.x2, s.y2)} ${p(s.x, s.y)}`;
    case "A":
      return `A ${round(s.r)} ${round(s.r)} 0 0 ${s.sweep} ${p(s.x, s.y)}`;
    case "Z":
      return "Z";
  }
}
