import { describe, expect, test } from "vitest";
import { computeFees, feeAmountText, feeTotalText } from "@/lib/fees";
import { facts, feeLine } from "./fixtures";

describe("a fee line's amount as the Fees page shows it", () => {
  test.each<[string, number, "valuation-missing" | "size-missing" | null, string]>([
    ["worked out", 123_45, null, "$123.45"],
    ["worked out to nothing", 0, null, "$0.00"],
    ["waiting for the valuation, with a minimum", 50_00, "valuation-missing", "at least $50.00"],
    ["waiting for the valuation, no minimum", 0, "valuation-missing", "needs the valuation"],
    ["waiting for the design, with a minimum", 100_00, "size-missing", "at least $100.00"],
    ["waiting for the design, no minimum", 0, "size-missing", "needs the design"],
  ])("%s", (_, amountCents, problem, text) => {
    expect(feeAmountText({ amountCents, problem })).toBe(text);
  });

  test("a total with a line still waiting is the least the fees come to", () => {
    // Invented schedule (demo): a $75.00 flat fee and 1.25 % of the valuation with a $50.00 minimum.
    const lines = [
      feeLine({ kind: "flat", amountCents: 75_00 }, { name: "Plan review" }),
      feeLine({ kind: "valuation-percent", ratePercent: "1.25" }, { minimumCents: 50_00 }),
    ];
    expect(feeTotalText(computeFees({ lines, facts: facts({ valuationCents: null }) }))).toBe("at least $125.00");
    // $40,000.00 × 1.25 % = $500.00; + $75.00
    expect(feeTotalText(computeFees({ lines, facts: facts() }))).toBe("$575.00");
  });
});
