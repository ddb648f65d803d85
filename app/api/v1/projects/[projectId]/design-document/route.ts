import { NextResponse } from "next/server";
import { getProjectDesignDocument } from "@/lib/server/data/design-documents";
import { withAuth } from "@/lib/server/http";

// GET /api/v1/projects/:projectId/design-document – the saved design as a document for POST /api/v1/design-review
export const GET = withAuth<{ projectId: string }>(
  async (_request, { viewer, params }) => NextResponse.json(await getProjectDesignDocument({ viewer, projectId: params.projectId })),
  { permission: "project:view" },
);
