// First steps of `npm start`, `npm run dev` and `npm test`. They run before
// node_modules exists, so this file uses Node's built-ins only.
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { spawnSync } from "node:child_process";

export const isRoot = typeof process.getuid === "function" && process.getuid() === 0;

export function fail(message) {
  console.error(`\n✖ ${message}\n`);
  process.exit(1);
}

export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: "inherit", ...options });
  if (result.error) fail(`${command} could not run: ${result.error.message}`);
  if (result.status !== 0) fail(`${[command, ...args].join(" ")} exited with ${result.status}.`);
  return result;
}

/** Installs npm packages from the lock when node_modules is missing or older than the lock. */
export function ensureNodeModules(root) {
  const lock = path.join(root, "package-lock.json");
  const stamp = path.join(root, "node_modules", ".ohmstead-lock.sha256");
  const want = createHash("sha256").update(readFileSync(lock)).digest("hex");
  const have = existsSync(stamp) ? readFileSync(stamp, "utf8").trim() : "";
  if (have === want) return;
  console.log("• Installing npm packages from package-lock.json …");
  run("npm", ["ci", "--no-audit", "--no-fund", "--loglevel=error"], { cwd: root });
  writeFileSync(stamp, want + "\n");
}

export function aptInstall(packages, why) {
  if (!isRoot) {
    fail(
      `${why}\n  Install it once with:\n\n    sudo apt-get update && sudo apt-get install -y ${packages.join(" ")}\n\n  then run the command again.`,
    );
  }
  console.log(`• Installing Debian packages: ${packages.join(", ")} …`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  run("apt-get", ["update", "-qq"], { env });
  run("apt-get", ["install", "-y", "-qq", "--no-install-recommends", ...packages], { env });
}

/** Returns the folder of PostgreSQL's server binaries, installing Debian's package when absent. */
export function ensurePostgresBinaries() {
  const find = () => {
    const base = "/usr/lib/postgresql";
    if (!existsSync(base)) return null;
    const versions = readdirSync(base)
      .filter((v) => existsSync(path.join(base, v, "bin", "initdb")))
      .sort((a, b) => Number(b) - Number(a));
    return versions.length ? path.join(base, versions[0], "bin") : null;
  };
  let bin = find();
  if (!bin) {
    aptInstall(["postgresql"], "PostgreSQL's server (initdb, pg_ctl) is not installed.");
    bin = find();
    if (!bin) fail("PostgreSQL was installed but its server binaries were not found under /usr/lib/postgresql.");
  }
  return bin;
}

/** Debian's Chromium for the end-to-end tests and poppler's pdftoppm for PDF pictures. */
export function ensureTestTools() {
  const missing = [];
  if (!existsSync("/usr/bin/chromium")) missing.push("chromium");
  if (!existsSync("/usr/bin/pdftoppm")) missing.push("poppler-utils");
  if (missing.length) aptInstall(missing, `The tests need ${missing.join(" and ")}.`);
}
