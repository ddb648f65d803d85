"use client";

import { Bar, BarChart, CartesianGrid, LabelList, Legend, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { AGING_CHART_HEIGHT, MONTHLY_CHART_HEIGHT, daysChartHeight, decidedRows, type DaysRow } from "./report-chart-sizes";

// Series are told apart by fill pattern and by the words on and beside the bars, never by colour alone,
// so a chart reads the same printed in black and white.
const INK = "#1f1c17";
const COPPER = "#b5652b";
const PATTERNS = (
  <defs>
    <pattern id="report-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
      <rect width="6" height="6" fill="#ffffff" />
      <line x1="0" y1="0" x2="0" y2="6" stroke={INK} strokeWidth="2" />
    </pattern>
    <pattern id="report-dots" width="5" height="5" patternUnits="userSpaceOnUse">
      <rect width="5" height="5" fill="#ffffff" />
      <circle cx="2.5" cy="2.5" r="1.2" fill={INK} />
    </pattern>
  </defs>
);
const SOLID = { fill: COPPER, stroke: INK, strokeWidth: 1 };
const HATCHED = { fill: "url(#report-hatch)", stroke: INK, strokeWidth: 1 };
const DOTTED = { fill: "url(#report-dots)", stroke: INK, strokeWidth: 1 };
const AXIS = { fontSize: 12, fill: INK };
const label = (v: unknown) => (v === null || v === undefined ? "" : String(v));

/** Days from submitted to decided per authority: the median as a solid bar, the 90th percentile hatched. */
export function DaysToDecisionChart({ rows, title }: { rows: DaysRow[]; title: string }) {
  const shown = decidedRows(rows);
  if (shown.length === 0) return null; // the page says so in words (lazy-report-charts)
  return (
    <figure aria-label={title} className="break-inside-avoid">
      <ResponsiveContainer width="100%" height={daysChartHeight(shown.length)}>
        <BarChart data={shown} layout="vertical" margin={{ left: 8, right: 40, top: 4, bottom: 4 }} barGap={2}>
          {PATTERNS}
          <CartesianGrid horizontal={false} stroke="#ddd3bf" />
          <XAxis
            type="number"
            tick={AXIS}
            allowDecimals={false}
            label={{ value: "days", position: "insideBottomRight", offset: -2, fontSize: 12 }}
          />
          <YAxis type="category" dataKey="name" width={190} tick={AXIS} interval={0} />
          <Legend wrapperStyle={{ fontSize: 12, color: INK }} />
          <Bar dataKey="medianDays" name="Median (solid)" {...SOLID} isAnimationActive={false}>
            <LabelList dataKey="medianDays" position="right" fontSize={12} fill={INK} formatter={label} />
          </Bar>
          <Bar dataKey="p90Days" name="90th percentile (hatched)" {...HATCHED} isAnimationActive={false}>
            <LabelList dataKey="p90Days" position="right" fontSize={12} fill={INK} formatter={label} />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}

type Series = { key: string; name: string; style: typeof SOLID };
const blankZero = (v: unknown) => (v ? String(v) : "");

/** Upright bars over categories, each series with its pattern, its name and its figures on the bars. */
function ColumnChart(props: { label: string; data: object[]; category: string; height: number; series: Series[] }) {
  return (
    <figure aria-label={props.label} className="break-inside-avoid">
      <ResponsiveContainer width="100%" height={props.height}>
        <BarChart data={props.data} margin={{ left: 0, right: 8, top: 16, bottom: 4 }}>
          {PATTERNS}
          <CartesianGrid vertical={false} stroke="#ddd3bf" />
          <XAxis dataKey={props.category} tick={AXIS} />
          <YAxis tick={AXIS} allowDecimals={false} width={32} />
          {props.series.length > 1 ? <Legend wrapperStyle={{ fontSize: 12, color: INK }} /> : null}
          {props.series.map((s) => (
            <Bar key={s.key} dataKey={s.key} name={s.name} {...s.style} isAnimationActive={false}>
              <LabelList dataKey={s.key} position="top" fontSize={11} fill={INK} formatter={blankZero} />
            </Bar>
          ))}
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}

/** Approvals per month: permits solid, interconnection applications dotted. */
export function MonthlyApprovalsChart({ rows }: { rows: { month: string; permits: number; interconnections: number }[] }) {
  return (
    <ColumnChart
      label="Approvals by month"
      data={rows}
      category="month"
      height={MONTHLY_CHART_HEIGHT}
      series={[
        { key: "permits", name: "Permits (solid)", style: SOLID },
        { key: "interconnections", name: "Interconnections (dotted)", style: DOTTED },
      ]}
    />
  );
}

/** How many active projects have sat in their current stage for how long, one bar per age band. */
export function StageAgingChart({ buckets }: { buckets: { band: string; projects: number }[] }) {
  return (
    <ColumnChart
      label="Active projects by days in their current stage"
      data={buckets}
      category="band"
      height={AGING_CHART_HEIGHT}
      series={[{ key: "projects", name: "Active projects", style: HATCHED }]}
    />
  );
}
