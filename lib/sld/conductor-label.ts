// The words written along a conductor run, the way a plan reviewer reads
// them: what the run is, then "count × size material insulation, raceway; EGC".
import { circuitConductorCount, sizeLabel, unlessInputError, type ConductorRun, type Design } from "@/lib/engineering";
import { textWidthPt } from "./scene";
import type { SceneBuilder } from "./scene-builder";
import { SIZE } from "./style";

/**
 * The conductors in two halves that read as one: "2 × 10 AWG Cu PV wire" and
 * "free air; EGC 10 AWG Cu", or "… THWN-2" and "in 3/4 in EMT; EGC 10 AWG Cu".
 */
export function conductorSpec(design: Design, run: ConductorRun): [string, string] {
  const c = run.conductor;
  const insulation = c.insulation ?? `${c.insulationTempC} °C insulation`;
  // The engine's count, the same the review and the conductor schedule use; "?" while the run names a missing string or inverter.
  const wires = `${unlessInputError(() => circuitConductorCount(design, run)) ?? "?"} × ${sizeLabel(c.size)} ${c.material} ${insulation}`;
  const raceway = run.raceway ? `in ${run.raceway.tradeSize} in ${run.raceway.type}` : "free air";
  const egc = run.egc ? `; EGC ${sizeLabel(run.egc.size)} ${run.egc.material}` : "; no EGC entered";
  return [wires, `${raceway}${egc}`];
}

/** e.g. "Inverter to service panel, 28 ft" with the run's own protective device, if any. */
export function runTitle(run: ConductorRun): string {
  const ocpd = run.ocpdA ? `, ${run.ocpdA} A ${run.ocpdIsFuse ? "fuse" : "breaker"}` : "";
  return `${run.label}, ${formatFt(run.lengthFt)} ft${ocpd}`;
}

export type RunLabel = [title: string, wires: string, racewayAndEgc: string];

/** Written where a circuit has no run in the design yet. */
export const NO_RUN_LABEL: RunLabel = ["No conductor run entered", "add it to the design", ""];

/** The three lines written above a run's wire. */
export function runLabelLines(design: Design, run: ConductorRun | undefined): RunLabel {
  if (!run) return NO_RUN_LABEL;
  return [runTitle(run), ...conductorSpec(design, run)];
}

/** Room the run's number tag takes before its words. */
export const TAG_W = 16;
const TAG_R = 6;

/** The run's number from the conductor schedule, in a small circle sitting on its wire. */
export function drawRunTag(b: SceneBuilder, cx: number, wireY: number, number: number): void {
  b.circle(cx, wireY, TAG_R, { fill: "white", strokeWidth: 0.9 });
  b.text(cx, wireY + 2.3, String(number), { size: SIZE.spec, anchor: "middle", weight: "bold" });
}

/** Above a wire: the run's name and length, then its conductors on two lines; the number tag on the wire in front. */
export function drawRunLabel(b: SceneBuilder, x: number, wireY: number, [title, ...spec]: RunLabel, number?: number): void {
  if (number !== undefined) drawRunTag(b, x + TAG_R, wireY, number);
  const tx = x + TAG_W;
  b.text(tx, wireY - 23, title, { size: SIZE.label });
  b.textLines(tx, wireY - 14, spec.filter(Boolean), 8.5, { size: SIZE.spec, mono: true, tone: "soft" });
}

/** The label's width, its tag included. */
export function runLabelWidth([title, ...spec]: RunLabel): number {
  return TAG_W + Math.max(textWidthPt(title, SIZE.label), ...spec.map((line) => textWidthPt(line, SIZE.spec, { mono: true })));
}

function formatFt(ft: number): string {
  return Number.isInteger(ft) ? String(ft) : ft.toFixed(1);
}
