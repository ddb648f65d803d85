import { describe, expect, test } from "vitest";
import { evaluateLoadSideRules, largestMainBreakerA, largestPvBreakerA } from "@/lib/engineering";
import { stringDesign } from "../fixtures";

describe("705.12 load-side busbar arithmetic", () => {
  // REFERENCE.md 705.12 examples (code arithmetic): PV OCPD ≤ 1.2 × busbar − main, as a 240.6(A) rating.
  test.each([
    [200, 200, 40], // 240 − 200 = 40
    [225, 200, 70], // 270 − 200 = 70
    [100, 100, 20], // 120 − 100 = 20
    [125, 100, 50], // 150 − 100 = 50
  ])("120 %% rule: busbar %d A / main %d A → PV breaker ≤ %d A", (busbarA, mainA, pvA) => {
    expect(largestPvBreakerA(busbarA, mainA, "120%")).toBe(pvA);
  });

  test.each([
    [200, 200, null], // 100 % rule leaves no room on a fully used bus
    [225, 200, 25],
    [200, 175, 25],
  ])("100 %% rule: busbar %d A / main %d A → PV breaker ≤ %s A", (busbarA, mainA, pvA) => {
    expect(largestPvBreakerA(busbarA, mainA, "100%")).toBe(pvA);
  });

  test.each([
    [200, 60, 175], // 240 − 60 = 180 → 175 A is the largest standard main that fits
    [200, 40, 200],
    [100, 50, 70], // 120 − 50 = 70
  ])("main-breaker change: busbar %d A with a %d A PV breaker → main ≤ %d A", (busbarA, pvA, mainA) => {
    expect(largestMainBreakerA(busbarA, pvA, "120%")).toBe(mainA);
  });

  // 32 A inverter: 1.25 × 32 + 200 = 240 A. 100 %: 240 > 200 fails; 120 %: 240 ≤ 240 passes exactly at the limit.
  test("a 32 A inverter on 200/200: 100 % fails, 120 % passes exactly at 240 A", () => {
    const outcomes = evaluateLoadSideRules(stringDesign().service, 32);
    expect(outcomes.map((o) => [o.rule, o.applies, o.passes, o.valueA, o.limitA])).toEqual([
      ["100%", true, false, 240, 200],
      ["120%", true, true, 240, 240],
      ["sum", false, false, 40, 200],
    ]);
  });

  test("the 120 % rule needs the PV breaker at the far end of the bus", () => {
    const service = { ...stringDesign().service, pvBreakerAtOppositeEnd: false };
    expect(evaluateLoadSideRules(service, 32)[1]).toMatchObject({ rule: "120%", applies: false, passes: false });
  });

  // Sum rule: 100 + 60 + 40 (PV) = 200 A ≤ 200 A busbar; the main is not counted.
  test("sum rule: every breaker but the main, 200 A on a 200 A bus, passes", () => {
    const service = { ...stringDesign().service, otherBreakersA: [100, 60] };
    expect(evaluateLoadSideRules(service, 32)[2]).toMatchObject({ rule: "sum", applies: true, passes: true, valueA: 200 });
  });
});
