import { NextResponse } from "next/server";
import { reviewProjectDocument } from "@/lib/server/data/design-documents";
import { withAuth } from "@/lib/server/http";

// GET /api/v1/projects/:projectId/review – the saved design's review, as POST /api/v1/design-review answers it; 422 while incomplete
export const GET = withAuth<{ projectId: string }>(
  async (_request, { viewer, params }) => NextResponse.json(await reviewProjectDocument({ viewer, projectId: params.projectId })),
  { permission: "project:view" },
);
