import { describe, expect, test } from "vitest";
import {
  DesignInputError,
  checkPathVoltageDrop,
  checkRunVoltageDrop,
  runVoltageDrop,
  voltageDropStatus,
  voltageDropV,
} from "@/lib/engineering";
import { acRun, coldSite, fenwickOptimizer, northmereOptimizerInverter, northmereString, stringDesign, stringRun } from "../fixtures";

describe("voltage drop, Chapter 9 Table 8 method (REFERENCE.md)", () => {
  test.each([
    // DC two-wire: 2 × 100 ft × 1.24 Ω/kft × 11.9 A / 1000 = 2.9512 V
    ["dc", 100, 1.24, 11.9, 2.9512],
    // single phase: 2 × 50 × 0.778 × 32 / 1000 = 2.4896 V
    ["1-phase", 50, 0.778, 32, 2.4896],
    // three phase: √3 × 100 × 0.778 × 32 / 1000 = 1.7320508 × 2.4896 = 4.31211 V
    ["3-phase", 100, 0.778, 32, 4.312114],
  ] as const)("%s, %d ft, %d Ω/kft, %d A → %d V", (system, lengthFt, ohms, currentA, dropV) => {
    expect(voltageDropV(system, lengthFt, ohms, currentA)).toBeCloseTo(dropV, 5);
  });

  test.each([
    // string run: Vmp 10 × 33.6 = 336 V, Imp 11.9 A, 10 AWG Cu stranded 1.24 → 2.9512 / 336 = 0.8783 %
    ["stranded Cu", {}, 0.8783],
    // solid 10 AWG Cu 1.21: 2 × 100 × 1.21 × 11.9 / 1000 = 2.8798 V → 0.8571 %
    ["solid Cu", { stranding: "solid" }, 0.8571],
    // 10 AWG Al stranded 2.04 (Table 8, from memory): 2 × 100 × 2.04 × 11.9 / 1000 = 4.8552 V → 1.445 %
    ["Al", { material: "Al" }, 1.445],
    // 10 AWG Al solid 2.00: 2 × 100 × 2.00 × 11.9 / 1000 = 4.76 V → 1.4167 %
    ["solid Al", { material: "Al", stranding: "solid" }, 1.4167],
  ] as const)("string run, %s → %d %%", (_name, conductor, percent) => {
    const run = { ...stringRun, conductor: { ...stringRun.conductor, ...conductor } };
    expect(runVoltageDrop(stringDesign(), run).percent).toBeCloseTo(percent, 4);
  });

  // Optimizer string at 380 V: 10 × 400 W / 380 V = 10.526 A → 2 × 100 × 1.24 × 10.526 / 1000 = 2.6105 V → 0.687 %
  test("optimizer strings run at the regulated voltage", () => {
    const design = stringDesign({
      inverters: [northmereOptimizerInverter],
      moduleLevelDevice: fenwickOptimizer,
      strings: [{ id: "S1", inverterId: "inv-opt", modulesInSeries: 10 }],
    });
    expect(runVoltageDrop(design, stringRun).percent).toBeCloseTo(0.687, 3);
  });

  // 8 AWG, 100 ft, 32 A at 208 V three phase: 4.3121 V / 208 = 2.073 % → warn; 6 AWG: √3 × 100 × 0.491 × 32 / 1000 = 2.7214 V → 1.308 %.
  // 6 AWG is larger than the 8 AWG ampacity needs, so 250.122(B) grows the 10 AWG EGC to 8 AWG: the fix says so
  // rather than leading into a grounding-conductor failure (issue 11 item 5).
  test("3-phase run above 2 % warns and suggests 6 AWG with the EGC it then needs (2 % is common practice)", () => {
    const design = stringDesign({ inverters: [{ ...northmereString, phase: 3, acVoltageV: 208 }] });
    const [r] = checkRunVoltageDrop(design, coldSite, { ...acRun, terminalTempC: 75, lengthFt: 100 });
    expect(r).toMatchObject({
      status: "warn",
      value: 2.07,
      limit: 2,
      fix: "Use 6 AWG conductors with an 8 AWG grounding conductor (250.122(B) grows it with the conductors) to stay within 2 %.",
    });
  });

  test("a DC string run upsized for voltage drop keeps its EGC (690.45): the fix names the conductors only", () => {
    // 10 AWG, 300 ft: 2 × 300 × 1.24 × 11.9 / 1000 = 8.85 V / 336 V = 2.63 % → 8 AWG: 2 × 300 × 0.778 × 11.9 / 1000 = 5.55 V → 1.65 %
    const [r] = checkRunVoltageDrop(stringDesign(), coldSite, { ...stringRun, lengthFt: 300 });
    expect(r).toMatchObject({ status: "warn", fix: "Use 8 AWG conductors to stay within 2 %." });
  });

  test("two strings in one raceway: each circuit drops by its own current, not the sum", () => {
    // each string 11.9 A: the same 0.8783 % as one string alone (not 2 × 11.9 A)
    const run = { ...stringRun, circuit: { kind: "dc-strings" as const, stringIds: ["S1", "S2"] } };
    expect(runVoltageDrop(stringDesign(), run).percent).toBeCloseTo(0.8783, 4);
    const combined = { ...run, circuit: { ...run.circuit, combined: true } };
    expect(runVoltageDrop(stringDesign(), combined).percent).toBeCloseTo(1.7567, 4);
  });

  // 2 × 200 × 1.24 × 32 / 1000 = 15.872 V / 240 = 6.61 % > 5 %
  test("above 5 % fails", () => {
    const run = { ...acRun, lengthFt: 200, conductor: { ...acRun.conductor, size: "10" as const } };
    expect(checkRunVoltageDrop(stringDesign(), coldSite, run)[0]).toMatchObject({ status: "fail", value: 6.61 });
  });

  test.each([
    [2, "pass"], // exactly at the common-practice 2 %
    [2.01, "warn"],
    [5, "warn"], // exactly at the 5 % total
    [5.01, "fail"],
  ] as const)("%d %% → %s", (percent, status) => {
    expect(voltageDropStatus(percent)).toBe(status);
  });

  // r1 0.8783 % + r2 (2 × 50 × 0.778 × 32 / 1000 = 2.4896 V / 240 V = 1.0373 %) = 1.9157 %
  test("drops along a path add up", () => {
    const design = stringDesign();
    expect(checkPathVoltageDrop(design, coldSite, design.paths![0]!)[0]).toMatchObject({ status: "pass", value: 1.92, limit: 5 });
  });

  test("a negative length is a readable input error, never NaN", () => {
    expect(() => runVoltageDrop(stringDesign(), { ...stringRun, lengthFt: -5 })).toThrow(DesignInputError);
    expect(() => runVoltageDrop(stringDesign(), { ...stringRun, lengthFt: -5 })).toThrow(/must be zero or more/);
  });

  test("a path naming a missing run is an input error", () => {
    expect(() => checkPathVoltageDrop(stringDesign(), coldSite, { id: "p", label: "P", runIds: ["nope"] })).toThrow(/"nope"/);
  });
});
