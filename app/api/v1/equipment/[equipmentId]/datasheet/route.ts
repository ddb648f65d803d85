import { NextResponse } from "next/server";
import { attachDatasheet, getDatasheetLocation } from "@/lib/server/data/equipment";
import { withAuth } from "@/lib/server/http";
import { presignedDownloadUrl } from "@/lib/server/services/storage";
import { AppError } from "@/lib/errors";
import { DATASHEET_MAX_BYTES } from "@/lib/schemas/equipment";

type Params = { equipmentId: string };

// Room for the multipart envelope around the largest accepted file.
const MAX_REQUEST_BYTES = DATASHEET_MAX_BYTES + 64 * 1024;

// GET /api/v1/equipment/:equipmentId/datasheet – after the check, a redirect to a one-minute download link
export const GET = withAuth<Params>(
  async (_request, { viewer, params }) => {
    const { key, fileName } = await getDatasheetLocation({ viewer, equipmentId: params.equipmentId });
    const url = await presignedDownloadUrl(key, { fileName, inline: true, expiresInSeconds: 60 });
    return NextResponse.redirect(url, { status: 302, headers: { "Cache-Control": "private, no-store" } });
  },
  { permission: "catalog:view" },
);

// POST /api/v1/equipment/:equipmentId/datasheet – upload the data sheet PDF (multipart field "file"), replacing any earlier one
export const POST = withAuth<Params>(
  async (request, { viewer, params }) => {
    // Refuse an oversize body before reading it into memory.
    if (Number(request.headers.get("content-length") ?? 0) > MAX_REQUEST_BYTES)
      throw new AppError("INVALID_INPUT", `The data sheet is larger than ${DATASHEET_MAX_BYTES / 1024 / 1024} MB.`, {
        file: ["Too large"],
      });
    const file = (await request.formData().catch(() => null))?.get("file");
    if (!(file instanceof File))
      throw new AppError("INVALID_INPUT", "Attach the data sheet as the multipart field “file”.", { file: ["Choose a PDF file"] });
    const equipment = await attachDatasheet({
      viewer,
      equipmentId: params.equipmentId,
      fileName: file.name,
      bytes: new Uint8Array(await file.arrayBuffer()),
    });
    return NextResponse.json(equipment, { status: 201 });
  },
  { permission: "catalog:edit", body: "multipart" },
);
