// The PV array: strings and microinverter branches, each drawn as a short
// chain of module symbols (first two, a dotted gap, the last) marked "× N",
// so a 14-module string takes the same room as a 4-module one.
import type { Design } from "@/lib/engineering";
import type { BranchRow, CircuitModel, StringRow } from "./circuit-model";
import type { SceneBuilder } from "./scene-builder";
import { textWidthPt } from "./scene";
import { SIZE, LINE_GAP, wrapWords } from "./style";
import { DEVICE_W, MICRO_W, MODULE_W, microBox, optimizerBox, pvModule, shutdownDeviceBox } from "./symbols";

export type DeviceKind = "optimizer" | "shutdown-device" | "micro";

export const ROW_H = 62;
/** From a row's wire up to the top of its label, and down to the bottom of its "× N". */
export const ROW_ABOVE = 34;
export const ROW_BELOW = 30;
const UNIT_GAP = 8;
const DOTTED_GAP = 18;
const HEADER_CHARS = 46;

export function rowDevice(design: Design, row: StringRow | BranchRow): DeviceKind | undefined {
  return row.kind === "branch" ? "micro" : design.moduleLevelDevice?.kind;
}

export function rowCount(row: StringRow | BranchRow): number {
  return row.kind === "string" ? row.string.modulesInSeries : row.units;
}

export function rowLabel(row: StringRow | BranchRow): string {
  if (row.kind === "branch") return `Branch ${row.index}: ${row.units} microinverter${row.units === 1 ? "" : "s"}`;
  const mppt = row.string.mpptIndex ? ` to MPPT ${row.string.mpptIndex}` : "";
  return `String ${row.string.id}${mppt}`;
}

function unitWidth(device: DeviceKind | undefined): number {
  if (!device) return MODULE_W;
  return MODULE_W + 4 + (device === "micro" ? MICRO_W : DEVICE_W);
}

/** Where each drawn unit starts, and the chain's width. */
function chainPlan(count: number, device: DeviceKind | undefined): { starts: number[]; width: number } {
  const step = unitWidth(device) + UNIT_GAP;
  if (count <= 3)
    return { starts: Array.from({ length: Math.max(count, 1) }, (_, i) => i * step), width: Math.max(count, 1) * step - UNIT_GAP };
  const last = 2 * step + DOTTED_GAP;
  return { starts: [0, step, last], width: last + unitWidth(device) };
}

export function chainWidth(count: number, device: DeviceKind | undefined): number {
  return chainPlan(count, device).width;
}

/** Draws the chain with its wire from x; returns where the wire leaves it. */
export function drawChain(b: SceneBuilder, x: number, y: number, count: number, device: DeviceKind | undefined): number {
  const plan = chainPlan(count, device);
  const unit = unitWidth(device);
  plan.starts.forEach((start, i) => {
    const ux = x + start;
    const next = plan.starts[i + 1];
    if (next !== undefined) {
      // The longer hop stands for the modules not drawn.
      const skipsModules = next - start > unit + UNIT_GAP;
      b.line(ux + unit, y, x + next, y, skipsModules ? { dash: [1.5, 2.5], strokeWidth: 1.2 } : {});
    }
    pvModule(b, ux, y);
    if (!device) return;
    const dx = ux + MODULE_W + 4;
    b.line(ux + MODULE_W, y, dx, y);
    if (device === "micro") microBox(b, dx, y);
    else if (device === "optimizer") optimizerBox(b, dx, y);
    else shutdownDeviceBox(b, dx, y);
  });
  b.text(x + plan.width / 2, y + 22, `× ${count}`, { size: SIZE.title, anchor: "middle", weight: "bold" });
  return x + plan.width;
}

/** What the array box says about its modules and their module-level devices. */
export function arrayHeaderLines(design: Design, model: CircuitModel): string[] {
  const m = design.module;
  const count =
    design.roofPlanes.reduce((sum, p) => sum + p.moduleCount, 0) ||
    model.groups.flatMap((g): (StringRow | BranchRow)[] => g.rows).reduce((sum, r) => sum + rowCount(r), 0);
  const lines = [`${count} × ${m.maker} ${m.model}, ${m.powerW} W`];
  const micro = design.inverters.find((i) => i.kind === "micro");
  const device = design.moduleLevelDevice;
  if (micro) lines.push("Microinverter on each module:", `${micro.maker} ${micro.model}`);
  else if (device?.kind === "optimizer") lines.push("DC optimizer on each module:", `${device.maker} ${device.model}`);
  else if (device) lines.push("Rapid shutdown device on each module:", `${device.maker} ${device.model}`);
  return lines.flatMap((line) => wrapWords(line, HEADER_CHARS));
}

export function arrayHeaderWidth(lines: string[]): number {
  return Math.max(textWidthPt("PV ARRAY", SIZE.title, { weight: "bold" }), ...lines.map((l) => textWidthPt(l, SIZE.label)));
}

/** The dashed array boundary with its heading. */
export function drawArrayBox(b: SceneBuilder, x: number, y: number, width: number, height: number, lines: string[]): void {
  b.rect(x, y, width, height, { dash: [5, 3], strokeWidth: 0.8, stroke: "soft" });
  b.text(x + 10, y + 14, "PV ARRAY", { size: SIZE.title, weight: "bold" });
  b.textLines(x + 10, y + 14 + LINE_GAP + 1, lines, LINE_GAP, { size: SIZE.label, tone: "soft" });
}

export function arrayHeaderHeight(lines: string[]): number {
  return 14 + (lines.length + 1) * LINE_GAP;
}
