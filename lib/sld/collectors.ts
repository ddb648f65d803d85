// Where source circuits meet: a string inverter (with its integral DC
// disconnect) or an AC combiner (with a breaker per branch). Both have a body
// that spans their inputs and a caption underneath.
import type { Inverter } from "@/lib/engineering";
import type { SceneBuilder } from "./scene-builder";
import { textWidthPt } from "./scene";
import { LINE_GAP, SIZE, formatKw } from "./style";
import { breakerH, inverterSymbol, junctionDot, switchH } from "./symbols";

export const INVERTER_BOX_W = 118;
export const COMBINER_W = 92;
export const MIN_BODY_H = 104;

export interface Caption {
  title: string;
  lines: string[];
}

export function captionWidth(c: Caption): number {
  return Math.max(textWidthPt(c.title, SIZE.title, { weight: "bold" }), ...c.lines.map((l) => textWidthPt(l, SIZE.label)));
}

export function captionHeight(c: Caption): number {
  return 14 + (c.lines.length + 1) * LINE_GAP;
}

/** Caption starts 14 pt under the body. */
export function drawCaption(b: SceneBuilder, x: number, bodyBottom: number, c: Caption): void {
  b.text(x, bodyBottom + 14, c.title, { size: SIZE.title, weight: "bold" });
  b.textLines(x, bodyBottom + 14 + LINE_GAP, c.lines, LINE_GAP, { size: SIZE.label, tone: "soft" });
}

export function inverterCaption(inverter: Inverter, number: number | null): Caption {
  const units = inverter.quantity > 1 ? `${inverter.quantity} × ` : "";
  const lines = [
    `${units}${inverter.maker} ${inverter.model}`,
    `${formatKw(inverter.acPowerW)} kW, ${inverter.acVoltageV} V, ${inverter.acOutputCurrentA} A out`,
    "DC disconnect integral (dashed)",
  ];
  if (inverter.regulatedStringV) lines.push(`Fixed string voltage ${inverter.regulatedStringV} V`);
  return { title: number === null ? "INVERTER" : `INVERTER ${number}`, lines };
}

/**
 * The inverter enclosure (dashed) holds a disconnect switch on every DC input
 * and the inverter symbol; returns the output point on the enclosure's edge.
 */
export function drawInverter(b: SceneBuilder, x: number, top: number, height: number, inputYs: number[]): { x: number; y: number } {
  const cy = top + height / 2;
  b.rect(x, top, INVERTER_BOX_W, height, { dash: [4, 2.5], strokeWidth: 0.8 });
  const symbolX = x + 44;
  for (const y of inputYs) {
    switchH(b, x, x + 30, y);
    b.line(x + 30, y, symbolX, y);
  }
  inverterSymbol(b, symbolX, top + 8, INVERTER_BOX_W - 54, height - 16);
  b.line(x + INVERTER_BOX_W - 10, cy, x + INVERTER_BOX_W, cy);
  return { x: x + INVERTER_BOX_W, y: cy };
}

export function combinerCaption(feedCount: number, microUnits: number, microW: number): Caption {
  if (microUnits > 0) {
    const joins = feedCount === 1 ? "Holds the branch breaker" : `Joins ${feedCount} branch circuits`;
    return { title: "AC COMBINER", lines: [joins, `${microUnits} microinverters, ${formatKw(microW)} kW AC`] };
  }
  return { title: "AC COMBINER", lines: [`Joins ${feedCount} inverter outputs`] };
}

/** A breaker per feed (when the feed's run has one), a bus, one output at outY. */
export function drawCombiner(
  b: SceneBuilder,
  x: number,
  top: number,
  height: number,
  feeds: { y: number; ocpdA?: number }[],
  outY: number,
): { x: number; y: number } {
  b.rect(x, top, COMBINER_W, height, { strokeWidth: 1.1 });
  const busX = x + 56;
  for (const feed of feeds) {
    if (feed.ocpdA) {
      breakerH(b, x, x + 36, feed.y);
      b.text(x + 18, feed.y - 10, `${feed.ocpdA} A`, { size: SIZE.spec, anchor: "middle", mono: true });
    } else {
      b.line(x, feed.y, x + 36, feed.y);
    }
    b.line(x + 36, feed.y, busX, feed.y);
    junctionDot(b, busX, feed.y);
  }
  const ys = [...feeds.map((f) => f.y), outY];
  b.line(busX, Math.min(...ys), busX, Math.max(...ys), { strokeWidth: 1.6 });
  b.line(busX, outY, x + COMBINER_W, outY);
  return { x: x + COMBINER_W, y: outY };
}
