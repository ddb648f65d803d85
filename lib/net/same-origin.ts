/**
 * Whether a browser's Origin header names this app: the configured origin, or the host the request
 * was addressed to (a browser cannot forge either on a cross-site request). A missing or "null"
 * Origin is not same-origin: every current browser sends one on POST, PUT and DELETE.
 */
export function isSameOrigin(origin: string | null, { appUrl, host }: { appUrl: string; host: string | null }): boolean {
  if (!origin || origin === "null") return false;
  let given: URL;
  try {
    given = new URL(origin);
  } catch {
    return false;
  }
  if (given.origin === new URL(appUrl).origin) return true;
  return host !== null && given.host === host.toLowerCase() && (given.protocol === "http:" || given.protocol === "https:");
}
