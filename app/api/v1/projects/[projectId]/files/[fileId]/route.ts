import { getProjectFileLocation } from "@/lib/server/data/project-files";
import { attachmentHeaders, withAuth } from "@/lib/server/http";
import { getObjectBytes } from "@/lib/server/services/storage";

// GET /api/v1/projects/:projectId/files/:fileId – an uploaded file, as an attachment, after the project check
export const GET = withAuth<{ projectId: string; fileId: string }>(
  async (_request, { viewer, params }) => {
    const file = await getProjectFileLocation({ viewer, projectId: params.projectId, fileId: params.fileId });
    const bytes = await getObjectBytes(file.key);
    return new Response(Buffer.from(bytes), { headers: attachmentHeaders({ fileName: file.fileName, contentType: file.contentType, length: bytes.length }) });
  },
  { permission: "project:view" },
);
