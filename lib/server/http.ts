import "server-only";
import { randomUUID } from "node:crypto";
import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { can, type Permission, type Viewer } from "@/lib/domain/permissions";
import { AppError, ERROR_STATUS, isAppError } from "@/lib/errors";
import { findUnstorableInput } from "@/lib/schemas/fields";
import { readBounded } from "@/lib/net/read-bounded";
import { isSameOrigin } from "@/lib/net/same-origin";
import { fieldErrorsOf } from "./action";
import { getViewer } from "./auth";
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "./db-unavailable";
import { env } from "./env";
import { getViewerByApiToken } from "./data/api-tokens";

/** The one mapping from thrown errors to JSON responses. */
export function toErrorResponse(error: unknown): NextResponse {
  if (error instanceof z.ZodError) {
    return NextResponse.json(
      { error: { code: "INVALID_INPUT", message: "The request has invalid fields.", fieldErrors: fieldErrorsOf(error) } },
      { status: 422 },
    );
  }
  if (isAppError(error)) {
    return NextResponse.json(
      { error: { code: error.code, message: error.message, ...(error.fieldErrors ? { fieldErrors: error.fieldErrors } : {}) } },
      { status: ERROR_STATUS[error.code] },
    );
  }
  if (isDatabaseUnavailable(error)) {
    return NextResponse.json(
      { error: { code: "UNAVAILABLE", message: DATABASE_UNAVAILABLE_MESSAGE } },
      { status: 503, headers: { "retry-after": "30" } },
    );
  }
  const reference = randomUUID().slice(0, 8);
  console.error(`[api ${reference}]`, error);
  return NextResponse.json({ error: { code: "INTERNAL", message: `Unexpected error (reference ${reference}).` } }, { status: 500 });
}

const MAX_JSON_BYTES = 64 * 1024;

/**
 * The request body's bytes, refused with 413 once it passes `maxBytes`: a declared length is checked
 * before reading, and an undeclared (chunked) one is counted while it streams, so an oversize body is
 * never held in memory whole.
 */
export async function readBodyBounded(request: Request, maxBytes: number): Promise<Uint8Array> {
  const tooLarge = () => new AppError("TOO_LARGE", `The request body is larger than ${Math.round(maxBytes / 1024)} KiB.`);
  const declared = request.headers.get("content-length");
  if (declared !== null && !(Number(declared) <= maxBytes)) throw tooLarge();
  const bytes = await readBounded(request.body, maxBytes);
  if (bytes === null) throw tooLarge();
  return bytes;
}

/** Reads a JSON body, refusing oversize (413), malformed (400) and unstorable (422) ones with a readable message. */
export async function readJson(request: Request): Promise<unknown> {
  const bytes = await readBodyBounded(request, MAX_JSON_BYTES);
  let value: unknown;
  try {
    value = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    throw new AppError("MALFORMED", "The request body is not valid JSON (UTF-8).");
  }
  const unstorable = findUnstorableInput(value);
  if (unstorable) throw new AppError("INVALID_INPUT", "The request has invalid fields.", { [unstorable.path]: [unstorable.message] });
  return value;
}

/** The viewer behind a request: an API token sent as `Authorization: Bearer …`, else the session. */
async function requestViewer(request: NextRequest): Promise<{ viewer: Viewer | null; byToken: boolean }> {
  const header = request.headers.get("authorization");
  if (header === null) return { viewer: await getViewer(), byToken: false };
  const token = /^Bearer +(\S+) *$/i.exec(header)?.[1];
  if (!token) throw new AppError("UNAUTHORIZED", "Send the API token as: Authorization: Bearer <token>.");
  const viewer = await getViewerByApiToken(token);
  if (!viewer) throw new AppError("UNAUTHORIZED", "The API token is not valid or has been revoked.");
  return { viewer, byToken: true };
}

/** What a write route reads from its body, which fixes the Content-Type a browser must send. */
export type BodyKind = "json" | "multipart" | "none";
const BODY_TYPES: Record<Exclude<BodyKind, "none">, string> = { json: "application/json", multipart: "multipart/form-data" };
const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * A write carried by the session cookie must come from this app's own pages: a same-origin Origin
 * (403 otherwise) and the Content-Type the route reads (415 otherwise). A plain HTML form on another
 * site, even a same-site one, can send neither. Calls with an API token carry no cookie to ride on.
 */
function assertBrowserWrite(request: NextRequest, body: BodyKind) {
  if (!isSameOrigin(request.headers.get("origin"), { appUrl: env().APP_URL, host: request.headers.get("host") })) {
    throw new AppError("FORBIDDEN", "This request came from another site and was refused.");
  }
  if (body === "none") return;
  const type = (request.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
  if (type !== BODY_TYPES[body]) throw new AppError("UNSUPPORTED_TYPE", `Send the body as ${BODY_TYPES[body]}.`);
}

type Handler<P> = (request: NextRequest, context: { viewer: Viewer; params: P }) => Promise<Response>;

/**
 * Wraps a route handler: signed-in viewer or API token with the permission, params resolved, errors
 * mapped. Writes by a session are checked for their origin and body type first (see assertBrowserWrite).
 */
export function withAuth<P = Record<string, never>>(
  handler: Handler<P>,
  { permission, body = "json" }: { permission: Permission; body?: BodyKind },
) {
  return async (request: NextRequest, context: { params: Promise<P> }) => {
    try {
      const { viewer, byToken } = await requestViewer(request);
      if (!viewer) throw new AppError("UNAUTHORIZED", "Sign in first, or send an API token.");
      if (!byToken && !SAFE_METHODS.has(request.method)) assertBrowserWrite(request, body);
      if (!can(viewer, permission))
        throw new AppError(
          "FORBIDDEN",
          viewer.apiTokenId ? "API tokens may only read projects and review designs." : "Your role does not allow this.",
        );
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
export function attachmentHeaders({
  fileName,
  contentType,
  length,
}: {
  fileName: string;
  contentType: string;
  length: number;
}): Record<string, string> {
  const ascii = fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return {
    "content-type": contentType,
    "content-length": String(length),
    "content-disposition": `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`,
    "x-content-type-options": "nosniff",
    "cache-control": "private, no-store",
  };
}

/**
 * Headers for a thumbnail the app made from an uploaded picture: always a JPEG it encoded itself, shown
 * inline in the app's own pages, kept only in the viewer's browser (a file's id never changes content).
 */
export function thumbnailHeaders(length: number): Record<string, string> {
  return {
    "content-type": "image/jpeg",
    "content-length": String(length),
    "content-disposition": "inline",
    "x-content-type-options": "nosniff",
    "cache-control": "private, max-age=86400",
    "cross-origin-resource-policy": "same-origin",
  };
}
