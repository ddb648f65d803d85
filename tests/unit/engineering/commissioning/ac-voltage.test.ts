import { describe, expect, test } from "vitest";
import { DesignInputError, checkAcVoltage, serviceVoltageRanges } from "@/lib/engineering";

const at = (nominalServiceV: number, acVoltageV: number | null) => checkAcVoltage({ edition: 2020, nominalServiceV, acVoltageV });

// ANSI C84.1, from memory (REFERENCE.md): Range A 114–126 V and Range B 110–127 V on 120 V; other nominals scale.
describe("AC voltage at the point of connection vs ANSI C84.1 (from memory)", () => {
  test.each([
    // nominal, A low, A high, B low, B high — 120 V base × nominal / 120
    [120, 114, 126, 110, 127],
    [240, 228, 252, 220, 254], // 240 / 120 = 2: 2 × 114 = 228 ... as REFERENCE.md says
    [208, 197.6, 218.4, 190.67, 220.13], // 208 / 120 × 114 = 197.6; × 110 = 190.67
    [277, 263.15, 290.85, 253.92, 293.16], // 277 × 0.95 = 263.15; 277 × 1.05 = 290.85
    [480, 456, 504, 440, 508], // 480 × 0.95 = 456; 4 × 110 = 440; 4 × 127 = 508
  ])("%d V service: Range A %d–%d V, Range B %d–%d V (from memory)", (nominal, aLow, aHigh, bLow, bHigh) => {
    const r = serviceVoltageRanges(nominal);
    expect(r.rangeA.lowV).toBeCloseTo(aLow, 2);
    expect(r.rangeA.highV).toBeCloseTo(aHigh, 2);
    expect(r.rangeB.lowV).toBeCloseTo(bLow, 2);
    expect(r.rangeB.highV).toBeCloseTo(bHigh, 2);
  });

  test.each([
    [120, 114, "pass", 114], // exactly the Range A low end
    [120, 126, "pass", 126], // exactly the Range A high end
    [120, 120, "pass", 114], // nominal; limit shows the low end
    [120, 113.9, "warn", 114], // below A, inside B (110)
    [120, 110, "warn", 114], // exactly the Range B low end
    [120, 109.9, "fail", 110],
    [120, 127, "warn", 126], // exactly the Range B high end
    [120, 127.1, "fail", 127],
    [240, 228, "pass", 228],
    [240, 252, "pass", 252],
    [240, 253, "warn", 252], // 252 < 253 ≤ 254
    [240, 219, "fail", 220],
    [480, 505, "warn", 504], // 504 < 505 ≤ 508
  ])("%d V service reading %d V → %s (limit %d V)", (nominal, reading, status, limit) => {
    const r = at(nominal, reading);
    expect(r).toMatchObject({ status, value: reading, limit, unit: "V", kind: "ac-voltage", reading: "recorded" });
    expect(r.clause).toBe("ANSI C84.1 Range A and Range B");
  });

  test("a reading outside Range B says what to do", () => {
    const r = at(240, 200);
    expect(r.message).toMatch(/220–254 V/);
    expect(r.fix).toMatch(/utility/);
  });

  test("not recorded yet: warns, no value, reading missing", () => {
    expect(at(240, null)).toMatchObject({ status: "warn", value: null, reading: "missing" });
  });

  test.each([[Number.NaN], [-5], [Number.POSITIVE_INFINITY]])("bad reading %d fails without NaN", (v) => {
    const r = at(120, v);
    expect(r).toMatchObject({ status: "fail", value: null, reading: "invalid" });
    expect(JSON.stringify(r)).not.toMatch(/NaN/);
  });

  test.each([[230], [0], [Number.NaN]])("nominal %d V is not a service voltage: input error", (nominal) => {
    expect(() => at(nominal, 230)).toThrow(DesignInputError);
  });
});
