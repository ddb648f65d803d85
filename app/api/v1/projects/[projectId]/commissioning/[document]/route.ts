import { AppError } from "@/lib/errors";
import { COMMISSIONING_DOCUMENT_KINDS, type CommissioningDocumentKind } from "@/lib/documents/commissioning/input";
import { renderCommissioningPdf } from "@/lib/documents/commissioning/render";
import { buildCommissioningDocumentInput } from "@/lib/server/data/commissioning";
import { attachmentHeaders, withAuth } from "@/lib/server/http";

const FILE_NAMES: Record<CommissioningDocumentKind, string> = { certificate: "certificate-of-completion", report: "commissioning-report" };

// GET /api/v1/projects/:projectId/commissioning/certificate|report – pre-filled from the saved record, rendered on request
export const GET = withAuth<{ projectId: string; document: string }>(
  async (_request, { viewer, params }) => {
    const kind = params.document as CommissioningDocumentKind;
    if (!COMMISSIONING_DOCUMENT_KINDS.includes(kind)) throw new AppError("NOT_FOUND", "Ask for the certificate or the report.");
    const input = await buildCommissioningDocumentInput({ viewer, projectId: params.projectId, kind });
    const bytes = await renderCommissioningPdf(input);
    return new Response(Buffer.from(bytes), {
      headers: attachmentHeaders({
        fileName: `${FILE_NAMES[kind]}-project-${input.project.number}.pdf`,
        contentType: "application/pdf",
        length: bytes.length,
      }),
    });
  },
  { permission: "project:view" },
);
