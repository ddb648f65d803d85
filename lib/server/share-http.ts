import "server-only";
import { ERROR_STATUS, isAppError } from "@/lib/errors";
import { escapeHtml } from "@/templates/email/layout";
import { clientAddress } from "./client-address";
import type { ClientInfo } from "./data/share-links";

/** Who opened a share link, as the access log records it. */
export function clientOf(headers: Headers): ClientInfo {
  return { address: clientAddress(headers), userAgent: headers.get("user-agent") ?? "" };
}

// Inspector pages must never be indexed, whatever answers them.
export const NO_INDEX = { "x-robots-tag": "noindex, nofollow", "cache-control": "private, no-store" };

const TITLES: Partial<Record<number, string>> = { 404: "Link not found", 410: "Link no longer available", 429: "Too many attempts" };

/**
 * A plain page for a share link that cannot be opened. Route handlers answer with it because
 * App Router pages cannot set a 410 or 429 status themselves.
 */
export function shareErrorResponse(error: unknown): Response {
  if (!isAppError(error)) throw error;
  const status = ERROR_STATUS[error.code];
  const title = TITLES[status] ?? "Link not available";
  const html = `<!doctype html><html lang="en-US"><head><meta charset="utf-8"><meta name="robots" content="noindex, nofollow"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${title} · Ohmstead</title></head>
<body style="background:#f7f3ea;color:#1f1c17;font-family:Helvetica,Arial,sans-serif;margin:0;padding:64px 24px"><main style="max-width:520px;margin:auto">
<p style="font-weight:700;color:#8f4c1c;letter-spacing:.04em">OHMSTEAD</p><h1>${title}</h1><p>${escapeHtml(error.message)}</p></main></body></html>`;
  return new Response(html, { status, headers: { "content-type": "text/html; charset=utf-8", ...NO_INDEX } });
}
