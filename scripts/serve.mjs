// `npm run serve`: serves the built app (or `--dev` for hot reload) through Next.js's request handler,
// after stamping each request with the client's address taken from the connection itself
// (or from TRUSTED_PROXY_HOPS proxies), so a client cannot choose the address that throttles
// and access logs see. Usage: node scripts/serve.mjs [--dev] [--port 3000] [--host 127.0.0.1]
import { createServer } from "node:http";
import path from "node:path";
import { fileURLToPath } from "node:url";
import next from "next";
import { CLIENT_ADDRESS_HEADER, clientAddressOf, trustedProxyHops } from "../lib/net/client-address.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const args = process.argv.slice(2);
const option = (name, fallback) => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1] : fallback;
};
const dev = args.includes("--dev");
const port = Number(option("--port", process.env.PORT ?? "3000"));
const hostname = option("--host", process.env.HOST ?? "127.0.0.1");
let hops;
try {
  hops = trustedProxyHops(process.env.TRUSTED_PROXY_HOPS);
} catch (error) {
  console.error(error.message);
  process.exit(1);
}

// The app refuses to serve requests that did not come through here (see lib/server/client-address.ts).
process.env.OHMSTEAD_FRONT_DOOR = "1";
const app = next({ dev, dir: root, hostname, port, ...(dev ? { turbopack: true } : {}) });
const handle = app.getRequestHandler();
await app.prepare();

const server = createServer((req, res) => {
  const address = clientAddressOf({ socketAddress: req.socket.remoteAddress, forwardedFor: req.headers["x-forwarded-for"], hops });
  req.headers[CLIENT_ADDRESS_HEADER] = address;
  // Only the trusted part of the chain travels on, so nothing downstream mistakes the client's own entries for facts.
  if (hops === 0) req.headers["x-forwarded-for"] = address;
  handle(req, res);
});
server.listen(port, hostname, () => console.log(`• Serving on http://${hostname}:${port}${dev ? " (development)" : ""}`));
for (const signal of ["SIGINT", "SIGTERM"]) process.on(signal, () => server.close(() => process.exit(0)));
