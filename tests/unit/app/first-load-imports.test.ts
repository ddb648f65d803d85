// The heaviest pages ship to the browser with their first load kept small: the design editor's review
// engine and zod arrive after hydration (lib/design/editor-checks.ts) or with the Review step
// (review-step.tsx), the field record's readings schema and checks after its form (live-record.ts),
// the reports' chart library after the page. This walks each entry's static imports (type-only ones
// and import() left out, as the bundler does) and fails when one pulls them back into the first load.
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

const root = process.cwd();
const EDITOR = "app/(app)/projects/[projectId]/design/_components/design-editor.tsx";
const FIELD_FORM = "app/(app)/projects/[projectId]/field/_components/commissioning-form.tsx";
const REPORT_CHARTS = "app/(app)/reports/_components/lazy-report-charts.tsx";

function resolve(from: string, spec: string): string | null {
  const base = spec.startsWith("@/")
    ? path.join(root, spec.slice(2))
    : spec.startsWith(".")
      ? path.resolve(path.dirname(from), spec)
      : null;
  if (!base) return null;
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, path.join(base, "index.ts"), path.join(base, "index.tsx")])
    if (existsSync(candidate) && !candidate.endsWith(path.sep) && /\.(ts|tsx|js|mjs)$/.test(candidate)) return candidate;
  throw new Error(`cannot resolve ${spec} from ${from}`);
}

/** Module specifiers a file loads at run time: static imports and re-exports that carry a value. */
function valueImports(file: string): string[] {
  const source = ts.createSourceFile(file, readFileSync(file, "utf8"), ts.ScriptTarget.Latest, false);
  const specs: string[] = [];
  for (const node of source.statements) {
    if (ts.isImportDeclaration(node)) {
      const clause = node.importClause;
      const named = clause?.namedBindings;
      const typeOnly =
        clause?.isTypeOnly ||
        (clause &&
          !clause.name &&
          named &&
          ts.isNamedImports(named) &&
          named.elements.length > 0 &&
          named.elements.every((e) => e.isTypeOnly));
      if (!typeOnly) specs.push((node.moduleSpecifier as ts.StringLiteral).text);
    } else if (ts.isExportDeclaration(node) && node.moduleSpecifier && !node.isTypeOnly) {
      specs.push((node.moduleSpecifier as ts.StringLiteral).text);
    }
  }
  return specs;
}

/** Every project file and package a module reaches through its static value imports. */
function reach(entry: string): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const visit = (file: string) => {
    if (files.has(file)) return;
    files.add(file);
    for (const spec of valueImports(file)) {
      const next = resolve(file, spec);
      if (next) visit(next);
      else packages.add(spec.startsWith("@") ? spec.split("/").slice(0, 2).join("/") : spec.split("/")[0]!);
    }
  };
  visit(path.join(root, entry));
  return { files: new Set([...files].map((f) => path.relative(root, f).split(path.sep).join("/"))), packages };
}

describe("the design editor's first load", () => {
  const { files, packages } = reach(EDITOR);

  it("reaches the steps and the form library, so the walk is not empty", () => {
    expect(files).toContain("app/(app)/projects/[projectId]/design/_components/runs-step.tsx");
    expect(files).toContain("lib/schemas/design-options.ts");
    expect(packages).toContain("react-hook-form");
  });

  it("carries neither zod nor the review engine, the diagram or the conductor schedule", () => {
    expect(packages).not.toContain("zod");
    // The conductor sizes are a list of names the steps offer; the rest of lib/engineering stays out.
    expect([...files].filter((f) => f.startsWith("lib/engineering/") && f !== "lib/engineering/tables/conductor-sizes.ts")).toEqual([]);
    for (const heavy of [
      "lib/schemas/design.ts",
      "lib/design/run-review.ts",
      "lib/design/editor-checks.ts",
      "lib/design/conductor-schedule.ts",
    ])
      expect(files).not.toContain(heavy);
    expect([...files].filter((f) => f.startsWith("lib/sld/") || f.startsWith("components/sld/"))).toEqual([]);
  });

  it("would see them if a step imported them: the checks module reaches zod and the engine", () => {
    const checks = reach("lib/design/editor-checks.ts");
    expect(checks.packages).toContain("zod");
    expect(checks.files).toContain("lib/engineering/index.ts");
  });
});

describe("the field record's first load", () => {
  const { files, packages } = reach(FIELD_FORM);

  it("reaches the form's steps and the form library", () => {
    expect(files).toContain("app/(app)/projects/[projectId]/field/_components/form-values.ts");
    expect(packages).toContain("react-hook-form");
  });

  it("carries neither zod nor the readings' schema nor the whole set of checks", () => {
    expect(packages).not.toContain("zod");
    for (const heavy of [
      "lib/schemas/commissioning.ts",
      "lib/field/commissioning-facts.ts",
      "lib/engineering/commissioning/check-record.ts",
      "app/(app)/projects/[projectId]/field/_components/live-record.ts",
    ])
      expect(files).not.toContain(heavy);
  });

  it("would see them if the form imported its checker directly", () => {
    const live = reach("app/(app)/projects/[projectId]/field/_components/live-record.ts");
    expect(live.packages).toContain("zod");
    expect(live.files).toContain("lib/engineering/commissioning/check-record.ts");
  });
});

describe("the reports page's first load", () => {
  it("leaves the chart library to the charts loaded after the page", () => {
    expect(reach(REPORT_CHARTS).packages).not.toContain("recharts");
    expect(reach("app/(app)/reports/_components/report-charts.tsx").packages).toContain("recharts");
  });
});
