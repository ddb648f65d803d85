import { NextResponse } from "next/server";
import { AppError } from "@/lib/errors";
import { MAX_UPLOAD_BYTES, tooLargeMessage } from "@/lib/field/upload-rules";
import { isProjectFileKind, listProjectFiles, uploadProjectFile } from "@/lib/server/data/project-files";
import { withAuth } from "@/lib/server/http";

// Room for the multipart boundaries and the kind field around one file.
const FORM_OVERHEAD_BYTES = 64 * 1024;

// GET /api/v1/projects/:projectId/files – uploads from the field, newest first
export const GET = withAuth<{ projectId: string }>(
  async (_request, { viewer, params }) => NextResponse.json({ files: await listProjectFiles({ viewer, projectId: params.projectId }) }),
  { permission: "project:view" },
);

// POST /api/v1/projects/:projectId/files – multipart: kind (signed-completion | site-photo | comment-letter) and one file
export const POST = withAuth<{ projectId: string }>(
  async (request, { viewer, params }) => {
    // The body is read whole, so its size must be known and bounded before reading it.
    const length = request.headers.get("content-length");
    if (length === null) throw new AppError("INVALID_INPUT", "Send the upload with a Content-Length header.");
    const declared = Number(length);
    if (!Number.isFinite(declared) || declared > MAX_UPLOAD_BYTES + FORM_OVERHEAD_BYTES)
      throw new AppError("TOO_LARGE", tooLargeMessage(declared));
    const form = await request.formData().catch(() => {
      throw new AppError("INVALID_INPUT", "Send the file as multipart/form-data with the fields kind and file.");
    });
    const kind = form.get("kind");
    const file = form.get("file");
    if (!isProjectFileKind(kind))
      throw new AppError("INVALID_INPUT", "Say what the file is: kind must be signed-completion, site-photo or comment-letter.", {
        kind: ["Choose signed-completion, site-photo or comment-letter"],
      });
    if (!(file instanceof File))
      throw new AppError("INVALID_INPUT", "Attach one file in the field named file.", { file: ["Attach a file"] });
    if (file.size > MAX_UPLOAD_BYTES) throw new AppError("TOO_LARGE", tooLargeMessage(file.size));
    const saved = await uploadProjectFile({
      viewer,
      projectId: params.projectId,
      kind,
      fileName: file.name,
      bytes: new Uint8Array(await file.arrayBuffer()),
    });
    return NextResponse.json({ file: saved }, { status: 201 });
  },
  { permission: "field:record", body: "multipart" },
);
