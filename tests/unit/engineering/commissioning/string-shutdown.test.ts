import { describe, expect, test } from "vitest";
import { DesignInputError, checkShutdownString, shutdownReadingsFromDesign, shutdownWindow } from "@/lib/engineering";
import { fenwickOptimizer, stringDesign } from "../fixtures";

const reading = (measuredV: number | null, devicesInSeries = 15, wiringLeavesArray = true, perDeviceV?: number) =>
  checkShutdownString({ id: "S1", devicesInSeries, measuredV, wiringLeavesArray, perDeviceV }, 2020);

// Common practice (REFERENCE.md): each module-level device holds about 1 V when shut down;
// the window is expected to expected + max(1 V, 10 %). Limits: NEC 690.12(B)(1) 30 V outside the
// array boundary, 690.12(B)(2) 80 V inside it.
describe("string voltage with the array shut down", () => {
  test.each([
    [15, 1, 15, 16.5], // 15 × 1 V = 15 V; + max(1, 1.5) = 16.5 V
    [5, 1, 5, 6], // 5 V; + max(1, 0.5) = 6 V
    [20, 1, 20, 22], // 20 V; + 2 V
    [10, 0.6, 6, 7], // 10 × 0.6 V = 6 V; + max(1, 0.6) = 7 V
  ])("%d devices × %d V → window %d–%d V (common practice)", (n, per, expected, high) => {
    const w = shutdownWindow(n, per);
    expect(w.expectedV).toBeCloseTo(expected, 9);
    expect(w.highV).toBeCloseTo(high, 9);
  });

  test.each([
    [15, "pass", 16.5], // exactly the expected value
    [16.5, "pass", 16.5], // exactly the top of the window
    [15.8, "pass", 16.5],
    [14.9, "warn", 16.5], // below expected: open string or wrong string
    [0, "warn", 16.5],
    [16.6, "warn", 16.5], // above the window but within 30 V
    [30, "warn", 16.5], // exactly 30 V: allowed by 690.12(B)(1)
    [30.1, "fail", 30],
    [45, "fail", 30], // a device did not shut down
  ])("15 devices, wiring leaves the array, read %d V → %s", (v, status, limit) => {
    const r = reading(v);
    expect(r).toMatchObject({ status, value: v, limit, unit: "V", kind: "string-shutdown", id: "string-shutdown:S1" });
    expect(r.clause).toBe("NEC 2020 690.12(B)(1); common practice 1 V per device");
  });

  test.each([
    [31, "warn"], // over 30 V but inside the array only 80 V applies
    [80, "warn"],
    [80.5, "fail"],
  ])("wiring kept within the array: %d V → %s (NEC 690.12(B)(2), 80 V)", (v, status) => {
    const r = reading(v, 15, false);
    expect(r.status).toBe(status);
    expect(r.clause).toMatch(/^NEC 2020 690\.12\(B\)\(2\)/);
  });

  test("a failing string tells the installer to keep clear and find the device", () => {
    expect(reading(45).fix).toMatch(/Do not touch/);
  });

  test("missing reading: warn, reading missing, window in the message", () => {
    const r = reading(null);
    expect(r).toMatchObject({ status: "warn", reading: "missing", value: null });
    expect(r.message).toContain("15–16.5 V");
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
