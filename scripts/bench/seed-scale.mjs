// `npm run seed:scale [-- --projects 10000]`: the scale profile's own database (its data in
// .data/scale/, never the dev or test one) made afresh with the demo scenario, then its first company
// grown to the given number of projects by copying the demo projects with everything hanging off them
// (scripts/bench/scale-fill.ts). The benchmarks run against it.
import path from "node:path";
import { fileURLToPath } from "node:url";
import { ensureNodeModules, ensurePostgresBinaries } from "../bootstrap.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const args = process.argv.slice(2);
const at = args.indexOf("--projects");
const projects = at >= 0 ? Number(args[at + 1]) : 10_000;
if (!Number.isInteger(projects) || projects < 1 || projects > 1_000_000) {
  console.error("--projects takes a whole number between 1 and 1,000,000.");
  process.exit(1);
}

ensureNodeModules(root);
const postgresBin = ensurePostgresBinaries();
const { startStack } = await import("../services/stack.mjs");
const { recreateDatabase } = await import("../services/postgres.mjs");
const { migrateAndSeed, runStep } = await import("../app-process.mjs");

const started = Date.now();
const stack = await startStack({ root, profile: "scale", postgresBin, fresh: true });
try {
  await recreateDatabase(stack.ports.postgres, stack.ports.database);
  await migrateAndSeed(root, stack.env);
  await runStep(
    root,
    "Scale fill",
    path.join(root, "node_modules", ".bin", "tsx"),
    ["scripts/bench/scale-fill.ts", "--projects", String(projects)],
    stack.env,
  );
  console.log(`• Scale profile ready in ${((Date.now() - started) / 1000).toFixed(1)} s: ${stack.env.DATABASE_URL}`);
} finally {
  await stack.stop();
}
