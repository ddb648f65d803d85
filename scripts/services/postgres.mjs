// A private PostgreSQL cluster in a git-ignored project folder, run from
// Debian's server binaries on loopback. initdb refuses root, so as root the
// cluster belongs to the `postgres` user.
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { chmodSync, chownSync, existsSync, mkdirSync } from "node:fs";
import path from "node:path";
import net from "node:net";
import pg from "pg";
import { isRoot, fail } from "../bootstrap.mjs";

function asOwner(command, args) {
  const full = isRoot ? ["runuser", ["-u", "postgres", "--", command, ...args]] : [command, args];
  // cwd "/" because the postgres user may not be allowed into the caller's folder.
  return spawnSync(full[0], full[1], { encoding: "utf8", cwd: "/" });
}

function postgresIds() {
  const out = spawnSync("id", ["-u", "postgres"], { encoding: "utf8" });
  const gid = spawnSync("id", ["-g", "postgres"], { encoding: "utf8" });
  if (out.status !== 0) fail("The `postgres` system user is missing; reinstall Debian's postgresql package.");
  return { uid: Number(out.stdout.trim()), gid: Number(gid.stdout.trim()) };
}

/**
 * Starts (creating on first use) the cluster in `dataDir` on 127.0.0.1:`port`.
 * Returns a stop function, or a no-op when the cluster was already running.
 */
/**
 * As root the cluster belongs to `postgres`, which must be able to reach its
 * folder. A checkout under a private home (such as /root) is out of its reach;
 * the cluster then lives in postgres's own home, in a folder named after the checkout.
 */
function reachableDataDir(dataDir) {
  if (!isRoot) return dataDir;
  mkdirSync(path.dirname(dataDir), { recursive: true });
  const probe = spawnSync("runuser", ["-u", "postgres", "--", "test", "-x", path.dirname(dataDir)]);
  if (probe.status === 0) return dataDir;
  const tag = createHash("sha256").update(dataDir).digest("hex").slice(0, 12);
  const fallback = path.join("/var/lib/postgresql/ohmstead", tag);
  console.log(`• The postgres user cannot reach ${path.dirname(dataDir)}; keeping this cluster in ${fallback}.`);
  return fallback;
}

export async function startPostgres({ bin, dataDir: wanted, port }) {
  const pgCtl = path.join(bin, "pg_ctl");
  const dataDir = reachableDataDir(wanted);
  if (!existsSync(path.join(dataDir, "PG_VERSION"))) {
    mkdirSync(dataDir, { recursive: true });
    if (isRoot) {
      const { uid, gid } = postgresIds();
      chownSync(dataDir, uid, gid);
    }
    chmodSync(dataDir, 0o700);
    const init = asOwner(path.join(bin, "initdb"), ["-D", dataDir, "-U", "app", "--auth=trust", "-E", "UTF8", "--locale=C.UTF-8"]);
    if (init.status !== 0) fail(`initdb failed:\n${init.stderr || init.stdout}`);
  }
  const status = asOwner(pgCtl, ["-D", dataDir, "status"]);
  if (status.status === 0) {
    return { port, dataDir, stop: async () => {}, startedHere: false };
  }
  if (await isPortTaken(port)) {
    fail(
      `Port ${port} on 127.0.0.1 is taken by another program (perhaps a PostgreSQL left running by an earlier run).\n  Find it with: ss -ltnp 'sport = :${port}'`,
    );
  }
  // JIT compiling pays off only for long analytical queries (PostgreSQL's manual, "Just-in-Time Compilation");
  // for the portal's short reads its compile time was most of the query (75 of 117 ms on the desk at 10,000 projects).
  const options = `-p ${port} -h 127.0.0.1 -k ${dataDir} -c jit=off`;
  const start = asOwner(pgCtl, ["-D", dataDir, "-l", path.join(dataDir, "server.log"), "-o", options, "-w", "start"]);
  if (start.status !== 0) {
    fail(`PostgreSQL did not start on 127.0.0.1:${port}:\n${start.stdout}${start.stderr}\nSee ${path.join(dataDir, "server.log")}.`);
  }
  return {
    port,
    dataDir,
    startedHere: true,
    stop: async () => {
      asOwner(pgCtl, ["-D", dataDir, "-m", "fast", "-w", "stop"]);
    },
  };
}

export function databaseUrl(port, database) {
  return `postgres://app@127.0.0.1:${port}/${database}`;
}

async function withAdmin(port, fn) {
  const client = new pg.Client({ connectionString: databaseUrl(port, "postgres") });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** Creates the database when it does not exist yet. */
export async function ensureDatabase(port, database) {
  await withAdmin(port, async (client) => {
    const found = await client.query("select 1 from pg_database where datname = $1", [database]);
    if (found.rowCount === 0) await client.query(`create database "${database}"`);
  });
}

/** Drops and creates the database: a fresh one for each test run. */
export async function recreateDatabase(port, database) {
  await withAdmin(port, async (client) => {
    await client.query(`drop database if exists "${database}" with (force)`);
    await client.query(`create database "${database}"`);
  });
}

function isPortTaken(port) {
  return new Promise((resolve) => {
    const socket = net.connect({ port, host: "127.0.0.1" });
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
  });
}
