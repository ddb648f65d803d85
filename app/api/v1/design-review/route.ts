import { NextResponse } from "next/server";
import { reviewDocumentOrThrow } from "@/lib/design/document-review";
import { readJson, withAuth } from "@/lib/server/http";

// POST /api/v1/design-review – review a design document without saving anything; 422 names each problem by its JSON path
export const POST = withAuth(async (request) => NextResponse.json(reviewDocumentOrThrow(await readJson(request))), {
  permission: "design:review",
});
