import { NextResponse } from "next/server";
import { listCycleTimes, reportRange } from "@/lib/server/data/reports";
import { withAuth } from "@/lib/server/http";
import { CycleTimesQuery } from "@/lib/schemas/reports";

// GET /api/v1/reports/cycle-times – days from submitted to decided per AHJ or utility, for filings submitted in a range
export const GET = withAuth(
  async (request, { viewer }) => {
    const { groupBy, ...given } = CycleTimesQuery.parse(Object.fromEntries(request.nextUrl.searchParams));
    const range = await reportRange({ viewer, range: given });
    return NextResponse.json({ rows: await listCycleTimes({ viewer, groupBy, range }) });
  },
  { permission: "reports:view" },
);
