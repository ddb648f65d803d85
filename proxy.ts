import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy } from "@/lib/net/content-security-policy";
import { actionBodyProblem } from "@/lib/net/action-body";
import { readBounded } from "@/lib/net/read-bounded";
import { isSameOrigin } from "@/lib/net/same-origin";
import { env } from "@/lib/server/env";

const SESSION_COOKIES = ["next-auth.session-token", "__Secure-next-auth.session-token"];
const SIGNED_IN_AREAS = ["/dashboard", "/projects", "/reports", "/settings", "/mailbox", "/profile"];
/** The framework's own limit on a server action's body (next.config serverActions.bodySizeLimit, default 1 MB). */
const ACTION_BODY_LIMIT_BYTES = 1024 * 1024;

const plain = (status: number, message: string) =>
  new NextResponse(message, { status, headers: { "content-type": "text/plain; charset=utf-8", "x-content-type-options": "nosniff" } });

/** A path with a broken percent-escape cannot be routed; say so instead of failing inside the router. */
function hasBrokenEscape(pathname: string): boolean {
  try {
    decodeURIComponent(pathname);
    return false;
  } catch {
    return true;
  }
}

/**
 * Server actions are public POST endpoints that the framework parses before any of our code runs; a
 * foreign origin, an oversize body or a body that is not what the client library sends would end
 * there as a 500. They are answered here with 403, 413, 415 and 400 instead (lib/net/action-body.ts).
 */
async function screenAction(request: NextRequest): Promise<NextResponse | null> {
  const appUrl = env().APP_URL;
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  if (!isSameOrigin(request.headers.get("origin"), { appUrl, host }))
    return plain(403, "This request came from another site and was refused.");
  const declared = request.headers.get("content-length");
  if (declared !== null && !(Number(declared) <= ACTION_BODY_LIMIT_BYTES)) return plain(413, "The request is larger than 1 MB.");
  // The client library sends plain arguments as JSON in text/plain; multipart replies carry files and
  // streams, which no Ohmstead action takes.
  const type = (request.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
  if (type !== "text/plain") return plain(415, "Send the form as the page does.");
  // A copy of the body: the framework still reads the request's own.
  const bytes = await readBounded(request.clone().body, ACTION_BODY_LIMIT_BYTES);
  if (bytes === null) return plain(413, "The request is larger than 1 MB.");
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return plain(400, "The request body is not UTF-8 text.");
  }
  const problem = actionBodyProblem(text);
  if (problem) return plain(400, problem);
  return null;
}

/**
 * Runs before every page, action and API route: refuses what the framework would fail on, sends
 * visitors without a session cookie to sign-in (convenience only: every page, action and route
 * handler checks the session itself), and gives each page its Content-Security-Policy nonce.
 */
export async function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  if (hasBrokenEscape(pathname)) return plain(400, "The address has a broken percent-escape (%).");
  if (pathname.startsWith("/api/")) return NextResponse.next();
  if (request.method === "POST" && request.headers.has("next-action")) {
    const refusal = await screenAction(request);
    if (refusal) return refusal;
  }
  const hasSession = SESSION_COOKIES.some((name) => request.cookies.has(name));
  if (!hasSession && SIGNED_IN_AREAS.some((area) => pathname === area || pathname.startsWith(`${area}/`))) {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = `?callbackUrl=${encodeURIComponent(pathname + search)}`;
    return NextResponse.redirect(url);
  }
  const nonce = Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString("base64");
  const policy = contentSecurityPolicy({ nonce, dev: process.env.NODE_ENV === "development" });
  const headers = new Headers(request.headers);
  // Next.js reads the policy from the request to put the nonce on the scripts it writes.
  headers.set("content-security-policy", policy);
  headers.set("x-nonce", nonce);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", policy);
  return response;
}

export const config = {
  // Everything but built assets and icons.
  matcher: ["/((?!_next/static|_next/image|favicon\\.ico|icon|apple-icon|fonts/).*)"],
};
