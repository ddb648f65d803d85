// Which address a request came from, decided once where the connection arrives.
// Plain JavaScript so that the serving script can use it before anything is compiled.

/** The header the serving script sets on every request; the app reads the client's address from it alone. */
export const CLIENT_ADDRESS_HEADER = "x-ohmstead-client-address";

/**
 * The number of reverse proxies in front of the app that append to X-Forwarded-For
 * (TRUSTED_PROXY_HOPS). Unset or empty means none: the app is reached directly.
 */
export function trustedProxyHops(value) {
  if (value === undefined || value === "") return 0;
  const hops = Number(value);
  if (!Number.isInteger(hops) || hops < 0 || hops > 10)
    throw new Error(`TRUSTED_PROXY_HOPS must be a whole number from 0 to 10, not "${value}"`);
  return hops;
}

/** "::ffff:10.0.0.1" → "10.0.0.1", so one client has one spelling. */
function normalize(address) {
  const trimmed = String(address ?? "").trim();
  return trimmed.startsWith("::ffff:") && trimmed.includes(".") ? trimmed.slice(7) : trimmed;
}

/**
 * The client's address. With no trusted proxy it is the socket's peer and any X-Forwarded-For the
 * client wrote is ignored. Behind `hops` proxies, each appends the address it received from, so the
 * client is the entry `hops` places from the right; entries further left were written by the client
 * and are never believed. Too few entries means a request that bypassed a proxy: the peer is used.
 */
export function clientAddressOf({ socketAddress, forwardedFor, hops }) {
  const peer = normalize(socketAddress) || "unknown";
  if (hops === 0) return peer;
  const header = Array.isArray(forwardedFor) ? forwardedFor.join(",") : (forwardedFor ?? "");
  const chain = header.split(",").map(normalize).filter(Boolean);
  // The nearest proxy is the peer itself; it appended the hop before it, and so on.
  const index = chain.length - hops;
  return index >= 0 ? chain[index] : peer;
}
