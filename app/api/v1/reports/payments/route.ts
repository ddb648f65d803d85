import { listLedgerForExport } from "@/lib/server/data/exports";
import { getOrganization } from "@/lib/server/data/organizations";
import { reportRange } from "@/lib/server/data/reports";
import { csvResponse } from "@/lib/server/csv-response";
import { withAuth } from "@/lib/server/http";
import { DateRangeQuery } from "@/lib/schemas/reports";
import { LEDGER_CSV_COLUMNS } from "@/lib/spreadsheets/report-columns";
import { toCsv } from "@/lib/spreadsheets/write-csv";

// GET /api/v1/reports/payments – payments received and refunds given in a range of days, as CSV for the books
export const GET = withAuth(
  async (request, { viewer }) => {
    const range = await reportRange({ viewer, range: DateRangeQuery.parse(Object.fromEntries(request.nextUrl.searchParams)) });
    const { timeZone } = await getOrganization({ viewer });
    const rows = await listLedgerForExport({ viewer, range, timeZone });
    return csvResponse(`payments-and-refunds-${range.from}-to-${range.to}.csv`, toCsv(LEDGER_CSV_COLUMNS, rows));
  },
  { permission: "reports:view" },
);
