import { describe, expect, test } from "vitest";
import { DesignInputError, checkShutdownString, shutdownReadingsFromDesign, shutdownWindow } from "@/lib/engineering";
import { fenwickOptimizer, stringDesign } from "../fixtures";

const reading = (measuredV: number | null, devicesInSeries = 15, wiringLeavesArray = true, perDeviceV?: number) =>
  checkShutdownString({ id: "S1", devicesInSeries, measuredV, wiringLeavesArray, perDeviceV }, 2020);

// Common practice (REFERENCE.md): each module-level device holds about 1 V when shut down, so a
// string of N devices reads about N volts; the window is that ± max(1 V, 10 %) either way (common
// practice). Limits: NEC 690.12(B)(1) 30 V outside the array boundary, 690.12(B)(2) 80 V inside it.
describe("string voltage with the array shut down: a two-sided window", () => {
  test.each([
    [15, 1, 13.5, 15, 16.5], // the example: 15 devices at about 1 V each read about 15 V
    [5, 1, 4, 5, 6], // ± max(1, 0.5) = 1 V
    [20, 1, 18, 20, 22], // ± 2 V
    [10, 0.6, 5, 6, 7], // 10 × 0.6 V = 6 V, ± max(1, 0.6) = 1 V
    [1, 1, 0, 1, 2], // never below 0 V
  ])("%d devices × %d V → %d–%d V around %d V (common practice)", (n, per, low, expected, high) => {
    const w = shutdownWindow(n, per);
    expect(w.lowV).toBeCloseTo(low, 9);
    expect(w.expectedV).toBeCloseTo(expected, 9);
    expect(w.highV).toBeCloseTo(high, 9);
  });

  test.each([
    [14.6, "pass", 16.5], // the example: 14.6 V is normal for 15 devices
    [15, "pass", 16.5],
    [13.5, "pass", 16.5], // the bottom of the window
    [16.5, "pass", 16.5], // the top of the window
    [13.4, "fail", 13.5], // below: a device bypassed, the string open, or the meter on another string
    [0, "fail", 13.5],
    [16.6, "fail", 16.5], // above the window, though within 30 V
    [30, "fail", 16.5],
    [30.1, "fail", 30], // above 690.12(B)(1): a device did not shut down
    [45, "fail", 30],
  ])("15 devices, wiring leaves the array, read %d V → %s (limit %d V)", (v, status, limit) => {
    const r = reading(v);
    expect(r).toMatchObject({ status, value: v, limit, unit: "V", kind: "string-shutdown", id: "string-shutdown:S1" });
    expect(r.clause).toBe("NEC 2020 690.12(B)(1); 15 devices × 1 V");
  });

  test("the basis printed for users carries no rule-of-thumb mark", () => {
    expect(reading(15).clause).not.toMatch(/common practice|from memory/);
  });

  test.each([
    [31, "fail", /more than the 13\.5–16\.5 V expected/], // over 30 V, but inside the array only 80 V applies
    [80.5, "fail", /above the 80 V allowed on wiring kept within the array/],
  ])("wiring kept within the array: %d V → %s (NEC 690.12(B)(2), 80 V)", (v, status, message) => {
    const r = reading(v, 15, false);
    expect(r.status).toBe(status);
    expect(r.message).toMatch(message);
    expect(r.clause).toMatch(/^NEC 2020 690\.12\(B\)\(2\)/);
  });

  test("a string over the code limit tells the installer to keep clear and find the device", () => {
    expect(reading(45).fix).toMatch(/Do not touch/);
    expect(reading(12).fix).toMatch(/count its devices/);
  });

  test("missing reading: warn, reading missing, window in the message", () => {
    const r = reading(null);
    expect(r).toMatchObject({ status: "warn", reading: "missing", value: null });
    expect(r.message).toContain("about 15 V (13.5–16.5 V)");
  });

  test.each([[Number.NaN], [-1]])("bad reading %d → fail, never NaN", (v) => {
    const r = reading(v);
    expect(r).toMatchObject({ status: "fail", reading: "invalid", value: null, limit: null });
  });

  test.each([
    [0, 1],
    [2.5, 1],
    [15, 0],
    [15, Number.NaN],
  ])("bad design facts (%d devices, %d V each) are input errors", (n, per) => {
    expect(() => reading(15, n, true, per)).toThrow(DesignInputError);
  });

  test("readings from a design use its device's shut-down voltage", () => {
    const design = stringDesign({
      strings: [{ id: "S1", inverterId: "inv-1", modulesInSeries: 10 }],
      moduleLevelDevice: { ...fenwickOptimizer, shutdownOutputV: 0.6 },
    });
    const [s] = shutdownReadingsFromDesign(design);
    expect(s).toMatchObject({ id: "S1", devicesInSeries: 10, measuredV: null });
    expect(s!.perDeviceV).toBeCloseTo(0.6, 9);
  });
});
