import { NextResponse } from "next/server";
import { AppError } from "@/lib/errors";
import { ProjectFileQuery } from "@/lib/schemas/project-file";
import { deleteProjectFile, getProjectFileLocation } from "@/lib/server/data/project-files";
import { attachmentHeaders, thumbnailHeaders, withAuth } from "@/lib/server/http";
import { getObjectBytes } from "@/lib/server/services/storage";
import { makeThumbnail } from "@/lib/server/services/thumbnails";

type Params = { projectId: string; fileId: string };

// GET /api/v1/projects/:projectId/files/:fileId – an uploaded file, as an attachment, after the project check; ?size=thumbnail: a small JPEG of a picture
export const GET = withAuth<Params>(
  async (request, { viewer, params }) => {
    const { size } = ProjectFileQuery.parse(Object.fromEntries(request.nextUrl.searchParams));
    const file = await getProjectFileLocation({ viewer, projectId: params.projectId, fileId: params.fileId });
    const bytes = await getObjectBytes(file.key);
    if (size !== "thumbnail")
      return new Response(Buffer.from(bytes), {
        headers: attachmentHeaders({ fileName: file.fileName, contentType: file.contentType, length: bytes.length }),
      });
    if (!file.hasThumbnail) throw new AppError("NOT_FOUND", "This file is not a picture; download it instead.");
    const thumbnail = await makeThumbnail(bytes).catch((error: unknown) => {
      console.error(`thumbnail of file ${params.fileId}`, error);
      throw new AppError("NOT_FOUND", "No thumbnail can be made of this picture; download it instead.");
    });
    return new Response(new Uint8Array(thumbnail), { headers: thumbnailHeaders(thumbnail.length) });
  },
  { permission: "project:view" },
);

// DELETE /api/v1/projects/:projectId/files/:fileId – removes an upload made by mistake (its uploader, or the project's coordinator or an admin)
export const DELETE = withAuth<Params>(
  async (_request, { viewer, params }) => {
    await deleteProjectFile({ viewer, projectId: params.projectId, fileId: params.fileId });
    return new NextResponse(null, { status: 204 });
  },
  { permission: "field:record", body: "none" },
);
