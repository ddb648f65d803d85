import { listFilingsForExport } from "@/lib/server/data/exports";
import { reportRange } from "@/lib/server/data/reports";
import { csvResponse } from "@/lib/server/csv-response";
import { withAuth } from "@/lib/server/http";
import { DateRangeQuery } from "@/lib/schemas/reports";
import { FILING_CSV_COLUMNS } from "@/lib/spreadsheets/report-columns";
import { toCsv } from "@/lib/spreadsheets/write-csv";

// GET /api/v1/reports/filings – the filings submitted in a range of days, with their dates, as CSV
export const GET = withAuth(
  async (request, { viewer }) => {
    const range = await reportRange({ viewer, range: DateRangeQuery.parse(Object.fromEntries(request.nextUrl.searchParams)) });
    const rows = await listFilingsForExport({ viewer, range });
    return csvResponse(`filings-${range.from}-to-${range.to}.csv`, toCsv(FILING_CSV_COLUMNS, rows));
  },
  { permission: "reports:view" },
);
