import type { CheckResult, Design, ReviewFigures, Site } from "@/lib/engineering";
import { CALC_COLUMNS, CALC_FONT_PT, CALC_TITLE_PT } from "@/templates/pdf/packets/sheets/calculation-columns";
import { describeCheck } from "./check-methods";

// A conservative estimate of each calculation row's height, so the checks can be split across
// sheets before rendering: every sheet's "Sheet N of M" and the cover's sheet index must be known up front.

// Room for rows on one calculation sheet: the body height less the heading, table head and a margin.
const ROWS_HEIGHT_BUDGET_PT = 575;
const CELL_PADDING_X_PT = 8;
const CELL_PADDING_Y_PT = 7;
const LINE_HEIGHT = 1.3;
// Average advance of Inter in ems (0.48 measured over check texts, rounded up); wrapping at word breaks wastes a little more.
const CHAR_EM = 0.52;
const WRAP_SLACK = 0.9;

function lines(text: string, widthPt: number, fontPt: number): number {
  if (!text) return 0;
  const perLine = Math.max(1, Math.floor(((widthPt - CELL_PADDING_X_PT) * WRAP_SLACK) / (CHAR_EM * fontPt)));
  return Math.ceil(text.length / perLine);
}

const height = (lineCount: number, fontPt: number) => lineCount * fontPt * LINE_HEIGHT;

/** The estimated height of a check's row, in points. */
export function estimateCheckRowPt(check: CheckResult, design: Design, site: Site, figures: ReviewFigures): number {
  const { inputs, method } = describeCheck(check, design, site, figures);
  const w = CALC_COLUMNS;
  const checkCol =
    height(lines(check.title, w.check, CALC_TITLE_PT), CALC_TITLE_PT) +
    height(
      lines(check.message, w.check, CALC_FONT_PT) + lines(check.fix ? `Suggested: ${check.fix}` : "", w.check, CALC_FONT_PT),
      CALC_FONT_PT,
    );
  const inputsCol = height(
    inputs.reduce((n, t) => n + lines(t, w.inputs, CALC_FONT_PT), 0),
    CALC_FONT_PT,
  );
  const methodCol = height(lines(method, w.method, CALC_FONT_PT), CALC_FONT_PT);
  const clauseCol = height(lines(check.clause, w.clause, CALC_FONT_PT) + 1, CALC_FONT_PT);
  return Math.max(checkCol, inputsCol, methodCol, clauseCol) + CELL_PADDING_Y_PT;
}

/** The checks in order, split into groups that each fit one calculation sheet. */
export function paginateChecks(checks: CheckResult[], design: Design, site: Site, figures: ReviewFigures): CheckResult[][] {
  const pages: CheckResult[][] = [[]];
  let used = 0;
  for (const check of checks) {
    const h = estimateCheckRowPt(check, design, site, figures);
    if (used + h > ROWS_HEIGHT_BUDGET_PT && pages.at(-1)!.length > 0) {
      pages.push([]);
      used = 0;
    }
    pages.at(-1)!.push(check);
    used += h;
  }
  return pages;
}
