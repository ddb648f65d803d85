import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { reviewDesign } from "@/lib/engineering";
import type { ReviewResult } from "@/lib/engineering";
import { NON_CODE_BASES } from "@/lib/engineering/clauses";
import { designArb, siteArb } from "./arbitraries";

// Each generated design is a whole review; 100 keeps this file to a second or two.
const REVIEWS = { numRuns: 100 } as const;

/** Every number finite and every string free of NaN, Infinity and "undefined", at any depth. */
function nonFiniteSpots(value: unknown, path = "result"): string[] {
  if (typeof value === "number") return Number.isFinite(value) ? [] : [`${path} = ${value}`];
  if (typeof value === "string") return /NaN|Infinity|undefined/.test(value) ? [`${path} = ${JSON.stringify(value)}`] : [];
  if (value && typeof value === "object") return Object.entries(value).flatMap(([k, v]) => nonFiniteSpots(v, `${path}.${k}`));
  return [];
}

/** A citation of the site's edition ("NEC 2020 …") or one of the engine's named non-code bases. */
function citesABasis(clauseText: string, edition: number): boolean {
  return clauseText.startsWith(`NEC ${edition} `) || NON_CODE_BASES.some((basis) => clauseText.startsWith(basis));
}

describe("reviewDesign on any valid generated design", () => {
  test("returns results with no NaN or Infinity anywhere: values, limits, summary, messages, labels", () => {
    fc.assert(
      fc.property(designArb, siteArb, (design, site) => {
        const r: ReviewResult = reviewDesign(design, site);
        expect(nonFiniteSpots(r)).toEqual([]);
        expect(r.checks.length).toBeGreaterThan(0);
        expect(r.summary.pass + r.summary.warn + r.summary.fail).toBe(r.checks.length);
      }),
      REVIEWS,
    );
  });

  test("every check and label names the site's edition or a documented non-code basis", () => {
    fc.assert(
      fc.property(designArb, siteArb, (design, site) => {
        const r = reviewDesign(design, site);
        for (const c of r.checks) {
          expect(c.edition).toBe(site.necEdition);
          expect(citesABasis(c.clause, site.necEdition), `${c.id}: ${c.clause}`).toBe(true);
        }
        for (const l of r.labels) expect(l.clause.startsWith(`NEC ${site.necEdition} `), `${l.id}: ${l.clause}`).toBe(true);
      }),
      REVIEWS,
    );
  });

  test("a complete, in-range design never needs an input correction", () => {
    fc.assert(
      fc.property(designArb, siteArb, (design, site) => {
        const inputFaults = reviewDesign(design, site).checks.filter((c) => c.id.startsWith("input:"));
        expect(inputFaults.map((c) => `${c.id}: ${c.message}`)).toEqual([]);
      }),
      REVIEWS,
    );
  });

  test("check ids are unique and every failure or warning says how to fix it", () => {
    fc.assert(
      fc.property(designArb, siteArb, (design, site) => {
        const r = reviewDesign(design, site);
        expect(new Set(r.checks.map((c) => c.id)).size).toBe(r.checks.length);
        for (const c of r.checks.filter((x) => x.status !== "pass")) expect(c.fix, c.id).toMatch(/\S/);
      }),
      REVIEWS,
    );
  });
});
