import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { computeFees, feeNameKey, isInEffect } from "@/lib/fees";
import type { FeeBasis, FeeFacts, FeeLine, SizeRating } from "@/lib/fees";
import { FeeLineInput, feeLineToFormValues } from "@/lib/schemas/fee-schedule";

// Invented schedules (demo), generated: any mix of bases, limits and dates the form accepts.
const RUNS = { numRuns: 200 } as const;

const centsArb = (max = 10_000_000) => fc.integer({ min: 0, max });
const wattsArb = fc.integer({ min: 0, max: 2_000_000 }); // up to 2 MW, read to the watt
const sizeArb = fc.constantFrom<SizeRating>("dc", "ac");

/** Strictly rising tier edges in kW (whole watts), then the open last tier. */
const edgesArb = fc
  .uniqueArray(fc.integer({ min: 1, max: 500_000 }), { maxLength: 5 })
  .map((watts) => [...[...watts].sort((a, b) => a - b).map((w) => w / 1000), null]);

const bracketArb = fc.tuple(sizeArb, edgesArb).chain(([size, edges]) =>
  fc.array(centsArb(), { minLength: edges.length, maxLength: edges.length }).map((amounts): FeeBasis => ({
    kind: "bracket-tiers",
    size,
    tiers: edges.map((upToKw, i) => ({ upToKw, amountCents: amounts[i]! })),
  })),
);
const marginalArb = fc.tuple(sizeArb, edgesArb).chain(([size, edges]) =>
  fc.array(centsArb(100_000), { minLength: edges.length, maxLength: edges.length }).map((rates): FeeBasis => ({
    kind: "marginal-tiers",
    size,
    tiers: edges.map((upToKw, i) => ({ upToKw, rateCentsPerKw: rates[i]! })),
  })),
);
const perKwArb = fc.record({ kind: fc.constant("per-kw" as const), size: sizeArb, rateCentsPerKw: centsArb(100_000) });
const flatArb = fc.record({ kind: fc.constant("flat" as const), amountCents: centsArb() });
/** A percent in its stored form: millionths of the whole as "1.25", "0.0725", "100". */
const percentArb = fc.integer({ min: 0, max: 1_000_000 }).map((millionths): FeeBasis => {
  const decimals = String(millionths % 10_000)
    .padStart(4, "0")
    .replace(/0+$/, "");
  return { kind: "valuation-percent", ratePercent: [String(Math.floor(millionths / 10_000)), decimals].filter(Boolean).join(".") };
});
const basisArb: fc.Arbitrary<FeeBasis> = fc.oneof(flatArb, perKwArb, bracketArb, marginalArb, percentArb);

/** A minimum and a maximum, each optional, never crossed. */
const limitsArb = fc
  .tuple(fc.option(centsArb()), fc.option(centsArb()))
  .map(([a, b]) => (a !== null && b !== null && a > b ? [b, a] : [a, b]));

const DAY_MS = 86_400_000;
const dateArb = fc.integer({ min: 0, max: 3_000 }).map((days) => new Date(Date.UTC(2024, 0, 1) + days * DAY_MS).toISOString().slice(0, 10));

const lineArb = (basis: fc.Arbitrary<FeeBasis> = basisArb) =>
  fc
    .record({
      name: fc.constantFrom("Building permit", "building permit", "Plan review", "Electrical permit", "Interconnection application fee"),
      effectiveFrom: dateArb,
      until: fc.option(dateArb),
      basis,
      limits: limitsArb,
    })
    .map(({ until, limits: [minimumCents, maximumCents], ...line }) => ({
      ...line,
      effectiveUntil: until !== null && until > line.effectiveFrom ? until : null,
      minimumCents: minimumCents ?? null,
      maximumCents: maximumCents ?? null,
    }));

/** A schedule: versions of one fee never start on the same day. */
const scheduleArb = fc
  .uniqueArray(lineArb(), { maxLength: 8, selector: (line) => `${feeNameKey(line.name)} ${line.effectiveFrom}` })
  .map((lines): FeeLine[] => lines.map((line, i) => ({ id: `line-${i}`, ...line })));

const factsArb: fc.Arbitrary<FeeFacts> = fc.record({
  dcKw: fc.option(
    wattsArb.map((w) => w / 1000),
    { freq: 5 },
  ),
  acKw: fc.option(
    wattsArb.map((w) => w / 1000),
    { freq: 5 },
  ),
  valuationCents: fc.option(centsArb(1_000_000_000)),
  asOf: dateArb,
});

describe("fee arithmetic holds for any schedule the form accepts", () => {
  test("the total is the sum of the lines, each whole cents, zero or more", () => {
    fc.assert(
      fc.property(scheduleArb, factsArb, (lines, facts) => {
        const result = computeFees({ lines, facts });
        for (const line of result.lines) {
          expect(Number.isSafeInteger(line.amountCents)).toBe(true);
          expect(line.amountCents).toBeGreaterThanOrEqual(0);
        }
        expect(result.totalCents).toBe(result.lines.reduce((sum, line) => sum + line.amountCents, 0));
        expect(result.isComplete).toBe(result.lines.every((line) => !line.problem));
      }),
      RUNS,
    );
  });

  test("only lines in effect count, one version of each fee, and only a missing valuation or size leaves a problem", () => {
    fc.assert(
      fc.property(scheduleArb, factsArb, (lines, facts) => {
        const result = computeFees({ lines, facts });
        const byId = new Map(lines.map((line) => [line.id, line]));
        for (const { lineId, problem } of result.lines) {
          const line = byId.get(lineId)!;
          expect(isInEffect(line, facts.asOf)).toBe(true);
          const basis = line.basis;
          const missing =
            basis.kind === "valuation-percent"
              ? facts.valuationCents === null
              : basis.kind !== "flat" && facts[basis.size === "dc" ? "dcKw" : "acKw"] === null;
          expect(problem !== undefined).toBe(missing);
        }
        const names = result.lines.map((line) => feeNameKey(line.name));
        expect(new Set(names).size).toBe(names.length);
      }),
      RUNS,
    );
  });

  test("every worked-out line keeps its minimum and maximum", () => {
    fc.assert(
      fc.property(scheduleArb, factsArb, (lines, facts) => {
        const byId = new Map(lines.map((line) => [line.id, line]));
        for (const { lineId, amountCents, problem } of computeFees({ lines, facts }).lines) {
          if (problem) continue;
          const { minimumCents, maximumCents } = byId.get(lineId)!;
          if (minimumCents !== null) expect(amountCents).toBeGreaterThanOrEqual(minimumCents);
          if (maximumCents !== null) expect(amountCents).toBeLessThanOrEqual(maximumCents);
        }
      }),
      RUNS,
    );
  });

  test("a line that waits for a fact counts at its minimum (or 0), never more than it comes to once the fact is given", () => {
    const given = fc.record({ watts: wattsArb, valuationCents: centsArb(1_000_000_000) });
    fc.assert(
      fc.property(lineArb(), dateArb, given, (line, asOf, { watts, valuationCents }) => {
        const lines = [{ id: "line", ...line, effectiveFrom: "2024-01-01", effectiveUntil: null }];
        const [waiting] = computeFees({ lines, facts: { dcKw: null, acKw: null, valuationCents: null, asOf } }).lines;
        const [known] = computeFees({ lines, facts: { dcKw: watts / 1000, acKw: watts / 1000, valuationCents, asOf } }).lines;
        expect(known!.problem).toBeUndefined();
        if (line.basis.kind === "flat") {
          expect(waiting).toEqual(known);
          return;
        }
        expect(waiting!.amountCents).toBe(line.minimumCents ?? 0);
        expect(waiting!.amountCents).toBeLessThanOrEqual(known!.amountCents);
      }),
      RUNS,
    );
  });

  test("per-kW and marginal-tier fees never fall as the system grows", () => {
    fc.assert(
      fc.property(lineArb(fc.oneof(perKwArb, marginalArb)), wattsArb, wattsArb, (line, a, b) => {
        const [smallerW, largerW] = a <= b ? [a, b] : [b, a];
        const amountAt = (watts: number) =>
          computeFees({
            lines: [{ id: "line", ...line }],
            facts: { dcKw: watts / 1000, acKw: watts / 1000, valuationCents: null, asOf: line.effectiveFrom },
          }).totalCents;
        expect(amountAt(largerW)).toBeGreaterThanOrEqual(amountAt(smallerW));
      }),
      RUNS,
    );
  });

  test("a bracket fee is one bracket's amount, or its minimum or maximum", () => {
    fc.assert(
      fc.property(lineArb(bracketArb), wattsArb, (line, watts) => {
        const [result] = computeFees({
          lines: [{ id: "line", ...line }],
          facts: { dcKw: watts / 1000, acKw: watts / 1000, valuationCents: null, asOf: line.effectiveFrom },
        }).lines;
        const amounts = (line.basis as Extract<FeeBasis, { kind: "bracket-tiers" }>).tiers.map((tier) => tier.amountCents);
        expect([...amounts, line.minimumCents, line.maximumCents]).toContain(result!.amountCents);
      }),
      RUNS,
    );
  });

  test("a stored line shown in the form and saved unchanged is the same line", () => {
    fc.assert(
      fc.property(scheduleArb, (lines) => {
        for (const line of lines) expect(FeeLineInput.parse(feeLineToFormValues(line))).toEqual(line);
      }),
      RUNS,
    );
  });
});
