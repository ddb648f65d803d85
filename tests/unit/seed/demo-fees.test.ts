import { describe, expect, it } from "vitest";
import { computeFees } from "@/lib/fees";
import { FeeScheduleInput, feeLineToFormValues } from "@/lib/schemas/fee-schedule";
import { DEMO_JURISDICTION_FEES, DEMO_UTILITY_FEES } from "@/lib/seed/demo-fees";

const schedules = Object.entries({ ...DEMO_JURISDICTION_FEES, ...DEMO_UTILITY_FEES });

describe("demo fee schedules (invented)", () => {
  it.each(schedules)("%s: passes the admin form's schema unchanged", (_key, lines) => {
    expect(FeeScheduleInput.parse(lines.map(feeLineToFormValues))).toEqual(lines);
  });

  it.each(schedules)("%s: works out for a 7.6 kW DC / 6 kW AC system", (_key, lines) => {
    const result = computeFees({ lines, facts: { dcKw: 7.6, acKw: 6, valuationCents: 24_500_00, asOf: "2026-12-02" } });
    expect(result.lines.length).toBeGreaterThan(0);
    expect(result.totalCents).toBeGreaterThan(0);
  });

  it("the utility's newer application fee supersedes the older one from its effective date", () => {
    const facts = (asOf: string) => ({ dcKw: 7.6, acKw: 6, valuationCents: null, asOf });
    expect(computeFees({ lines: DEMO_UTILITY_FEES.bmlp, facts: facts("2026-06-30") }).totalCents).toBe(100_00);
    expect(computeFees({ lines: DEMO_UTILITY_FEES.bmlp, facts: facts("2026-07-01") }).totalCents).toBe(125_00);
  });
});
