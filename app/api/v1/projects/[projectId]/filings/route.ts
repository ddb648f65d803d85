import { NextResponse } from "next/server";
import { listProjectFilings } from "@/lib/server/data/filings";
import { withAuth } from "@/lib/server/http";

type Params = { projectId: string };

// GET /api/v1/projects/:projectId/filings – the project's filings, rounds and inspections, and who it waits on.
// Read-only here: filings change through the project's pages (server actions), never through a token.
export const GET = withAuth<Params>(
  async (_request, { viewer, params }) => NextResponse.json(await listProjectFilings({ viewer, projectId: params.projectId })),
  { permission: "project:view" },
);
