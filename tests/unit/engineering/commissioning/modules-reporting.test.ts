import { describe, expect, test } from "vitest";
import { DesignInputError, checkModulesReporting } from "@/lib/engineering";

// Basis: the design's module count; with module-level monitoring every module installed must report (common practice).
describe("modules reporting vs installed (all must report)", () => {
  const check = (modulesReporting: number | null, modulesInstalled = 20) =>
    checkModulesReporting({ edition: 2020, modulesInstalled, modulesReporting });

  test.each([
    [20, "pass"],
    [19, "fail"], // one module silent: the record cannot be completed yet
    [0, "fail"],
    [21, "fail"], // more than installed: a count or device list is wrong
  ])("20 installed, %d reporting → %s", (n, status) => {
    expect(check(n)).toMatchObject({ status, value: n, limit: 20, unit: "modules", kind: "modules-reporting" });
  });

  test("missing count warns and stays open", () => {
    expect(check(null)).toMatchObject({ status: "warn", reading: "missing" });
  });

  test.each([[Number.NaN], [-1], [19.5]])("bad count %d → fail", (n) => {
    expect(check(n)).toMatchObject({ status: "fail", reading: "invalid", value: null });
  });

  test.each([[0], [Number.NaN], [2.5]])("modules installed %d is an input error", (installed) => {
    expect(() => check(20, installed)).toThrow(DesignInputError);
  });
});
