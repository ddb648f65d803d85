import { NextResponse, type NextRequest } from "next/server";

const SESSION_COOKIES = ["next-auth.session-token", "__Secure-next-auth.session-token"];

// Convenience only: sends visitors without a session cookie to sign-in.
// Every page, action and route handler checks the session itself.
export function proxy(request: NextRequest) {
  const hasSession = SESSION_COOKIES.some((name) => request.cookies.has(name));
  if (hasSession) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?callbackUrl=${encodeURIComponent(request.nextUrl.pathname + request.nextUrl.search)}`;
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/dashboard/:path*", "/projects/:path*", "/settings/:path*"],
};
