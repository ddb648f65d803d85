// Runs the drawing cannot place on a circuit (a design being entered may
// name a string or inverter that is gone) are still shown, numbered, under
// the drawing, so the diagram and the conductor schedule always agree.
import type { Design } from "@/lib/engineering";
import type { CircuitModel } from "./circuit-model";
import { drawRunLabel, runLabelLines, runLabelWidth } from "./conductor-label";
import { itemsBounds } from "./scene";
import type { SceneBuilder } from "./scene-builder";
import { SIZE } from "./style";

const ENTRY_H = 40;

export function drawUnplacedRuns(b: SceneBuilder, design: Design, model: CircuitModel): void {
  if (model.unplaced.length === 0) return;
  const drawn = itemsBounds(b.build());
  const x = Number.isFinite(drawn.minX) ? drawn.minX : 0;
  const top = (Number.isFinite(drawn.maxY) ? drawn.maxY : 0) + 30;
  b.text(x, top, "RUNS NOT CONNECTED ON THIS DRAWING", { size: SIZE.title, weight: "bold" });
  b.text(x, top + 10, "Each names a string or inverter the design does not have; correct the run in the design.", {
    size: SIZE.label,
    tone: "soft",
  });
  model.unplaced.forEach((run, i) => {
    const wireY = top + 10 + 38 + i * ENTRY_H;
    const lines = runLabelLines(design, run);
    b.line(x, wireY, x + runLabelWidth(lines) + 10, wireY, { dash: [3, 2] });
    drawRunLabel(b, x, wireY, lines, model.numbers.get(run));
  });
}
