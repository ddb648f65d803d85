import "server-only";
import { CLIENT_ADDRESS_HEADER } from "@/lib/net/client-address.mjs";

type HeaderSource = Headers | Record<string, unknown> | undefined;

/**
 * The address a request came from, as the serving script (scripts/serve.mjs) stamped it from the
 * connection and TRUSTED_PROXY_HOPS. X-Forwarded-For is never read here: a client can write it.
 */
export function clientAddress(headers: HeaderSource): string {
  const value = headers instanceof Headers ? headers.get(CLIENT_ADDRESS_HEADER) : headers?.[CLIENT_ADDRESS_HEADER];
  return typeof value === "string" && value ? value : "unknown";
}
