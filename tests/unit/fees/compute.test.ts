import { describe, expect, test } from "vitest";
import { FeeScheduleError, computeFees } from "@/lib/fees";
import type { FeeBasis, FeeFacts, ScheduledFeeLine } from "@/lib/fees";
import { ASHCOMBE, BRINDLE, ashcombeBrackets, brindleMarginal, facts, feeLine } from "./fixtures";

/** The single applicable line of a one-line schedule. */
const only = (line: ScheduledFeeLine, on: Partial<FeeFacts> = {}) => {
  const result = computeFees({ lines: [line], facts: facts(on) });
  expect(result.lines).toHaveLength(1);
  return result.lines[0]!;
};

describe("each basis, invented schedule (demo)", () => {
  test.each<[string, FeeBasis, Partial<FeeFacts>, number, string[]]>([
    ["flat fee", { kind: "flat", amountCents: 25_000 }, {}, 25_000, ["flat fee = $250.00"]],
    // 7.600 kW × 1500 ¢/kW = 11,400 ¢
    ["per kW on DC", { kind: "per-kw", size: "dc", rateCentsPerKw: 1_500 }, {}, 11_400, ["7.600 kW DC × $15.00/kW = $114.00"]],
    // 6.000 kW × 2000 ¢/kW = 12,000 ¢: the AC size, not the DC
    ["per kW on AC", { kind: "per-kw", size: "ac", rateCentsPerKw: 2_000 }, {}, 12_000, ["6.000 kW AC × $20.00/kW = $120.00"]],
    // 1525 × 7634 = 11,641,850 thousandths of a cent = 11,641.85 ¢ → 11,642 ¢
    [
      "per kW, rounded",
      { kind: "per-kw", size: "dc", rateCentsPerKw: 1_525 },
      { dcKw: 7.634 },
      11_642,
      ["7.634 kW DC × $15.25/kW = $116.4185, rounded to $116.42"],
    ],
    // 4,000,000 ¢ × 1.25 % = 50,000 ¢
    ["percent of valuation", { kind: "valuation-percent", ratePercent: "1.25" }, {}, 50_000, ["$40,000.00 valuation × 1.25% = $500.00"]],
    // 72.5 ¢ per $1,000 is 0.0725 %: 3,825,000 ¢ × 0.000725 = 2,773.125 ¢ → 2,773 ¢ (38.25 × $0.725 = $27.73125)
    [
      "percent of valuation, rounded",
      { kind: "valuation-percent", ratePercent: "0.0725" },
      { valuationCents: 3_825_000 },
      2_773,
      ["$38,250.00 valuation × 0.0725% = $27.73125, rounded to $27.73"],
    ],
  ])("%s", (_what, basis, on, amountCents, arithmetic) => {
    expect(only(feeLine(basis), on)).toMatchObject({ amountCents, arithmetic });
  });

  test("a result names its line, authority and basis, and the total adds the lines", () => {
    const lines = [
      feeLine({ kind: "flat", amountCents: 25_000 }, { id: "permit", authority: ASHCOMBE }),
      feeLine(
        { kind: "per-kw", size: "ac", rateCentsPerKw: 2_000 },
        { id: "interconnect", name: "Interconnection application fee", authority: BRINDLE },
      ),
    ];
    // $250.00 + 6.000 kW × $20.00 = $250.00 + $120.00 = $370.00
    expect(computeFees({ lines, facts: facts() })).toEqual({
      lines: [
        {
          lineId: "permit",
          name: "Building permit",
          authority: ASHCOMBE,
          kind: "flat",
          amountCents: 25_000,
          arithmetic: ["flat fee = $250.00"],
        },
        {
          lineId: "interconnect",
          name: "Interconnection application fee",
          authority: BRINDLE,
          kind: "per-kw",
          amountCents: 12_000,
          arithmetic: ["6.000 kW AC × $20.00/kW = $120.00"],
        },
      ],
      totalCents: 37_000,
      isComplete: true,
    });
  });

  test("no lines, no fees", () => {
    expect(computeFees({ lines: [], facts: facts() })).toEqual({ lines: [], totalCents: 0, isComplete: true });
  });

  test("sizes are read to the watt: 0.1 + 0.2 kW is 0.300 kW", () => {
    expect(only(feeLine({ kind: "per-kw", size: "dc", rateCentsPerKw: 1_000 }), { dcKw: 0.1 + 0.2 }).arithmetic).toEqual([
      "0.300 kW DC × $10.00/kW = $3.00",
    ]);
  });
});

describe("minimum and maximum, applied after the basis (invented schedule, demo)", () => {
  // $15.00/kW DC, at least $150.00, at most $500.00
  const capped = (minimumCents: number | null, maximumCents: number | null) =>
    feeLine({ kind: "per-kw", size: "dc", rateCentsPerKw: 1_500 }, { minimumCents, maximumCents });

  test.each<[number, number, string[]]>([
    // 7.600 × $15 = $114.00 < $150.00
    [7.6, 15_000, ["7.600 kW DC × $15.00/kW = $114.00", "below the $150.00 minimum → $150.00"]],
    // exactly the minimum: 10.000 × $15 = $150.00, nothing to raise
    [10, 15_000, ["10.000 kW DC × $15.00/kW = $150.00"]],
    // 20.000 × $15 = $300.00, between the two
    [20, 30_000, ["20.000 kW DC × $15.00/kW = $300.00"]],
    // 40.000 × $15 = $600.00 > $500.00
    [40, 50_000, ["40.000 kW DC × $15.00/kW = $600.00", "above the $500.00 maximum → $500.00"]],
  ])("%d kW DC → %d ¢", (dcKw, amountCents, arithmetic) => {
    expect(only(capped(15_000, 50_000), { dcKw })).toMatchObject({ amountCents, arithmetic });
  });

  test("a minimum alone, a maximum alone, and both equal", () => {
    expect(only(capped(15_000, null), { dcKw: 100 }).amountCents).toBe(150_000); // 100 × $15, no cap
    expect(only(capped(null, 50_000), { dcKw: 0 }).amountCents).toBe(0); // no floor
    expect(only(capped(20_000, 20_000), { dcKw: 3 }).amountCents).toBe(20_000); // $45.00 raised to the fixed $200.00
    expect(only(capped(20_000, 20_000), { dcKw: 30 }).amountCents).toBe(20_000); // $450.00 capped at the fixed $200.00
  });

  test("a minimum applies to a flat fee and to a percent of valuation", () => {
    // 0.5 % of $12,000.00 = $60.00 < $75.00
    const line = feeLine({ kind: "valuation-percent", ratePercent: "0.5" }, { minimumCents: 7_500 });
    expect(only(line, { valuationCents: 1_200_000 }).arithmetic).toEqual([
      "$12,000.00 valuation × 0.5% = $60.00",
      "below the $75.00 minimum → $75.00",
    ]);
  });
});

describe("rounding: integer cents, half up at the cent edge", () => {
  // $12.50/kW: 1250 × watts thousandths of a cent; the last digits .25, .5, .75, .0 of a cent
  test.each([
    [7.601, 9_501, "$95.0125, rounded to $95.01"], // 9,501.25 ¢ → down
    [7.602, 9_503, "$95.025, rounded to $95.03"], // 9,502.5 ¢: exactly half → up
    [7.603, 9_504, "$95.0375, rounded to $95.04"], // 9,503.75 ¢ → up
    [7.604, 9_505, "$95.05"], // 9,505 ¢ exactly, no rounding shown
  ])("%d kW × $12.50/kW → %d ¢", (dcKw, amountCents, shown) => {
    const result = only(feeLine({ kind: "per-kw", size: "dc", rateCentsPerKw: 1_250 }), { dcKw });
    expect(result.amountCents).toBe(amountCents);
    expect(result.arithmetic[0]).toMatch(new RegExp(`= ${shown.replaceAll("$", "\\$")}$`));
  });

  test.each([
    [0.5, 1, "0.500 kW DC × $0.01/kW = $0.005, rounded to $0.01"], // half a cent → 1 ¢
    [0.499, 0, "0.499 kW DC × $0.01/kW = $0.00499, rounded to $0.00"], // just under half → 0 ¢
  ])("the smallest amounts: %d kW × $0.01/kW → %d ¢", (dcKw, amountCents, shown) => {
    expect(only(feeLine({ kind: "per-kw", size: "dc", rateCentsPerKw: 1 }), { dcKw })).toMatchObject({ amountCents, arithmetic: [shown] });
  });

  test.each([
    [1_000_040, 12_501, "$10,000.40 valuation × 1.25% = $125.005, rounded to $125.01"], // 12,500.5 ¢: half → up
    [1_000_020, 12_500, "$10,000.20 valuation × 1.25% = $125.0025, rounded to $125.00"], // 12,500.25 ¢ → down
  ])("valuation %d ¢ × 1.25 %% → %d ¢", (valuationCents, amountCents, shown) => {
    expect(only(feeLine({ kind: "valuation-percent", ratePercent: "1.25" }), { valuationCents })).toMatchObject({
      amountCents,
      arithmetic: [shown],
    });
  });
});

describe("size tiers at the bracket boundaries (invented schedule, demo)", () => {
  // A size exactly on a boundary belongs to the LOWER bracket: "up to 10 kW" includes 10.000 kW.
  test.each([
    [0, 10_000, "0.000 kW DC is in the bracket up to 10.000 kW → $100.00"],
    [7.6, 10_000, "7.600 kW DC is in the bracket up to 10.000 kW → $100.00"],
    [10, 10_000, "10.000 kW DC is in the bracket up to 10.000 kW → $100.00"], // on the boundary: lower bracket
    [10.001, 20_000, "10.001 kW DC is in the bracket over 10.000 kW up to 25.000 kW → $200.00"], // one watt more: upper
    [25, 20_000, "25.000 kW DC is in the bracket over 10.000 kW up to 25.000 kW → $200.00"],
    [25.001, 30_000, "25.001 kW DC is in the bracket over 25.000 kW → $300.00"],
    [1_250, 30_000, "1,250.000 kW DC is in the bracket over 25.000 kW → $300.00"],
  ])("brackets: %d kW DC → %d ¢, the whole fee of its bracket", (dcKw, amountCents, shown) => {
    expect(only(feeLine(ashcombeBrackets), { dcKw })).toMatchObject({ amountCents, arithmetic: [shown] });
  });

  test("a single open bracket covers every size", () => {
    const line = feeLine({ kind: "bracket-tiers", size: "ac", tiers: [{ upToKw: null, amountCents: 9_900 }] });
    expect(only(line).arithmetic).toEqual(["6.000 kW AC is in the bracket of every size → $99.00"]);
  });

  // Marginal: each tier's rate on the kW within it; on a boundary the upper tier holds 0 kW, so it is the same.
  test.each([
    [0, 0, ["0.000 kW AC × $20.00/kW (tier 0.000–10.000 kW) = $0.00"]],
    // 6 × $20 = $120
    [6, 12_000, ["6.000 kW AC × $20.00/kW (tier 0.000–10.000 kW) = $120.00"]],
    // on the boundary: 10 × $20 = $200, nothing in the second tier
    [10, 20_000, ["10.000 kW AC × $20.00/kW (tier 0.000–10.000 kW) = $200.00"]],
    // one watt over: 0.001 × $10 = 1 ¢
    [
      10.001,
      20_001,
      [
        "10.000 kW AC × $20.00/kW (tier 0.000–10.000 kW) = $200.00",
        "0.001 kW AC × $10.00/kW (tier 10.000–25.000 kW) = $0.01",
        "$200.00 + $0.01 = $200.01",
      ],
    ],
    // 10 × $20 + 15 × $10 = $200 + $150 = $350
    [
      25,
      35_000,
      [
        "10.000 kW AC × $20.00/kW (tier 0.000–10.000 kW) = $200.00",
        "15.000 kW AC × $10.00/kW (tier 10.000–25.000 kW) = $150.00",
        "$200.00 + $150.00 = $350.00",
      ],
    ],
    // + 5 × $5 = $25 → $375
    [
      30,
      37_500,
      [
        "10.000 kW AC × $20.00/kW (tier 0.000–10.000 kW) = $200.00",
        "15.000 kW AC × $10.00/kW (tier 10.000–25.000 kW) = $150.00",
        "5.000 kW AC × $5.00/kW (tier above 25.000 kW) = $25.00",
        "$200.00 + $150.00 + $25.00 = $375.00",
      ],
    ],
  ])("marginal: %d kW AC → %d ¢", (acKw, amountCents, arithmetic) => {
    expect(only(feeLine(brindleMarginal), { acKw })).toMatchObject({ amountCents, arithmetic });
  });

  test("each marginal tier is rounded to the cent on its own, so the parts shown add up", () => {
    // $0.15/kW then $0.25/kW above 1 kW; 1.003 kW: 15 ¢ + 0.003 × 25 ¢ = 0.075 ¢ → 0 ¢; total 15 ¢
    const line = feeLine({
      kind: "marginal-tiers",
      size: "dc",
      tiers: [
        { upToKw: 1, rateCentsPerKw: 15 },
        { upToKw: null, rateCentsPerKw: 25 },
      ],
    });
    expect(only(line, { dcKw: 1.003 })).toMatchObject({ amountCents: 15, arithmetic: expect.arrayContaining(["$0.15 + $0.00 = $0.15"]) });
  });
});

describe("a line that needs a fact not given yet", () => {
  test("no valuation: a problem on its line, counted at its minimum, not a thrown error; the other lines still count", () => {
    const lines = [
      feeLine({ kind: "valuation-percent", ratePercent: "1.25" }, { id: "valuation", minimumCents: 5_000 }),
      feeLine({ kind: "flat", amountCents: 7_500 }, { id: "plan-review", name: "Plan review" }),
    ];
    const result = computeFees({ lines, facts: facts({ valuationCents: null }) });
    expect(result.lines[0]).toEqual({
      lineId: "valuation",
      name: "Building permit",
      kind: "valuation-percent",
      // Every amount is raised to the minimum, so the line comes to at least $50.00 whatever the valuation.
      amountCents: 5_000,
      arithmetic: ["1.25% of the project valuation: no valuation declared yet", "at least the $50.00 minimum until then"],
      problem: { code: "valuation-missing", message: "Enter the project's declared valuation to work out this fee." },
    });
    // $50.00 at least + $75.00: the total is the least the fees come to.
    expect(result).toMatchObject({ totalCents: 12_500, isComplete: false });
  });

  test("no valuation and no minimum: counted at 0 until the valuation is declared", () => {
    const result = computeFees({
      lines: [feeLine({ kind: "valuation-percent", ratePercent: "1.25" })],
      facts: facts({ valuationCents: null }),
    });
    expect(result.lines[0]).toMatchObject({
      amountCents: 0,
      arithmetic: ["1.25% of the project valuation: no valuation declared yet"],
      problem: { code: "valuation-missing" },
    });
    expect(result).toMatchObject({ totalCents: 0, isComplete: false });
  });

  test("a valuation of $0.00 is declared: the line is worked out", () => {
    const result = computeFees({
      lines: [feeLine({ kind: "valuation-percent", ratePercent: "1.25" }, { minimumCents: 5_000 })],
      facts: facts({ valuationCents: 0 }),
    });
    expect(result).toMatchObject({ totalCents: 5_000, isComplete: true });
  });

  test.each<[string, FeeBasis, Partial<FeeFacts>, number | null, number]>([
    ["per kW on DC, no DC size, $100 minimum", { kind: "per-kw", size: "dc", rateCentsPerKw: 1_500 }, { dcKw: null }, 10_000, 10_000],
    ["per kW on AC, no AC size, no minimum", { kind: "per-kw", size: "ac", rateCentsPerKw: 2_000 }, { acKw: null }, null, 0],
    ["brackets, no DC size, $150 minimum", ashcombeBrackets, { dcKw: null }, 15_000, 15_000],
    ["marginal tiers, no AC size, no minimum", brindleMarginal, { acKw: null }, null, 0],
  ])("size not known (%s): a problem, counted at its minimum or 0", (_what, basis, on, minimumCents, amountCents) => {
    const line = only(feeLine(basis, { minimumCents }), on);
    expect(line).toMatchObject({
      amountCents,
      problem: { code: "size-missing", message: "Complete the design to work out this fee: it depends on the system size." },
    });
    expect(line.arithmetic[0]).toMatch(/reads the system size in kW (DC|AC): not known until the design is complete/);
  });

  test("the other size still works a line out: an AC fee needs no DC size", () => {
    expect(only(feeLine({ kind: "per-kw", size: "ac", rateCentsPerKw: 2_000 }), { dcKw: null })).toMatchObject({ amountCents: 12_000 });
    expect(only(feeLine({ kind: "flat", amountCents: 25_000 }), { dcKw: null, acKw: null, valuationCents: null }).problem).toBeUndefined();
  });
});

describe("data that bypassed the schedule form is refused with a typed error", () => {
  const flat = (amountCents: number) => ({ kind: "flat", amountCents }) as FeeBasis;
  test.each<[string, ScheduledFeeLine[], Partial<FeeFacts>, string, RegExp]>([
    [
      "a negative rate",
      [feeLine({ kind: "per-kw", size: "dc", rateCentsPerKw: -1_500 })],
      {},
      "lines.0.basis.rateCentsPerKw",
      /rate per kW must be whole cents, zero or more/,
    ],
    ["fractional cents", [feeLine(flat(12.5))], {}, "lines.0.basis.amountCents", /amount must be whole cents/],
    [
      "a negative tier amount",
      [
        feeLine({
          ...ashcombeBrackets,
          tiers: [
            { upToKw: 10, amountCents: -1 },
            { upToKw: null, amountCents: 0 },
          ],
        } as FeeBasis),
      ],
      {},
      "lines.0.basis.tiers.0.amountCents",
      /each tier's amount/,
    ],
    [
      "tiers not ascending",
      [
        feeLine({
          ...brindleMarginal,
          tiers: [
            { upToKw: 10, rateCentsPerKw: 1 },
            { upToKw: 10, rateCentsPerKw: 1 },
            { upToKw: null, rateCentsPerKw: 1 },
          ],
        } as FeeBasis),
      ],
      {},
      "lines.0.basis.tiers.1.upToKw",
      /Tiers must ascend: this tier must end above 10.000 kW/,
    ],
    [
      "a closed last tier",
      [
        feeLine({
          ...ashcombeBrackets,
          tiers: [
            { upToKw: 10, amountCents: 1 },
            { upToKw: 25, amountCents: 2 },
          ],
        } as FeeBasis),
      ],
      {},
      "lines.0.basis.tiers.1.upToKw",
      /Leave the last tier's upper size blank/,
    ],
    [
      "an open middle tier",
      [
        feeLine({
          ...ashcombeBrackets,
          tiers: [
            { upToKw: null, amountCents: 1 },
            { upToKw: null, amountCents: 2 },
          ],
        } as FeeBasis),
      ],
      {},
      "lines.0.basis.tiers.0.upToKw",
      /Only the last tier is open-ended/,
    ],
    [
      "a tier edge finer than a watt",
      [
        feeLine({
          ...ashcombeBrackets,
          tiers: [
            { upToKw: 10.0005, amountCents: 1 },
            { upToKw: null, amountCents: 2 },
          ],
        } as FeeBasis),
      ],
      {},
      "lines.0.basis.tiers.0.upToKw",
      /at most three decimals/,
    ],
    ["no tiers", [feeLine({ ...ashcombeBrackets, tiers: [] } as FeeBasis)], {}, "lines.0.basis.tiers", /Add at least one tier/],
    [
      "a minimum above the maximum",
      [feeLine(flat(100), { minimumCents: 50_000, maximumCents: 15_000 })],
      {},
      "lines.0.maximumCents",
      /The minimum \(\$500\.00\) cannot be above the maximum \(\$150\.00\)/,
    ],
    [
      "an end before the start",
      [feeLine(flat(100), { effectiveFrom: "2026-07-01", effectiveUntil: "2026-07-01" })],
      {},
      "lines.0.effectiveUntil",
      /end date must be after/,
    ],
    ["an impossible date", [feeLine(flat(100), { effectiveFrom: "2026-02-30" })], {}, "lines.0.effectiveFrom", /YYYY-MM-DD/],
    ["a percent above 100", [feeLine({ kind: "valuation-percent", ratePercent: "150" })], {}, "lines.0.basis.ratePercent", /from 0 to 100/],
    ["a negative percent", [feeLine({ kind: "valuation-percent", ratePercent: "-1" })], {}, "lines.0.basis.ratePercent", /from 0 to 100/],
    [
      "an unknown size",
      [feeLine({ kind: "per-kw", size: "both", rateCentsPerKw: 1 } as unknown as FeeBasis)],
      {},
      "lines.0.basis.size",
      /"dc" or "ac"/,
    ],
    [
      "an unknown basis",
      [feeLine({ kind: "hourly" } as unknown as FeeBasis)],
      {},
      "lines.0.basis.kind",
      /"hourly" is not a way of working out a fee/,
    ],
    [
      "two versions starting the same day",
      [feeLine(flat(100)), feeLine(flat(200), { name: " building PERMIT " })],
      {},
      "lines.1.effectiveFrom",
      /Another version of "building PERMIT" already takes effect on 2025-01-01/,
    ],
    ["a negative size", [], { dcKw: -7.6 }, "facts.dcKw", /kW DC/],
    ["a size that is not a number", [], { acKw: Number.NaN }, "facts.acKw", /kW AC/],
    ["a valuation in fractions of a cent", [], { valuationCents: 100.5 }, "facts.valuationCents", /whole cents/],
    ["an impossible day", [], { asOf: "2026-02-30" }, "facts.asOf", /YYYY-MM-DD/],
  ])("%s", (_what, lines, on, field, message) => {
    let error: unknown;
    try {
      computeFees({ lines, facts: facts(on) });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(FeeScheduleError);
    expect(error).toMatchObject({ code: "INVALID_FEE_SCHEDULE", field });
    expect((error as Error).message).toMatch(message);
  });

  test("the message names the line", () => {
    const line = feeLine({ kind: "per-kw", size: "dc", rateCentsPerKw: -1 }, { name: "Electrical permit" });
    expect(() => computeFees({ lines: [line], facts: facts() })).toThrow(
      'Fee line "Electrical permit": the rate per kW must be whole cents, zero or more.',
    );
  });

  test("a line out of effect is checked too: bad data anywhere in a schedule is reported", () => {
    const expired = feeLine({ kind: "flat", amountCents: -1 }, { effectiveFrom: "2020-01-01", effectiveUntil: "2021-01-01" });
    expect(() => computeFees({ lines: [expired], facts: facts() })).toThrow(FeeScheduleError);
  });
});
