// Lays out a single-line diagram from the review engine's design: the array
// and inverters on the left, the service on the right, a heading above and
// the reviewer's notes below. Everything is in points (1/72 in).
import { hasStorage, systemRatings, totalUnits, type Design, type NecEdition } from "@/lib/engineering";
import { readCircuits, type CircuitModel } from "./circuit-model";
import { layoutService, type ServicePlace } from "./layout-service";
import { layoutSources } from "./layout-sources";
import { layoutStorage } from "./layout-storage";
import { diagramNotes } from "./notes";
import { drawUnplacedRuns } from "./unplaced-runs";
import { itemsBounds, type SldScene } from "./scene";
import { SceneBuilder } from "./scene-builder";
import { LINE_GAP, SIZE, formatKw, wrapWords } from "./style";

export interface SingleLineOptions {
  /** The AHJ's NEC edition, quoted in the notes. */
  necEdition?: NecEdition;
  title?: string;
  /** Leave out the heading or the notes where the page around the diagram shows them already. */
  heading?: boolean;
  notes?: boolean;
}

const MARGIN = 16;
const HEADING_H = 40;
const NOTES_GAP = 28;
const MIN_NOTES_W = 560;
const TWO_COLUMNS_FROM_W = 900;
const STORAGE_GAP = 36;

export function layoutSingleLine(design: Design, options: SingleLineOptions = {}): SldScene {
  const model = readCircuits(design);
  const diagram = new SceneBuilder();
  const boxes = { next: 1 };
  const sources = layoutSources(diagram, design, model, boxes);
  const microOnly = model.groups.every((g) => g.kind === "micro");
  let service: ServicePlace | null = null;
  if (sources.output) {
    service = layoutService(diagram, {
      design,
      homeRuns: model.homeRuns,
      from: sources.output,
      startX: sources.nextX,
      initiatorTarget: microOnly ? null : { right: sources.collector.right },
      numbers: model.numbers,
      boxes,
    });
  }
  drawUnplacedRuns(diagram, design, model);
  if (hasStorage(design)) {
    const hybridId = design.storage.coupling === "dc" ? design.storage.multimodeInverterId : undefined;
    layoutStorage(diagram, design, {
      top: itemsBounds(diagram.build()).maxY + STORAGE_GAP,
      hybrid: (hybridId !== undefined && sources.inverterBodies.get(hybridId)) || null,
      service,
      necEdition: options.necEdition,
    });
  }
  const drawn = itemsBounds(diagram.build());
  const withNotes = options.notes !== false;
  const headingH = options.heading === false ? 0 : HEADING_H;
  const diagramBottom = MARGIN + headingH + (drawn.maxY - drawn.minY);
  const width = Math.max(drawn.maxX - drawn.minX, withNotes ? MIN_NOTES_W : 0);

  const frame = new SceneBuilder();
  if (headingH) {
    frame.text(MARGIN, MARGIN + SIZE.heading, options.title ?? "SINGLE-LINE DIAGRAM", { size: SIZE.heading, weight: "bold" });
    frame.text(MARGIN, MARGIN + SIZE.heading + 13, ratingsLine(design), { size: SIZE.subheading, tone: "soft" });
  }
  const bottom = withNotes
    ? drawNotes(frame, diagramNotes(design, options.necEdition), MARGIN, diagramBottom + NOTES_GAP, width)
    : diagramBottom;

  return {
    unit: "pt",
    width: Math.ceil(width + 2 * MARGIN),
    height: Math.ceil(bottom + MARGIN),
    description: describe(design, model),
    items: [...diagram.build(MARGIN - drawn.minX, MARGIN + headingH - drawn.minY), ...frame.build()],
  };
}

/** Numbered notes under a rule, in two columns on a wide diagram; returns the lowest point used. */
function drawNotes(b: SceneBuilder, notes: string[], x: number, top: number, width: number): number {
  b.line(x, top, x + width, top, { strokeWidth: 0.6, stroke: "soft" });
  b.text(x, top + 16, "NOTES", { size: SIZE.title, weight: "bold" });
  const columns = width >= TWO_COLUMNS_FROM_W ? 2 : 1;
  const columnW = (width - 24 * (columns - 1)) / columns;
  const maxChars = Math.floor((columnW - 16) / (SIZE.note * 0.6));
  const wrapped = notes.map((note) => wrapWords(note, maxChars));
  const perColumn = Math.ceil(wrapped.reduce((sum, lines) => sum + lines.length, 0) / columns);
  const firstY = top + 16 + LINE_GAP + 6;
  let column = 0;
  let y = firstY;
  let lowest = y;
  wrapped.forEach((lines, i) => {
    if (column < columns - 1 && y - firstY >= perColumn * LINE_GAP) {
      column += 1;
      y = firstY;
    }
    const cx = x + column * (columnW + 24);
    b.text(cx, y, `${i + 1}.`, { size: SIZE.note });
    y = b.textLines(cx + 14, y, lines, LINE_GAP, { size: SIZE.note }) + LINE_GAP + 3;
    lowest = Math.max(lowest, y);
  });
  return lowest;
}

function ratingsLine(design: Design): string {
  const s = design.service;
  const service = `${s.voltageV} V ${s.phase === 3 ? "3-phase" : "1-phase"} service`;
  try {
    const r = systemRatings(design);
    return `${formatKw(r.dcKw * 1000)} kW DC · ${formatKw(r.acKw * 1000)} kW AC · ${r.moduleCount} modules · ${service} · not to scale`;
  } catch {
    // A design still being entered may have no modules yet; the diagram still draws.
    return `${service} · not to scale`;
  }
}

function describe(design: Design, model: CircuitModel): string {
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;
  const parts = model.groups.map((g) =>
    g.kind === "micro"
      ? plural(g.rows.length, "microinverter branch circuit")
      : `${plural(g.rows.length, "string")} into ${g.inverter.maker} ${g.inverter.model}`,
  );
  const s = design.service;
  const connection =
    s.connection === "supply-side"
      ? `a supply-side connection with ${s.pvBreakerA} A fuses`
      : `a ${s.pvBreakerA} A PV breaker on a ${s.busbarA} A busbar`;
  const storage = hasStorage(design)
    ? ` Energy storage: ${totalUnits(design.storage)} battery unit${totalUnits(design.storage) === 1 ? "" : "s"}, ${design.storage.coupling === "dc" ? "DC-coupled through the hybrid inverter" : "AC-coupled through a battery inverter"}${design.storage.backupPanel ? ", with a backup loads panel" : ""}.`
    : "";
  return `Single-line diagram: ${parts.join(", ") || "no PV sources yet"}, to ${connection}.${storage}`;
}
