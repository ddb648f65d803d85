import { AppError } from "@/lib/errors";
import { getSignatureRequestFile } from "@/lib/server/data/signature-requests";
import { getObjectBytes } from "@/lib/server/services/storage";
import { attachmentHeaders, withAuth } from "@/lib/server/http";

// GET /api/v1/signature-requests/:requestId/original|signed – the document as generated, or its signed copy
export const GET = withAuth<{ requestId: string; file: string }>(
  async (_request, { viewer, params }) => {
    if (params.file !== "original" && params.file !== "signed") throw new AppError("NOT_FOUND", "Ask for the original or the signed copy.");
    const file = await getSignatureRequestFile({ viewer, requestId: params.requestId, which: params.file });
    const bytes = await getObjectBytes(file.key);
    return new Response(Buffer.from(bytes), {
      headers: attachmentHeaders({ fileName: file.fileName, contentType: "application/pdf", length: bytes.length }),
    });
  },
  { permission: "project:view" },
);
