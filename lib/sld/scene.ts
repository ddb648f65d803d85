// The drawing a single-line diagram is made of: plain primitives in points
// (1/72 in), origin top-left, y growing down, so the browser (SVG) and the PDF
// renderer draw exactly the same thing without knowing anything about PV.

/** Ink for lines and text, a softer ink for secondary words, copper for the one accent. */
export type SldTone = "ink" | "soft" | "accent";
export type SldFill = "none" | "white" | SldTone;

export const SLD_COLORS: Record<SldTone | "white", string> = {
  ink: "#1f1c17",
  soft: "#4a443a",
  accent: "#b5652b",
  white: "#ffffff",
};

interface Stroked {
  stroke: SldTone;
  strokeWidth: number;
  dash?: number[]; // dash and gap lengths in points
}

export type SldLine = Stroked & { kind: "line"; x1: number; y1: number; x2: number; y2: number };
export type SldRect = Stroked & { kind: "rect"; x: number; y: number; width: number; height: number; fill: SldFill };
export type SldCircle = Stroked & { kind: "circle"; cx: number; cy: number; r: number; fill: SldFill };
/** `d` uses absolute M, L, C, A and Z commands only. */
export type SldPath = Stroked & { kind: "path"; d: string; fill: SldFill };

/** `y` is the baseline, as in SVG. */
export interface SldText {
  kind: "text";
  x: number;
  y: number;
  text: string;
  size: number;
  anchor: "start" | "middle" | "end";
  weight: "normal" | "bold";
  mono?: boolean;
  tone: SldTone;
}

export type SldPrimitive = SldLine | SldRect | SldCircle | SldPath | SldText;

export interface SldScene {
  unit: "pt";
  width: number;
  height: number;
  /** One sentence for screen readers and alt text. */
  description: string;
  items: SldPrimitive[];
}

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/**
 * A safe guess at a string's width without font metrics: wide capitals and
 * monospace count more, and the result is never below chars × size × 0.55.
 */
export function textWidthPt(text: string, size: number, opts: { mono?: boolean; weight?: SldText["weight"] } = {}): number {
  if (opts.mono) return text.length * size * 0.6;
  let em = 0;
  for (const ch of text) em += /[A-Z]/.test(ch) ? 0.68 : /[0-9]/.test(ch) ? 0.58 : /[\s.,:;'|il]/.test(ch) ? 0.3 : 0.55;
  if (opts.weight === "bold") em *= 1.05;
  return Math.max(em, text.length * 0.55) * size;
}

/** The area a text takes, from the cap line to below the descenders. */
export function textBox(t: SldText): Box {
  const width = textWidthPt(t.text, t.size, t);
  const minX = t.anchor === "start" ? t.x : t.anchor === "middle" ? t.x - width / 2 : t.x - width;
  return { minX, maxX: minX + width, minY: t.y - t.size, maxY: t.y + t.size * 0.25 };
}

export function primitiveBox(p: SldPrimitive): Box {
  switch (p.kind) {
    case "line":
      return { minX: Math.min(p.x1, p.x2), maxX: Math.max(p.x1, p.x2), minY: Math.min(p.y1, p.y2), maxY: Math.max(p.y1, p.y2) };
    case "rect":
      return { minX: p.x, minY: p.y, maxX: p.x + p.width, maxY: p.y + p.height };
    case "circle":
      return { minX: p.cx - p.r, maxX: p.cx + p.r, minY: p.cy - p.r, maxY: p.cy + p.r };
    case "path":
      return pathBox(p.d);
    case "text":
      return textBox(p);
  }
}

// Control points and arc end points bound our small symbol curves well enough.
function pathBox(d: string): Box {
  const box = emptyBox();
  for (const command of d.match(/[MLCAZ][^MLCAZ]*/g) ?? []) {
    const values = (command.match(/-?\d+(\.\d+)?/g) ?? []).map(Number);
    // An arc is rx ry rotation large sweep x y: only its end point is a position.
    const points = command[0] === "A" ? values.slice(5, 7) : values;
    for (let i = 0; i + 1 < points.length; i += 2) growBox(box, points[i], points[i + 1]);
  }
  return box;
}

export function emptyBox(): Box {
  return { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
}

export function growBox(box: Box, x: number, y: number): void {
  box.minX = Math.min(box.minX, x);
  box.maxX = Math.max(box.maxX, x);
  box.minY = Math.min(box.minY, y);
  box.maxY = Math.max(box.maxY, y);
}

/** The area every primitive of a list covers (text by its estimated box). */
export function itemsBounds(items: SldPrimitive[]): Box {
  const box = emptyBox();
  for (const item of items) {
    const b = primitiveBox(item);
    growBox(box, b.minX, b.minY);
    growBox(box, b.maxX, b.maxY);
  }
  return items.length ? box : { minX: 0, minY: 0, maxX: 0, maxY: 0 };
}

/** The drawn area of a scene, for renderers that crop or scale to the ink. */
export function sceneBounds(scene: SldScene): Box {
  return itemsBounds(scene.items);
}

/** The factor that fits a scene into a box without distorting it. */
export function fitScale(scene: Pick<SldScene, "width" | "height">, width: number, height: number): number {
  return Math.min(width / scene.width, height / scene.height);
}

export type SldShape = Exclude<SldPrimitive, SldText>;

/** A shape's attributes as SVG names them; react-pdf's Svg elements take the same names. */
export function shapeAttributes(item: SldShape): Record<string, string | number> {
  const paint = (fill: SldFill) => (fill === "none" ? "none" : SLD_COLORS[fill]);
  const stroke = {
    stroke: SLD_COLORS[item.stroke],
    strokeWidth: item.strokeWidth,
    ...(item.dash ? { strokeDasharray: item.dash.join(" ") } : {}),
  };
  switch (item.kind) {
    case "line":
      return { ...stroke, x1: item.x1, y1: item.y1, x2: item.x2, y2: item.y2 };
    case "rect":
      return { ...stroke, x: item.x, y: item.y, width: item.width, height: item.height, fill: paint(item.fill) };
    case "circle":
      return { ...stroke, cx: item.cx, cy: item.cy, r: item.r, fill: paint(item.fill) };
    case "path":
      return { ...stroke, d: item.d, fill: paint(item.fill), strokeLinejoin: "round" };
  }
}
