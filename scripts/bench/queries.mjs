// `npm run bench:queries`: the scale profile's services, then scripts/bench/queries.ts against its database.
import path from "node:path";
import { fileURLToPath } from "node:url";
import { ensureNodeModules, ensurePostgresBinaries } from "../bootstrap.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
ensureNodeModules(root);
const { startStack } = await import("../services/stack.mjs");
const { runStep } = await import("../app-process.mjs");
const stack = await startStack({ root, profile: "scale", postgresBin: ensurePostgresBinaries() });
try {
  const tsx = path.join(root, "node_modules", ".bin", "tsx");
  await runStep(
    root,
    "Query profile",
    tsx,
    ["--import", "./scripts/server-only-hook.mjs", "scripts/bench/queries.ts", ...process.argv.slice(2)],
    stack.env,
  );
} finally {
  await stack.stop();
}
