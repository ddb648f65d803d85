// `npm run bench:web [-- --url http://127.0.0.1:3300 --only "dashboard" --details --js-only]`: Lighthouse (the npm package, on Debian's
// Chromium through chrome-launcher; CHROME_PATH overrides /usr/bin/chromium) on the sign-in page, the
// dashboard, a project page and its design editor at desktop size, and the field page at phone size,
// signed in as the demo coordinator. Prints each page's performance and accessibility scores, then
// each route's first-load JavaScript from the build's manifests, gzip-compressed. Starts the
// production build on the scale profile (fill it first with `npm run seed:scale`) unless --url names a
// server already running; --only measures the pages whose name contains it, --details prints the
// elements each failed accessibility audit names, --js-only prints the first-load JavaScript of the
// last build alone (no server, no browser). Prints figures; asserts nothing.
import { readdirSync, readFileSync, existsSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { gzipSync } from "node:zlib";
import * as chromeLauncher from "chrome-launcher";
import lighthouse from "lighthouse";
import desktopConfig from "lighthouse/core/config/desktop-config.js";
import { startScaleApp } from "./scale-app.mjs";
import { sessionCookie } from "./session.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const args = process.argv.slice(2);
const urlAt = args.indexOf("--url");
let base = urlAt >= 0 ? args[urlAt + 1] : "";
const details = args.includes("--details");
const only = args.includes("--only") ? args[args.indexOf("--only") + 1] : "";
const distDir = path.join(root, process.env.NEXT_DIST_DIR || ".next");

/**
 * Every page route's first-load JavaScript: the files its client reference manifest names for the
 * page's tree (layouts, error and not-found boundaries included) and the files every page loads, each
 * counted once, gzip-compressed.
 */
function firstLoadJs() {
  const appDir = path.join(distDir, "server", "app");
  const manifests = [];
  const visit = (dir) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) visit(full);
      else if (entry.name === "page_client-reference-manifest.js") manifests.push(full);
    }
  };
  visit(appDir);
  const buildManifest = JSON.parse(readFileSync(path.join(distDir, "build-manifest.json"), "utf8"));
  // Polyfills load only in browsers without modules (nomodule), so they are not counted.
  const shared = (buildManifest.rootMainFiles ?? []).filter((f) => f.endsWith(".js"));
  const gzipped = new Map();
  const sizeOf = (file) => {
    if (!gzipped.has(file)) {
      const full = path.join(distDir, file.replace(/^\/?_next\//, ""));
      gzipped.set(file, existsSync(full) ? gzipSync(readFileSync(full), { level: 9 }).length : 0);
    }
    return gzipped.get(file);
  };
  return manifests
    .map((file) => {
      const route = "/" + path.relative(appDir, path.dirname(file)).split(path.sep).join("/");
      const globalThis_ = { __RSC_MANIFEST: {} };
      new Function("globalThis", "self", readFileSync(file, "utf8"))(globalThis_, globalThis_);
      const manifest = Object.values(globalThis_.__RSC_MANIFEST)[0] ?? {};
      const entries = Object.values(manifest.entryJSFiles ?? {}).flat();
      const files = [...new Set([...shared, ...entries])].filter((f) => f.endsWith(".js"));
      const bytes = files.reduce((total, f) => total + sizeOf(f), 0);
      return { route: route.replace(/\/\([^)]+\)/g, "") || "/", bytes, files: files.length };
    })
    .sort((a, b) => a.route.localeCompare(b.route));
}

function printFirstLoadJs() {
  console.log("\n| route | first-load JS (gzip) | files |\n|---|---|---|");
  for (const r of firstLoadJs()) console.log(`| ${r.route} | ${(r.bytes / 1024).toFixed(1)} kB | ${r.files} |`);
}

if (args.includes("--js-only")) {
  printFirstLoadJs();
  process.exit(0);
}

let app = null;
if (!base) {
  app = await startScaleApp(root);
  base = app.url;
}

const chrome = await chromeLauncher.launch({
  chromePath: process.env.CHROME_PATH || "/usr/bin/chromium",
  chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking", "--disable-sync"],
});
try {
  const cookie = await sessionCookie(base);
  const { items } = await (await fetch(`${base}/api/v1/projects?stage=installed&pageSize=1`, { headers: { cookie } })).json();
  const project = items[0];
  const pages = [
    { name: "sign-in", path: "/sign-in", signedIn: false, phone: false },
    { name: "dashboard", path: "/dashboard", signedIn: true, phone: false },
    { name: "project page", path: `/projects/${project.id}`, signedIn: true, phone: false },
    { name: "design editor", path: `/projects/${project.id}/design`, signedIn: true, phone: false },
    { name: "field page (phone)", path: `/projects/${project.id}/field`, signedIn: true, phone: true },
  ];
  console.log(
    `\nLighthouse on ${base} (Chromium ${chrome.port ? "on port " + chrome.port : ""}); load average ${os
      .loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")} on ${os.cpus().length} cores. Desktop pages use Lighthouse's desktop settings; the phone page its default mobile ones.\n`,
  );
  console.log("| page | performance | accessibility | LCP | TBT | CLS |\n|---|---|---|---|---|---|");
  for (const page of pages.filter((p) => !only || p.name.includes(only))) {
    const flags = {
      port: chrome.port,
      output: "json",
      logLevel: "error",
      onlyCategories: ["performance", "accessibility"],
      ...(page.signedIn ? { extraHeaders: { Cookie: cookie } } : {}),
    };
    const result = await lighthouse(`${base}${page.path}`, flags, page.phone ? undefined : desktopConfig);
    const { categories, audits } = result.lhr;
    const score = (c) => (c.score === null ? "n/a" : Math.round(c.score * 100));
    const metric = (id) => audits[id]?.displayValue ?? "n/a";
    console.log(
      `| ${page.name} | ${score(categories.performance)} | ${score(categories.accessibility)} | ${metric("largest-contentful-paint")} | ${metric("total-blocking-time")} | ${metric("cumulative-layout-shift")} |`,
    );
    const failed = Object.values(audits).filter(
      (a) => result.lhr.categories.accessibility.auditRefs.some((r) => r.id === a.id && r.weight > 0) && a.score !== null && a.score < 1,
    );
    for (const a of failed) {
      console.log(`|   ↳ accessibility: ${a.title} | | | | | |`);
      // --details: the elements each failed audit names, to find them in the code.
      if (!details) continue;
      for (const item of (a.details?.items ?? []).slice(0, 6)) {
        const node = item.node ?? {};
        console.log(
          `|     · \`${(node.snippet ?? "").slice(0, 140)}\` ${(node.explanation ?? "").split("\n").at(-1).slice(0, 160)} | | | | | |`,
        );
      }
    }
  }
  printFirstLoadJs();
} finally {
  await chrome.kill();
  await app?.stop();
}
