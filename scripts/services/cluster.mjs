// Several app servers and background workers against one database, one storage and one mail catcher,
// as production runs them behind a load balancer: used by the system tests (tests/system) and by
// `npm run bench:load`. Every part is a real process; the database and storage can be stopped and
// started under them.
import { openSync, readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { ensurePostgresBinaries } from "../bootstrap.mjs";
import { buildIfNeeded, migrateAndSeed, serveApp, startWorker, waitForApp } from "../app-process.mjs";
import { recreateDatabase } from "./postgres.mjs";
import { startStack } from "./stack.mjs";

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

async function waitFor(ready, what, timeoutMs = 120_000) {
  const deadline = Date.now() + timeoutMs;
  while (!ready()) {
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}.`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

/**
 * Starts a fresh system profile: services, a freshly migrated and seeded database, `apps` app servers
 * on consecutive ports and `workers` workers. `build` runs `next build` when the sources changed
 * (tests leave it to `npm test`, which has built already). Returns their addresses and stoppers.
 */
export async function startCluster({ apps = 2, workers = 2, build = false, quiet = true } = {}) {
  const postgresBin = ensurePostgresBinaries();
  const stack = await startStack({ root: ROOT, profile: "system", postgresBin, fresh: true });
  const processes = [];
  const stopProcesses = async () => {
    for (const p of processes.splice(0).reverse()) await p.stop();
  };
  try {
    await recreateDatabase(stack.ports.postgres, stack.ports.database);
    await migrateAndSeed(ROOT, stack.env);
    if (build) await buildIfNeeded(ROOT, stack.env);
    // Each process writes to its own log in the profile's folder (or to this terminal).
    const stdio = (name) =>
      quiet
        ? ["ignore", openSync(path.join(stack.dataRoot, `${name}.log`), "w"), openSync(path.join(stack.dataRoot, `${name}.log`), "a")]
        : "inherit";
    const workerLogs = [];
    for (let i = 0; i < workers; i++) {
      processes.push(startWorker(ROOT, stack.env, { stdio: stdio(`worker-${i + 1}`) }));
      workerLogs.push(path.join(stack.dataRoot, `worker-${i + 1}.log`));
    }
    const urls = [];
    for (let i = 0; i < apps; i++) {
      const port = stack.ports.app + i;
      const app = serveApp(ROOT, stack.env, { dev: false, port, stdio: stdio(`app-${i + 1}`) });
      processes.push(app);
      urls.push(`http://127.0.0.1:${port}`);
      await waitForApp(urls[i], app.child);
    }
    // Faults are injected only once every worker is taking jobs.
    if (quiet)
      await waitFor(
        () => workerLogs.every((file) => readFileSync(file, "utf8").includes("Packet worker is taking jobs")),
        "the workers to take jobs",
      );
    return {
      urls,
      env: stack.env,
      services: stack.services,
      stop: async () => {
        await stopProcesses();
        await stack.stop();
      },
    };
  } catch (error) {
    await stopProcesses();
    await stack.stop();
    throw error;
  }
}
