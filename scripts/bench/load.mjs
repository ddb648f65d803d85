// `npm run bench:load [-- --seconds 60 --connections 50]`: two app servers and two workers on the
// system profile (built first when the sources changed), then autocannon drives the projects list and
// the design-review API through both servers at once, half the connections each. Prints figures; it
// asserts nothing (timings are not tests).
import autocannon from "autocannon";
import { startCluster } from "../services/cluster.mjs";

const args = process.argv.slice(2);
const option = (name, fallback) => {
  const i = args.indexOf(name);
  return i >= 0 ? Number(args[i + 1]) : fallback;
};
const seconds = option("--seconds", 60);
const connections = option("--connections", 50);

function run(opts) {
  return new Promise((resolve, reject) => {
    const instance = autocannon(opts, (error, result) => (error ? reject(error) : resolve(result)));
    autocannon.track(instance, { renderProgressBar: false, renderResultsTable: false, renderLatencyTable: false });
  });
}

/** Signs in as the demo coordinator on one server and returns its session cookie. */
async function sessionCookie(base) {
  const jar = new Map();
  const keep = (res) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const at = pair.indexOf("=");
      jar.set(pair.slice(0, at), pair.slice(at + 1));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrf = await fetch(`${base}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = await csrf.json();
  const form = new URLSearchParams({ csrfToken, email: "dana@quillmoor.example", password: "ohmstead-demo", json: "true" });
  keep(
    await fetch(`${base}/api/auth/callback/credentials`, {
      method: "POST",
      body: form,
      headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookie() },
      redirect: "manual",
    }),
  );
  return cookie();
}

const cluster = await startCluster({ apps: 2, workers: 2, build: true });
try {
  const cookies = await Promise.all(cluster.urls.map(sessionCookie));
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
