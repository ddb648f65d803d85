// Each chart's height, known before the chart library arrives, so the box it will fill is reserved
// from the first paint and nothing below it moves when it draws.
export type DaysRow = { name: string; medianDays: number | null; p90Days: number | null };

/** The authorities with a decided filing in the range: the only rows a days-to-decision chart draws. */
export const decidedRows = (rows: DaysRow[]) => rows.filter((r) => r.medianDays !== null);

export const daysChartHeight = (shown: number) => 70 + shown * 56;
export const MONTHLY_CHART_HEIGHT = 260;
export const AGING_CHART_HEIGHT = 220;
