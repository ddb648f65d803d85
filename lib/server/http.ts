import "server-only";
import { randomUUID } from "node:crypto";
import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { can, type Permission, type Viewer } from "@/lib/domain/permissions";
import { AppError, ERROR_STATUS, isAppError } from "@/lib/errors";
import { fieldErrorsOf } from "./action";
import { getViewer } from "./auth";
import { getViewerByApiToken } from "./data/api-tokens";

/** The one mapping from thrown errors to JSON responses. */
export function toErrorResponse(error: unknown): NextResponse {
  if (error instanceof z.ZodError) {
    return NextResponse.json({ error: { code: "INVALID_INPUT", message: "The request has invalid fields.", fieldErrors: fieldErrorsOf(error) } }, { status: 422 });
  }
  if (isAppError(error)) {
    return NextResponse.json({ error: { code: error.code, message: error.message, ...(error.fieldErrors ? { fieldErrors: error.fieldErrors } : {}) } }, { status: ERROR_STATUS[error.code] });
  }
  const reference = randomUUID().slice(0, 8);
  console.error(`[api ${reference}]`, error);
  return NextResponse.json({ error: { code: "INTERNAL", message: `Unexpected error (reference ${reference}).` } }, { status: 500 });
}

const MAX_JSON_BYTES = 64 * 1024;

/** Reads a JSON body, refusing oversize and malformed ones with a readable message. */
export async function readJson(request: Request): Promise<unknown> {
  const text = await request.text();
  if (text.length > MAX_JSON_BYTES) throw new AppError("INVALID_INPUT", `The request body is larger than ${MAX_JSON_BYTES / 1024} KiB.`);
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError("INVALID_INPUT", "The request body is not valid JSON.");
  }
}

/** The viewer behind a request: an API token sent as `Authorization: Bearer …`, else the session. */
async function requestViewer(request: NextRequest): Promise<Viewer | null> {
  const header = request.headers.get("authorization");
  if (header === null) return getViewer();
  const token = /^Bearer +(\S+) *$/i.exec(header)?.[1];
  if (!token) throw new AppError("UNAUTHORIZED", "Send the API token as: Authorization: Bearer <token>.");
  const viewer = await getViewerByApiToken(token);
  if (!viewer) throw new AppError("UNAUTHORIZED", "The API token is not valid or has been revoked.");
  return viewer;
}

type Handler<P> = (request: NextRequest, context: { viewer: Viewer; params: P }) => Promise<Response>;

/** Wraps a route handler: signed-in viewer or API token with the permission, params resolved, errors mapped. */
export function withAuth<P = Record<string, never>>(handler: Handler<P>, { permission }: { permission: Permission }) {
  return async (request: NextRequest, context: { params: Promise<P> }) => {
    try {
      const viewer = await requestViewer(request);
      if (!viewer) throw new AppError("UNAUTHORIZED", "Sign in first, or send an API token.");
      if (!can(viewer, permission)) throw new AppError("FORBIDDEN", viewer.apiTokenId ? "API tokens may only read projects and review designs." : "Your role does not allow this.");
      return await handler(request, { viewer, params: await context.params });
    } catch (error) {
      return toErrorResponse(error);
    }
  };
}

/**
 * Headers for sending stored bytes as a download, never shown inline: an uploaded file is
 * only ever handed back as an attachment of the type its bytes were judged to be.
 */
export function attachmentHeaders({ fileName, contentType, length }: { fileName: string; contentType: string; length: number }): Record<string, string> {
  const ascii = fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return {
    "content-type": contentType,
    "content-length": String(length),
    "content-disposition": `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`,
    "x-content-type-options": "nosniff",
    "cache-control": "private, no-store",
  };
}
