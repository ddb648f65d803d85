// Migrating, seeding, building and serving the app as child processes.
import { spawn } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { fail } from "./bootstrap.mjs";

const bin = (root, name) => path.join(root, "node_modules", ".bin", name);

/**
 * Runs a child to completion without blocking this process, which also
 * serves the storage and mail fakes the child may need.
 */
export async function runStep(root, label, command, args, env) {
  const child = spawn(command, args, { cwd: root, stdio: "inherit", env: { ...process.env, ...env } });
  const [code, signal] = await new Promise((resolve) => child.on("exit", (c, s) => resolve([c, s])));
  if (code !== 0) fail(`${label} failed (exit ${code ?? signal}).`);
}

export async function migrateAndSeed(root, env, { seed = true } = {}) {
  await runStep(root, "Migrations", bin(root, "tsx"), ["scripts/migrate.ts", "up"], env);
  if (seed) await runStep(root, "Demo seed", bin(root, "tsx"), ["--import", "./scripts/server-only-hook.mjs", "scripts/seed.ts"], env);
}

const SOURCE_DIRS = ["app", "components", "lib", "models", "templates", "public"];
const SOURCE_FILES = [
  "package-lock.json",
  "next.config.mjs",
  "tailwind.config.ts",
  "postcss.config.mjs",
  "tsconfig.json",
  "proxy.ts",
  "instrumentation.ts",
];

function sourceHash(root) {
  const hash = createHash("sha256");
  const visit = (rel) => {
    const full = path.join(root, rel);
    if (!existsSync(full)) return;
    if (statSync(full).isDirectory()) {
      for (const name of readdirSync(full).sort()) visit(path.join(rel, name));
    } else {
      hash.update(rel).update(readFileSync(full));
    }
  };
  [...SOURCE_DIRS, ...SOURCE_FILES].forEach(visit);
  return hash.digest("hex");
}

/** Runs `next build` only when the sources changed since the last build. */
export async function buildIfNeeded(root, env) {
  const distDir = path.join(root, process.env.NEXT_DIST_DIR || ".next");
  const stamp = path.join(distDir, "ohmstead-source.sha256");
  const want = sourceHash(root);
  if (existsSync(stamp) && readFileSync(stamp, "utf8").trim() === want && existsSync(path.join(distDir, "BUILD_ID"))) {
    console.log("• Build is up to date.");
    return;
  }
  console.log("• Building the app (next build) …");
  await runStep(root, "next build", bin(root, "next"), ["build"], env);
  writeFileSync(stamp, want + "\n");
}

// The built server's old generation is capped: left alone, V8 sizes it from the machine's memory and
// lets garbage pile up to several hundred MB under load before collecting, though a request's live data
// is small. Under the API bench at this cap the server's resident memory stays near 250 MB at the same
// requests per second (DEVELOPERS.md, Benchmarks).
const PRODUCTION_HEAP = ["--max-old-space-size=256"];

/**
 * Starts the app through scripts/serve.mjs (built, or with hot reload) in its own process group so it can be stopped whole.
 * `nodeArgs` go to Node itself (such as --cpu-prof, which NODE_OPTIONS refuses).
 */
export function serveApp(root, env, { dev, port, stdio = "inherit", nodeArgs = [] }) {
  const args = [
    ...(dev ? [] : PRODUCTION_HEAP),
    ...nodeArgs,
    "scripts/serve.mjs",
    "--host",
    "127.0.0.1",
    "--port",
    String(port),
    ...(dev ? ["--dev"] : []),
  ];
  return spawnGroup(root, process.execPath, args, { ...env, ...(dev ? { NODE_ENV: "development" } : {}) }, stdio);
}

/** Starts the background worker that generates packets. */
export function startWorker(root, env, { stdio = "inherit" } = {}) {
  return spawnGroup(root, bin(root, "tsx"), ["--import", "./scripts/server-only-hook.mjs", "scripts/worker.ts"], env, stdio);
}

function spawnGroup(root, command, args, env, stdio = "inherit") {
  const child = spawn(command, args, { cwd: root, env: { ...process.env, ...env }, stdio, detached: true });
  const stop = () =>
    new Promise((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve();
      // Held (not unref'd) until the group exits: a caller that ends right after stop() must not leave a server
      // behind that is still waiting for its keep-alive connections to close.
      const kill = setTimeout(() => {
        try {
          process.kill(-child.pid, "SIGKILL");
        } catch {}
      }, 5000);
      child.once("exit", () => {
        clearTimeout(kill);
        resolve();
      });
      try {
        process.kill(-child.pid, "SIGTERM");
      } catch {
        clearTimeout(kill);
        resolve();
      }
    });
  return { child, stop };
}

/** Waits until the app answers on its health route (any HTTP answer counts as started). */
export async function waitForApp(url, child, timeoutMs = 120_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) fail("The app exited while starting.");
    try {
      await fetch(`${url}/api/health`);
      return;
    } catch {
      await new Promise((r) => setTimeout(r, 300));
    }
  }
  fail(`The app did not answer at ${url} within ${timeoutMs / 1000} s.`);
}
