import { describe, expect, test } from "vitest";
import { checkInsulation, insulationRequirement } from "@/lib/engineering";
import { stringReading } from "./fixtures";

// IEC 62446-1 insulation resistance test (from memory; partly confirmed, see insulation-resistance.ts):
// up to 120 V: 250 V test, 0.5 MΩ; to 500 V: 500 V test, 1 MΩ; above: 1000 V test, 1 MΩ.
describe("string insulation resistance to ground", () => {
  test.each([
    [3 * 37.2, 250, 0.5], // 111.6 V
    [120, 250, 0.5], // the row's top
    [11 * 37.2, 500, 1], // 409.2 V
    [500, 500, 1],
    [16 * 37.2, 1000, 1], // 595.2 V
  ])("string Voc %d V → test at %d V, at least %d MΩ", (voc, testV, minMohm) => {
    expect(insulationRequirement(voc)).toEqual({ testV, minMohm });
  });

  test.each([
    [11, 220, "pass", 1],
    [11, 1, "pass", 1], // at the minimum
    [11, 0.99, "fail", 1],
    [11, 0, "fail", 1],
    [3, 0.5, "pass", 0.5],
    [3, 0.49, "fail", 0.5],
  ])("%d modules, %d MΩ → %s (minimum %d MΩ)", (n, mohm, status, min) => {
    const r = checkInsulation(stringReading({ modulesInSeries: n, insulationMohm: mohm }), 2023);
    expect(r).toMatchObject({
      status,
      value: mohm,
      limit: min,
      unit: "MΩ",
      kind: "string-insulation",
      clause: "IEC 62446-1 insulation resistance test",
    });
  });

  test("a low reading says not to connect, and why", () => {
    const r = checkInsulation(stringReading({ insulationMohm: 0.3 }), 2023);
    expect(r.message).toMatch(/insulation may be damaged or wet/);
    expect(r.fix).toMatch(/Do not connect the string/);
  });

  test.each([
    [null, "warn", "missing"],
    [-2, "fail", "invalid"],
    [Number.NaN, "fail", "invalid"],
  ])("reading %j → %s (%s)", (mohm, status, state) => {
    expect(checkInsulation(stringReading({ insulationMohm: mohm }), 2023)).toMatchObject({ status, reading: state });
  });
});
