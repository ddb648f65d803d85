// `npm test`: typecheck, lint and format check; then the same bootstrap as `npm start` for separate test services,
// then every suite: unit, integration against a fresh PostgreSQL database,
// end-to-end in Debian's Chromium against a production build, and system
// (two app servers and two workers, database and storage faults).
// Exits non-zero on the first failing suite.
import path from "node:path";
import { spawn, spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { ensureNodeModules, ensurePostgresBinaries, ensureTestTools } from "./bootstrap.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const only = process.argv.slice(2); // e.g. `npm test -- unit e2e`
const wants = (suite) => only.length === 0 || only.includes(suite);

ensureNodeModules(root);
const postgresBin = ensurePostgresBinaries();
ensureTestTools();

// Typecheck, lint and format first: a broken boundary stops the run before any service starts.
if (wants("lint")) {
  console.log("\n━━ lint ━━");
  const lint = spawnSync("npm", ["run", "--silent", "lint"], { cwd: root, stdio: "inherit" });
  if (lint.status !== 0) {
    console.log("\nSuites:\n  ✖ lint\n\nsuites: 0 passed, 1 failed");
    process.exit(1);
  }
}

const { startStack } = await import("./services/stack.mjs");
const { recreateDatabase, databaseUrl } = await import("./services/postgres.mjs");
const { migrateAndSeed, buildIfNeeded, serveApp, startWorker, waitForApp } = await import("./app-process.mjs");

const bin = (name) => path.join(root, "node_modules", ".bin", name);
const results = [];
let app;
let worker;
const stack = await startStack({ root, profile: "test", postgresBin, fresh: true });

async function finish(code) {
  await app?.stop();
  await worker?.stop();
  await stack.stop();
  console.log("\nSuites:");
  for (const r of results) console.log(`  ${r.ok ? "✔" : "✖"} ${r.suite}`);
  const passed = results.filter((r) => r.ok).length;
  console.log(`\nsuites: ${passed} passed, ${results.length - passed} failed`);
  process.exit(code);
}
for (const signal of ["SIGINT", "SIGTERM", "SIGHUP"]) process.on(signal, () => finish(130));

/** Runs one suite without blocking this process, which also serves the storage and mail fakes. */
async function suite(name, command, args, env) {
  console.log(`\n━━ ${name} ━━`);
  const child = spawn(command, args, { cwd: root, stdio: "inherit", env: { ...process.env, ...stack.env, ...env } });
  const status = await new Promise((resolve) => child.on("exit", (code) => resolve(code)));
  const ok = status === 0;
  results.push({ suite: name, ok });
  return ok;
}

try {
  if (wants("unit") && !(await suite("unit", bin("vitest"), ["run", "--project", "unit"], { NODE_ENV: "test" }))) await finish(1);

  if (wants("integration")) {
    const database = "ohmstead_it";
    await recreateDatabase(stack.ports.postgres, database);
    const env = { NODE_ENV: "test", DATABASE_URL: databaseUrl(stack.ports.postgres, database) };
    await migrateAndSeed(root, env, { seed: false });
    if (!(await suite("integration", bin("vitest"), ["run", "--project", "integration"], env))) await finish(1);
  }

  if (wants("e2e")) {
    await recreateDatabase(stack.ports.postgres, stack.ports.database);
    await migrateAndSeed(root, stack.env);
    await buildIfNeeded(root, stack.env);
    worker = startWorker(root, stack.env);
    app = serveApp(root, stack.env, { dev: false, port: stack.ports.app });
    await waitForApp(stack.env.APP_URL, app.child);
    if (!(await suite("e2e", bin("playwright"), ["test"], { BASE_URL: stack.env.APP_URL, NODE_ENV: "test" }))) await finish(1);
    await app.stop();
    await worker.stop();
    app = worker = undefined;
  }

  if (wants("system")) {
    // Two app servers and two workers on their own services (the system profile), with faults injected.
    await buildIfNeeded(root, stack.env);
    if (!(await suite("system", bin("vitest"), ["run", "--project", "system"], { NODE_ENV: "test" }))) await finish(1);
  }
  await finish(0);
} catch (error) {
  console.error(error);
  await finish(1);
}
