// The calculation table's type sizes and columns: the sheet draws with them, and
// lib/documents/packets/calculation-layout.ts estimates row heights from them.

export const CALC_FONT_PT = 7;
export const CALC_TITLE_PT = 7.5;

/** Column widths in points; they add up to the body width of an 11 × 17 sheet. */
export const CALC_COLUMNS = { index: 22, check: 320, inputs: 230, method: 220, result: 70, limit: 70, clause: 160, status: 49 } as const;
