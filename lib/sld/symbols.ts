// Schematic symbols as the trade draws them (IEEE/IEC style), in Ohmstead's
// own plain hand: thin ink lines on white. Each takes the point where its
// wire enters and returns nothing; sizes are fixed so the layout can plan.
import type { SceneBuilder } from "./scene-builder";

export const MODULE_W = 22;
export const MODULE_H = 16;
export const DEVICE_W = 10;
export const MICRO_W = 12;
const CONTACT_R = 1.5;
const THIN = 0.7;

/** Small filled dot where conductors join. */
export function junctionDot(b: SceneBuilder, x: number, y: number): void {
  b.circle(x, y, 1.8, { fill: "ink", strokeWidth: 0.5 });
}

/** PV module: a cell inside a box, with light falling on it. Wire at (x, cy) and (x + MODULE_W, cy). */
export function pvModule(b: SceneBuilder, x: number, cy: number): void {
  b.rect(x, cy - MODULE_H / 2, MODULE_W, MODULE_H, { fill: "white" });
  const mid = x + MODULE_W / 2;
  b.line(x, cy, mid - 2, cy, { strokeWidth: THIN });
  b.line(mid - 2, cy - 5, mid - 2, cy + 5, { strokeWidth: 1.1 });
  b.line(mid + 2, cy - 2.8, mid + 2, cy + 2.8, { strokeWidth: 1.1 });
  b.line(mid + 2, cy, x + MODULE_W, cy, { strokeWidth: THIN });
  lightArrow(b, x - 3, cy - 18, x + 3, cy - 11);
  lightArrow(b, x + 3, cy - 18, x + 9, cy - 11);
}

function lightArrow(b: SceneBuilder, x1: number, y1: number, x2: number, y2: number): void {
  b.line(x1, y1, x2, y2, { strokeWidth: 0.6 });
  const len = Math.hypot(x2 - x1, y2 - y1);
  const ux = (x2 - x1) / len;
  const uy = (y2 - y1) / len;
  const head = 2.6;
  b.path(
    [
      { op: "M", x: x2, y: y2 },
      { op: "L", x: x2 - head * ux + head * 0.5 * uy, y: y2 - head * uy - head * 0.5 * ux },
      { op: "L", x: x2 - head * ux - head * 0.5 * uy, y: y2 - head * uy + head * 0.5 * ux },
      { op: "Z" },
    ],
    { fill: "ink", strokeWidth: 0.4 },
  );
}

/** A power converter box: the diagonal separates input from output (IEC). */
function converterBox(b: SceneBuilder, x: number, cy: number, size: number): void {
  b.rect(x, cy - size / 2, size, size, { fill: "white", strokeWidth: 0.8 });
  b.line(x, cy + size / 2, x + size, cy - size / 2, { strokeWidth: 0.6 });
}

/** DC optimizer behind a module. */
export function optimizerBox(b: SceneBuilder, x: number, cy: number): void {
  converterBox(b, x, cy, DEVICE_W);
}

/** Shutdown-only device behind a module: a box holding an open contact. */
export function shutdownDeviceBox(b: SceneBuilder, x: number, cy: number): void {
  b.rect(x, cy - DEVICE_W / 2, DEVICE_W, DEVICE_W, { fill: "white", strokeWidth: 0.8 });
  b.line(x, cy, x + 3, cy, { strokeWidth: 0.6 });
  b.line(x + 3, cy, x + 7, cy - 3.2, { strokeWidth: 0.6 });
  b.line(x + 7.2, cy, x + DEVICE_W, cy, { strokeWidth: 0.6 });
}

/** Microinverter behind a module: converter box with a small AC wave. */
export function microBox(b: SceneBuilder, x: number, cy: number): void {
  converterBox(b, x, cy, MICRO_W);
  sineWave(b, x + MICRO_W - 5.5, cy + MICRO_W / 2 - 2.5, 4, 1.2, 0.5);
}

/** One period of a sine from (x, y) over `width`, the AC mark. */
export function sineWave(b: SceneBuilder, x: number, y: number, width: number, amplitude: number, strokeWidth = 0.8): void {
  const a = amplitude * 1.3;
  b.path(
    [
      { op: "M", x, y },
      { op: "C", x1: x + width * 0.18, y1: y - a, x2: x + width * 0.32, y2: y - a, x: x + width / 2, y },
      { op: "C", x1: x + width * 0.68, y1: y + a, x2: x + width * 0.82, y2: y + a, x: x + width, y },
    ],
    { strokeWidth },
  );
}

/** The DC mark: a solid line over a dashed one. */
export function dcMark(b: SceneBuilder, x: number, y: number, width: number): void {
  b.line(x, y, x + width, y, { strokeWidth: 0.8 });
  b.line(x, y + 3, x + width, y + 3, { strokeWidth: 0.8, dash: [2, 1.5] });
}

function contacts(x1: number, x2: number): [number, number] {
  const span = x2 - x1;
  return [x1 + span * 0.25, x2 - span * 0.25];
}

/** Disconnect switch, open blade, on a horizontal wire from x1 to x2. */
export function switchH(b: SceneBuilder, x1: number, x2: number, y: number): void {
  const [c1, c2] = contacts(x1, x2);
  b.line(x1, y, c1 - CONTACT_R, y);
  b.circle(c1, y, CONTACT_R, { fill: "white", strokeWidth: 0.8 });
  b.line(c1 + CONTACT_R * 0.7, y - CONTACT_R * 0.7, c2 - 0.5, y - (c2 - c1) * 0.5);
  b.circle(c2, y, CONTACT_R, { fill: "white", strokeWidth: 0.8 });
  b.line(c2 + CONTACT_R, y, x2, y);
}

/** Circuit breaker: two contacts bridged by an arc, on a horizontal wire. */
export function breakerH(b: SceneBuilder, x1: number, x2: number, y: number): void {
  const [c1, c2] = contacts(x1, x2);
  b.line(x1, y, c1 - CONTACT_R, y);
  b.circle(c1, y, CONTACT_R, { fill: "white", strokeWidth: 0.8 });
  b.path([
    { op: "M", x: c1, y: y - CONTACT_R },
    { op: "A", r: (c2 - c1) * 0.6, sweep: 1, x: c2, y: y - CONTACT_R },
  ]);
  b.circle(c2, y, CONTACT_R, { fill: "white", strokeWidth: 0.8 });
  b.line(c2 + CONTACT_R, y, x2, y);
}

/** Circuit breaker on a vertical wire from y1 (top) to y2. */
export function breakerV(b: SceneBuilder, x: number, y1: number, y2: number): void {
  const [c1, c2] = contacts(y1, y2);
  b.line(x, y1, x, c1 - CONTACT_R);
  b.circle(x, c1, CONTACT_R, { fill: "white", strokeWidth: 0.8 });
  b.path([
    { op: "M", x: x + CONTACT_R, y: c1 },
    { op: "A", r: (c2 - c1) * 0.6, sweep: 1, x: x + CONTACT_R, y: c2 },
  ]);
  b.circle(x, c2, CONTACT_R, { fill: "white", strokeWidth: 0.8 });
  b.line(x, c2 + CONTACT_R, x, y2);
}

/** Fuse: a slim box with the wire running through it (IEC). */
export function fuseH(b: SceneBuilder, x1: number, x2: number, y: number): void {
  const w = Math.min(16, x2 - x1 - 4);
  const fx = (x1 + x2 - w) / 2;
  b.line(x1, y, x2, y);
  b.rect(fx, y - 3, w, 6, { fill: "white" });
  b.line(fx, y, fx + w, y, { strokeWidth: 0.6 });
}

/** Inverter: a box split by a diagonal, DC mark upper left, AC mark lower right. */
export function inverterSymbol(b: SceneBuilder, x: number, y: number, w: number, h: number): void {
  b.rect(x, y, w, h, { fill: "white", strokeWidth: 1.2 });
  b.line(x, y + h, x + w, y, { strokeWidth: 0.8 });
  dcMark(b, x + 5, y + 7, 12);
  sineWave(b, x + w - 17, y + h - 8, 12, 2.5);
}

/** Utility meter: a circle marked kWh. */
export function meterSymbol(b: SceneBuilder, cx: number, cy: number, r: number): void {
  b.circle(cx, cy, r, { fill: "white", strokeWidth: 1.2 });
  b.text(cx, cy + 2.5, "kWh", { size: 7, anchor: "middle", weight: "bold" });
}

/** Earth ground below (x, y). */
export function groundSymbol(b: SceneBuilder, x: number, y: number): void {
  b.line(x, y, x, y + 8);
  b.line(x - 7, y + 8, x + 7, y + 8);
  b.line(x - 4.5, y + 11, x + 4.5, y + 11);
  b.line(x - 2, y + 14, x + 2, y + 14);
}

/** The utility's supply: a transformer, two linked windings. */
export function utilitySymbol(b: SceneBuilder, cx: number, cy: number): void {
  b.circle(cx - 6, cy, 9, { strokeWidth: 1.1 });
  b.circle(cx + 6, cy, 9, { strokeWidth: 1.1 });
}

/** Rapid shutdown initiator: a switch in its own enclosure. */
export function initiatorSymbol(b: SceneBuilder, cx: number, cy: number): void {
  b.rect(cx - 13, cy - 9, 26, 18, { fill: "white", strokeWidth: 1 });
  switchH(b, cx - 11, cx + 11, cy + 3);
}

export const JUNCTION_BOX_W = 12;

/** Junction box where one run's conductors meet the next run's: a box across the wires it holds. */
export function junctionBox(b: SceneBuilder, cx: number, top: number, bottom: number): void {
  b.rect(cx - JUNCTION_BOX_W / 2, top, JUNCTION_BOX_W, bottom - top, { fill: "white", strokeWidth: 1.1 });
  b.line(cx - JUNCTION_BOX_W / 2, top + 3, cx + JUNCTION_BOX_W / 2, top + 3, { strokeWidth: 0.5 });
}

/** One raceway holding several circuits: a slim outline around the wires where they run together. */
export function racewayMark(b: SceneBuilder, cx: number, top: number, bottom: number): void {
  const r = 4;
  b.path(
    [
      { op: "M", x: cx - r, y: top },
      { op: "A", r, sweep: 1, x: cx + r, y: top },
      { op: "L", x: cx + r, y: bottom },
      { op: "A", r, sweep: 1, x: cx - r, y: bottom },
      { op: "Z" },
    ],
    { strokeWidth: 0.8 },
  );
}
