import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";

// Document layouts only place what lib/documents hands them: imports between lib and templates run
// one way (lib → templates), and lib/fees stays free of PDF code.

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? sources(full) : /\.(ts|tsx)$/.test(name) ? [full] : [];
  });
}

/** Every import or re-export statement of a file, with whether it is type-only and what it names. */
function imports(file: string): { typeOnly: boolean; from: string }[] {
  const text = readFileSync(file, "utf8");
  return [...text.matchAll(/(?:^|\n)\s*(import|export)\s+(type\s+)?(?:[^;"']*?\sfrom\s+)?["']([^"']+)["']/g)].map((m) => ({
    typeOnly: Boolean(m[2]),
    from: m[3]!,
  }));
}

const offenders = (dirs: string[], bad: (i: { typeOnly: boolean; from: string }) => boolean) =>
  dirs.flatMap(sources).flatMap((file) =>
    imports(file)
      .filter(bad)
      .map((i) => `${file}: ${i.from}`),
  );

describe("imports between lib and templates", () => {
  test("the reader sees type-only and value imports apart", () => {
    const sample = path.join(import.meta.dirname, "import-direction.test.ts");
    expect(imports(sample)).toContainEqual({ typeOnly: false, from: "vitest" });
  });

  test("templates import nothing from lib at run time", () => {
    expect(offenders(["templates"], (i) => i.from.startsWith("@/lib") && !i.typeOnly)).toEqual([]);
  });

  test("templates import nothing at all from lib/server", () => {
    expect(offenders(["templates"], (i) => i.from.startsWith("@/lib/server"))).toEqual([]);
  });

  test("lib/fees imports nothing from templates", () => {
    expect(offenders(["lib/fees"], (i) => i.from.includes("templates"))).toEqual([]);
  });
});
