import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.dirname(fileURLToPath(import.meta.url));

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its dialect with a dynamic require that bundlers cannot follow.
  serverExternalPackages: ["sequelize", "pg", "pg-hstore", "pg-boss"],
  // A lockfile in a parent folder would otherwise make Turbopack guess the workspace root.
  turbopack: { root },
  // A second build folder lets a second test run build beside the first (see OHMSTEAD_PORT_OFFSET).
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // Inspector links are private by their token: keep every page under them out of search indexes.
  async headers() {
    return [{ source: "/share/:path*", headers: [{ key: "X-Robots-Tag", value: "noindex, nofollow" }] }];
  },
  typedRoutes: false,
};

export default nextConfig;
