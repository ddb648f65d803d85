/**
 * The path to return to after sign-in, only when it stays on this app: parsed with the URL parser
 * against the app's own origin (which, like browsers, reads "/\host" as "//host"), never by prefix.
 * Anything else, or a path that would itself read as another host, gives the fallback.
 */
export function sameOriginReturnPath(value: unknown, appOrigin: string, fallback = "/dashboard"): string {
  const given = Array.isArray(value) ? value[0] : value;
  if (typeof given !== "string" || given === "") return fallback;
  let url: URL;
  let origin: string;
  try {
    origin = new URL(appOrigin).origin;
    url = new URL(given, origin);
  } catch {
    return fallback;
  }
  if (url.origin !== origin) return fallback;
  const path = `${url.pathname}${url.search}${url.hash}`;
  // "/.//evil.example" parses to the path "//evil.example", which a browser would follow off-site.
  return path.startsWith("//") || path.startsWith("/\\") ? fallback : path;
}
