import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { reviewDocument } from "@/lib/design/document-review";

// The README's design review example must stay true: its request reviews as shown.
const readme = readFileSync(path.join(process.cwd(), "README.md"), "utf8");
const section = readme.slice(readme.indexOf("## Design review API"));
const request = JSON.parse(section.slice(section.indexOf("-d '") + 4, section.indexOf("}'") + 1)) as unknown;
const response = section.slice(section.indexOf("```json"), section.indexOf("```", section.indexOf("```json") + 7));
const quoted = (key: string) => JSON.parse(new RegExp(`"${key}": (.+),\\n`).exec(response)![1]!) as unknown;

describe("README design review example", () => {
  const out = reviewDocument(request);
  if (!out.ok) throw new Error(JSON.stringify(out.problems));
  const r = out.review;

  it("reviews as the README says", () => {
    expect(r.status).toBe("pass");
    for (const key of ["ratings", "strings", "inverterOutputs", "pointOfConnection"] as const) expect(r[key], key).toEqual(quoted(key));
  });

  it("prints each run's figures as the README quotes them", () => {
    for (const run of r.runs) {
      const line = Object.entries(run).map(([k, v]) => `"${k}": ${JSON.stringify(v)}`);
      for (const part of line) expect(response, `${run.id} ${part}`).toContain(part);
    }
  });

  it("quotes the first string check and the labels' words as the review gives them", () => {
    expect(response).toContain(JSON.stringify(r.checks.find((c) => c.id === "string-voltage:S1")!.message));
    const rsd = r.labels.find((l) => l.title === "Rapid shutdown")!;
    expect(response).toContain(`"codeRef": "${rsd.codeRef}"`);
    expect(response).toContain(JSON.stringify(rsd.text));
  });
});
