import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.dirname(fileURLToPath(import.meta.url));

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its dialect with a dynamic require that bundlers cannot follow; pdf-parse loads pdf.js and a native canvas.
  serverExternalPackages: ["sequelize", "pg", "pg-hstore", "pg-boss", "pdf-parse"],
  // A lockfile in a parent folder would otherwise make Turbopack guess the workspace root.
  turbopack: { root },
  // A second build folder lets a second test run build beside the first (see OHMSTEAD_PORT_OFFSET).
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // Headers on every answer; pages also get a Content-Security-Policy with a per-request nonce from proxy.ts.
  async headers() {
    const everywhere = [
      { key: "X-Content-Type-Options", value: "nosniff" },
      { key: "Referrer-Policy", value: "same-origin" },
      { key: "X-Frame-Options", value: "DENY" },
      { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
    ];
    return [
      { source: "/:path*", headers: everywhere },
      // JSON and files are never documents to run: nothing in them may load or be framed.
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'" }] },
      // The field record scans barcodes and takes photos with the phone's camera; nowhere else may use it.
      {
        source: "/projects/:projectId/field",
        headers: [{ key: "Permissions-Policy", value: "camera=(self), microphone=(), geolocation=(), payment=(), usb=()" }],
      },
      // Inspector links, calendar feeds and signing links are private by their token: keep them out of search indexes and out of Referer headers.
      ...["/share/:path*", "/calendar/:path*", "/sign/:path*"].map((source) => ({
        source,
        headers: [
          { key: "X-Robots-Tag", value: "noindex, nofollow" },
          { key: "Referrer-Policy", value: "no-referrer" },
        ],
      })),
    ];
  },
  typedRoutes: false,
};

export default nextConfig;
