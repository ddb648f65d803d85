// The production build served on the scale profile's services, for the benchmarks.
import { ensureNodeModules, ensurePostgresBinaries } from "../bootstrap.mjs";

/**
 * Starts the scale profile's services, brings its database up to the current migrations (a profile
 * seeded before a new migration would otherwise stop the bench on a missing column) and serves the
 * app on them, building it when the sources changed; `stop` ends both.
 */
export async function startScaleApp(root, { nodeArgs = [] } = {}) {
  ensureNodeModules(root);
  const { startStack } = await import("../services/stack.mjs");
  const { buildIfNeeded, migrateAndSeed, serveApp, waitForApp } = await import("../app-process.mjs");
  const stack = await startStack({ root, profile: "scale", postgresBin: ensurePostgresBinaries() });
  try {
    await migrateAndSeed(root, stack.env, { seed: false });
    await buildIfNeeded(root, stack.env);
    const server = serveApp(root, stack.env, { dev: false, port: stack.ports.app, stdio: ["ignore", "ignore", "inherit"], nodeArgs });
    await waitForApp(stack.env.APP_URL, server.child);
    return {
      url: stack.env.APP_URL,
      pid: server.child.pid,
      stop: async () => {
        await server.stop();
        await stack.stop();
      },
    };
  } catch (error) {
    await stack.stop();
    throw error;
  }
}
