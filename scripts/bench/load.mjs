// `npm run bench:load [-- --seconds 60 --connections 50]`: two app servers and two workers on the
// system profile (built first when the sources changed), then autocannon drives the projects list and
// the design-review API through both servers at once, half the connections each. Prints figures; it
// asserts nothing (timings are not tests).
import autocannon from "autocannon";
import { startCluster } from "../services/cluster.mjs";
import { load, sessionCookie } from "./session.mjs";

const args = process.argv.slice(2);
const option = (name, fallback) => {
  const i = args.indexOf(name);
  return i >= 0 ? Number(args[i + 1]) : fallback;
};
const seconds = option("--seconds", 60);
const connections = option("--connections", 50);

const run = (options) => load(autocannon, options);

const cluster = await startCluster({ apps: 2, workers: 2, build: true });
try {
  const cookies = await Promise.all(cluster.urls.map((url) => sessionCookie(url)));
  const { items } = await (
    await fetch(`${cluster.urls[0]}/api/v1/projects?stage=permit_filed&pageSize=1`, { headers: { cookie: cookies[0] } })
  ).json();
  const document = await (
    await fetch(`${cluster.urls[0]}/api/v1/projects/${items[0].id}/design-document`, { headers: { cookie: cookies[0] } })
  ).json();
  const routes = [
    { name: "GET /api/v1/projects?page=1&pageSize=50", method: "GET", path: "/api/v1/projects?page=1&pageSize=50" },
    { name: "POST /api/v1/design-review", method: "POST", path: "/api/v1/design-review", body: JSON.stringify(document) },
  ];
  console.log(
    `\n${connections} connections for ${seconds} s per route, split over ${cluster.urls.length} app servers (${cluster.urls.join(", ")}), two workers running.\n`,
  );
  console.log("| route | req/s | p50 | p99 | errors | non-2xx |\n|---|---|---|---|---|---|");
  for (const route of routes) {
    const results = await Promise.all(
      cluster.urls.map((url, i) =>
        run({
          url: `${url}${route.path}`,
          method: route.method,
          body: route.body,
          connections: Math.max(1, Math.round(connections / cluster.urls.length)),
          duration: seconds,
          headers: { cookie: cookies[i], origin: url, "content-type": "application/json" },
        }),
      ),
    );
    const sum = (f) => results.reduce((total, r) => total + f(r), 0);
    const max = (f) => Math.max(...results.map(f));
    console.log(
      `| \`${route.name}\` | ${Math.round(sum((r) => r.requests.average))} | ${max((r) => r.latency.p50)} ms | ${max((r) => r.latency.p99)} ms | ${sum((r) => r.errors + r.timeouts)} | ${sum((r) => r.non2xx)} |`,
    );
  }
} finally {
  await cluster.stop();
}
