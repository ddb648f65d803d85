// `npm run bench:api [-- --seconds 5 --url http://127.0.0.1:3300 --pid 1234 --cpu-prof]`: the API and
// the server-rendered pages under load on the scale profile (fill it first with `npm run seed:scale`).
// Starts the production build on that profile (building it when the sources changed) unless --url
// names a server already running. Each route is measured A/B/A/B against the floor, a trivial route
// of the same server (/api/auth/csrf), so a busy machine moves both alike: the ratio of req/s is the
// figure to compare between runs. Prints req/s, p50, p99, errors and the ratio for each route, and the
// server's peak RSS (of the server it started, or of --pid). --cpu-prof writes the started server's
// CPU profile into .data/profiles/ on exit. Asserts nothing: timings are not tests.
import autocannon from "autocannon";
import { execFileSync } from "node:child_process";
import { mkdirSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { startScaleApp } from "./scale-app.mjs";
import { load, sessionCookie } from "./session.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const args = process.argv.slice(2);
const option = (name, fallback) => {
  const i = args.indexOf(name);
  return i >= 0 ? args[i + 1] : fallback;
};
const seconds = Number(option("--seconds", "5"));
const only = option("--only", "");

/** The server's resident memory: every process of its process group, in MB. */
function rssMb(pid) {
  try {
    const out = execFileSync("ps", ["-eo", "pgid=,rss="], { encoding: "utf8" });
    return out
      .split("\n")
      .map((line) => line.trim().split(/\s+/).map(Number))
      .filter(([group]) => group === pid)
      .reduce((total, [, kb]) => total + kb / 1024, 0);
  } catch {
    return 0;
  }
}

let app = null;
let base = option("--url", "");
let pid = Number(option("--pid", "0"));
if (!base) {
  const profileDir = path.join(root, ".data", "profiles");
  if (args.includes("--cpu-prof")) mkdirSync(profileDir, { recursive: true });
  app = await startScaleApp(root, { nodeArgs: args.includes("--cpu-prof") ? ["--cpu-prof", `--cpu-prof-dir=${profileDir}`] : [] });
  base = app.url;
  pid = app.pid;
}

let peakRss = 0;
const sampler = pid ? setInterval(() => (peakRss = Math.max(peakRss, rssMb(pid))), 250) : null;

try {
  const cookie = await sessionCookie(base);
  const get = async (route) => {
    const res = await fetch(`${base}${route}`, { headers: { cookie } });
    if (!res.ok) throw new Error(`${route} answered ${res.status}`);
    return res.json();
  };
  const { items, total } = await get("/api/v1/projects?stage=permit_filed&pageSize=1");
  const project = items[0];
  const document = await get(`/api/v1/projects/${project.id}/design-document`);
  const { total: all } = await get("/api/v1/projects?pageSize=1");
  const list = "/api/v1/projects?pageSize=50";
  const routes = [
    { name: "list, first page", path: `${list}&page=1` },
    { name: "list, page 100", path: `${list}&page=100` },
    ...["number", "customerName", "city", "stage", "daysInStage", "waitingSince", "createdAt"].map((sort) => ({
      name: `list sorted by ${sort}`,
      path: `${list}&sort=${sort}&direction=asc`,
    })),
    { name: "list filtered by stage", path: `${list}&stage=permit_issued` },
    { name: "list searched by name", path: `${list}&q=${encodeURIComponent(project.customerName.split(" ").at(-1))}` },
    { name: "list searched by address", path: `${list}&q=${encodeURIComponent(project.street.split(" ").slice(1).join(" "))}` },
    { name: "list searched by account number", path: `${list}&q=${encodeURIComponent(project.utilityAccountNumber.slice(0, 7))}` },
    { name: "one project's JSON", path: `/api/v1/projects/${project.id}` },
    { name: "design review", path: "/api/v1/design-review", method: "POST", body: JSON.stringify(document) },
    { name: "project page (HTML)", path: `/projects/${project.id}`, connections: 10 },
    { name: "dashboard page (HTML)", path: "/dashboard", connections: 10 },
  ].filter((r) => !only || r.name.includes(only));

  const floor = { name: "floor", path: "/api/auth/csrf" };
  const hit = (route) =>
    load(autocannon, {
      url: `${base}${route.path}`,
      method: route.method ?? "GET",
      body: route.body,
      connections: route.connections ?? 20,
      duration: seconds,
      headers: { cookie, origin: base, "content-type": "application/json" },
    });
  // Warm up: the first requests compile routes and fill caches.
  for (const route of [floor, ...routes])
    await load(autocannon, {
      url: `${base}${route.path}`,
      amount: 40,
      connections: 4,
      method: route.method ?? "GET",
      body: route.body,
      headers: { cookie, origin: base, "content-type": "application/json" },
    });

  console.log(
    `\n${base}: ${all} projects visible to the coordinator (${total} filed for permit). ${seconds} s a run, A/B/A/B against the floor; ` +
      `20 connections (pages 10). Load average before: ${os
        .loadavg()
        .map((l) => l.toFixed(2))
        .join(" ")} on ${os.cpus().length} cores.\n`,
  );
  console.log("| route | conns | req/s | floor req/s | ratio | p50 | p99 | errors | non-2xx |\n|---|---|---|---|---|---|---|---|---|");
  for (const route of routes) {
    const runs = [];
    for (let round = 0; round < 2; round++) {
      const a = await hit({ ...floor, connections: route.connections });
      const b = await hit(route);
      runs.push({ a, b });
    }
    const mean = (f) => runs.reduce((t, r) => t + f(r), 0) / runs.length;
    const reqs = mean((r) => r.b.requests.average);
    const floorReqs = mean((r) => r.a.requests.average);
    const p50 = Math.max(...runs.map((r) => r.b.latency.p50));
    const p99 = Math.max(...runs.map((r) => r.b.latency.p99));
    const errors = runs.reduce((t, r) => t + r.b.errors + r.b.timeouts, 0);
    const non2xx = runs.reduce((t, r) => t + r.b.non2xx, 0);
    console.log(
      `| ${route.name} | ${route.connections ?? 20} | ${reqs.toFixed(0)} | ${floorReqs.toFixed(0)} | ${(reqs / floorReqs).toFixed(2)} | ${p50} ms | ${p99} ms | ${errors} | ${non2xx} |`,
    );
  }
  console.log(
    `\nServer peak RSS: ${pid ? `${peakRss.toFixed(0)} MB` : "not measured (pass --pid)"}. Load average after: ${os
      .loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")}.`,
  );
} finally {
  if (sampler) clearInterval(sampler);
  await app?.stop();
}
