import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";

// Every way into the app, read from the app folder itself, so that a route, action or page added
// later shows up here and must be given an entry in the authorization matrix.

const APP = "app";

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : [full];
  });
}

/** "app/(app)/projects/[projectId]/page.tsx" → "/projects/:projectId" */
function urlOf(file: string): string {
  const parts = path
    .dirname(path.relative(APP, file))
    .split(path.sep)
    .filter((p) => p !== "." && !/^\(.*\)$/.test(p));
  return "/" + parts.map((p) => p.replace(/^\[\.\.\.(\w+)\]$/, ":$1*").replace(/^\[(\w+)\]$/, ":$1")).join("/");
}

const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"];

/** "GET /api/v1/projects/:projectId" for each method each route handler exports. */
export function routeKeys(): string[] {
  return walk(APP)
    .filter((f) => path.basename(f) === "route.ts")
    .flatMap((file) => {
      const source = readFileSync(file, "utf8");
      const exported = new Set<string>();
      for (const m of source.matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)) exported.add(m[1]!);
      for (const m of source.matchAll(/export\s*\{([^}]*)\}/g))
        for (const name of m[1]!.split(",")) {
          const alias = name
            .trim()
            .split(/\s+as\s+/)
            .pop()!;
          if (METHODS.includes(alias)) exported.add(alias);
        }
      return [...exported].map((method) => `${method} ${urlOf(file)}`);
    })
    .sort();
}

/** "app/(app)/projects/actions.ts#changeStageAction" for each exported server action. */
export function actionKeys(): string[] {
  return walk(APP)
    .filter((f) => /\.tsx?$/.test(f) && /^["']use server["']/.test(readFileSync(f, "utf8").trimStart()))
    .flatMap((file) =>
      [...readFileSync(file, "utf8").matchAll(/export\s+(?:const|async\s+function)\s+(\w+)/g)].map(
        (m) => `${path.relative(".", file).split(path.sep).join("/")}#${m[1]}`,
      ),
    )
    .sort();
}

/** "/projects/:projectId/fees" for each page. */
export function pageKeys(): string[] {
  return walk(APP)
    .filter((f) => path.basename(f) === "page.tsx")
    .map(urlOf)
    .sort();
}
