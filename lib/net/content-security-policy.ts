/**
 * The Content-Security-Policy of every page: scripts only from this app and only those carrying the
 * request's nonce (Next.js puts it on its own scripts; `strict-dynamic` lets them load their chunks),
 * no plugins, no framing by other sites, forms posting only here. Styles allow inline attributes
 * because components set widths and fonts with `style`; no script can be injected through them.
 * `unsafe-eval` is for the development server's hot reload only.
 */
export function contentSecurityPolicy({ nonce, dev }: { nonce: string; dev: boolean }): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    `connect-src 'self'${dev ? " ws: wss:" : ""}`,
    "media-src 'self' blob:",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}
