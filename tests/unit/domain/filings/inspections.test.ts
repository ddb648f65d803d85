// Which visit to book next (product rule): the authority profile's required inspections first, in the order
// the work reaches them; a kind counts as done once one visit of it passed.
import { describe, expect, it } from "vitest";
import { inspectionPlan, type InspectionKind, type InspectionResult } from "@/lib/domain/filings";

const visit = (kind: InspectionKind, result: InspectionResult | null) => ({ kind, result });

describe("the inspection plan of a filing", () => {
  it.each([
    ["an AHJ requiring only the final", ["rough", "final"], ["final"], [], ["final", "rough"], "final"],
    ["an AHJ requiring both, nothing booked", ["rough", "final"], ["rough", "final"], [], ["rough", "final"], "rough"],
    ["rough passed: the final is next", ["rough", "final"], ["rough", "final"], [visit("rough", "passed")], ["rough", "final"], "final"],
    ["a failed final is still to pass", ["rough", "final"], ["final"], [visit("final", "failed")], ["final", "rough"], "final"],
    [
      "every required visit passed: an optional one may still be booked",
      ["rough", "final"],
      ["final"],
      [visit("final", "passed")],
      ["final", "rough"],
      "rough",
    ],
    ["a utility requiring the meter set", ["witness_test", "meter_set"], ["meter_set"], [], ["meter_set", "witness_test"], "meter_set"],
    ["no profile requirement", ["witness_test", "meter_set"], [], [], ["witness_test", "meter_set"], "witness_test"],
    ["another approval has no visits", [], [], [], [], null],
  ] as const)("%s", (_what, kinds, required, inspections, order, next) => {
    const plan = inspectionPlan(kinds, required, inspections);
    expect(plan.rows.map((r) => r.kind)).toEqual(order);
    expect(plan.next).toBe(next);
  });

  it("marks which kinds the authority requires and which have passed", () => {
    expect(inspectionPlan(["rough", "final"], ["final"], [visit("rough", "passed"), visit("final", "cancelled")]).rows).toEqual([
      { kind: "final", required: true, passed: false },
      { kind: "rough", required: false, passed: true },
    ]);
  });
});
