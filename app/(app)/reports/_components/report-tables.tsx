import { DataTable } from "@/components/ui/data-table";
import { STAGE_LABELS } from "@/lib/domain/stages";
import { WAITING_PARTY_LABELS } from "@/lib/domain/filings";
import { AGE_BUCKETS, type CycleTimeRow, type ReportsOverview } from "@/lib/dto/reports";

const percent = (share: number | null) => (share === null ? "—" : `${Math.round(share * 100)} %`);
const figure = (n: number | null) => (n === null ? "—" : String(n));
const TD = "px-3 py-2";
const NUM = "measure px-3 py-2";

/** A table of report figures: the shared bordered table, named for screen readers by its caption. */
function Table({ caption, head, children }: { caption: string; head: string[]; children: React.ReactNode }) {
  return (
    <section aria-label={caption}>
      <DataTable columns={head}>{children}</DataTable>
    </section>
  );
}

/** The cycle-times rows with every figure the API answers. */
export function CycleTimesTable({ rows, authority }: { rows: CycleTimeRow[]; authority: string }) {
  return (
    <Table
      caption={`Days to a decision by ${authority}`}
      head={[
        authority,
        "Filed",
        "Decided",
        "Median days",
        "90th pct. days",
        "Approved first time",
        "Rounds per filing",
        "Inspections passed first time",
      ]}
    >
      {rows.map((r) => (
        <tr key={r.authorityId} className="border-b border-paper-edge" data-testid="cycle-row">
          <th scope="row" className={`${TD} font-normal`}>
            {r.name}
          </th>
          <td className={NUM}>{r.filings}</td>
          <td className={NUM}>{r.decided}</td>
          <td className={NUM}>{figure(r.medianDays)}</td>
          <td className={NUM}>{figure(r.p90Days)}</td>
          <td className={NUM}>{percent(r.firstPassRate)}</td>
          <td className={NUM}>{figure(r.meanRounds)}</td>
          <td className={NUM}>{percent(r.inspectionPassRate)}</td>
        </tr>
      ))}
    </Table>
  );
}

export function MonthlyApprovalsTable({ rows }: { rows: ReportsOverview["monthlyApprovals"] }) {
  return (
    <Table caption="Approvals by month" head={["Month", "Permits", "Interconnections"]}>
      {rows.map((r) => (
        <tr key={r.month} className="border-b border-paper-edge">
          <th scope="row" className={`${TD} measure font-normal`}>
            {r.month}
          </th>
          <td className={NUM}>{r.permits}</td>
          <td className={NUM}>{r.interconnections}</td>
        </tr>
      ))}
    </Table>
  );
}

export function StageTables({ overview }: { overview: ReportsOverview }) {
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <Table caption="Median days in each stage" head={["Stage", "Stays ended in range", "Median days"]}>
        {overview.stageDurations.map((r) => (
          <tr key={r.stage} className="border-b border-paper-edge">
            <th scope="row" className={`${TD} font-normal`}>
              {STAGE_LABELS[r.stage]}
            </th>
            <td className={NUM}>{r.stays}</td>
            <td className={NUM}>{figure(r.medianDays)}</td>
          </tr>
        ))}
      </Table>
      <Table caption="Active projects by days in their current stage" head={["Stage now", ...AGE_BUCKETS]}>
        {overview.stageAging.map((r) => (
          <tr key={r.stage} className="border-b border-paper-edge">
            <th scope="row" className={`${TD} font-normal`}>
              {STAGE_LABELS[r.stage]}
            </th>
            {r.counts.map((c, i) => (
              <td key={AGE_BUCKETS[i]} className={NUM}>
                {c}
              </td>
            ))}
          </tr>
        ))}
      </Table>
    </div>
  );
}

export function WaitingTable({ rows }: { rows: ReportsOverview["waiting"] }) {
  return (
    <Table caption="Active projects by who they wait on" head={["Waiting on", "Active projects"]}>
      {rows.map((r) => (
        <tr key={r.waitingOn} className="border-b border-paper-edge">
          <th scope="row" className={`${TD} font-normal`}>
            {r.waitingOn === "nobody" ? "Nobody (PTO received)" : WAITING_PARTY_LABELS[r.waitingOn]}
          </th>
          <td className={NUM}>{r.projects}</td>
        </tr>
      ))}
    </Table>
  );
}
