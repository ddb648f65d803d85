// `npm start` (and `npm run dev` with --dev): install what is missing, start
// the local services, migrate, seed the demo scenario, build and serve.
// Ctrl-C stops everything this script started; the data stays in .data/dev.
import path from "node:path";
import { fileURLToPath } from "node:url";
import { ensureNodeModules, ensurePostgresBinaries } from "./bootstrap.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const dev = process.argv.includes("--dev");

ensureNodeModules(root);
const postgresBin = ensurePostgresBinaries();

const { startStack } = await import("./services/stack.mjs");
const { migrateAndSeed, buildIfNeeded, serveApp, startWorker, waitForApp } = await import("./app-process.mjs");
const { DEMO_SIGN_INS } = await import("../lib/seed/demo-sign-ins.mjs");

const stack = await startStack({ root, profile: "dev", postgresBin });
let app;
let worker;
let stopping = false;
const shutdown = async (code = 0) => {
  if (stopping) return;
  stopping = true;
  console.log("\n• Stopping …");
  await app?.stop();
  await worker?.stop();
  await stack.stop();
  process.exit(code);
};
for (const signal of ["SIGINT", "SIGTERM", "SIGHUP"]) process.on(signal, () => shutdown(0));

try {
  await migrateAndSeed(root, stack.env);
  if (!dev) await buildIfNeeded(root, stack.env);
  worker = startWorker(root, stack.env);
  app = serveApp(root, stack.env, { dev, port: stack.ports.app });
  app.child.on("exit", (code) => {
    if (!stopping) shutdown(code ?? 1);
  });
  await waitForApp(stack.env.APP_URL, app.child);
} catch (error) {
  console.error(error);
  await shutdown(1);
}

const p = stack.ports;
console.log(`
Ohmstead is running${dev ? " (development)" : ""}: ${stack.env.APP_URL}

Demo sign-ins (password for all: ${DEMO_SIGN_INS.password}):
${DEMO_SIGN_INS.users.map((u) => `  ${u.role.padEnd(12)} ${u.email}`).join("\n")}

Local services (127.0.0.1):
  PostgreSQL     ${p.postgres}  database ${p.database}, data in .data/dev/postgres
  S3 storage     ${p.storage}   bucket ohmstead-files, data in .data/dev/storage
  SMTP catcher   ${p.smtp}   caught mail at ${stack.env.APP_URL}/mailbox
Press Ctrl-C to stop.
`);
