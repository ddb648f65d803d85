import { spawnSync } from "node:child_process";
import { chmodSync, copyFileSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, expect, test } from "vitest";

// Without root, the bootstrap cannot install Debian packages: it must stop and print the one line to run.
// Run as the unprivileged `nobody` account (possible only when the tests themselves run as root).
const asRoot = typeof process.getuid === "function" && process.getuid() === 0;
const folder = mkdtempSync(path.join(tmpdir(), "ohmstead-bootstrap-"));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

test.skipIf(!asRoot)("a user without root is told which apt-get line to run, and nothing is installed", () => {
  chmodSync(folder, 0o755);
  const copy = path.join(folder, "bootstrap.mjs");
  copyFileSync(path.resolve("scripts/bootstrap.mjs"), copy);
  chmodSync(copy, 0o644);
  const script = `import { aptInstall } from ${JSON.stringify(copy)}; aptInstall(["postgresql"], "PostgreSQL's server (initdb, pg_ctl) is not installed.");`;
  const result = spawnSync("runuser", ["-u", "nobody", "--", process.execPath, "--input-type=module", "-e", script], {
    encoding: "utf8",
    cwd: folder,
  });
  expect(result.status).toBe(1);
  expect(result.stderr).toContain("PostgreSQL's server (initdb, pg_ctl) is not installed.");
  expect(result.stderr).toContain("sudo apt-get update && sudo apt-get install -y postgresql");
  expect(result.stdout).not.toContain("Installing Debian packages");
});
