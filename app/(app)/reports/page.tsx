import type { Metadata } from "next";
import Link from "next/link";
import { calendarDayText } from "@/lib/domain/time-zones";
import { AGE_BUCKETS } from "@/lib/dto/reports";
import { requirePermission } from "@/lib/server/auth";
import { getReportsOverview } from "@/lib/server/data/reports";
import { DateRangeQuery } from "@/lib/schemas/reports";
import { DaysToDecisionChart, MonthlyApprovalsChart, StageAgingChart } from "./_components/lazy-report-charts";
import { CycleTimesTable, MonthlyApprovalsTable, StageTables, WaitingTable } from "./_components/report-tables";

export const metadata: Metadata = { title: "Reports" };

export default async function ReportsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requirePermission("reports:view");
  const given = await searchParams;
  const parsed = DateRangeQuery.safeParse({ from: String(given.from ?? ""), to: String(given.to ?? "") });
  const overview = await getReportsOverview({ viewer, range: parsed.success ? parsed.data : { from: "", to: "" } });
  const range = new URLSearchParams({ from: overview.from, to: overview.to });
  const aging = AGE_BUCKETS.map((band, i) => ({ band, projects: overview.stageAging.reduce((sum, r) => sum + r.counts[i]!, 0) }));

  return (
    <div className="space-y-8">
      <div className="space-y-2">
        <h1>Reports</h1>
        <p className="text-sm text-ink-soft">
          How long each AHJ and utility takes, for filings submitted from {calendarDayText(overview.from)} to {calendarDayText(overview.to)}
          . The figures describe your own filings; an authority&apos;s published review times and its own instructions govern.
        </p>
        <form className="flex flex-wrap items-end gap-3 print:hidden" method="get">
          <div>
            <label className="label" htmlFor="report-from">
              From
            </label>
            <input id="report-from" name="from" type="date" className="input" defaultValue={overview.from} />
          </div>
          <div>
            <label className="label" htmlFor="report-to">
              To
            </label>
            <input id="report-to" name="to" type="date" className="input" defaultValue={overview.to} />
          </div>
          <button type="submit" className="rounded border border-paper-edge bg-white px-4 py-2 text-sm font-medium hover:bg-paper-deep">
            Show
          </button>
        </form>
        {parsed.success ? null : (
          <p role="alert" className="text-sm">
            {parsed.error.issues[0]?.message}; showing the last twelve months instead.
          </p>
        )}
      </div>

      <section className="space-y-3">
        <h2>Days from submission to decision: AHJs</h2>
        <DaysToDecisionChart rows={overview.ahj} title="Days to a decision by AHJ" />
        <CycleTimesTable rows={overview.ahj} authority="AHJ" />
      </section>

      <section className="space-y-3">
        <h2>Days from submission to decision: utilities</h2>
        <DaysToDecisionChart rows={overview.utility} title="Days to a decision by utility" />
        <CycleTimesTable rows={overview.utility} authority="Utility" />
        <p className="text-xs text-ink-faint">
          Median and 90th percentile of whole days from the day a filing was submitted to the day it was decided. “Approved first time” is
          the share of decided filings approved without a correction round; inspections count first visits only.
        </p>
      </section>

      <section className="space-y-3">
        <h2>Approvals by month</h2>
        <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
          <MonthlyApprovalsChart rows={overview.monthlyApprovals} />
          <MonthlyApprovalsTable rows={overview.monthlyApprovals} />
        </div>
      </section>

      <section className="space-y-3">
        <h2>Time in each stage</h2>
        <StageAgingChart buckets={aging} />
        <StageTables overview={overview} />
      </section>

      <section className="space-y-3">
        <h2>Who active projects wait on</h2>
        <div className="max-w-md">
          <WaitingTable rows={overview.waiting} />
        </div>
      </section>

      <section className="space-y-2 print:hidden">
        <h2>Spreadsheets</h2>
        <ul className="list-disc space-y-1 pl-5 text-sm">
          <li>
            <a href="/api/v1/projects?format=csv" download>
              Every project (CSV)
            </a>
          </li>
          <li>
            <a href={`/api/v1/reports/filings?${range}`} download>
              Filings submitted in this range, with their dates (CSV)
            </a>
          </li>
          <li>
            <a href={`/api/v1/reports/payments?${range}`} download>
              Payments and refunds in this range, for the books (CSV)
            </a>
          </li>
          <li>
            <Link href="/projects/import">Import projects from a spreadsheet</Link>
          </li>
        </ul>
      </section>
    </div>
  );
}
