"use client";

import dynamic from "next/dynamic";
import type { ComponentProps, ReactNode } from "react";
import type * as Charts from "./report-charts";
import { AGING_CHART_HEIGHT, MONTHLY_CHART_HEIGHT, daysChartHeight, decidedRows } from "./report-chart-sizes";

// The chart library is the largest script the portal ships. The page's tables already carry every
// figure, so the charts arrive after the page; each keeps its height reserved meanwhile.
const charts = () => import("./report-charts");
const DaysChart = dynamic(() => charts().then((m) => m.DaysToDecisionChart), { ssr: false });
const MonthlyChart = dynamic(() => charts().then((m) => m.MonthlyApprovalsChart), { ssr: false });
const AgingChart = dynamic(() => charts().then((m) => m.StageAgingChart), { ssr: false });

function Reserved({ height, children }: { height: number; children: ReactNode }) {
  return <div style={{ minHeight: height }}>{children}</div>;
}

export function DaysToDecisionChart(props: ComponentProps<typeof Charts.DaysToDecisionChart>) {
  const shown = decidedRows(props.rows).length;
  if (shown === 0) return <p className="text-sm text-ink-soft">No decided filings in this range.</p>;
  return (
    <Reserved height={daysChartHeight(shown)}>
      <DaysChart {...props} />
    </Reserved>
  );
}

export function MonthlyApprovalsChart(props: ComponentProps<typeof Charts.MonthlyApprovalsChart>) {
  return (
    <Reserved height={MONTHLY_CHART_HEIGHT}>
      <MonthlyChart {...props} />
    </Reserved>
  );
}

export function StageAgingChart(props: ComponentProps<typeof Charts.StageAgingChart>) {
  return (
    <Reserved height={AGING_CHART_HEIGHT}>
      <AgingChart {...props} />
    </Reserved>
  );
}
