import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.dirname(fileURLToPath(import.meta.url));

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its dialect with a dynamic require that bundlers cannot follow.
  serverExternalPackages: ["sequelize", "pg", "pg-hstore"],
  // A lockfile in a parent folder would otherwise make Turbopack guess the workspace root.
  turbopack: { root },
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
